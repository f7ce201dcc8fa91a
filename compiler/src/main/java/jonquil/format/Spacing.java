package jonquil.format;

import java.util.List;
import java.util.Set;
import jonquil.syntax.Token;
import jonquil.syntax.TokenKind;
import jonquil.syntax.Tokens;

/**
 * Whether one space or none goes between two tokens on a line. One space is the rule; the
 * exceptions keep units, references, signs and lists looking the way people write them. A pair is
 * only ever written together when the two texts still read back as the same two tokens.
 */
final class Spacing {
  /** The hazard classes written with a letter (IEC 60825-1:2014, clause 5). */
  private static final Set<String> LETTERED_CLASSES = Set.of("1M", "2M", "3R", "3B");

  private Spacing() {}

  /** The tokens joined with the spacing rules, as they appear on one line. */
  static String join(List<WrittenToken> line) {
    StringBuilder text = new StringBuilder();
    for (int i = 0; i < line.size(); i++) {
      if (i > 0 && spaced(line, i)) {
        text.append(' ');
      }
      text.append(line.get(i).text());
    }
    return text.toString();
  }

  /** True when a space goes before {@code line.get(i)}, which follows {@code line.get(i - 1)}. */
  static boolean spaced(List<WrittenToken> line, int i) {
    WrittenToken prev = line.get(i - 1);
    WrittenToken next = line.get(i);
    return !glued(line, i, prev, next)
        || !Tokens.scan(prev.text() + next.text()).stream()
            .filter(t -> t.kind() != TokenKind.WHITESPACE)
            .map(Token::text)
            .toList()
            .equals(List.of(prev.text(), next.text()));
  }

  private static boolean glued(
      List<WrittenToken> line, int i, WrittenToken prev, WrittenToken next) {
    TokenKind p = prev.kind();
    TokenKind n = next.kind();
    if (p.isComment() || n.isComment()) {
      return false;
    }
    if (n == TokenKind.COMMA || p == TokenKind.DOT || n == TokenKind.DOT) {
      return true; // 'waist 1 mm, m2 1.1' and 'pbs.through'
    }
    if (p.isSign() && n == TokenKind.NUMBER) {
      return true; // a sign is part of its number: '-50 mm'
    }
    if (p.isUnitOperator()
        || n == TokenKind.STAR
        || n == TokenKind.MIDDOT
        || n == TokenKind.CARET) {
      return true; // a compound unit is one word: 'kW/cm2', 'J/cm^2'
    }
    if (p == TokenKind.NUMBER && isHazardClassSuffix(prev, next)) {
      return true; // a hazard class is one label: '3R', '1M', never '3 R'
    }
    if (n == TokenKind.SLASH) {
      // After a value a '/' starts the unit ('0.2 /cm'); after a unit factor it continues it.
      return !(p == TokenKind.NUMBER && !isExponent(line, i - 1));
    }
    if ((n == TokenKind.PERCENT || n == TokenKind.DEGREE)
        && p == TokenKind.NUMBER
        && !isExponent(line, i - 1)) {
      return !next.spaceBefore(); // both '95 %' and '45°' are common: keep the writer's choice
    }
    return false;
  }

  /**
   * The lexer reads '3R' as a number and a name; the laser classes 1M, 2M, 3R and 3B are the only
   * places the language writes a digit and such a letter together.
   */
  private static boolean isHazardClassSuffix(WrittenToken number, WrittenToken letter) {
    return letter.kind() == TokenKind.IDENTIFIER
        && LETTERED_CLASSES.contains(number.text() + letter.text());
  }

  /**
   * True when the number at {@code at} is the power of a unit factor ({@code cm^2}, {@code m^-1}).
   */
  private static boolean isExponent(List<WrittenToken> line, int at) {
    int before = at - 1;
    if (before >= 0 && line.get(before).kind().isSign()) {
      before--;
    }
    return before >= 0 && line.get(before).kind() == TokenKind.CARET;
  }
}
