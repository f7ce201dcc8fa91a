package jonquil.safety.directive;

/**
 * The one place that holds the numbers of Directive 2006/25/EC, Annex II (laser radiation), so that
 * each can be audited against its table: Table 2.2 (eye, exposure shorter than 10 s), Table 2.3
 * (eye, 10 s and longer), Table 2.4 (skin), Table 2.5 (correction factors) and Table 2.6
 * (repetitive exposure). The limiting apertures are stated in the aperture column of Tables
 * 2.2–2.4.
 *
 * <p>Confirmed against public restatements of the text: the table numbering and titles (Annex II as
 * published on legislation.gov.uk, "eudr/2006/25/annex/II", and its Norwegian transposition,
 * Arbeidstilsynet, regulations concerning action and limit values, Annex 4, Tables 4.2–4.6); every
 * factor of Table 2.5 (C_A, C_B, C_C including C_C = 8 for 1200–1400 nm, T_1 of the visible, α_min,
 * C_E, T_2, γ; Norwegian §11-5); the three rules of Table 2.6 with C_P = N^−0.25 and T_min for 315
 * nm to 1800 nm (consolidated text 02006L0025-20190726). The rows of Tables 2.2–2.4 are the ICNIRP
 * values the directive reproduces; where a row was not seen in a public restatement during this
 * work it says "from memory", and its continuity with the neighbouring rows (which the tables are
 * built to have) is checked by the tests.
 *
 * <p>Units: SI as the directive writes them (J m⁻², W m⁻², s, m); wavelengths in nm inside the
 * formulas because the tables state their bands in nm.
 */
final class AnnexII {
  private AnnexII() {}

  static final String TITLE = "Directive 2006/25/EC, Annex II";
  static final String EYE_SHORT = TITLE + ", Table 2.2 (eye, exposure < 10 s)";
  static final String EYE_LONG = TITLE + ", Table 2.3 (eye, exposure >= 10 s)";
  static final String SKIN = TITLE + ", Table 2.4 (skin)";
  static final String FACTORS = TITLE + ", Table 2.5 (correction factors, C_E = 1)";
  static final String REPETITIVE = TITLE + ", Table 2.6 (repetitive exposure, rules 1-3)";

  /** Shortest wavelength of the tables, m (180 nm, Tables 2.2–2.4). */
  static final double LAMBDA_MIN = 180e-9;

  /** Longest wavelength of the tables, m (10⁶ nm = 1 mm, Tables 2.2–2.4). */
  static final double LAMBDA_MAX = 1e-3;

  /** Shortest exposure of the tables, s (10⁻¹³ s, first column of Tables 2.2 and 2.4). */
  static final double T_MIN = 1e-13;

  /** Longest exposure of the tables, s (3×10⁴ s, last column of Tables 2.3 and 2.4). */
  static final double T_MAX = 3e4;

  /** Where Table 2.2 (eye, t &lt; 10 s) hands over to Table 2.3 (t ≥ 10 s), s. */
  static final double SHORT_LONG = 10;

  static double nm(double lambda) {
    return lambda / 1e-9;
  }

  // ---- Table 2.5: correction factors (confirmed, Norwegian §11-5 restating Table 2.5) ----

  /** C_A, Table 2.5: 1 below 700 nm, 10^(0.002(λ−700)) for 700–1050 nm, 5 for 1050–1400 nm. */
  static double cA(double n) {
    if (n < 700) {
      return 1.0;
    }
    return n < 1050 ? Math.pow(10, 0.002 * (n - 700)) : 5.0;
  }

  /** C_B, Table 2.5: 1 for 400–450 nm, 10^(0.02(λ−450)) for 450–700 nm. */
  static double cB(double n) {
    return n < 450 ? 1.0 : Math.pow(10, 0.02 * (n - 450));
  }

  /** C_C, Table 2.5: 1 for 700–1150 nm, 10^(0.018(λ−1150)) for 1150–1200 nm, 8 for 1200–1400 nm. */
  static double cC(double n) {
    if (n < 1150) {
      return 1.0;
    }
    return n < 1200 ? Math.pow(10, 0.018 * (n - 1150)) : 8.0;
  }

  /**
   * T_1 of the visible, Table 2.5, s: 10 s below 450 nm, 10·10^(0.02(λ−450)) s for 450–500 nm, 100
   * s above 500 nm. It marks where the photochemical limit of Table 2.3 (100 C_B J m⁻²) falls below
   * the thermal one (10 W m⁻² × t): T_1 = 10 C_B up to 500 nm, so taking the lower of the two
   * limits, as {@link #eye} does, is the same as switching at T_1 (definition).
   */
  static double t1Visible(double n) {
    if (n < 450) {
      return 10;
    }
    return n <= 500 ? 10 * Math.pow(10, 0.02 * (n - 450)) : 100;
  }

  /**
   * C_1 = 5.6×10³ t^0.25 J m⁻², the thermal limit of the ultraviolet and the far infrared (Tables
   * 2.2 and 2.4; the factor is listed in the table notes, from memory).
   */
  static double c1(double t) {
    return 5.6e3 * Math.pow(t, 0.25);
  }

  /** C_2 = 10^(0.2(λ−295)) J m⁻², the photochemical limit of 302.5–315 nm (from memory). */
  static double c2(double n) {
    return Math.pow(10, 0.2 * (n - 295));
  }

  /**
   * T_1 of the ultraviolet, s: 10^(0.8(λ−295)) × 10⁻¹⁵ s, the duration at which C_1 reaches C_2 for
   * 302.5–315 nm (from memory; C_1(T_1) = C_2 within 0.5 %, which the tests check).
   */
  static double t1Ultraviolet(double n) {
    return Math.pow(10, 0.8 * (n - 295)) * 1e-15;
  }

  // ---- Tables 2.2 / 2.3: the eye ----

  /**
   * Exposure limit value of the eye as radiant exposure over t, J m⁻², point source (C_E = 1), 180
   * nm ≤ λ ≤ 1 mm, 10⁻¹³ s ≤ t ≤ 3×10⁴ s: Table 2.2 for t &lt; 10 s, Table 2.3 from 10 s.
   */
  static double eye(double lambda, double t) {
    double n = nm(lambda);
    if (n < 400) {
      return ultraviolet(n, t);
    }
    if (n < 1400) {
      return Math.min(retinalThermal(n, t), retinalPhotochemical(n, t));
    }
    return infrared(n, t);
  }

  /**
   * 180–400 nm, eye (Tables 2.2, 2.3) and skin (Table 2.4), J m⁻² (rows from memory):
   *
   * <ul>
   *   <li>t &lt; 10⁻⁹ s: E = 3×10¹⁰ W m⁻²;
   *   <li>180–302.5 nm: H = 30 J m⁻² up to 3×10⁴ s;
   *   <li>302.5–315 nm: H = C_1 for t &lt; T_1, C_2 for t ≥ T_1 (the lower of the two, since C_1
   *       rises through C_2 at T_1);
   *   <li>315–400 nm: H = C_1 for t &lt; 10 s, 10⁴ J m⁻² for 10–10³ s, E = 10 W m⁻² from 10³ s.
   * </ul>
   */
  static double ultraviolet(double n, double t) {
    if (t < 1e-9) {
      return 3e10 * t;
    }
    if (n < 302.5) {
      return 30;
    }
    if (n < 315) {
      return t < t1Ultraviolet(n) ? c1(t) : c2(n);
    }
    if (t < SHORT_LONG) {
      return c1(t);
    }
    return t < 1e3 ? 1e4 : 10 * t;
  }

  /**
   * Retinal thermal limit, 400–1400 nm, J m⁻² (Table 2.2 rows from memory; the 18 t^0.75 row is the
   * one IEC 60825-1 shares, confirmed in {@code jonquil.safety.Ed3}):
   *
   * <ul>
   *   <li>400–1050 nm: 1.5×10⁻⁴ C_A (10⁻¹³–10⁻¹¹ s), 2.7×10⁴ t^0.75 C_A (10⁻¹¹–10⁻⁹ s), 5×10⁻³ C_A
   *       (10⁻⁹–1.8×10⁻⁵ s), 18 t^0.75 C_A (1.8×10⁻⁵–10 s);
   *   <li>1050–1400 nm: 1.5×10⁻³ C_C, 2.7×10⁵ t^0.75 C_C, 5×10⁻² C_C (10⁻⁹–5×10⁻⁵ s), 90 t^0.75 C_C
   *       (5×10⁻⁵–10 s);
   *   <li>from 10 s (Table 2.3): E = 10 C_A C_C W m⁻² (10 W m⁻² in the visible).
   * </ul>
   */
  static double retinalThermal(double n, double t) {
    double a = cA(n);
    double c = cC(n);
    if (t >= SHORT_LONG) {
      return 10 * a * c * t;
    }
    if (n < 1050) {
      if (t < 1e-11) {
        return 1.5e-4 * a;
      }
      if (t < 1e-9) {
        return 2.7e4 * Math.pow(t, 0.75) * a;
      }
      return t < 1.8e-5 ? 5e-3 * a : 18 * Math.pow(t, 0.75) * a;
    }
    if (t < 1e-11) {
      return 1.5e-3 * c;
    }
    if (t < 1e-9) {
      return 2.7e5 * Math.pow(t, 0.75) * c;
    }
    return t < 5e-5 ? 5e-2 * c : 90 * Math.pow(t, 0.75) * c;
  }

  /**
   * Retinal photochemical limit, 400–600 nm, t ≥ 10 s, point source (γ = 11 mrad up to 100 s),
   * Table 2.3: H = 100 C_B J m⁻² for 10–100 s, E = 1 C_B W m⁻² from 100 s (from memory; C_B
   * confirmed). +∞ where it does not apply.
   */
  static double retinalPhotochemical(double n, double t) {
    if (n >= 600 || t < SHORT_LONG) {
      return Double.POSITIVE_INFINITY;
    }
    return t < 100 ? 100 * cB(n) : cB(n) * t;
  }

  /**
   * 1400 nm–1 mm, eye (Tables 2.2, 2.3) and skin (Table 2.4), J m⁻² (rows from memory):
   *
   * <ul>
   *   <li>t &lt; 10⁻⁹ s: E = 10¹² W m⁻² (1400–1500 nm), 10¹³ (1500–1800 nm), 10¹² (1800–2600 nm),
   *       10¹¹ (2600 nm–1 mm), each meeting its 1 ns row;
   *   <li>1400–1500 and 1800–2600 nm: 10³ J m⁻² (10⁻⁹–10⁻³ s), then C_1;
   *   <li>1500–1800 nm: 10⁴ J m⁻² (10⁻⁹–10 s);
   *   <li>2600 nm–1 mm: 100 J m⁻² (10⁻⁹–10⁻⁷ s), then C_1;
   *   <li>from 10 s (Table 2.3): E = 1000 W m⁻².
   * </ul>
   */
  static double infrared(double n, double t) {
    if (t >= SHORT_LONG) {
      return 1000 * t;
    }
    boolean midBand = n >= 1500 && n < 1800;
    boolean farBand = n >= 2600;
    if (t < 1e-9) {
      return (midBand ? 1e13 : farBand ? 1e11 : 1e12) * t;
    }
    if (midBand) {
      return 1e4;
    }
    if (farBand) {
      return t < 1e-7 ? 100 : c1(t);
    }
    return t < 1e-3 ? 1e3 : c1(t);
  }

  /**
   * Limiting aperture of the eye, m (aperture column of Tables 2.2 and 2.3; from memory): 7 mm for
   * 400–1400 nm; 11 mm for 10⁵ nm–1 mm; otherwise (180–400 nm, 1400–10⁵ nm) 1 mm below 0.3 s, 1.5
   * t^0.375 mm for 0.3–10 s and 3.5 mm from 10 s.
   */
  static double eyeAperture(double lambda, double t) {
    double n = nm(lambda);
    if (n >= 400 && n < 1400) {
      return 7e-3;
    }
    if (n >= 1e5) {
      return 11e-3;
    }
    if (t < 0.3) {
      return 1e-3;
    }
    return t < SHORT_LONG ? 1.5e-3 * Math.pow(t, 0.375) : 3.5e-3;
  }

  // ---- Table 2.4: the skin ----

  /**
   * Exposure limit value of the skin, J m⁻², Table 2.4 (rows from memory): the ultraviolet and
   * infrared rows are those of the eye ({@link #ultraviolet}, {@link #infrared}); 400–1400 nm: E =
   * 2×10¹¹ C_A W m⁻² below 1 ns, H = 200 C_A J m⁻² (10⁻⁹–10⁻⁷ s), 1.1×10⁴ C_A t^0.25 J m⁻² (10⁻⁷–10
   * s), E = 2000 C_A W m⁻² (10 s–3×10⁴ s).
   */
  static double skin(double lambda, double t) {
    double n = nm(lambda);
    if (n < 400) {
      return ultraviolet(n, t);
    }
    if (n >= 1400) {
      return infrared(n, t);
    }
    double a = cA(n);
    if (t < 1e-9) {
      return 2e11 * a * t;
    }
    if (t < 1e-7) {
      return 200 * a;
    }
    return t < SHORT_LONG ? 1.1e4 * a * Math.pow(t, 0.25) : 2000 * a * t;
  }

  /** Limiting aperture of the skin, m (Table 2.4; from memory): 3.5 mm, 11 mm from 10⁵ nm. */
  static double skinAperture(double lambda) {
    return nm(lambda) >= 1e5 ? 11e-3 : 3.5e-3;
  }

  // ---- Table 2.6: repetitive exposure ----

  /**
   * T_min of Table 2.6, s: pulses within it count as one pulse for rule 3. 1 ns (315–400 nm), 18 µs
   * (400–1050 nm), 50 µs (1050–1400 nm), 1 ms (1400–1500 nm), 10 s (1500–1800 nm) confirmed
   * (consolidated text); 1 ms (1800–2600 nm) and 100 ns (2600 nm–1 mm) from memory. NaN below 315
   * nm, where the table gives none because the limits there are photochemical.
   */
  static double tMin(double n) {
    if (n < 315) {
      return Double.NaN;
    }
    if (n < 400) {
      return 1e-9;
    }
    if (n < 1050) {
      return 18e-6;
    }
    if (n < 1400) {
      return 50e-6;
    }
    if (n < 1500) {
      return 1e-3;
    }
    if (n < 1800) {
      return 10;
    }
    return n < 2600 ? 1e-3 : 1e-7;
  }

  /** C_P = N^−0.25, Table 2.6 rule 3 (confirmed), N the number of pulses (at least 1). */
  static double cP(double pulses) {
    return Math.pow(Math.max(1, pulses), -0.25);
  }
}
