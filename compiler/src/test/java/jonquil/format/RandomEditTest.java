package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import jonquil.syntax.TokenKind;
import jonquil.syntax.Tokens;
import org.junit.jupiter.api.Test;

/**
 * Seeded random layout edits of the well-formed corpus (spaces, tabs, blank lines, comments, ';'
 * for line breaks, CRLF, over-long paths): every edited spec that still parses formats faithfully
 * and idempotently. A failure names the seed and the variant, to replay it.
 */
class RandomEditTest {
  private static final long SEED = 0x6A6F6E7175696CL;
  private static final int VARIANTS = 600;
  private static final String[] COMMENTS = {"/* note */", "/*x*/", "/* two\n   lines */", "// why"};

  @Test
  void editedSpecsFormatFaithfullyAndIdempotently() {
    List<Path> specs = FormatCorpus.wellFormedSpecs();
    SplittableRandom random = new SplittableRandom(SEED);
    int tried = 0;
    int withBlockComments = 0;
    for (int v = 0; v < VARIANTS; v++) {
      String text = FormatCorpus.source(specs.get(random.nextInt(specs.size()))).text();
      int edits = 1 + random.nextInt(6);
      for (int e = 0; e < edits; e++) {
        text = edit(text, random);
      }
      String name = "variant " + v + " of seed " + SEED + ":\n" + text + "\n---";
      if (!Formatter.hasSyntaxErrors(FormatCorpus.source(text))) {
        FormatAssertions.formatsFaithfully(text, name);
        tried++;
        if (text.contains("/*")) {
          withBlockComments++;
        }
      }
    }
    assertTrue(tried > VARIANTS / 3, "only " + tried + " edited specs still parsed");
    assertTrue(
        withBlockComments > VARIANTS / 10,
        "only " + withBlockComments + " edited specs with block comments");
  }

  private static String edit(String text, SplittableRandom random) {
    List<WrittenToken> tokens = WrittenToken.of(text);
    if (tokens.isEmpty()) {
      return text + "probe p";
    }
    WrittenToken at = tokens.get(random.nextInt(tokens.size()));
    int pos = at.token().start();
    switch (random.nextInt(9)) {
      case 0:
        return insert(text, pos, random.nextBoolean() ? "   " : "\t ");
      case 1:
        {
          int start = pos;
          while (start > 0 && Tokens.isBlank(text.charAt(start - 1))) {
            start--;
          }
          return text.substring(0, start)
              + text.substring(pos); // may join tokens; then it rarely parses
        }
      case 2:
        return at.kind() == TokenKind.NEWLINE ? insert(text, pos, "\n\n") : insert(text, pos, " ");
      case 3:
        {
          String comment = COMMENTS[random.nextInt(COMMENTS.length)];
          return comment.startsWith("//")
              ? insertBeforeLineEnd(text, pos, " " + comment)
              : insert(text, pos, comment + " ");
        }
      case 4:
        return at.kind() == TokenKind.NEWLINE
            ? text.substring(0, pos) + " ; " + text.substring(pos + at.token().text().length())
            : text;
      case 5:
        return text.replace("\r\n", "\n").replace("\n", "\r\n");
      case 6:
        return at.kind() == TokenKind.ARROW
            ? insert(text, pos, "-> 12.5 mm -> 0.25 mm in saline ".repeat(1 + random.nextInt(4)))
            : text;
      case 7:
        return at.kind() == TokenKind.ARROW ? insert(text, pos, "\n      ") : text;
      default:
        return at.kind() == TokenKind.NEWLINE
            ? text.substring(0, pos) + " " + text.substring(pos + at.token().text().length())
            : text;
    }
  }

  private static String insert(String text, int pos, String what) {
    return text.substring(0, pos) + what + text.substring(pos);
  }

  private static String insertBeforeLineEnd(String text, int pos, String what) {
    int end = pos;
    while (end < text.length() && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
      end++;
    }
    return insert(text, end, what);
  }
}
