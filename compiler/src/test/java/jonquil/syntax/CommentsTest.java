package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.SourceFile;
import org.junit.jupiter.api.Test;

/** Comments are kept for the formatter and never mistaken for code, closed or not. */
class CommentsTest {
  static ParseResult parse(String text) {
    return SpecParser.parse(new SourceFile(Path.of("c.jonq"), text));
  }

  @Test
  void aClosedBlockCommentBeforeMoreCodeIsJustAComment() {
    ParseResult r =
        parse("/* bench notes */\nprobe p /* inline */\n/* a\n * multi-line ** note */\ndump d\n");
    assertEquals(List.of(), r.diagnostics());
    assertEquals(3, r.ast().comments().size());
    assertEquals(2, r.ast().declarations().size());
  }

  @Test
  void onlyACommentThatNeverClosesIsReported() {
    ParseResult r = parse("probe p\n/* closed */\n/* open until the end\ndump d\n");
    assertEquals(
        List.of(DiagnosticCode.UNTERMINATED_COMMENT),
        r.diagnostics().stream().map(Diagnostic::code).toList());
  }
}
