package jonquil.safety;

import static jonquil.safety.CorrectionFactors.cA;
import static jonquil.safety.CorrectionFactors.cB;
import static jonquil.safety.CorrectionFactors.cC;
import static jonquil.safety.CorrectionFactors.nm;

/**
 * Why it exists: the one place that holds the formulas and constants taken from IEC 60825-1:2014
 * (Edition 3), so that every number can be audited against its source in a single file.
 *
 * <p>Scope: the retinal hazard region 400 nm ≤ λ &lt; 1250 nm for point and extended sources (C6,
 * T2, γ_ph: {@link ExtendedSource}); the ultraviolet and far-infrared rows are in {@link
 * Ed3Ultraviolet} and {@link Ed3Infrared}, the AELs outside these rows in {@link
 * AccessibleEmissionLimits}. Table numbers are those of Edition 3 as remembered; where a value
 * could not be confirmed by a published secondary source it is marked "from memory".
 *
 * <p>Confirmed by secondary sources (see the tests for the exact citations):
 *
 * <ul>
 *   <li>C4 (ICNIRP C<sub>A</sub>), C3 (C<sub>B</sub>), C7 (C<sub>C</sub>, 700–1200 nm): ICNIRP
 *       factors as reproduced in the Norwegian regulations on action and limit values, §11-5
 *       (transposing Directive 2006/25/EC, which reproduces the ICNIRP laser tables).
 *   <li>Retinal MPE 400–700 nm, 18 t^0.75 J/m² (1.8 t^0.75 mJ/cm²) and its 0.25 s value 2.55
 *       mW/cm²: university laser-safety "Sample calculations" appendix (AS/NZS 2211.1, i.e. IEC
 *       60825-1).
 *   <li>Class 1 visible cw 0.39 mW, Class 2 1 mW, Class 3R = 5 × Class 2 (visible) or 5 × Class 1
 *       (other λ), Class 3B 0.5 W cw: several vendor and university class summaries of IEC 60825-1
 *       (cited in ClassifierTest).
 * </ul>
 */
final class Ed3 {
  private Ed3() {}

  static final String EDITION = "IEC 60825-1:2014 (Ed. 3)";
  static final String MPE_EYE_TABLE = EDITION + ", Annex A, Table A.1 (MPE at the cornea, C6 = 1)";
  static final String MPE_SKIN_TABLE = EDITION + ", Annex A, Table A.5 (MPE of the skin)";
  static final String FACTORS_TABLE =
      EDITION + ", Table 9 (correction factors; ICNIRP C_A/C_B/C_C)";

  /**
   * Upper end of the evaluated ocular range, m. From 1250 nm to 1400 nm Ed. 3 adds a corneal/lens
   * dual limit to the retinal one (confirmed: "Comparison of corneal injury thresholds with laser
   * safety limits", a paper comparing ANSI Z136.1-2014, ICNIRP 2013 and IEC 60825-1:2014 for
   * 1250–1400 nm); that dual limit is not implemented, so 1250–1400 nm is "not evaluated". The rest
   * of the scope both standards share is in {@link TableScope}.
   */
  static final double LAMBDA_MAX_EYE = 1250e-9;

  /**
   * C7 (ICNIRP C_C): {@link CorrectionFactors#cC} below 1200 nm (confirmed, ICNIRP/§11-5); 8 for
   * 1200–1250 nm. Ed. 3 gives 8 + 10^(0.04(λ−1250)) there (from memory), which is ≥ 8, so the
   * confirmed ICNIRP value 8 used here is the more restrictive. C3 and C4 are ICNIRP's C_B and C_A
   * ({@link CorrectionFactors}); T_i is {@link CorrectionFactors#pulseGroupTime} (clause 4.3 f).
   */
  static double c7(double lambda) {
    return nm(lambda) < 1200 ? cC(lambda) : 8.0;
  }

  /**
   * Retinal thermal MPE as radiant exposure over the whole exposure t, J/m², point source (C6 = 1),
   * 400 nm ≤ λ &lt; 1250 nm, T_MIN_EYE ≤ t ≤ T_MAX. Table A.1 of Ed. 3:
   *
   * <ul>
   *   <li>400–1050 nm: 10 ps–5 µs: 2×10⁻³ C4 J/m² (from memory; the 2014 editions lowered the ns
   *       value from 5×10⁻³ — the change is confirmed qualitatively by J. Biomed. Opt. 20(9) 095011
   *       (2015), "Trends in nanosecond melanosome microcavitation up to 1540 nm", which notes the
   *       2014 MPE changes "in the visible region in the nanosecond time regime"); 5 µs–10 s: 18
   *       t^0.75 C4 J/m² (confirmed); 10 s–3×10⁴ s: 10 C4 C7 W/m² (from memory; = 18·T2^-0.25 with
   *       T2 = 10 s, rounded down).
   *   <li>1050–1250 nm: 10 ps–13 µs: 2×10⁻² C7 J/m² (from memory); 13 µs–10 s: 90 t^0.75 C7 J/m² (=
   *       18·C4 t^0.75 with C4 = 5; from memory; cross-checked: the same formula is Directive
   *       2006/25/EC, Annex II, Table 2.2, row 1050–1400 nm, 5×10⁻⁵–10 s, 90 t^0.75 C_C, which the
   *       directive starts at 50 µs instead of 13 µs); 10 s–3×10⁴ s: 10 C4 C7 W/m² (from memory).
   * </ul>
   */
  static double retinalThermal(double lambda, double t) {
    return retinalThermal(lambda, t, ExtendedSource.ALPHA_MIN);
  }

  /**
   * The retinal thermal limit for a source of angular subtense alpha (rad), J/m². Below 10 ps (Ed.
   * 3 Table A.1, from memory; the same values as ANSI Z136.1-2014 Table 5a, 1.0×10⁻⁷ J/cm² and
   * 1.0×10⁻⁶ C_C J/cm²): 1×10⁻³ C4 C6 J/m² (400–1050 nm), 1×10⁻² C7 C6 J/m² (1050–1400 nm); the
   * tables step up by 2 at 10 ps. Extended sources (α &gt; α_min): every row times C6, the rising
   * row running to T2 and the last row 18 C4 C6 T2^−0.25 W/m² (90 C7 C6 T2^−0.25 above 1050 nm),
   * Ed. 3 Table A.1 (from memory).
   */
  static double retinalThermal(double lambda, double t, double alpha) {
    double c4 = cA(lambda);
    double c7 = c7(lambda);
    double c6 = ExtendedSource.c6(alpha, t);
    boolean below1050 = nm(lambda) < 1050;
    if (t < 1e-11) {
      return (below1050 ? 1e-3 * c4 : 1e-2 * c7) * c6;
    }
    if (alpha <= ExtendedSource.ALPHA_MIN) {
      LimitRows rows =
          below1050
              ? new LimitRows(5e-6, 2e-3 * c4, 10, 18 * c4, 0.75, 10 * c4 * c7)
              : new LimitRows(1.3e-5, 2e-2 * c7, 10, 90 * c7, 0.75, 10 * c4 * c7);
      return rows.at(t);
    }
    double t2 = ExtendedSource.t2(alpha);
    double k = below1050 ? 18 * c4 * c7 * c6 : 90 * c7 * c6;
    LimitRows rows =
        below1050
            ? new LimitRows(5e-6, 2e-3 * c4 * c6, t2, k, 0.75, k * Math.pow(t2, -0.25))
            : new LimitRows(1.3e-5, 2e-2 * c7 * c6, t2, k, 0.75, k * Math.pow(t2, -0.25));
    return rows.at(t);
  }

  /**
   * Retinal photochemical MPE, J/m², point source, 400–600 nm, t ≥ 10 s: 10–100 s: 100 C3 J/m²; 100
   * s–3×10⁴ s: 1 C3 W/m² (Table A.1; from memory, consistent with ANSI Z136.1 Table 5a C_B×10⁻²
   * J/cm² and C_B×10⁻⁴ W/cm²; C3 confirmed). NaN where it does not apply.
   */
  static double retinalPhotochemical(double lambda, double t) {
    double c3 = cB(lambda);
    return LimitRows.photochemical(lambda, t, 100 * c3, c3);
  }

  /**
   * The photochemical limit for a source of subtense alpha: a source larger than γ_ph is seen only
   * in part ({@link ExtendedSource#photochemicalDilution}).
   */
  static double retinalPhotochemical(double lambda, double t, double alpha) {
    return retinalPhotochemical(lambda, t) * ExtendedSource.photochemicalDilution(alpha, t);
  }

  /**
   * Ocular MPE (radiant exposure over t, J/m²): the lower of the thermal and photochemical limits.
   */
  static double ocularMpe(double lambda, double t) {
    return ocularLimit(lambda, t, ExtendedSource.ALPHA_MIN).exposure();
  }

  static final String RETINAL_THERMAL = "retinal thermal";
  static final String RETINAL_PHOTOCHEMICAL = "retinal photochemical";

  /**
   * The ocular limit over t, J/m², at any wavelength the eye rows cover (180–1250 nm, 1400 nm–1
   * mm), for a source of subtense alpha, with the effect that governs.
   */
  static GoverningLimit ocularLimit(double lambda, double t, double alpha) {
    double n = nm(lambda);
    if (n < 400) {
      return Ed3Ultraviolet.limit(lambda, t);
    }
    if (n >= 1400) {
      return GoverningLimit.only(Ed3Infrared.limit(lambda, t), Ed3Infrared.CORNEA);
    }
    return GoverningLimit.stricter(
        retinalThermal(lambda, t, alpha),
        RETINAL_THERMAL,
        retinalPhotochemical(lambda, t, alpha),
        RETINAL_PHOTOCHEMICAL);
  }

  /**
   * Skin MPE, J/m², 400–1400 nm (Table A.5 of Ed. 3, from memory; same values as ANSI Z136.1-2014
   * Table 7: 2 C_A×10⁻² J/cm², 1.1 C_A t^0.25 J/cm², 0.2 C_A W/cm²): below 1 ns: 2×10¹¹ C4 W/m²
   * (from memory; joins 200 C4 J/m² at 1 ns); 1 ns–100 ns: 200 C4 J/m²; 100 ns–10 s: 1.1×10⁴ C4
   * t^0.25 J/m²; 10 s–3×10⁴ s: 2000 C4 W/m². Ultraviolet and far infrared: {@link Ed3Ultraviolet},
   * {@link Ed3Infrared}, the same rows as the eye there. Cross-checked, all four rows: they are
   * Directive 2006/25/EC, Annex II, Table 2.4, rows 400–700 and 700–1400 nm (2×10¹¹ C_A W/m² below
   * 10⁻⁹ s, 200 C_A J/m² to 10⁻⁷ s, 1.1×10⁴ C_A t^0.25 J/m² to 10 s, 2×10³ C_A W/m² to 3×10⁴ s), as
   * read in its public text (see {@code jonquil.safety.directive.AnnexII}).
   */
  static double skinMpe(double lambda, double t) {
    return skinLimit(lambda, t).exposure();
  }

  static final String SKIN_THERMAL = "skin thermal";

  /** The skin limit over t at any wavelength from 180 nm to 1 mm, with the effect that governs. */
  static GoverningLimit skinLimit(double lambda, double t) {
    double n = nm(lambda);
    if (n < 400) {
      return Ed3Ultraviolet.limit(lambda, t);
    }
    if (n >= 1400) {
      return GoverningLimit.only(Ed3Infrared.limit(lambda, t), Ed3Infrared.SKIN);
    }
    double c4 = cA(lambda);
    if (t < 1e-9) {
      return GoverningLimit.only(2e11 * c4 * t, SKIN_THERMAL);
    }
    return GoverningLimit.only(
        new LimitRows(1e-7, 200 * c4, 10, 1.1e4 * c4, 0.25, 2000 * c4).at(t), SKIN_THERMAL);
  }

  /**
   * Class 1 AEL, J accessible within t, point source (C6 = 1), 400 nm ≤ λ &lt; 1250 nm. Table 3 of
   * Ed. 3 (from memory; each coefficient is the MPE above times the 7 mm aperture area 3.85×10⁻⁵
   * m², rounded as the table rounds, which ClassifierTest checks):
   *
   * <ul>
   *   <li>400–1050 nm: t &lt; 5 µs: 7.7×10⁻⁸ C4 J; 5 µs–10 s: 7×10⁻⁴ t^0.75 C4 J; ≥ 10 s: 3.9×10⁻⁴
   *       C4 C7 W (0.39 mW visible confirmed); 400–600 nm also photochemical: 10–100 s: 3.9×10⁻³ C3
   *       J, ≥ 100 s: 3.9×10⁻⁵ C3 W (0.039 mW at 400–450 nm; from memory).
   *   <li>1050–1250 nm: t &lt; 13 µs: 7.7×10⁻⁷ C7 J; 13 µs–10 s: 3.5×10⁻³ t^0.75 C7 J; ≥ 10 s:
   *       3.9×10⁻⁴ C4 C7 W.
   * </ul>
   */
  static double class1Ael(double lambda, double t) {
    double c4 = cA(lambda);
    double c7 = c7(lambda);
    LimitRows rows =
        nm(lambda) < 1050
            ? new LimitRows(5e-6, 7.7e-8 * c4, 10, 7e-4 * c4, 0.75, 3.9e-4 * c4 * c7)
            : new LimitRows(1.3e-5, 7.7e-7 * c7, 10, 3.5e-3 * c7, 0.75, 3.9e-4 * c4 * c7);
    double c3 = cB(lambda);
    return LimitRows.lowerOf(
        rows.at(t), LimitRows.photochemical(lambda, t, 3.9e-3 * c3, 3.9e-5 * c3));
  }

  /**
   * Class 2 AEL, J within t, 400–700 nm only (Table 5 of Ed. 3): t &lt; 0.25 s: the Class 1 AEL; t
   * ≥ 0.25 s: C6 × 10⁻³ W (1 mW with C6 = 1; confirmed).
   */
  static double class2Ael(double lambda, double t) {
    return t < 0.25 ? class1Ael(lambda, t) : 1e-3 * t;
  }

  /**
   * Class 3R AEL, J within t (Table 6 of Ed. 3): 5 × the Class 2 AEL for 400–700 nm, 5 × the Class
   * 1 AEL elsewhere (rule confirmed by the class summaries cited in ClassifierTest; the table
   * itself rounds).
   */
  static double class3rAel(double lambda, double t) {
    return 5 * (visible(lambda) ? class2Ael(lambda, t) : class1Ael(lambda, t));
  }

  /** Class 3B AEL for t ≥ 0.25 s, W (Table 8 of Ed. 3, 0.5 W; confirmed for cw). */
  static final double CLASS_3B_CW = 0.5;

  static boolean visible(double lambda) {
    double n = nm(lambda);
    return n >= 400 && n <= 700;
  }

  /**
   * Time base for Class 1/1M and non-visible 3R (Ed. 3 clause 4.3 e; 100 s for λ > 400 nm, from
   * memory).
   */
  static final double TIME_BASE_CLASS1 = 100;

  /**
   * Time base for Class 2/2M and visible 3R: 0.25 s (aversion response; confirmed by the class
   * summaries).
   */
  static final double TIME_BASE_CLASS2 = 0.25;
}
