package jonquil.safety;

/**
 * Why it exists: the far-infrared rows (1400 nm–1 mm) of IEC 60825-1:2014 (Ed. 3), Annex A, Table
 * A.1 (the cornea) and Table A.5 (the skin, the same rows), where the tissue at the surface absorbs
 * and the limit is thermal.
 *
 * <p>Rows (radiant exposure H over t; from memory for Ed. 3; the same values are in Directive
 * 2006/25/EC, Annex II, Tables 2.2–2.4, which restate them from ICNIRP):
 *
 * <ul>
 *   <li>1400–1500 nm and 1800–2600 nm: t &lt; 1 ns: 10¹² W/m²; 1 ns–1 ms: 10³ J/m²; 1 ms–10 s:
 *       5.6×10³ t^0.25 J/m²; beyond: 1000 W/m²;
 *   <li>1500–1800 nm: t &lt; 1 ns: 10¹³ W/m²; 1 ns–10 s: 10⁴ J/m²; beyond: 1000 W/m²;
 *   <li>2600 nm–1 mm: t &lt; 1 ns: 10¹¹ W/m²; 1 ns–100 ns: 100 J/m²; 100 ns–10 s: 5.6×10³ t^0.25
 *       J/m²; beyond: 1000 W/m².
 * </ul>
 *
 * Each band's rows join within rounding (5.6×10³ × 1 ms^0.25 = 996, × 100 ns^0.25 = 99.6, × 10
 * s^0.25 = 9958 = 996 W/m² × 10 s); the bands themselves step at 1500, 1800 and 2600 nm for pulses,
 * as the tables do. Above 10 s over a large skin area the tables lower the limit further; that
 * large-area row is not implemented (the 1000 W/m² row assumes a small exposed area).
 *
 * <p>Cross-checked, value for value, against the directive's tables as read in their public text
 * (see {@code jonquil.safety.directive.AnnexII}): every row below 10 s is Directive 2006/25/EC,
 * Annex II, Table 2.2, rows 1400–1500, 1500–1800, 1800–2600 and 2600–10⁶ nm (and the sub-ns
 * irradiances also Table 2.4, those rows, &lt; 10⁻⁹ s). The 1000 W/m² beyond 10 s is the
 * directive's Table 2.3, which could not be read, so it is not cross-checked.
 */
final class Ed3Infrared {
  private Ed3Infrared() {}

  static final String CORNEA = "corneal thermal (infrared)";
  static final String SKIN = "skin thermal (infrared)";

  /** The limit over t, J/m², for 1400 nm ≤ λ ≤ 1 mm. */
  static double limit(double lambda, double t) {
    double n = CorrectionFactors.nm(lambda);
    if (n >= 1500 && n < 1800) {
      if (t < 1e-9) {
        return 1e13 * t;
      }
      return t < 10 ? 1e4 : 1000 * t;
    }
    boolean farIr = n >= 2600;
    if (t < 1e-9) {
      return (farIr ? 1e11 : 1e12) * t;
    }
    double constantUntil = farIr ? 1e-7 : 1e-3;
    double constant = farIr ? 100 : 1e3;
    return new LimitRows(constantUntil, constant, 10, 5.6e3, 0.25, 1000).at(t);
  }
}
