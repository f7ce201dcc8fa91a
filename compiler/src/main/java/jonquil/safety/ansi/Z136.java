package jonquil.safety.ansi;

import static jonquil.safety.CorrectionFactors.cA;
import static jonquil.safety.CorrectionFactors.cB;
import static jonquil.safety.CorrectionFactors.cC;
import static jonquil.safety.CorrectionFactors.nm;

import jonquil.safety.CorrectionFactors;
import jonquil.safety.LimitRows;
import jonquil.safety.TableScope;

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

  /**
   * Eye evaluated below 1200 nm only: C_C is confirmed (ICNIRP form) up to 1200 nm; for 1200–1400
   * nm the 2014 edition's C_C and its added corneal/lens limit (1250–1400 nm; ANSI Z136.1-2014 is
   * one of the standards compared in "Comparison of corneal injury thresholds with laser safety
   * limits") were not confirmed, so that band is "not evaluated". The rest of the scope both
   * standards share (400 nm, 3×10⁴ s, 10 ps, 1 ns, the 7 mm and 3.5 mm apertures of Table 8) is in
   * {@link TableScope}; the Table 6 factors C_A, C_B, C_C and t_min are in {@link
   * CorrectionFactors}.
   */
  static final double LAMBDA_MAX_EYE = 1200e-9;

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
    LimitRows rows;
    if (nm(lambda) < 1050) {
      double cA = cA(lambda) * PER_CM2;
      rows = new LimitRows(5e-6, 2.0e-7 * cA, 10, 1.8e-3 * cA, 0.75, 1.0e-3 * cA);
    } else {
      double cC = cC(lambda) * PER_CM2;
      rows = new LimitRows(1.3e-5, 2.0e-6 * cC, 10, 9.0e-3 * cC, 0.75, 5.0e-3 * cC);
    }
    return rows.at(t);
  }

  /**
   * Retinal photochemical MPE, J/m², Table 5a, point source, 400–600 nm, t ≥ 10 s (dual limit with
   * the thermal one): 10–100 s: C_B × 10⁻² J/cm²; 100 s–3×10⁴ s: C_B × 10⁻⁴ W/cm² (from memory; C_B
   * confirmed). NaN where it does not apply.
   */
  static double retinalPhotochemical(double lambda, double t) {
    double cB = cB(lambda) * PER_CM2;
    return LimitRows.photochemical(lambda, t, 1e-2 * cB, 1e-4 * cB);
  }

  /**
   * Ocular MPE (radiant exposure over t, J/m²): the lower of the thermal and photochemical limits;
   * outside the retinal region the corneal limits of {@link #ultraviolet} and {@link #infrared}.
   */
  static double ocular(double lambda, double t) {
    double n = nm(lambda);
    if (n < 400) {
      return ultraviolet(n, t);
    }
    if (n >= 1400) {
      return infrared(n, t);
    }
    return LimitRows.lowerOf(retinalThermal(lambda, t), retinalPhotochemical(lambda, t));
  }

  /** Shortest exposure of the ultraviolet and infrared rows of Table 5a, s (from memory). */
  static final double T_MIN_CORNEA = 1e-9;

  /**
   * Ultraviolet ocular MPE, J/m², Table 5a, 180–400 nm, 1 ns ≤ t ≤ 3×10⁴ s, the lower of its dual
   * limits (all from memory; each equals the Directive 2006/25/EC Table 2.2/2.3 value, which the
   * cross-check test compares): thermal 0.56 t^0.25 J/cm² below 10 s; photochemical 3×10⁻³ J/cm²
   * (180–302 nm), 10^(0.2(λ−295)) × 10⁻⁴ J/cm² (302–315 nm), and for 315–400 nm 1 J/cm² from 10 s
   * to 10³ s then 10⁻³ W/cm².
   */
  static double ultraviolet(double n, double t) {
    double thermal = t < 10 ? 0.56 * Math.pow(t, 0.25) : Double.POSITIVE_INFINITY;
    double photochemical;
    if (n < 302) {
      photochemical = 3e-3;
    } else if (n < 315) {
      photochemical = Math.pow(10, 0.2 * (n - 295)) * 1e-4;
    } else if (t < 10) {
      photochemical = Double.POSITIVE_INFINITY;
    } else {
      photochemical = t < 1e3 ? 1.0 : 1e-3 * t;
    }
    return Math.min(thermal, photochemical) * PER_CM2;
  }

  /**
   * Infrared (corneal) ocular MPE, J/m², Table 5a, 1400 nm–1 mm, 1 ns ≤ t ≤ 3×10⁴ s (from memory;
   * equal to Directive 2006/25/EC Tables 2.2/2.3): 1400–1500 and 1800–2600 nm: 0.1 J/cm² to 1 ms,
   * then 0.56 t^0.25 J/cm²; 1500–1800 nm: 1.0 J/cm² to 10 s; 2600 nm–1 mm: 10⁻² J/cm² to 100 ns,
   * then 0.56 t^0.25 J/cm²; from 10 s: 0.1 W/cm².
   */
  static double infrared(double n, double t) {
    double h;
    if (t >= 10) {
      h = 0.1 * t;
    } else if (n >= 1500 && n < 1800) {
      h = 1.0;
    } else if (n >= 2600) {
      h = t < 1e-7 ? 1e-2 : 0.56 * Math.pow(t, 0.25);
    } else {
      h = t < 1e-3 ? 0.1 : 0.56 * Math.pow(t, 0.25);
    }
    return h * PER_CM2;
  }

  /**
   * Limiting aperture of the eye, m, Table 8 (from memory): 7 mm for 400–1400 nm; 1 mm for 180–400
   * nm; for 1400 nm–100 µm 1 mm below 0.3 s, 1.5 t^0.375 mm to 10 s, 3.5 mm from 10 s; 11 mm from
   * 100 µm.
   */
  static double eyeAperture(double lambda, double t) {
    double n = nm(lambda);
    if (n >= 400 && n < 1400) {
      return TableScope.APERTURE_EYE;
    }
    if (n < 400) {
      return 1e-3;
    }
    if (n >= 1e5) {
      return 11e-3;
    }
    if (t < 0.3) {
      return 1e-3;
    }
    return t < 10 ? 1.5e-3 * Math.pow(t, 0.375) : 3.5e-3;
  }

  /**
   * Skin MPE, J/m², Table 7, 400–1400 nm, 1 ns ≤ t ≤ 3×10⁴ s (from memory): 1 ns–100 ns: 2 C_A ×
   * 10⁻² J/cm²; 100 ns–10 s: 1.1 C_A t^0.25 J/cm²; 10 s–3×10⁴ s: 0.2 C_A W/cm². The 10 s–3×10⁴ s
   * row assumes an irradiated skin area ≤ 100 cm²; the edition lowers it for larger areas (from
   * memory), which is not implemented because the exposed area is not an input.
   */
  static double skin(double lambda, double t) {
    double cA = cA(lambda) * PER_CM2;
    return new LimitRows(1e-7, 2e-2 * cA, 10, 1.1 * cA, 0.25, 0.2 * cA).at(t);
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
