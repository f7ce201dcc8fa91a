package jonquil.resolve;

/** The physically meaningful range of a value, in SI units. */
public record Bounds(
    double min, boolean minInclusive, double max, boolean maxInclusive, boolean nonZero) {
  public static final Bounds ANY =
      new Bounds(Double.NEGATIVE_INFINITY, true, Double.POSITIVE_INFINITY, true, false);
  public static final Bounds POSITIVE = new Bounds(0, false, Double.POSITIVE_INFINITY, true, false);
  public static final Bounds NON_NEGATIVE =
      new Bounds(0, true, Double.POSITIVE_INFINITY, true, false);
  public static final Bounds NON_ZERO =
      new Bounds(Double.NEGATIVE_INFINITY, true, Double.POSITIVE_INFINITY, true, true);

  public static Bounds closed(double min, double max) {
    return new Bounds(min, true, max, true, false);
  }

  public static Bounds halfOpen(double min, double max) {
    return new Bounds(min, true, max, false, false);
  }

  public static Bounds atLeast(double min) {
    return new Bounds(min, true, Double.POSITIVE_INFINITY, true, false);
  }

  public boolean contains(double v) {
    if (Double.isNaN(v) || (nonZero && v == 0)) {
      return false;
    }
    boolean aboveMin = minInclusive ? v >= min : v > min;
    boolean belowMax = maxInclusive ? v <= max : v < max;
    return aboveMin && belowMax;
  }
}
