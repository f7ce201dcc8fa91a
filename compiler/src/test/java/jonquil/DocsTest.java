package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import jonquil.resolve.ParamSpec;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/** The docs stay true: every kind, parameter, measure and diagnostic code is documented. */
class DocsTest {
  static String readme() throws IOException {
    return Files.readString(Repo.root().resolve("README.md"));
  }

  @Test
  void everySampleBenchIsListedInTheReadme() throws IOException {
    String readme = readme();
    List<String> missing = new ArrayList<>();
    try (var files = Files.list(Repo.samples())) {
      files
          .filter(p -> p.toString().endsWith(".jonq"))
          .map(p -> p.getFileName().toString())
          .sorted()
          .filter(name -> !readme.contains("(`" + name + "`)"))
          .forEach(missing::add);
    }
    assertEquals(List.of(), missing, "samples not listed under 'Samples' in README.md");
  }

  @Test
  void theReadmeOpensWithTheJobAndGivesExactlyTheTwoCommandsCiRuns() throws IOException {
    String readme = readme();
    String ci = Files.readString(Repo.root().resolve(".ci/run"));
    String run =
        "mvn -q -DskipTests package && java -jar lsp/target/jonquil.jar check"
            + " samples/optical_trap.jonq";
    String test = "mvn -B test";
    assertTrue(
        readme.contains("```\n" + run + "\n" + test + "\n```"), "README set-up block changed");
    assertTrue(ci.contains(run) && ci.contains(test), ".ci/run must run the README's commands");
    assertTrue(ci.indexOf(test) < ci.indexOf(run), ".ci/run runs the tests first");
  }

  @Test
  void everyKindAndParameterIsInTheReadmeTable() throws IOException {
    String readme = readme();
    List<String> missing = new ArrayList<>();
    for (ElementKind kind : ElementKind.values()) {
      if (!readme.contains("`" + kind.word() + "`")) {
        missing.add(kind.word());
      }
      for (ParamSpec p : kind.params()) {
        if (!readme.contains("`" + p.name() + "`")) {
          missing.add(kind.word() + "." + p.name());
        }
      }
    }
    assertTrue(missing.isEmpty(), "not in README.md: " + missing);
  }

  @Test
  void everyMeasureIsInTheReadme() throws IOException {
    String readme = readme();
    List<String> missing = new ArrayList<>();
    for (Measure m : Measure.values()) {
      if (!readme.contains("`" + m.word() + "`")) {
        missing.add(m.word());
      }
    }
    assertTrue(missing.isEmpty(), "not in README.md: " + missing);
  }

  @Test
  void everyDiagnosticCodeIsInTheDevelopersGuide() throws IOException {
    String guide = Files.readString(Repo.root().resolve("DEVELOPERS.md"));
    List<String> missing = new ArrayList<>();
    for (DiagnosticCode c : DiagnosticCode.values()) {
      if (!guide.contains(
          "| "
              + c.id()
              + " | `"
              + c.ruleName()
              + "` | "
              + c.severity().name().toLowerCase(java.util.Locale.ROOT)
              + " |\n")) {
        missing.add(c.id());
      }
    }
    assertTrue(missing.isEmpty(), "not in DEVELOPERS.md: " + missing);
  }

  /** Room for the map only: detail belongs in the module guides it points to. */
  static final int GUIDE_MAX_BYTES = 11_000;

  @Test
  void theDevelopersGuideStaysAMap() throws IOException {
    long size = Files.size(Repo.root().resolve("DEVELOPERS.md"));
    assertTrue(
        size <= GUIDE_MAX_BYTES,
        "DEVELOPERS.md is "
            + size
            + " bytes, over "
            + GUIDE_MAX_BYTES
            + ": move detail to compiler/README.md or lsp/README.md and leave a pointer");
  }

  /** A Markdown link or image: its target runs to the first closing parenthesis or blank. */
  static final Pattern LINK = Pattern.compile("\\]\\(([^)\\s]+)\\)");

  /** The relative link targets of a Markdown file, without their #fragment. */
  static List<String> relativeLinks(String markdown) {
    List<String> targets = new ArrayList<>();
    Matcher m = LINK.matcher(markdown);
    while (m.find()) {
      String target = m.group(1);
      // A scheme (https:, mailto:) leaves the repository; a bare #anchor stays on the page.
      if (target.matches("[A-Za-z][A-Za-z0-9+.-]*:.*") || target.startsWith("#")) {
        continue;
      }
      int hash = target.indexOf('#');
      targets.add(hash < 0 ? target : target.substring(0, hash));
    }
    return targets;
  }

  @Test
  void relativeLinksFindTheirTargetsWithoutAnchorsOrSchemes() {
    assertEquals(
        List.of("a/b.md", "../c.md", "d.png"),
        relativeLinks(
            "[a](a/b.md) [x](https://example.org/y) [c](../c.md#part) ![d](d.png) [e](#top)"));
  }

  @Test
  void everyRelativeLinkOfTheGuidesNamesAFileThatExists() throws IOException {
    List<String> broken = new ArrayList<>();
    for (String guide : List.of("DEVELOPERS.md", "compiler/README.md", "lsp/README.md")) {
      Path file = Repo.root().resolve(guide);
      for (String target : relativeLinks(Files.readString(file))) {
        if (target.startsWith("/") || !Files.exists(file.resolveSibling(target))) {
          broken.add(guide + " -> " + target);
        }
      }
    }
    assertEquals(List.of(), broken, "links to no file");
    List<String> pointers = relativeLinks(Files.readString(Repo.root().resolve("DEVELOPERS.md")));
    assertTrue(
        pointers.contains("compiler/README.md") && pointers.contains("lsp/README.md"),
        "DEVELOPERS.md must point at the two module guides that hold its detail");
  }
}
