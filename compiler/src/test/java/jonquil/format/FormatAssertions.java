package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

/** The promises of the formatter, checked on one input: only layout changes, and once is enough. */
final class FormatAssertions {
  private FormatAssertions() {}

  /**
   * Formats {@code text} (which must parse) without the safety net and checks every promise;
   * returns the result.
   */
  static String formatsFaithfully(String text, String name) {
    String once = Formatter.render(text, FormatOptions.DEFAULT);
    assertFalse(
        Formatter.hasSyntaxErrors(FormatCorpus.source(once)),
        name + ": output no longer parses:\n" + once);
    assertEquals(
        Formatter.tokens(text), Formatter.tokens(once), name + ": tokens changed:\n" + once);
    assertEquals(
        FormatCorpus.tree(text), FormatCorpus.tree(once), name + ": syntax tree changed:\n" + once);
    assertEquals(
        FormatCorpus.comments(text),
        FormatCorpus.comments(once),
        name + ": comments changed:\n" + once);
    assertEquals(
        once,
        Formatter.render(once, FormatOptions.DEFAULT),
        name + ": formatting twice changes the text");
    assertEquals(
        once,
        Formatter.format(FormatCorpus.source(text), FormatOptions.DEFAULT).orElseThrow(),
        name + ": the safety net rejected the layout");
    assertLayout(once, name);
    return once;
  }

  private static void assertLayout(String text, String name) {
    if (text.isEmpty()) {
      return;
    }
    String newline = LineEnding.of(text);
    assertTrue(
        text.endsWith(newline) && !text.endsWith(newline + newline),
        name + ": must end with one line break");
    List<String> lines = List.of(text.split("\r\n|\r|\n", -1));
    for (String line : lines) {
      assertEquals(
          WrittenToken.stripTrailingSpace(line),
          line,
          name + ": trailing blanks in '" + line + "'");
    }
    for (int i = 1; i < lines.size(); i++) {
      assertFalse(
          lines.get(i).isEmpty() && lines.get(i - 1).isEmpty() && i < lines.size() - 1,
          name + ": two blank lines in a row at line " + (i + 1));
    }
  }
}
