package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.format.FormatOptions;
import jonquil.format.Formatter;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentRangeFormattingParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * textDocument/formatting and rangeFormatting relay the compiler's formatter with the editor's
 * indentation.
 */
class FormattingTest {
  static final String MESSY =
      "probe   p\n"
          + "mirror m1 {reflectance 99 % ;   aoi 45 deg}\n"
          + "\n\n\n"
          + "window w {\n"
          + "material   glass\n"
          + "      thickness 1 mm\n"
          + "}\n"
          + "material glass = index 1.5\n";

  @TempDir Path dir;

  private String uri(String name, String text) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve(name);
    Files.writeString(file, text);
    return file.toUri().toString();
  }

  private static List<? extends TextEdit> format(
      LspHarness h, String uri, int tabSize, boolean spaces) throws Exception {
    return h.remote
        .getTextDocumentService()
        .formatting(
            new DocumentFormattingParams(
                new TextDocumentIdentifier(uri), new FormattingOptions(tabSize, spaces)))
        .get(10, TimeUnit.SECONDS);
  }

  @Test
  void formatsWithTheEditorsIndentationAndASecondRunChangesNothing() throws Exception {
    String uri = uri("messy.jonq", MESSY);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, MESSY);
      List<? extends TextEdit> edits = format(h, uri, 4, true);
      assertFalse(edits.isEmpty());
      String once = ClientText.apply(MESSY, edits);
      assertEquals(
          Formatter.format(
                  new SourceFile(dir.resolve("messy.jonq"), MESSY), new FormatOptions(4, true))
              .orElseThrow(),
          once);
      assertTrue(once.contains("\n    thickness 1 mm\n"), once);
      assertTrue(once.contains("\n    aoi 45 deg\n"), once);

      h.changeAll(uri, 2, once);
      assertEquals(List.of(), format(h, uri, 4, true), "formatting is idempotent");

      List<? extends TextEdit> tabs = format(h, uri, 8, false);
      String tabbed = ClientText.apply(once, tabs);
      assertTrue(tabbed.contains("\n\tthickness 1 mm\n"), tabbed);
      h.changeAll(uri, 3, tabbed);
      assertEquals(List.of(), format(h, uri, 8, false));
    }
  }

  @Test
  void aBrokenFileGetsNoEditsAndNoError() throws Exception {
    String broken = "mirror m1 {   reflectance 99 %\nprobe    p  {\n";
    String uri = uri("broken.jonq", broken);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, broken);
      assertEquals(List.of(), format(h, uri, 2, true));
      assertEquals(
          List.of(),
          h.remote
              .getTextDocumentService()
              .rangeFormatting(
                  new DocumentRangeFormattingParams(
                      new TextDocumentIdentifier(uri),
                      new FormattingOptions(2, true),
                      new Range(new Position(0, 0), new Position(1, 0))))
              .get(10, TimeUnit.SECONDS));
      assertEquals(
          List.of(), format(h, "file:///not/open.jonq", 2, true), "a document that is not open");
    }
  }

  @Test
  void rangeFormattingChangesOnlyTheStatementsTheSelectionTouches() throws Exception {
    String uri = uri("range.jonq", MESSY);
    try (LspHarness h = new LspHarness()) {
      h.initialize(dir);
      h.open(uri, 1, MESSY);
      // Select the window block (lines 5-8): the mirror line and the first probe keep their layout.
      List<? extends TextEdit> edits =
          h.remote
              .getTextDocumentService()
              .rangeFormatting(
                  new DocumentRangeFormattingParams(
                      new TextDocumentIdentifier(uri),
                      new FormattingOptions(2, true),
                      new Range(new Position(5, 0), new Position(8, 1))))
              .get(10, TimeUnit.SECONDS);
      assertFalse(edits.isEmpty());
      for (TextEdit e : edits) {
        assertTrue(
            e.getRange().getStart().getLine() >= 5 && e.getRange().getEnd().getLine() <= 9,
            e.toString());
      }
      String after = ClientText.apply(MESSY, edits);
      assertTrue(
          after.startsWith("probe   p\nmirror m1 {reflectance 99 % ;   aoi 45 deg}\n"), after);
      assertTrue(after.contains("window w {\n  material glass\n  thickness 1 mm\n}\n"), after);

      // Formatting the rest afterwards gives the same text as formatting everything at once.
      h.changeAll(uri, 2, after);
      String all = ClientText.apply(after, format(h, uri, 2, true));
      assertEquals(
          Formatter.format(new SourceFile(dir.resolve("range.jonq"), MESSY), FormatOptions.DEFAULT)
              .orElseThrow(),
          all);
    }
  }
}
