package jonquil.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

/** The one line splitter: LF, CRLF and CR end lines; UTF-16, code-point and UTF-8 columns agree. */
class LineIndexTest {
  @Test
  void allThreeLineEndingsEndALine() {
    LineIndex index = new LineIndex("a\nb\r\nc\rd");
    assertEquals(4, index.lineCount());
    assertEquals(3, index.line(index.lineStart(3)));
    assertEquals(2, index.lineStart(1));
    assertEquals(5, index.lineStart(2));
    assertEquals(7, index.lineStart(3));
  }

  @Test
  void aPositionNeverPointsBetweenCarriageReturnAndLineFeed() {
    LineIndex index = new LineIndex("ab\r\ncd");
    assertEquals(2, index.lineContentEnd(0));
    assertEquals(2, index.offsetOfUtf16(0, 99), "a column past the end clamps before the CR");
  }

  @Test
  void columnsAfterAnEmojiDifferByEncoding() {
    // The LSP checklist case: in "😀é" x, x is at UTF-16 column 6 and UTF-8 byte 9.
    String line = "\"😀é\" x";
    LineIndex index = new LineIndex(line);
    int x = line.indexOf('x');
    assertEquals(6, index.utf16Column(x));
    assertEquals(9, index.utf8Column(x));
    assertEquals(5, index.codePointColumn(x));
  }

  @Test
  void aColumnInsideASurrogatePairSnapsToItsStart() {
    LineIndex index = new LineIndex("😀x");
    assertEquals(0, index.offsetOfUtf16(0, 1));
  }

  @RepeatedTest(50)
  void offsetsRoundTripThroughLinesAndColumns(RepetitionInfo info) {
    SplittableRandom random = new SplittableRandom(info.getCurrentRepetition());
    String[] pieces = {"a", "é", "😀", "\u0301", "\t", "\n", "\r\n", "\r", "漢", " "};
    StringBuilder text = new StringBuilder();
    for (int i = random.nextInt(200); i > 0; i--) {
      text.append(pieces[random.nextInt(pieces.length)]);
    }
    String s = text.toString();
    LineIndex index = new LineIndex(s);
    for (int offset = 0; offset <= s.length(); offset++) {
      boolean insidePair =
          offset > 0 && offset < s.length() && Character.isLowSurrogate(s.charAt(offset));
      boolean insideCrLf =
          offset > 0
              && offset < s.length()
              && s.charAt(offset - 1) == '\r'
              && s.charAt(offset) == '\n';
      if (insidePair || insideCrLf) {
        continue;
      }
      int line = index.line(offset);
      assertEquals(
          offset, index.offsetOfUtf16(line, index.utf16Column(offset)), "utf16 at " + offset);
      assertEquals(
          offset,
          index.offsetOfCodePoint(line, index.codePointColumn(offset)),
          "code points at " + offset);
      assertTrue(index.utf8Column(offset) >= index.codePointColumn(offset));
    }
  }
}
