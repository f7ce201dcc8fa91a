package jonquil.units;

/** Converts integer exponents to and from Unicode superscripts, as people type "cm²". */
final class Superscripts {
  private static final String DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
  static final char MINUS = '⁻';

  private Superscripts() {}

  static String of(int n) {
    StringBuilder out = new StringBuilder();
    if (n < 0) {
      out.append(MINUS);
    }
    for (char c : Long.toString(Math.abs((long) n)).toCharArray()) {
      out.append(DIGITS.charAt(c - '0'));
    }
    return out.toString();
  }

  /** The digit a superscript character stands for, or -1 if it is not a superscript digit. */
  static int digit(char c) {
    return DIGITS.indexOf(c);
  }
}
