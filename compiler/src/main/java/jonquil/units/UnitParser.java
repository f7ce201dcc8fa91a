package jonquil.units;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Reads the compact unit written after a number ("mW", "W/cm2", "kV/cm", "µm^2") into a {@link
 * Unit}; every way the text can be wrong comes back as a {@link UnitParse.Failure}.
 *
 * <p>Grammar: {@code ["/" | "1/"] factor (("/" | "*" | "·") factor)*}, where a factor is a symbol
 * followed by an optional exponent: trailing digits ("cm2"), superscripts ("cm²", "m⁻¹") or "^" and
 * a signed integer ("m^-1"). A "/" divides only the factor right after it, so "W/m/s" is W·m⁻¹·s⁻¹
 * and "W/cm*s" is W·cm⁻¹·s.
 */
public final class UnitParser {
  /** Beyond this no real unit goes, and prefix powers would overflow a double. */
  static final int MAX_EXPONENT = 12;

  private UnitParser() {}

  /** One factor as written: its symbol, its exponent, and whether it follows a "/". */
  private record Term(String symbol, String written, int exponent, boolean divided) {}

  /** An exponent read after a symbol, or why it could not be read. */
  private record Exponent(int value, String error) {
    static Exponent ok(int value) {
      return new Exponent(value, null);
    }

    static Exponent error(String message) {
      return new Exponent(0, message);
    }
  }

  /** Scanner state over one unit text; discarded after a single parse. */
  private static final class Scanner {
    final String text;
    int pos;

    Scanner(String text) {
      this.text = text;
    }

    boolean atEnd() {
      return pos >= text.length();
    }

    char peek() {
      return text.charAt(pos);
    }
  }

  /**
   * Units written in specs are few and repeat; parsing is pure, so each text is read once (bounded:
   * input may be hostile).
   */
  private static final int CACHE_LIMIT = 4096;

  private static final java.util.concurrent.ConcurrentHashMap<String, UnitParse> CACHE =
      new java.util.concurrent.ConcurrentHashMap<>();

  public static UnitParse parse(String text) {
    if (text == null) {
      return new UnitParse.Failure("no unit written");
    }
    UnitParse known = CACHE.get(text);
    if (known != null) {
      return known;
    }
    UnitParse parsed = read(text);
    if (CACHE.size() < CACHE_LIMIT) {
      CACHE.putIfAbsent(text, parsed);
    }
    return parsed;
  }

  private static UnitParse read(String text) {
    if (text == null) {
      return new UnitParse.Failure("no unit written");
    }
    String compact = text.replaceAll("\\s+", "");
    if (compact.isEmpty()) {
      return new UnitParse.Failure("no unit written");
    }
    Scanner in = new Scanner(compact);
    List<Term> terms = new ArrayList<>();
    boolean divided = false;
    if (compact.startsWith("/")) {
      divided = true;
      in.pos = 1;
    } else if (compact.startsWith("1/")) {
      divided = true;
      in.pos = 2;
    }
    while (true) {
      if (in.atEnd()) {
        char op = compact.charAt(in.pos - 1);
        return fail("missing unit after '" + op + "' in '" + compact + "'");
      }
      int start = in.pos;
      String symbol = readSymbol(in);
      if (symbol.isEmpty()) {
        char c = in.peek();
        if (isOperator(c)) {
          return fail(
              in.pos == 0
                  ? "missing unit before '" + c + "' in '" + compact + "'"
                  : "missing unit between two operators in '" + compact + "'");
        }
        return fail("unexpected character '" + c + "' in '" + compact + "'");
      }
      Exponent exponent = readExponent(in);
      if (exponent.error() != null) {
        return fail(exponent.error());
      }
      String written = compact.substring(start, in.pos);
      terms.add(new Term(symbol, written, exponent.value(), divided));
      if (in.atEnd()) {
        break;
      }
      char c = in.peek();
      if (c == '/') {
        divided = true;
      } else if (c == '*' || c == '·' || c == '⋅') {
        divided = false;
      } else if (c == '-' || c == '−') {
        return fail(
            "unexpected '"
                + c
                + "' after '"
                + written
                + "' in '"
                + compact
                + "'; write a negative exponent as '"
                + symbol
                + "^-1'");
      } else if (isSymbolChar(c)) {
        return fail(
            "unexpected '"
                + compact.substring(in.pos)
                + "' after '"
                + written
                + "' in '"
                + compact
                + "'; join units with '*' or '/'");
      } else {
        return fail("unexpected character '" + c + "' in '" + compact + "'");
      }
      in.pos++;
    }
    return combine(compact, terms);
  }

  private static UnitParse combine(String compact, List<Term> terms) {
    List<UnitCatalog.Atom> atoms = new ArrayList<>();
    for (Term t : terms) {
      Optional<UnitCatalog.Atom> atom = UnitCatalog.lookup(t.symbol());
      if (atom.isEmpty()) {
        String hint =
            UnitCatalog.suggest(t.symbol()).map(s -> "; did you mean '" + s + "'?").orElse("");
        return fail("unknown unit '" + t.symbol() + "'" + hint);
      }
      atoms.add(atom.get());
    }
    for (int i = 0; i < terms.size(); i++) {
      if (atoms.get(i).use() != UnitCatalog.Use.ALONE) {
        continue;
      }
      Term t = terms.get(i);
      String advice =
          atoms.get(i).unit().offset() != 0 ? "; use 'K' for temperature differences" : "";
      if (terms.size() > 1 || t.divided()) {
        return fail("'" + t.symbol() + "' cannot be combined with other units" + advice);
      }
      if (t.exponent() != 1) {
        return fail("'" + t.symbol() + "' cannot be raised to a power" + advice);
      }
      Unit u = atoms.get(i).unit();
      return new UnitParse.Ok(new Unit(compact, u.factor(), u.offset(), u.dimension(), u.scale()));
    }
    double factor = 1;
    Dimension dim = Dimension.DIMENSIONLESS;
    for (int i = 0; i < terms.size(); i++) {
      int power = terms.get(i).divided() ? -terms.get(i).exponent() : terms.get(i).exponent();
      Unit u = atoms.get(i).unit();
      factor *= Math.pow(u.factor(), power);
      dim = dim.times(u.dimension().pow(power));
    }
    if (factor == 0 || !Double.isFinite(factor)) {
      return fail(
          "unit '" + compact + "' is too " + (factor == 0 ? "small" : "large") + " to work with");
    }
    return new UnitParse.Ok(new Unit(compact, factor, 0, dim, Scale.LINEAR));
  }

  private static String readSymbol(Scanner in) {
    int start = in.pos;
    while (!in.atEnd() && isSymbolChar(in.peek())) {
      in.pos++;
    }
    return in.text.substring(start, in.pos);
  }

  /** The exponent after a symbol, 1 if none is written. */
  private static Exponent readExponent(Scanner in) {
    if (in.atEnd()) {
      return Exponent.ok(1);
    }
    int start = in.pos;
    char c = in.peek();
    boolean negative = false;
    StringBuilder digits = new StringBuilder();
    if (c == '^') {
      in.pos++;
      if (!in.atEnd() && (in.peek() == '-' || in.peek() == '−' || in.peek() == '+')) {
        negative = in.peek() != '+';
        in.pos++;
      }
      while (!in.atEnd() && in.peek() >= '0' && in.peek() <= '9') {
        digits.append(in.peek());
        in.pos++;
      }
      if (digits.length() == 0) {
        return Exponent.error("missing whole-number exponent after '^' in '" + in.text + "'");
      }
    } else if (c >= '0' && c <= '9') {
      while (!in.atEnd() && in.peek() >= '0' && in.peek() <= '9') {
        digits.append(in.peek());
        in.pos++;
      }
    } else if (c == Superscripts.MINUS || Superscripts.digit(c) >= 0) {
      if (c == Superscripts.MINUS) {
        negative = true;
        in.pos++;
      }
      while (!in.atEnd() && Superscripts.digit(in.peek()) >= 0) {
        digits.append((char) ('0' + Superscripts.digit(in.peek())));
        in.pos++;
      }
      if (digits.length() == 0) {
        return Exponent.error("missing exponent after '⁻' in '" + in.text + "'");
      }
    } else {
      return Exponent.ok(1);
    }
    String written = in.text.substring(start, in.pos);
    // Long runs of digits are out of range anyway; checking length first keeps parseInt safe.
    int value = digits.length() > 3 ? Integer.MAX_VALUE : Integer.parseInt(digits.toString());
    if (value == 0) {
      return Exponent.error(
          "exponent '" + written + "' in '" + in.text + "' is zero, which cancels the unit");
    }
    if (value > MAX_EXPONENT) {
      return Exponent.error(
          "exponent '"
              + written
              + "' in '"
              + in.text
              + "' is out of range (at most "
              + MAX_EXPONENT
              + ")");
    }
    return Exponent.ok(negative ? -value : value);
  }

  private static boolean isSymbolChar(char c) {
    return Character.isLetter(c) || c == '°' || c == '%';
  }

  private static boolean isOperator(char c) {
    return c == '/' || c == '*' || c == '·' || c == '⋅';
  }

  private static UnitParse fail(String message) {
    return new UnitParse.Failure(message);
  }
}
