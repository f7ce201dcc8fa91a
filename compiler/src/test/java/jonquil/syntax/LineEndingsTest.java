package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import java.util.List;
import jonquil.diag.Diagnostic;
import jonquil.source.SourceFile;
import org.junit.jupiter.api.Test;

/**
 * The same spec with LF, CRLF or CR line endings gives the same diagnostics at the same lines and
 * columns.
 */
class LineEndingsTest {
  static final String SPEC =
      String.join(
          "\n",
          "source laser {",
          "  wavelength 532 nm $",
          "  power 2 W",
          "lens l { focal 3 mm }",
          "train t { laser -> -> l }",
          "");

  static List<String> positions(String text) {
    SourceFile file = new SourceFile(Path.of("x.jonq"), text);
    ParseResult result = SpecParser.parse(file);
    return result.diagnostics().stream()
        .map(
            (Diagnostic d) ->
                file.humanLine(d.range().start())
                    + ":"
                    + file.humanColumn(d.range().start())
                    + " "
                    + d.code().id()
                    + " "
                    + d.message())
        .toList();
  }

  @Test
  void crlfAndCrGiveTheSameDiagnosticsAsLf() {
    List<String> lf = positions(SPEC);
    assertFalse(lf.isEmpty());
    assertEquals(lf, positions(SPEC.replace("\n", "\r\n")));
    assertEquals(lf, positions(SPEC.replace("\n", "\r")));
  }

  @Test
  void columnsAfterNonAsciiTextCountCodePoints() {
    List<String> plain = positions("source s { wavelength 532 nm $ }\n");
    List<String> emoji = positions("source s { wavelength 532 nm $ } // 😀\n");
    assertEquals(plain, emoji);
    assertEquals(
        List.of("1:9 J107 unexpected character '$': not part of the Jonquil language"),
        positions("use \"😀\" $\n").stream().filter(s -> s.contains("J107")).toList());
  }
}
