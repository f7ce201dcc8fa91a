package jonquil.units;

import java.util.Objects;

/**
 * One written unit and how to bring its numbers into SI; the only place where a number stops being
 * "as the author wrote it" and becomes SI.
 *
 * <p>{@code offset} is non-zero only for temperature scales with a shifted zero (°C, °F). For the
 * logarithmic scales {@code factor} is the reference level (1 for dB and OD, 1e-3 W for dBm) and
 * {@code offset} must be 0.
 */
public record Unit(String symbol, double factor, double offset, Dimension dimension, Scale scale) {
  private static final Unit DIMENSIONLESS =
      new Unit("", 1, 0, Dimension.DIMENSIONLESS, Scale.LINEAR);

  public Unit {
    Objects.requireNonNull(symbol, "symbol");
    Objects.requireNonNull(dimension, "dimension");
    Objects.requireNonNull(scale, "scale");
    if (!(factor > 0) || Double.isInfinite(factor)) {
      throw new IllegalArgumentException("unit factor must be positive and finite: " + factor);
    }
    if (!Double.isFinite(offset) || (scale != Scale.LINEAR && offset != 0)) {
      throw new IllegalArgumentException("bad offset " + offset + " for scale " + scale);
    }
  }

  /** The unit of a bare number. */
  public static Unit dimensionless() {
    return DIMENSIONLESS;
  }

  static Unit linear(String symbol, double factor, Dimension dimension) {
    return new Unit(symbol, factor, 0, dimension, Scale.LINEAR);
  }

  public double toSi(double value) {
    return switch (scale) {
      case LINEAR -> value * factor + offset;
      case DECIBEL -> factor * Math.pow(10, value / 10);
      case OPTICAL_DENSITY -> factor * Math.pow(10, -value);
    };
  }

  public double fromSi(double si) {
    return switch (scale) {
      case LINEAR -> (si - offset) / factor;
      case DECIBEL -> 10 * Math.log10(si / factor);
      case OPTICAL_DENSITY -> -Math.log10(si / factor);
    };
  }

  /** True when numbers in this unit can be added, scaled and multiplied like SI numbers. */
  public boolean isPlainLinear() {
    return scale == Scale.LINEAR && offset == 0;
  }
}
