package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * Every reference test names its source, so a reader can tell a checked value from a guess.
 *
 * <p>A <em>reference assertion</em> is an {@code assertEquals} in a test source of compiler/ or
 * lsp/ whose expected value (first argument) is a number written in the test, a literal or
 * arithmetic on literals, {@code Math} and constants named in capitals (such as {@code W}), and
 * that has a tolerance (a numeric third argument). Its <em>paragraph</em> is the statement itself
 * and the lines just above it, back to the first blank line, annotation or declaration line, at
 * most {@value #PARAGRAPH} lines. The paragraph must hold a source marker: a locator in a published
 * work (a table, section, equation, chapter, clause or page: {@code Table 5}, {@code §4.6}, {@code
 * eq. 4.43}, {@code p. 12}) beside the work's name, or one of the words {@code common practice},
 * {@code definition} or {@code from memory} (a comment may wrap between the two words).
 */
class SourceMarkersTest {
  static final int PARAGRAPH = 12;

  static final Pattern MARKER =
      Pattern.compile(
          "common\\s+(?://\\s*)?practice|definition|from\\s+(?://\\s*)?memory|Table\\s+[A-Z]?\\d|§\\s*[\\dA-Z]"
              + "|\\bsec(?:tion)?\\.?\\s+\\d|\\beqs?\\.\\s*\\(?\\d|\\bequation\\s+\\(?\\d"
              + "|\\bch(?:apter|\\.)\\s*\\d|\\bpp?\\.\\s*\\d|\\bclause\\s+\\d",
          Pattern.CASE_INSENSITIVE);

  private static final Pattern ASSERT = Pattern.compile("^\\s*assertEquals\\(");
  private static final Pattern NUMBER = Pattern.compile("-?\\d[\\d_]*(?:\\.\\d*)?(?:[eE]-?\\d+)?");
  private static final Pattern NUMERIC_EXPRESSION =
      Pattern.compile(
          "[-+*/(). \\d_eE,]*(?:(?:Math\\.(?:pow|sqrt|exp|log10|PI|E)|\\b[A-Z][A-Z_0-9]*\\b)"
              + "[-+*/(). \\d_eE,]*)*");
  private static final Pattern PARAGRAPH_END =
      Pattern.compile("^\\s*(?:$|@|(?:static |private |public )*(?:void|class|record) )");

  static List<Path> testSources() throws IOException {
    List<Path> out = new ArrayList<>();
    for (String module : List.of("compiler", "lsp")) {
      try (Stream<Path> files = Files.walk(Repo.root().resolve(module).resolve("src/test/java"))) {
        files.filter(p -> p.toString().endsWith(".java")).sorted().forEach(out::add);
      }
    }
    return out;
  }

  /** The reference assertions of one source that have no marker, as "file:line: statement". */
  static List<String> unmarked(String name, String text) {
    List<String> lines = text.lines().toList();
    List<String> out = new ArrayList<>();
    for (int i = 0; i < lines.size(); i++) {
      if (!ASSERT.matcher(lines.get(i)).find()) {
        continue;
      }
      int end = i;
      StringBuilder statement = new StringBuilder(lines.get(i));
      while (!statement.toString().stripTrailing().endsWith(";") && end + 1 < lines.size()) {
        statement.append('\n').append(lines.get(++end));
      }
      if (isReference(statement.toString())) {
        int start = i;
        while (start > 0
            && i - start < PARAGRAPH
            && !PARAGRAPH_END.matcher(lines.get(start - 1)).find()) {
          start--;
        }
        String paragraph = String.join("\n", lines.subList(start, end + 1));
        if (!MARKER.matcher(paragraph).find()) {
          out.add(name + ":" + (i + 1) + ": " + lines.get(i).strip());
        }
      }
      i = end;
    }
    return out;
  }

  static boolean isReference(String statement) {
    java.util.regex.Matcher call = ASSERT.matcher(statement);
    if (!call.find()) {
      return false;
    }
    List<String> args = new ArrayList<>();
    StringBuilder current = new StringBuilder();
    int depth = 0;
    for (char c : statement.substring(call.end()).toCharArray()) {
      if (c == '(' || c == '[' || c == '{') {
        depth++;
      } else if (c == ')' || c == ']' || c == '}') {
        if (depth == 0) {
          break;
        }
        depth--;
      }
      if (c == ',' && depth == 0) {
        args.add(current.toString().strip());
        current.setLength(0);
      } else {
        current.append(c);
      }
    }
    args.add(current.toString().strip());
    return args.size() >= 3
        && NUMBER.matcher(args.get(2).replaceAll("[dDfF]$", "")).matches()
        && NUMBER.matcher(args.get(0)).find()
        && NUMERIC_EXPRESSION.matcher(args.get(0)).matches();
  }

  @Test
  void everyReferenceAssertionNamesItsSource() throws IOException {
    List<String> missing = new ArrayList<>();
    int references = 0;
    for (Path p : testSources()) {
      String text = Files.readString(p);
      String name = Repo.root().relativize(p).toString().replace('\\', '/');
      missing.addAll(unmarked(name, text));
      references += (int) text.lines().filter(l -> ASSERT.matcher(l).find()).count();
    }
    assertTrue(references > 100, "the scan found the tests: " + references);
    assertEquals(List.of(), missing, "reference assertions with no source marker");
  }

  @Test
  void theScanCatchesAnUnmarkedValueAndAcceptsEachMarker() {
    String bare =
        "class T {\n  @Test\n  void glass() {\n    // normal incidence\n"
            + "    assertEquals(0.04, Fresnel.r(1.5), 1e-4);\n  }\n}\n";
    assertEquals(List.of("T:5: assertEquals(0.04, Fresnel.r(1.5), 1e-4);"), unmarked("T", bare));
    for (String marker :
        List.of(
            "Hecht, Optics, 5th ed., eq. 4.47",
            "Born & Wolf, §1.5.2",
            "IEC 60825-1:2014, Table 3",
            "common practice",
            "definition of reflectance",
            "from memory")) {
      assertEquals(List.of(), unmarked("T", bare.replace("normal incidence", marker)), marker);
    }
    // A blank line ends the paragraph: a source two paragraphs up does not count.
    assertEquals(
        1, unmarked("T", bare.replace("// normal", "// Hecht, eq. 4.47\n\n    // normal")).size());
    // A comment may wrap between the two words of a marker.
    assertEquals(List.of(), unmarked("T", bare.replace("normal incidence", "from\n    // memory")));
    // A capitalised constant counts as a number written in the test.
    assertEquals(1, unmarked("T", bare.replace("0.04,", "0.04 * W,")).size());
    // Not reference assertions: no tolerance, or an expected value computed by the code.
    assertEquals(List.of(), unmarked("T", bare.replace(", 1e-4)", ")")));
    assertEquals(List.of(), unmarked("T", bare.replace("0.04,", "expected,")));
  }
}
