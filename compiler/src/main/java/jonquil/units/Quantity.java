package jonquil.units;

import java.util.Objects;

/**
 * A measured amount held in coherent SI, so arithmetic and comparison never meet a prefix or
 * offset.
 */
public record Quantity(double si, Dimension dimension) {
  public Quantity {
    Objects.requireNonNull(dimension, "dimension");
  }

  /** The amount an author wrote as {@code value} in {@code unit}. */
  public static Quantity of(double value, Unit unit) {
    return new Quantity(unit.toSi(value), unit.dimension());
  }

  /** The number to write before {@code unit}; a dimension mismatch is a programming error here. */
  public double in(Unit unit) {
    requireSameDimension(unit.dimension());
    return unit.fromSi(si);
  }

  public boolean has(Dimension d) {
    return dimension.equals(d);
  }

  public Quantity plus(Quantity o) {
    requireSameDimension(o.dimension);
    return new Quantity(si + o.si, dimension);
  }

  public Quantity minus(Quantity o) {
    requireSameDimension(o.dimension);
    return new Quantity(si - o.si, dimension);
  }

  public Quantity times(Quantity o) {
    return new Quantity(si * o.si, dimension.times(o.dimension));
  }

  public Quantity divide(Quantity o) {
    return new Quantity(si / o.si, dimension.divide(o.dimension));
  }

  public Quantity times(double k) {
    return new Quantity(si * k, dimension);
  }

  public String format() {
    return QuantityFormat.format(si, dimension);
  }

  private void requireSameDimension(Dimension other) {
    if (!dimension.equals(other)) {
      throw new IllegalArgumentException(
          "dimension mismatch: " + dimension.describe() + " vs " + other.describe());
    }
  }
}
