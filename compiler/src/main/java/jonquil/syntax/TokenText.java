package jonquil.syntax;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import jonquil.grammar.internal.JonquilLexer;
import jonquil.grammar.internal.JonquilParser;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.IntervalSet;

/** Plain-words descriptions of tokens and of sets of expected tokens, for syntax messages. */
final class TokenText {
  private TokenText() {}

  /**
   * Token types that can stand where a name is read (the grammar's {@code word} rule): an
   * identifier or one of the reserved words that double as names.
   */
  private static final IntervalSet WORDS = firstOf(JonquilParser.RULE_word);

  /** Token types that can start a quantity: a number, its sign, or 'OD'. */
  private static final IntervalSet NUMBER_START = firstOf(JonquilParser.RULE_quantity);

  private static IntervalSet firstOf(int rule) {
    return JonquilParser._ATN.nextTokens(JonquilParser._ATN.ruleToStartState[rule]);
  }

  private static boolean isComparator(int type) {
    return type > 0 && Tokens.kindOf(type) == TokenKind.COMPARISON;
  }

  /** Operators, '%' and '°': what can only be part of a unit. */
  private static boolean isUnitPart(int type) {
    if (type <= 0) {
      return false;
    }
    TokenKind kind = Tokens.kindOf(type);
    return kind.isUnitOperator() || kind == TokenKind.PERCENT || kind == TokenKind.DEGREE;
  }

  /** How a token that was found is named in a message: {@code 'm1'}, "end of line". */
  static String found(Token t) {
    return switch (t.getType()) {
      case Token.EOF -> "end of file";
      case JonquilLexer.NL -> "end of line";
      case JonquilLexer.STRING, JonquilLexer.UNTERMINATED_STRING -> "a quoted string";
      default -> "'" + shorten(t.getText()) + "'";
    };
  }

  /** A single token type described as a thing one could write. */
  static String expected(int type) {
    if (WORDS.contains(type)) {
      return "a name";
    }
    if (NUMBER_START.contains(type)) {
      return "a number";
    }
    if (isComparator(type)) {
      return "a comparison such as '>='";
    }
    return switch (type) {
      case Token.EOF -> "end of file";
      case JonquilLexer.NL, JonquilLexer.SEMI -> "end of line";
      case JonquilLexer.STRING -> "a quoted file path";
      default -> {
        String literal = JonquilLexer.VOCABULARY.getLiteralName(type);
        yield literal != null ? literal : JonquilLexer.VOCABULARY.getDisplayName(type);
      }
    };
  }

  /**
   * Describes an expected set in at most three plain alternatives, or returns null when the set is
   * too broad to be useful (the caller then uses a phrase for the context).
   */
  static String expectedSet(IntervalSet set) {
    Set<String> parts = new LinkedHashSet<>();
    boolean unitOnly = true;
    for (int type : set.toList()) {
      if (isUnitPart(type)) {
        continue; // units are always optional after a number; naming them only adds noise
      }
      unitOnly = false;
      parts.add(expected(type));
    }
    if (unitOnly && !set.isNil()) {
      return "a unit";
    }
    if (parts.isEmpty() || parts.size() > 3) {
      return null;
    }
    return join(new ArrayList<>(parts));
  }

  static String join(List<String> parts) {
    if (parts.size() == 1) {
      return parts.get(0);
    }
    return String.join(", ", parts.subList(0, parts.size() - 1))
        + " or "
        + parts.get(parts.size() - 1);
  }

  static String shorten(String text) {
    String oneLine = text.replace("\r", "\\r").replace("\n", "\\n");
    return oneLine.length() <= 24 ? oneLine : oneLine.substring(0, 21) + "...";
  }
}
