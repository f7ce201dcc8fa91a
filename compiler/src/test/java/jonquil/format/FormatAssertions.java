package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

/** The promises of the formatter, checked on one input: only layout changes, and once is enough. */
final class FormatAssertions {
  private FormatAssertions() {}

  /** Formats {@code text} (which must parse) without the safety net and checks every promise; returns the result. */
  static String formatsFaithfully(String text, String name) {
    String once = Formatter.render(text, FormatOptions.DEFAULT);
    assertFalse(Formatter.hasSyntaxErrors(FormatCorpus.source(once)), name + ": output no longer parses:\n" + once);
    assertEquals(Formatter.tokens(text), Formatter.tokens(once), name + ": tokens changed:\n" + once);
    assertEquals(FormatCorpus.tree(text), FormatCorpus.tree(once), name + ": syntax tree changed:\n" + once);
    assertEquals(FormatCorpus.comments(text), FormatCorpus.comments(once), name + ": comments changed:\n" + once);
    assertEquals(once, Formatter.render(once, FormatOptions.DEFAULT), name + ": formatting twice changes the text");
    assertEquals(once, Formatter.format(FormatCorpus.source(text), FormatOptions.DEFAULT).orElseThrow(),
        name + ": the safety net rejected the layout");
    assertLayout(once, name);
    return once;
  }

  /**
   * The checks that need no parser, for text the parser rejects only because of a block
   * comment: this version's lexer reads every block comment that does not end the file as
   * unterminated (J106), so block-comment layout can only be tested below {@code format}.
   */
  static String rendersFaithfully(String text, String name) {
    String once = Formatter.render(text, FormatOptions.DEFAULT);
    assertEquals(Formatter.tokens(text), Formatter.tokens(once), name + ": tokens changed:\n" + once);
    assertEquals(once, Formatter.render(once, FormatOptions.DEFAULT), name + ": formatting twice changes the text");
    assertLayout(once, name);
    return once;
  }

  /**
   * True when {@code text} is well formed apart from its block comments: each is closed,
   * and with each replaced by a space the text parses without errors.
   */
  static boolean wellFormedButForBlockComments(String text) {
    StringBuilder without = new StringBuilder();
    boolean any = false;
    for (Lexeme l : Lexer.lex(text)) {
      if (l.kind() == LexemeKind.BLOCK_COMMENT) {
        if (l.text().length() < 4 || !l.text().endsWith("*/")) {
          return false;
        }
        any = true;
      }
      without.append(l.spaceBefore() ? " " : "").append(l.kind() == LexemeKind.BLOCK_COMMENT ? " " : l.text());
    }
    return any && !Formatter.hasSyntaxErrors(FormatCorpus.source(without.toString()));
  }

  private static void assertLayout(String text, String name) {
    if (text.isEmpty()) {
      return;
    }
    String newline = LineEnding.of(text);
    assertTrue(text.endsWith(newline) && !text.endsWith(newline + newline), name + ": must end with one line break");
    List<String> lines = List.of(text.split("\r\n|\r|\n", -1));
    for (String line : lines) {
      assertEquals(Lexer.stripTrailingSpace(line), line, name + ": trailing blanks in '" + line + "'");
    }
    for (int i = 1; i < lines.size(); i++) {
      assertFalse(lines.get(i).isEmpty() && lines.get(i - 1).isEmpty() && i < lines.size() - 1,
          name + ": two blank lines in a row at line " + (i + 1));
    }
  }
}
