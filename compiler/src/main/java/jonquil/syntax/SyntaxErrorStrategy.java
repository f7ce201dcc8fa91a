package jonquil.syntax;

import jonquil.diag.DiagnosticCode;
import jonquil.grammar.internal.JonquilLexer;
import jonquil.grammar.internal.JonquilParser;
import jonquil.source.TextRange;
import org.antlr.v4.runtime.DefaultErrorStrategy;
import org.antlr.v4.runtime.FailedPredicateException;
import org.antlr.v4.runtime.InputMismatchException;
import org.antlr.v4.runtime.NoViableAltException;
import org.antlr.v4.runtime.Parser;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.IntervalSet;
import org.antlr.v4.runtime.misc.ParseCancellationException;

/**
 * ANTLR's recovery, with its reports rewritten in plain words ("expected a name after 'lens', found
 * '{'") instead of token-set dumps, and a stop after too many errors.
 */
final class SyntaxErrorStrategy extends DefaultErrorStrategy {
  private static final int MAX_REPORTS = 400;

  private final SyntaxReporter reporter;
  private final OffsetMap offsets;
  private int reports;

  SyntaxErrorStrategy(SyntaxReporter reporter, OffsetMap offsets) {
    this.reporter = reporter;
    this.offsets = offsets;
  }

  @Override
  protected void reportNoViableAlternative(Parser parser, NoViableAltException e) {
    report(parser, e.getOffendingToken(), expectation(parser, e.getExpectedTokens()), false);
  }

  @Override
  protected void reportInputMismatch(Parser parser, InputMismatchException e) {
    report(parser, e.getOffendingToken(), expectation(parser, e.getExpectedTokens()), false);
  }

  @Override
  protected void reportFailedPredicate(Parser parser, FailedPredicateException e) {
    report(parser, e.getOffendingToken(), expectation(parser, parser.getExpectedTokens()), false);
  }

  @Override
  protected void reportUnwantedToken(Parser parser) {
    if (inErrorRecoveryMode(parser)) {
      return;
    }
    beginErrorCondition(parser);
    report(parser, parser.getCurrentToken(), expectation(parser, getExpectedTokens(parser)), false);
  }

  @Override
  protected void reportMissingToken(Parser parser) {
    if (inErrorRecoveryMode(parser)) {
      return;
    }
    beginErrorCondition(parser);
    report(parser, parser.getCurrentToken(), expectation(parser, getExpectedTokens(parser)), true);
  }

  private void report(Parser parser, Token offending, String expected, boolean missing) {
    if (++reports > MAX_REPORTS || reporter.full()) {
      throw new ParseCancellationException("too many syntax errors");
    }
    boolean valueNext =
        offending.getType() == JonquilLexer.NUMBER
            || offending.getType() == JonquilLexer.MINUS
            || offending.getType() == JonquilLexer.OD;
    boolean onSameLine = previousOnSameLine(parser, offending) != null;
    if (!missing && onSameLine && valueNext && within(parser, JonquilParser.RULE_requireDecl)) {
      // 'power at spot 15 mW': the number is the bound; what is missing is the comparison before
      // it.
      missing = true;
      expected = "a comparison such as '>=' or 'in'";
    } else if (!missing
        && onSameLine
        && within(parser, JonquilParser.RULE_trainDecl)
        && (valueNext || offending.getType() == JonquilLexer.IDENT)) {
      // 'seed -> 40 mm spot': two steps side by side; the arrow between them is missing.
      missing = true;
      expected = "'->'";
    }
    Token previous = previousOnSameLine(parser, offending);
    boolean atLineEnd = offending.getType() == JonquilLexer.NL || offending.getType() == Token.EOF;
    TextRange range;
    if (atLineEnd && previous != null) {
      int end = offsets.toUtf16(previous.getStopIndex() + 1);
      range = new TextRange(end, end);
    } else if (offending.getType() == Token.EOF) {
      int end = offsets.toUtf16(offending.getStartIndex());
      range = new TextRange(end, end);
    } else {
      range =
          new TextRange(
              offsets.toUtf16(offending.getStartIndex()),
              offsets.toUtf16(offending.getStopIndex() + 1));
    }
    StringBuilder message = new StringBuilder();
    String after = previous != null ? " after '" + TokenText.shorten(previous.getText()) + "'" : "";
    if (missing) {
      message.append("missing ").append(expected).append(after);
      if (!atLineEnd) {
        message.append(" (before ").append(TokenText.found(offending)).append(')');
      }
    } else {
      message
          .append("expected ")
          .append(expected)
          .append(after)
          .append(", found ")
          .append(TokenText.found(offending));
    }
    reporter.parse(
        missing ? DiagnosticCode.SYNTAX_MISSING : DiagnosticCode.SYNTAX_UNEXPECTED,
        range,
        message.toString(),
        offending.getType() == Token.EOF);
  }

  private static boolean within(Parser parser, int rule) {
    for (ParserRuleContext ctx = parser.getContext(); ctx != null; ctx = ctx.getParent()) {
      if (ctx.getRuleIndex() == rule) {
        return true;
      }
    }
    return false;
  }

  /** The token before the offending one, if it is on the same line (used to say "after 'x'"). */
  private static Token previousOnSameLine(Parser parser, Token offending) {
    var stream = parser.getTokenStream();
    for (int index = offending.getTokenIndex() - 1; index >= 0; index--) {
      Token t = stream.get(index);
      if (t.getChannel() != Token.DEFAULT_CHANNEL) {
        continue;
      }
      boolean offendingEndsLine =
          offending.getType() == JonquilLexer.NL || offending.getType() == Token.EOF;
      if (t.getType() == JonquilLexer.NL
          || (!offendingEndsLine && t.getLine() != offending.getLine())) {
        return null;
      }
      return t;
    }
    return null;
  }

  /** What could come here, in words; falls back to a phrase for the surrounding rule. */
  private static String expectation(Parser parser, IntervalSet expected) {
    String fromSet = expected == null ? null : TokenText.expectedSet(expected);
    if (fromSet != null) {
      return fromSet;
    }
    ParserRuleContext ctx = parser.getContext();
    int rule = ctx == null ? -1 : ctx.getRuleIndex();
    return switch (rule) {
      case JonquilParser.RULE_file, JonquilParser.RULE_topStatement ->
          "a declaration (such as 'lens obj { ... }'), 'train', 'require' or 'use'";
      case JonquilParser.RULE_declaration -> "'{', '=' or end of line";
      case JonquilParser.RULE_block, JonquilParser.RULE_property -> "a parameter line or '}'";
      case JonquilParser.RULE_args, JonquilParser.RULE_arg, JonquilParser.RULE_value ->
          "a value (a number with its unit, a name or a quoted string)";
      case JonquilParser.RULE_quantity, JonquilParser.RULE_number, JonquilParser.RULE_tolerance ->
          "a number";
      case JonquilParser.RULE_unit, JonquilParser.RULE_unitFactor -> "a unit";
      case JonquilParser.RULE_trainDecl,
          JonquilParser.RULE_path,
          JonquilParser.RULE_step,
          JonquilParser.RULE_distance ->
          "an element name or a distance such as '150 mm'";
      case JonquilParser.RULE_requireDecl,
          JonquilParser.RULE_requirement,
          JonquilParser.RULE_check,
          JonquilParser.RULE_measure ->
          "a requirement such as 'power at probe1 >= 400 mW'";
      case JonquilParser.RULE_condition, JonquilParser.RULE_extra ->
          "a condition such as '>= 400 mW', 'in 1 W .. 2 W' or 'is linear 0 deg'";
      case JonquilParser.RULE_place -> "'at' a name, 'everywhere' or 'from' a name 'to' a name";
      case JonquilParser.RULE_state -> "a polarization state such as 'linear 90 deg'";
      case JonquilParser.RULE_band -> "a band such as 'wavelength 1060 nm .. 1070 nm'";
      default -> "something else";
    };
  }

  @Override
  public void recover(Parser recognizer, RecognitionException e) {
    if (reporter.full()) {
      throw new ParseCancellationException("too many syntax errors");
    }
    super.recover(recognizer, e);
  }
}
