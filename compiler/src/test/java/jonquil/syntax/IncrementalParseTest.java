package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import jonquil.source.SourceFile;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * An editor parses with a memo of earlier parses, reusing the trees of statements an edit did not
 * touch. That must never change what the user sees: after every edit of a long seeded sequence over
 * every sample and corpus file, the memo's parse equals a fresh parse, tree (every range) and
 * diagnostics alike.
 */
class IncrementalParseTest {
  private static ParseResult sameAsFresh(ParseMemo memo, Path file, String text) {
    SourceFile source = new SourceFile(file, text);
    ParseResult remembered = SpecParser.parse(source, memo);
    ParseResult fresh = SpecParser.parse(source);
    assertEquals(
        fresh.diagnostics(), remembered.diagnostics(), () -> "diagnostics differ on:\n" + text);
    assertEquals(fresh.ast(), remembered.ast(), () -> "trees differ on:\n" + text);
    return remembered;
  }

  private static final String ALPHABET = "0123456789 {}\n->.,;=\"±%/*^abzµ😀";

  /**
   * One seeded edit: insertions and deletions of characters and lines, duplicated and moved lines.
   */
  private static String edit(String text, SplittableRandom random, String[] snippets) {
    StringBuilder b = new StringBuilder(text);
    int at = random.nextInt(b.length() + 1);
    switch (random.nextInt(6)) {
      case 0 -> b.insert(at, ALPHABET.charAt(random.nextInt(ALPHABET.length())));
      case 1 -> b.delete(at, Math.min(b.length(), at + 1 + random.nextInt(6)));
      case 2 -> b.insert(lineStart(b, at), snippets[random.nextInt(snippets.length)]);
      case 3 -> {
        int start = lineStart(b, at);
        int end = b.indexOf("\n", at);
        b.delete(start, end < 0 ? b.length() : end + 1);
      }
      case 4 -> {
        int digit = -1;
        for (int i = at; i < b.length() && digit < 0; i++) {
          digit = Character.isDigit(b.charAt(i)) ? i : -1;
        }
        if (digit >= 0) {
          b.setCharAt(digit, (char) ('1' + random.nextInt(8)));
        }
      }
      default -> b.insert(0, "// note " + random.nextInt(100) + "\n");
    }
    return b.toString();
  }

  private static int lineStart(StringBuilder b, int at) {
    int nl = b.lastIndexOf("\n", Math.max(0, at - 1));
    return at == 0 || nl < 0 ? 0 : nl + 1;
  }

  @Test
  void aLongSequenceOfEditsParsesAsFreshAfterEveryEdit() throws IOException {
    String[] snippets = {
      "probe extra_probe\n",
      "material filler = index 1.33\n",
      "window w_new {\n  material   filler\n  thickness  3 mm\n}\n",
      "train {\n  a -> 5 mm -> b\n}\n",
      "\n",
      "require {\n  power at p > 1 mW\n}\n",
      "use \"parts/bench_parts.jonq\"\n",
      "require {\n"
          + "  yield >= 95 % for loss from a to b in 1 % .. 2 %, extinction >= 100 over wavelength"
          + " 1 um .. 2 um\n"
          + "  polarization at p is elliptical 10 deg ± 1 deg\n"
          + "  stray everywhere < 1 mW\n"
          + "}\n"
    };
    int steps = 0;
    for (Path spec : Repo.specFiles()) {
      ParseMemo memo = new ParseMemo();
      String text = Files.readString(spec);
      sameAsFresh(memo, spec, text);
      SplittableRandom random = new SplittableRandom(spec.getFileName().toString().hashCode());
      for (int i = 0; i < 40; i++) {
        text = edit(text, random, snippets);
        sameAsFresh(memo, spec, text);
        steps++;
      }
    }
    assertTrue(steps > 3000, "edits checked: " + steps);
  }

  @Test
  void aOneDigitEditReparsesOneStatementAndAnInsertedLineShiftsTheRest() throws IOException {
    Path sample = Repo.samples().resolve("optical_trap.jonq");
    String text = Files.readString(sample);
    ParseMemo memo = new ParseMemo();
    ParseResult first = sameAsFresh(memo, sample, text);
    int statements = memo.lastParsed();
    assertTrue(
        statements > 10 && memo.lastReused() == 0,
        "the first parse parses everything: " + statements);

    int digit = text.indexOf("mm") - 2;
    String edited =
        text.substring(0, digit)
            + (text.charAt(digit) == '7' ? '6' : '7')
            + text.substring(digit + 1);
    sameAsFresh(memo, sample, edited);
    assertEquals(1, memo.lastParsed(), "only the edited statement is parsed again");
    assertEquals(statements - 1, memo.lastReused());

    String grown = "probe front_probe\n" + edited;
    sameAsFresh(memo, sample, grown);
    assertEquals(
        1, memo.lastParsed(), "only the new statement is parsed; the rest move by its length");
    assertEquals(statements, memo.lastReused());

    assertSame(
        memo.unchanged(new SourceFile(sample, grown)),
        SpecParser.parse(new SourceFile(sample, grown), memo),
        "an unchanged file is not parsed again");
    assertTrue(first.ast().declarations().size() > 5);
  }
}
