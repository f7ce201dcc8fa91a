package jonquil.ide;

import java.util.List;
import java.util.Locale;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/** Small Markdown and number helpers, so every hover prints figures the same way. */
final class MarkdownText {
  private MarkdownText() {}

  static String q(double si, Dimension dim) {
    return QuantityFormat.format(si, dim);
  }

  /** A plain number to four significant digits, without trailing zeros. */
  static String num(double x) {
    if (x == 0 || !Double.isFinite(x)) {
      return x == 0 ? "0" : String.valueOf(x);
    }
    String s = String.format(Locale.ROOT, "%.4g", x);
    String mantissa = s;
    String exponent = "";
    int e = s.indexOf('e');
    if (e >= 0) {
      mantissa = s.substring(0, e);
      exponent = "e" + Integer.parseInt(s.substring(e + 1));
    }
    if (mantissa.contains(".")) {
      mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
    return mantissa + exponent;
  }

  /** The coherent SI unit of a dimension as the formatter prints it ("W", "m", "rad"). */
  static String siUnit(Dimension dim) {
    if (dim.isDimensionless()) {
      return "";
    }
    for (String s : List.of(QuantityFormat.format(1.0, dim))) {
      if (s.startsWith("1 ")) {
        return s.substring(2);
      }
    }
    for (String s : QuantityFormat.alternatives(1.0, dim)) {
      if (s.startsWith("1 ")) {
        return s.substring(2);
      }
    }
    return dim.formula();
  }

  /** Angles read in degrees in every hover. */
  static String deg(double radians) {
    double d = Math.toDegrees(radians);
    return num(Math.abs(d) < 1e-9 ? 0 : d) + "°";
  }

  /** Starts a new paragraph: exactly one blank line after what is already there. */
  static StringBuilder para(StringBuilder md) {
    int end = md.length();
    while (end > 0 && Character.isWhitespace(md.charAt(end - 1))) {
      end--;
    }
    md.setLength(end);
    return md.append("\n\n");
  }

  static String code(String text) {
    return "`" + text.replace("`", "'") + "`";
  }

  /** Collapses a source excerpt to one line. */
  static String oneLine(String text) {
    return text.strip().replaceAll("\\s+", " ");
  }

  static String cell(String text) {
    return text.replace("|", "\\|");
  }
}
