package jonquil.ide;

import java.util.ArrayList;
import java.util.List;
import jonquil.resolve.Shape;
import jonquil.units.Dimension;
import jonquil.units.UnitParse;
import jonquil.units.UnitParser;

/**
 * The units worth offering after a number: a short list of the common ones, narrowed to the
 * dimension the parameter expects when that is known (the unit parser decides each unit's
 * dimension).
 */
final class UnitChoices {
  static final List<String> COMMON =
      List.of(
          "nm", "um", "mm", "cm", "m", "uW", "mW", "W", "kW", "uJ", "mJ", "J", "fs", "ps", "ns",
          "us", "ms", "s", "Hz", "kHz", "MHz", "deg", "mrad", "rad", "wave", "%", "ppm", "W/cm2",
          "kW/cm2", "MW/cm2", "W/cm", "mJ/cm2", "J/cm2", "V/m", "kV/cm", "dB", "/cm", "degC",
          "A/W");

  private UnitChoices() {}

  /** Units for one expected shape; every common unit when nothing narrower is known. */
  static List<String> forShape(Shape shape) {
    if (shape instanceof Shape.Quantity q) {
      return forDimensions(q.dimensions());
    }
    if (shape instanceof Shape.Ratio) {
      return List.of("%", "ppm");
    }
    if (shape instanceof Shape.PowerRatio) {
      return List.of("dB");
    }
    if (shape instanceof Shape.Density || shape instanceof Shape.Count) {
      return List.of();
    }
    return COMMON;
  }

  static List<String> forDimensions(List<Dimension> dims) {
    List<String> out = new ArrayList<>();
    for (String u : COMMON) {
      UnitParse p = UnitParser.parse(u);
      if (p instanceof UnitParse.Ok ok && dims.contains(ok.unit().dimension())) {
        out.add(u);
      }
    }
    return out;
  }

  /** What a unit measures, for the completion's detail. */
  static String describe(String unit) {
    UnitParse p = UnitParser.parse(unit);
    if (!(p instanceof UnitParse.Ok ok)) {
      return "unit";
    }
    Dimension d = ok.unit().dimension();
    String name = d.isDimensionless() ? "ratio" : d.describe();
    return "unit of " + name;
  }
}
