package jonquil;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
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
}
