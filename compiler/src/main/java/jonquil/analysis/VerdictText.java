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
      case "OD":
        return String.format(java.util.Locale.ROOT, "OD %.2f", value);
      default:
        return QuantityFormat.format(value, dimension(u));
    }
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
