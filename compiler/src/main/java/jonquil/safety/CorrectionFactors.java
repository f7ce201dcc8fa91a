package jonquil.safety;

/**
 * The wavelength correction factors that IEC 60825-1:2014 (Ed. 3) Table 9 and ANSI Z136.1-2014
 * Table 6 share, both taken from ICNIRP under different symbols, written once: C_A (IEC C4), C_B
 * (IEC C3), C_C (IEC C7) below 1200 nm, and the time inside which pulses act together (IEC T_i,
 * ANSI t_min).
 *
 * <p>Confirmed: the ICNIRP forms of C_A, C_B and C_C (700–1200 nm) as reproduced in the Norwegian
 * regulations on action and limit values, §11-5 (transposing Directive 2006/25/EC, which reproduces
 * the ICNIRP laser tables). That both standards use these same forms is from memory.
 */
public final class CorrectionFactors {
  private CorrectionFactors() {}

  /** The wavelength in nanometres, as the tables state their bands. */
  public static double nm(double lambda) {
    return lambda / 1e-9;
  }

  /**
   * C_A (IEC C4): 1 below 700 nm, 10^(0.002(λ−700)) for 700–1050 nm, 5 for 1050–1400 nm. Confirmed
   * (ICNIRP form).
   */
  public static double cA(double lambda) {
    double n = nm(lambda);
    if (n < 700) {
      return 1.0;
    }
    return n < 1050 ? Math.pow(10, 0.002 * (n - 700)) : 5.0;
  }

  /**
   * C_B (IEC C3): 1 for 400–450 nm, 10^(0.02(λ−450)) above (the tables use it up to 600 or 700 nm).
   * Confirmed (ICNIRP form).
   */
  public static double cB(double lambda) {
    double n = nm(lambda);
    return n < 450 ? 1.0 : Math.pow(10, 0.02 * (n - 450));
  }

  /**
   * C_C (IEC C7): 1 below 1150 nm, 10^(0.018(λ−1150)) for 1150–1200 nm. Confirmed (ICNIRP form). At
   * or above 1200 nm the standards differ and neither value was confirmed, so each standard's table
   * decides there; this throws.
   */
  public static double cC(double lambda) {
    double n = nm(lambda);
    if (n >= 1200) {
      throw new IllegalArgumentException("C_C is not implemented at or above 1200 nm");
    }
    return n < 1150 ? 1.0 : Math.pow(10, 0.018 * (n - 1150));
  }

  /**
   * The time inside which pulses act together and below which the single-pulse limit is constant
   * (IEC T_i, clause 4.3 f; ANSI t_min, Table 6): 5 µs for 400–1050 nm, 13 µs for 1050–1400 nm.
   * From memory for both 2014 editions (the earlier editions had 18 µs and 50 µs); the values match
   * the row breakpoints of both tables.
   */
  public static double pulseGroupTime(double lambda) {
    return nm(lambda) < 1050 ? 5e-6 : 1.3e-5;
  }
}
