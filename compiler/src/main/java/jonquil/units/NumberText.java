package jonquil.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Prints numbers to four significant digits without trailing zeros, identically in every locale.
 */
final class NumberText {
  static final int SIGNIFICANT = 4;
  private static final MathContext FOUR = new MathContext(SIGNIFICANT, RoundingMode.HALF_EVEN);

  private NumberText() {}

  /** The value rounded to four significant digits (so unit choice sees what will be printed). */
  static double round(double v) {
    if (!Double.isFinite(v) || v == 0) {
      return v;
    }
    return new BigDecimal(v).round(FOUR).doubleValue();
  }

  /** "500", "1.064", "0.0005", "1.5e-7": plain notation while it stays short, else scientific. */
  static String format(double v) {
    if (Double.isNaN(v)) {
      return "NaN";
    }
    if (Double.isInfinite(v)) {
      return v > 0 ? "∞" : "-∞";
    }
    if (v == 0) {
      return "0";
    }
    BigDecimal bd = new BigDecimal(v).round(FOUR).stripTrailingZeros();
    int exponent = bd.precision() - bd.scale() - 1;
    if (exponent >= -4 && exponent <= 5) {
      return bd.toPlainString();
    }
    return bd.movePointLeft(exponent).toPlainString() + "e" + exponent;
  }
}
