package jonquil.safety.ansi;

/**
 * Why it exists: the one place that holds the formulas and constants taken from ANSI Z136.1-2014,
 * so that every number can be audited against its table in a single file.
 *
 * <p>Units: the ANSI tables are written in J/cm² and W/cm²; each formula below is written in those
 * units and multiplied by {@link #PER_CM2} to return SI (J/m², W/m²).
 *
 * <p>Scope: point source (intrabeam viewing, α ≤ α<sub>min</sub>, so C<sub>E</sub> = 1), eye 400 nm
 * ≤ λ &lt; 1200 nm, skin 400 nm ≤ λ &lt; 1400 nm.
 *
 * <p>What published secondary sources confirmed during this work (see the tests for the citations):
 *
 * <ul>
 *   <li>the retinal-thermal form 1.8 t^0.75 mJ/cm² (2.55 mW/cm² at 0.25 s): university laser-safety
 *       "Sample calculations" appendix, which reproduces AS/NZS 2211.1 (= IEC 60825-1) — the same
 *       row appears in ANSI Z136.1-2014 Table 5a (that identity is from memory);
 *   <li>C_A = 10^(0.002(λ−700)) for 700–1050 nm and 5 for 1050–1400 nm, C_B = 10^(0.02(λ−450)), C_C
 *       = 10^(0.018(λ−1150)) for 1150–1200 nm: ICNIRP factors as reproduced in the Norwegian
 *       regulations on action and limit values §11-5 (Directive 2006/25/EC); ANSI Z136.1-2014 Table
 *       6 uses the same symbols and forms (from memory);
 *   <li>that the 2014 edition changed the MPE "in the visible region in the nanosecond time regime"
 *       and in the near infrared: J. Biomed. Opt. 20(9) 095011 (2015), "Trends in nanosecond
 *       melanosome microcavitation up to 1540 nm" (qualitative only — the new coefficient is from
 *       memory);
 *   <li>that ANSI Z136.1 limits a pulse train by three rules and that its Rule 3 factor C_P
 *       decreases with the number of pulses (the N^−1/4 form): J. Laser Appl. 25(4) (2013), Lund
 *       and Schulmeister, "On the exposure limits for extended source multiple pulse laser
 *       exposures"; J. Laser Appl. 37, 012028 (2025), "Rules for maximum permissible exposure for
 *       pulses in a train of multiple pulses" (three rules of Z136.1-2022); ILSC 2023, "The need to
 *       simplify MPE corrections for repetitive pulse exposures" (C_P / C5 decreasing with N). The
 *       exact 2014 wording and its t &lt; t_min provisions were not confirmed.
 * </ul>
 *
 * Everything else is from memory and says so.
 */
final class Z136 {
  private Z136() {}

  static final String EDITION = "ANSI Z136.1-2014";
  static final String OCULAR_TABLE = EDITION + ", Table 5a (ocular MPE, point source)";
  static final String FACTORS_TABLE = EDITION + ", Table 6 (parameters and correction factors)";
  static final String SKIN_TABLE = EDITION + ", Table 7 (skin MPE)";
  static final String APERTURE_TABLE = EDITION + ", Table 8 (limiting apertures; from memory)";
  static final String PULSE_RULES = EDITION + ", section 8.2.3 (repetitive pulses, Rules 1–3)";

  /** 1 J/cm² = 10⁴ J/m² (and 1 W/cm² = 10⁴ W/m²). */
  static final double PER_CM2 = 1e4;

  /** Eye evaluated from 400 nm, the start of the retinal-hazard rows of Table 5a. */
  static final double LAMBDA_MIN = 400e-9;

  /**
   * Eye evaluated below 1200 nm only: C_C is confirmed (ICNIRP form) up to 1200 nm; for 1200–1400
   * nm the 2014 edition's C_C and its added corneal/lens limit (1250–1400 nm; ANSI Z136.1-2014 is
   * one of the standards compared in "Comparison of corneal injury thresholds with laser safety
   * limits") were not confirmed, so that band is "not evaluated".
   */
  static final double LAMBDA_MAX_EYE = 1200e-9;

  /** Skin row 400–1400 nm of Table 7 (from memory). */
  static final double LAMBDA_MAX_SKIN = 1400e-9;

  /** Longest exposure in Table 5a and Table 7, s (3×10⁴ s; from memory, same as IEC Ed. 3). */
  static final double T_MAX = 3e4;

  /**
   * Shortest pulse evaluated for the eye, s; the 100 fs–10 ps row of Table 5a is not implemented.
   */
  static final double T_MIN_EYE = 1e-11;

  /** Shortest pulse evaluated for the skin, s; Table 7 rows below 1 ns are not implemented. */
  static final double T_MIN_SKIN = 1e-9;

  /**
   * Limiting aperture for the eye, 400–1400 nm: 7 mm (Table 8, from memory; 7 mm pupil confirmed).
   */
  static final double APERTURE_EYE = 7e-3;

  /** Limiting aperture for the skin, 400–1400 nm: 3.5 mm (Table 8, from memory). */
  static final double APERTURE_SKIN = 3.5e-3;

  static double nm(double lambda) {
    return lambda / 1e-9;
  }

  /**
   * C_A, Table 6: 1 for 400–700 nm, 10^(0.002(λ−700)) for 700–1050 nm, 5 for 1050–1400 nm.
   * Confirmed (ICNIRP form).
   */
  static double cA(double lambda) {
    double n = nm(lambda);
    if (n < 700) {
      return 1.0;
    }
    return n < 1050 ? Math.pow(10, 0.002 * (n - 700)) : 5.0;
  }

  /** C_B, Table 6: 1 for 400–450 nm, 10^(0.02(λ−450)) for 450–600 nm. Confirmed (ICNIRP form). */
  static double cB(double lambda) {
    double n = nm(lambda);
    return n < 450 ? 1.0 : Math.pow(10, 0.02 * (n - 450));
  }

  /**
   * C_C, Table 6: 1 for 1050–1150 nm, 10^(0.018(λ−1150)) for 1150–1200 nm. Confirmed (ICNIRP form).
   * Not defined here at or above 1200 nm (not confirmed; callers refuse that band).
   */
  static double cC(double lambda) {
    double n = nm(lambda);
    if (n >= 1200) {
      throw new IllegalArgumentException("C_C is not implemented at or above 1200 nm");
    }
    return n < 1150 ? 1.0 : Math.pow(10, 0.018 * (n - 1150));
  }

  /**
   * t_min, Table 6: the duration below which the single-pulse MPE is constant and inside which
   * pulses act together: 5 µs for 400–1050 nm, 13 µs for 1050–1400 nm (from memory: the 2007
   * edition had 18 µs and 50 µs; the 2014 values match the row breakpoints of Table 5a below, which
   * join within 3 %).
   */
  static double tMin(double lambda) {
    return nm(lambda) < 1050 ? 5e-6 : 1.3e-5;
  }

  /**
   * Retinal thermal MPE as radiant exposure over t, J/m², Table 5a, point source, 400 nm ≤ λ &lt;
   * 1200 nm, 10 ps ≤ t ≤ 3×10⁴ s. Rows (J/cm², t in s; from memory except the confirmed 1.8 t^0.75
   * form):
   *
   * <ul>
   *   <li>400–1050 nm: 10 ps–5 µs: 2.0 C_A × 10⁻⁷ (2014 value; the 2007 edition had 5.0 × 10⁻⁷ from
   *       1 ns — the change itself is confirmed qualitatively, JBO 20(9) 095011); 5 µs–10 s: 1.8
   *       C_A t^0.75 × 10⁻³ (confirmed form); 10 s–3×10⁴ s: C_A × 10⁻³ W/cm² (i.e. 1 mW/cm²
   *       visible).
   *   <li>1050–1200 nm: 10 ps–13 µs: 2.0 C_C × 10⁻⁶; 13 µs–10 s: 9.0 C_C t^0.75 × 10⁻³ (= 1.8 C_A
   *       t^0.75 × 10⁻³ with C_A = 5); 10 s–3×10⁴ s: 5.0 C_C × 10⁻³ W/cm².
   * </ul>
   *
   * At the 10 s breakpoint the constant-irradiance row is used, which is the lower of the two.
   */
  static double retinalThermal(double lambda, double t) {
    if (nm(lambda) < 1050) {
      double cA = cA(lambda);
      if (t < 5e-6) {
        return 2.0e-7 * cA * PER_CM2;
      }
      if (t < 10) {
        return 1.8e-3 * cA * Math.pow(t, 0.75) * PER_CM2;
      }
      return 1.0e-3 * cA * t * PER_CM2;
    }
    double cC = cC(lambda);
    if (t < 1.3e-5) {
      return 2.0e-6 * cC * PER_CM2;
    }
    if (t < 10) {
      return 9.0e-3 * cC * Math.pow(t, 0.75) * PER_CM2;
    }
    return 5.0e-3 * cC * t * PER_CM2;
  }

  /**
   * Retinal photochemical MPE, J/m², Table 5a, point source, 400–600 nm, t ≥ 10 s (dual limit with
   * the thermal one): 10–100 s: C_B × 10⁻² J/cm²; 100 s–3×10⁴ s: C_B × 10⁻⁴ W/cm² (from memory; C_B
   * confirmed). NaN where it does not apply.
   */
  static double retinalPhotochemical(double lambda, double t) {
    if (nm(lambda) >= 600 || t < 10) {
      return Double.NaN;
    }
    double cB = cB(lambda);
    return t < 100 ? 1e-2 * cB * PER_CM2 : 1e-4 * cB * t * PER_CM2;
  }

  /**
   * Ocular MPE (radiant exposure over t, J/m²): the lower of the thermal and photochemical limits.
   */
  static double ocular(double lambda, double t) {
    double thermal = retinalThermal(lambda, t);
    double photo = retinalPhotochemical(lambda, t);
    return Double.isNaN(photo) ? thermal : Math.min(thermal, photo);
  }

  /**
   * Skin MPE, J/m², Table 7, 400–1400 nm, 1 ns ≤ t ≤ 3×10⁴ s (from memory): 1 ns–100 ns: 2 C_A ×
   * 10⁻² J/cm²; 100 ns–10 s: 1.1 C_A t^0.25 J/cm²; 10 s–3×10⁴ s: 0.2 C_A W/cm². The 10 s–3×10⁴ s
   * row assumes an irradiated skin area ≤ 100 cm²; the edition lowers it for larger areas (from
   * memory), which is not implemented because the exposed area is not an input.
   */
  static double skin(double lambda, double t) {
    double cA = cA(lambda);
    if (t < 1e-7) {
      return 2e-2 * cA * PER_CM2;
    }
    if (t < 10) {
      return 1.1 * cA * Math.pow(t, 0.25) * PER_CM2;
    }
    return 0.2 * cA * t * PER_CM2;
  }

  /**
   * Rule 3 multiple-pulse correction, Table 6 / section 8.2.3: C_P = n^−0.25, n = number of pulses
   * in the exposure duration (the N^−1/4 form is confirmed qualitatively; that the 2014 edition
   * keeps exactly n^−0.25 for pulses of at least t_min is from memory). Applied only to the retinal
   * thermal limits, 400–1400 nm.
   */
  static double cP(double n) {
    return Math.pow(Math.max(1, n), -0.25);
  }
}
