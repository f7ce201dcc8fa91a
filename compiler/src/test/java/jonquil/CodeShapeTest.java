package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * Rules about the shape of the main code that a reader relies on and no compiler checks: one class
 * per name across every module (so a name always means one thing), no class named like a package,
 * and lines a reviewer can read side by side.
 */
class CodeShapeTest {
  /** The longest line the project's style allows (the formatter keeps code within 100). */
  static final int MAX_LINE = 120;

  static List<Path> mainSources() throws IOException {
    List<Path> out = new ArrayList<>();
    for (String module : List.of("compiler", "lsp")) {
      Path dir = Repo.root().resolve(module).resolve("src/main/java");
      try (Stream<Path> files = Files.walk(dir)) {
        files.filter(p -> p.toString().endsWith(".java")).sorted().forEach(out::add);
      }
    }
    return out;
  }

  static List<Path> allSources() throws IOException {
    List<Path> out = new ArrayList<>();
    for (String module : List.of("compiler", "lsp", "grammar")) {
      Path src = Repo.root().resolve(module).resolve("src");
      try (Stream<Path> files = Files.walk(src)) {
        files.filter(p -> p.toString().endsWith(".java")).sorted().forEach(out::add);
      }
    }
    return out;
  }

  static String simpleName(Path file) {
    String name = file.getFileName().toString();
    return name.substring(0, name.length() - ".java".length());
  }

  @Test
  void noClassNameIsDeclaredTwiceInTheMainCode() throws IOException {
    Map<String, List<String>> byName = new TreeMap<>();
    for (Path p : mainSources()) {
      if (simpleName(p).equals("package-info")) {
        continue;
      }
      byName
          .computeIfAbsent(simpleName(p), k -> new ArrayList<>())
          .add(Repo.root().relativize(p).toString());
    }
    Map<String, List<String>> twice = new TreeMap<>();
    byName.forEach(
        (name, files) -> {
          if (files.size() > 1) {
            twice.put(name, files);
          }
        });
    assertEquals(Map.of(), twice, "class names declared in more than one file");
  }

  @Test
  void noClassSharesItsNameWithAPackage() throws IOException {
    Set<String> packages = new TreeSet<>();
    List<Path> sources = mainSources();
    for (Path p : sources) {
      Path dir = p.getParent();
      while (dir != null && !dir.getFileName().toString().equals("java")) {
        packages.add(dir.getFileName().toString());
        dir = dir.getParent();
      }
    }
    Set<String> clashes = new TreeSet<>();
    for (Path p : sources) {
      if (packages.contains(simpleName(p).toLowerCase(Locale.ROOT))) {
        clashes.add(Repo.root().relativize(p).toString());
      }
    }
    assertEquals(Set.of(), clashes, "classes named like a package");
  }

  @Test
  void noLineIsLongerThanTheStyleAllows() throws IOException {
    List<String> long_ = new ArrayList<>();
    for (Path p : allSources()) {
      List<String> lines = Files.readAllLines(p);
      for (int i = 0; i < lines.size(); i++) {
        if (lines.get(i).codePointCount(0, lines.get(i).length()) > MAX_LINE) {
          long_.add(Repo.root().relativize(p) + ":" + (i + 1));
        }
      }
    }
    assertEquals(List.of(), long_, "lines over " + MAX_LINE + " characters");
  }
}
