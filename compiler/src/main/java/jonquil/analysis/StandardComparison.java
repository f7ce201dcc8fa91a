package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.Function;
import jonquil.resolve.SafetyStandard;
import jonquil.safety.Outcome;

/**
 * The figure of every standard but the governing one, stated beside a safety finding so that the
 * reader sees where the standards agree and where they differ. The directive's tables are public,
 * so where it agrees with IEC 60825-1 it is the sourced cross-check of the IEC figure.
 */
final class StandardComparison {
  private StandardComparison() {}

  /**
   * Two standards agree when their figures differ by no more than the tables' rounding: 1 % (common
   * practice; the tables state two or three significant figures).
   */
  static final double AGREEMENT = 0.01;

  /**
   * "beside it: Directive 2006/25/EC 41.2 % (agrees, ...), ANSI Z136.1-2014 not evaluated (...)".
   *
   * @param governing the standard that gates the requirement
   * @param value the governing figure, or NaN when it was not evaluated
   * @param figure the same figure under another standard
   * @param shown how a figure is written
   */
  static String beside(
      SafetyStandard governing,
      double value,
      Function<SafetyStandard, Outcome<Double>> figure,
      DoubleFunction<String> shown) {
    List<String> parts = new ArrayList<>();
    for (SafetyStandard other : SafetyStandard.values()) {
      if (other == governing) {
        continue;
      }
      Outcome<Double> o = figure.apply(other);
      if (!o.evaluated()) {
        parts.add(other.title() + " not evaluated (" + o.reason() + ")");
        continue;
      }
      parts.add(
          other.title() + " " + shown.apply(o.get()) + agreement(governing, other, value, o.get()));
    }
    return PREFIX + String.join(", ", parts);
  }

  /**
   * A line's finding without its comparison, for a sum over lines: each line's figures under the
   * other standards are not those of the sum.
   */
  static String without(String text) {
    int start = text.indexOf(PREFIX);
    int end = text.indexOf(Outcome.CAUTION, Math.max(start, 0));
    return start < 0 || end < 0 ? text : text.substring(0, start) + text.substring(end);
  }

  private static final String PREFIX = "beside it: ";

  private static String agreement(
      SafetyStandard governing, SafetyStandard other, double value, double theirs) {
    if (Double.isNaN(value)) {
      return "";
    }
    boolean agrees =
        value == theirs
            || Math.abs(value - theirs) <= AGREEMENT * Math.max(Math.abs(value), Math.abs(theirs));
    if (!agrees) {
      return " (differs)";
    }
    boolean crossCheck =
        governing == SafetyStandard.IEC_60825_1 && other == SafetyStandard.DIRECTIVE_2006_25;
    return crossCheck
        ? " (agrees: the directive's public table is the sourced cross-check)"
        : " (agrees)";
  }
}
