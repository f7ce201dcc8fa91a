package jonquil.safety;

/**
 * Why it exists: the ultraviolet rows (180–400 nm) of IEC 60825-1:2014 (Ed. 3), Annex A, Table A.1
 * (eye) and Table A.5 (skin, the same rows), in one place: a photochemical dose limit that
 * accumulates over the whole exposure and a thermal limit, both applying, the stricter governing.
 *
 * <p>Rows (radiant exposure H over the exposure t; from memory for Ed. 3 unless noted; the same
 * values are in Directive 2006/25/EC, Annex II, Table 2.2, whose public text restates them from
 * ICNIRP, and in ANSI Z136.1-2014 Table 5a in other units):
 *
 * <ul>
 *   <li>t &lt; 1 ns: 3×10¹⁰ W/m² (H = 3×10¹⁰ t), all 180–400 nm;
 *   <li>thermal, 1 ns ≤ t &lt; 10 s: C1 = 5.6×10³ t^0.25 J/m²;
 *   <li>photochemical dose, from 1 ns to 3×10⁴ s: 30 J/m² (180–302.5 nm); C2 = 10^(0.2(λ−295)) J/m²
 *       (302.5–315 nm; the thermal C1 governs below T1 = 10^(0.8(λ−295)) × 10⁻¹⁵ s, where the two
 *       meet); 10⁴ J/m² up to 10³ s then 10 W/m² (315–400 nm).
 * </ul>
 *
 * The rows join within the tables' rounding: 3×10¹⁰ × 1 ns = 30 J/m², C1(1 ns) = 31.5 J/m²,
 * C2(302.5 nm) = 31.6 J/m², C2(315 nm) = 10⁴ J/m², C1(10 s) = 9.96×10³ J/m².
 *
 * <p>Cross-checked, value for value, against the directive's Table 2.2 as read in its public text
 * (see {@code jonquil.safety.directive.AnnexII}): the 3×10¹⁰ W/m² below 1 ns (rows 180–400 nm,
 * 10⁻¹³–10⁻⁹ s), C1 (row 315–400 nm, 10⁻⁹–10 s, written out as 5.6×10³ t^0.25) and the 30 J/m² dose
 * (rows 180–280 and 280–302 nm, 10⁻⁹–10 s). Not C2 and T1: the directive lists one rounded dose and
 * T1 per nanometre for 303–314 nm instead (60 J/m² at 304 nm against C2 = 63.1 J/m²), and starts
 * them at 303 nm rather than 302.5 nm.
 */
final class Ed3Ultraviolet {
  private Ed3Ultraviolet() {}

  static final String PHOTOCHEMICAL = "ultraviolet photochemical (cornea, lens, skin)";
  static final String THERMAL = "ultraviolet thermal";

  /**
   * C1 = 5.6×10³ t^0.25 J/m² (Ed. 3 Table 9; from memory; cross-checked: the same formula is
   * Directive 2006/25/EC, Annex II, Table 2.2, row 315–400 nm, 10⁻⁹–10 s).
   */
  static double c1(double t) {
    return 5.6e3 * Math.pow(t, 0.25);
  }

  /** C2 = 10^(0.2(λ−295)) J/m², 302.5–315 nm (Ed. 3 Table 9; from memory). */
  static double c2(double lambda) {
    return Math.pow(10, 0.2 * (CorrectionFactors.nm(lambda) - 295));
  }

  /** T1 = 10^(0.8(λ−295)) × 10⁻¹⁵ s, 302.5–315 nm (Ed. 3 Table 9; from memory). */
  static double t1(double lambda) {
    return Math.pow(10, 0.8 * (CorrectionFactors.nm(lambda) - 295)) * 1e-15;
  }

  /** The photochemical dose limit over t ≥ 1 ns, J/m². */
  static double photochemical(double lambda, double t) {
    double n = CorrectionFactors.nm(lambda);
    if (n < 302.5) {
      return 30;
    }
    if (n < 315) {
      return c2(lambda);
    }
    return t < 1e3 ? 1e4 : 10 * t;
  }

  /** The thermal limit, J/m²: the sub-nanosecond row, then C1 to 10 s; NaN beyond. */
  static double thermal(double t) {
    if (t < 1e-9) {
      return 3e10 * t;
    }
    return t < 10 ? c1(t) : Double.NaN;
  }

  /** The limit over t, 180 nm ≤ λ &lt; 400 nm, with the effect that governs. */
  static GoverningLimit limit(double lambda, double t) {
    if (t < 1e-9) {
      return GoverningLimit.only(thermal(t), THERMAL);
    }
    return GoverningLimit.stricter(photochemical(lambda, t), PHOTOCHEMICAL, thermal(t), THERMAL);
  }
}
