package jonquil.analysis;

import jonquil.safety.HazardClass;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;
import jonquil.units.UnitParse;
import jonquil.units.UnitParser;

/**
 * How a requirement's value, bound and margin read in messages and reports: quantities with their
 * SI unit and a fitting prefix, hazard classes by name, densities as 'OD x' and fractions in
 * percent. One place, so findings and verdict lines cannot disagree.
 */
public final class VerdictText {
  private VerdictText() {}

  public static String format(double value, String unit) {
    String u = unit == null ? "" : unit;
    switch (u) {
      case "class":
        {
          return HazardClass.ofRank(value).map(HazardClass::label).orElse(String.valueOf(value));
        }
      case "%":
        return QuantityFormat.format(100 * value, Dimension.DIMENSIONLESS) + " %";
      case "ppm":
        return QuantityFormat.format(1e6 * value, Dimension.DIMENSIONLESS) + " ppm";
      case "dB":
        return QuantityFormat.format(10 * Math.log10(value), Dimension.DIMENSIONLESS) + " dB";
      case "OD":
        return String.format(java.util.Locale.ROOT, "OD %.2f", value);
      default:
        return QuantityFormat.format(value, dimension(u));
    }
  }

  /**
   * A margin shown in the unit of its bound: in dB it is the difference of the two levels (with the
   * margin's sign), in a linear unit the margin itself.
   */
  public static String margin(double value, double bound, double margin, String unit) {
    if (!"dB".equals(unit)) {
      return format(margin, unit);
    }
    double levels = Math.abs(10 * Math.log10(value) - 10 * Math.log10(bound));
    return QuantityFormat.format(Math.copySign(levels, margin), Dimension.DIMENSIONLESS) + " dB";
  }

  /** The dimension of an SI unit name such as "W" or "J/m2"; a plain number when there is none. */
  static Dimension dimension(String unit) {
    if (unit.isEmpty()) {
      return Dimension.DIMENSIONLESS;
    }
    UnitParse parsed = UnitParser.parse(unit);
    return parsed instanceof UnitParse.Ok ok ? ok.unit().dimension() : Dimension.DIMENSIONLESS;
  }
}
