package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import jonquil.grammar.internal.JonquilLexer;
import jonquil.grammar.internal.JonquilParser;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.atn.DecisionInfo;
import org.antlr.v4.runtime.atn.PredictionMode;
import org.junit.jupiter.api.Test;

/**
 * Runs of blank or comment lines cost the parser work in proportion to their length, wherever they
 * stand. The measure is an operation count, not a time: the tokens ANTLR's prediction looked at
 * (its profiler's SLL and LL lookahead totals) while parsing a spec with N lines of trivia and with
 * 4N. Linear work gives a ratio near 4; a decision that looks ahead over the whole run for each of
 * its lines (the grammar once had a leading {@code sep*} that competed with a trailing one, and 100
 * 000 blank lines took 38 s to check) gives 16.
 */
class BlankAndCommentRunsParseInLinearTimeTest {
  private static final String STATEMENT = "source s { wavelength 1064 nm; power 1 W }\n";
  private static final int N = 2_000;

  private static long lookahead(String text) {
    long total = 0;
    for (PredictionMode mode : new PredictionMode[] {PredictionMode.SLL, PredictionMode.LL}) {
      JonquilParser parser =
          new JonquilParser(new CommonTokenStream(new JonquilLexer(CharStreams.fromString(text))));
      parser.removeErrorListeners();
      parser.setProfile(true);
      parser.getInterpreter().setPredictionMode(mode);
      parser.file();
      total +=
          Arrays.stream(parser.getParseInfo().getDecisionInfo()).mapToLong(d -> lookedAt(d)).sum();
    }
    return total;
  }

  private static long lookedAt(DecisionInfo d) {
    return d.SLL_TotalLook + d.LL_TotalLook;
  }

  private static void linear(String name, java.util.function.IntFunction<String> spec) {
    long small = lookahead(spec.apply(N));
    long large = lookahead(spec.apply(4 * N));
    assertTrue(
        large <= 5 * small,
        name + ": 4x the lines cost " + small + " -> " + large + " tokens of lookahead");
  }

  @Test
  void blankLinesBeforeTheFirstStatement() {
    linear("leading blank lines", n -> "\n".repeat(n) + STATEMENT);
  }

  @Test
  void commentLinesBeforeTheFirstStatement() {
    linear("leading comment lines", n -> "// note\n".repeat(n) + STATEMENT);
  }

  @Test
  void blankLinesBetweenStatementsAndAtTheEnd() {
    linear("inner blank lines", n -> STATEMENT + "\n".repeat(n) + STATEMENT);
    linear("trailing blank lines", n -> STATEMENT + "\n".repeat(n));
    linear("only blank lines", n -> "\n".repeat(n));
  }

  @Test
  void blankLinesInsideAPath() {
    linear(
        "blank lines around an arrow",
        n -> STATEMENT + "lens l { focal 1 m }\ntrain t {\n s" + "\n".repeat(n) + "-> l\n}\n");
  }
}
