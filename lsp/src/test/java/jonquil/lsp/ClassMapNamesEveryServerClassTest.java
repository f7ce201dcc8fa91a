package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * lsp/README.md's class map names every class of the server's main code, and names no class that is
 * gone: a contributor finds each one's job there.
 */
class ClassMapNamesEveryServerClassTest {
  private static final Path LSP = ParityTest.REPO.resolve("lsp");
  private static final Pattern NAME = Pattern.compile("`(\\w+)`");

  @Test
  void everyMainClassHasARowAndEveryRowAClass() throws IOException {
    Set<String> main = mainClasses();
    Set<String> mapped = mappedClasses();
    Set<String> missing = new TreeSet<>(main);
    missing.removeAll(mapped);
    Set<String> gone = new TreeSet<>(mapped);
    gone.removeAll(main);
    assertEquals(Set.of(), missing, "classes of lsp/src/main with no row in lsp/README.md's map");
    assertEquals(Set.of(), gone, "names in lsp/README.md's class map that are no class");
  }

  private static Set<String> mainClasses() throws IOException {
    try (Stream<Path> files = Files.list(LSP.resolve("src/main/java/jonquil/lsp"))) {
      return files
          .map(f -> f.getFileName().toString())
          .filter(n -> n.endsWith(".java") && !n.equals("package-info.java"))
          .map(n -> n.substring(0, n.length() - ".java".length()))
          .collect(java.util.stream.Collectors.toCollection(TreeSet::new));
    }
  }

  /** The names in the first column of the table under '## Class map'. */
  private static Set<String> mappedClasses() throws IOException {
    List<String> lines = Files.readAllLines(LSP.resolve("README.md"));
    int start = lines.indexOf("## Class map");
    List<String> rows = new ArrayList<>();
    for (int i = start + 1; i < lines.size() && !lines.get(i).startsWith("## "); i++) {
      if (lines.get(i).startsWith("| `")) {
        rows.add(lines.get(i).split("\\|")[1]);
      }
    }
    Set<String> names = new TreeSet<>();
    for (String cell : rows) {
      Matcher m = NAME.matcher(cell);
      while (m.find()) {
        names.add(m.group(1));
      }
    }
    return names;
  }
}
