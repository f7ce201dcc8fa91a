package jonquil.resolve;

import java.util.OptionalDouble;

/**
 * The four power fractions of a splitter (transmitted and reflected, p and s) from what its
 * declaration states, with the stated defaults (compiler/README.md, "Element models") filling the
 * rest. The one home of that rule: the optics use it to split the beam, the resolver to refuse a
 * set that sends out more light than comes in.
 */
public record SplitterFractions(double tp, double ts, double rp, double rs) {
  /** Stated defaults of a polarizing splitter: p transmittance, s reflectance, extinction. */
  public static final double DEFAULT_PBS_TP = 0.95;

  public static final double DEFAULT_PBS_RS = 0.99;
  public static final double DEFAULT_PBS_EXTINCTION = 1000;

  /**
   * The fractions a splitter's parameters give; each stated fraction is passed as written (or at
   * the edge of its tolerance), an unstated one empty.
   */
  public static SplitterFractions of(
      boolean polarizing,
      OptionalDouble ratio,
      OptionalDouble transmitP,
      OptionalDouble transmitS,
      OptionalDouble reflectP,
      OptionalDouble reflectS,
      OptionalDouble extinction) {
    if (polarizing) {
      // A default yields to what is stated beside it, so that only stated figures can conflict.
      double tp = transmitP.orElse(Math.min(DEFAULT_PBS_TP, 1 - reflectP.orElse(0)));
      double ts =
          transmitS.orElse(
              extinction.isPresent()
                  ? tp / extinction.getAsDouble()
                  : Math.min(tp / DEFAULT_PBS_EXTINCTION, 1 - reflectS.orElse(0)));
      double rs = reflectS.orElse(Math.min(DEFAULT_PBS_RS, 1 - ts));
      double rp = reflectP.orElse(1 - tp);
      return new SplitterFractions(tp, ts, rp, rs);
    }
    double r = ratio.orElse(0.5);
    double rs = reflectS.orElse(r);
    double rp = reflectP.orElse(r);
    return new SplitterFractions(transmitP.orElse(1 - rp), transmitS.orElse(1 - rs), rp, rs);
  }
}
