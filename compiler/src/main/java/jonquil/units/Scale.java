package jonquil.units;

/**
 * How a written number maps onto its SI value: most units scale linearly, ratios may be
 * logarithmic.
 */
public enum Scale {
  /** si = value · factor + offset. */
  LINEAR,
  /**
   * x dB is the power ratio 10^(x/10), times the unit's reference (1 for plain dB, 1 mW for dBm).
   */
  DECIBEL,
  /** OD x is the transmission 10^(−x). */
  OPTICAL_DENSITY
}
