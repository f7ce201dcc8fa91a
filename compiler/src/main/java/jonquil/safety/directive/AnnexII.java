package jonquil.safety.directive;

import java.util.List;
import java.util.function.DoubleBinaryOperator;

/**
 * The one place that holds the numbers of Directive 2006/25/EC, Annex II (laser radiation), so that
 * each can be audited against its table: Table 2.2 (eye, exposure shorter than 10 s), Table 2.3
 * (eye, 10 s and longer), Table 2.4 (skin), Table 2.5 (correction factors) and Table 2.6
 * (repetitive exposure). The limiting apertures are stated in the aperture column of Tables 2.2–2.4
 * and their notes.
 *
 * <p>Where the directive's tables were read (the copies of the directive reachable here,
 * legislation.gov.uk and EUR-Lex, did not yield the rows of Tables 2.2–2.4 as text, so every
 * reading below is of a public restatement that keeps the directive's own numbering):
 *
 * <ul>
 *   <li>[FR] the French transposition, Code du travail, regulatory part, Book IV, Title V, Chapter
 *       II, Annexe II "rayonnements optiques laser" (Légifrance text as mirrored in the public
 *       "codes-juridiques-francais" dump): Tables 2.1, 2.2 (every row, the aperture column and
 *       notes a–d), 2.4 (every row and the aperture column), 2.5 (every factor) and 2.6 (the three
 *       rules and every T_min row). Its Table 2.3 is printed only as an image, so Table 2.3 was not
 *       read.
 *   <li>[CONS] the consolidated text CELEX 02006L0025-20190726, Annex II, as restated by a public
 *       legislation search site: the end of Table 2.5 (γ) and Table 2.6 (rules 1–3, C_P = N^−0.25,
 *       T_min from 315 nm to 1800 nm), the same as [FR].
 *   <li>[NO] the Norwegian transposition, regulations concerning action and limit values, Annex 4,
 *       Table 4.5 (§11-5), which is Table 2.5.
 * </ul>
 *
 * Rows of Table 2.3 (eye, 10 s and longer) could not be read in any text and stay "from memory";
 * the table the skin's ultraviolet and infrared rows refer to ("see the eye's limits", Table 2.4
 * [FR]) confirms that those skin rows are the eye's, whatever Table 2.3 says.
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

  /** Shortest wavelength of the tables, m (180 nm: Tables 2.1, 2.2 and 2.4, first rows; [FR]). */
  static final double LAMBDA_MIN = 180e-9;

  /** Longest wavelength of the tables, m (10⁶ nm = 1 mm: Tables 2.1, 2.2, 2.4, 2.6; [FR]). */
  static final double LAMBDA_MAX = 1e-3;

  /** Shortest exposure of the tables, s (10⁻¹³ s: first column of Table 2.2; [FR]). */
  static final double T_MIN = 1e-13;

  /** Longest exposure of the tables, s (3×10⁴ s: last column of Table 2.4, [FR]; and 2.3). */
  static final double T_MAX = 3e4;

  /** Where Table 2.2 (eye, t &lt; 10 s) hands over to Table 2.3 (t ≥ 10 s), s (titles; [FR]). */
  static final double SHORT_LONG = 10;

  static double nm(double lambda) {
    return lambda / 1e-9;
  }

  // ---- Table 2.5: correction factors (every factor read in [FR], [NO]) ----

  /**
   * C_A: 1 below 700 nm, 10^(0.002(λ−700)) for 700–1050 nm, 5 for 1050–1400 nm (Directive
   * 2006/25/EC, Annex II, Table 2.5, rows C_A; [FR], [NO]).
   */
  static double cA(double n) {
    if (n < 700) {
      return 1.0;
    }
    return n < 1050 ? Math.pow(10, 0.002 * (n - 700)) : 5.0;
  }

  /** C_B: 1 for 400–450 nm, 10^(0.02(λ−450)) for 450–700 nm (Table 2.5, rows C_B; [FR], [NO]). */
  static double cB(double n) {
    return n < 450 ? 1.0 : Math.pow(10, 0.02 * (n - 450));
  }

  /**
   * C_C: 1 for 700–1150 nm, 10^(0.018(λ−1150)) for 1150–1200 nm, 8 for 1200–1400 nm (Table 2.5,
   * rows C_C; [FR], [NO]).
   */
  static double cC(double n) {
    if (n < 1150) {
      return 1.0;
    }
    return n < 1200 ? Math.pow(10, 0.018 * (n - 1150)) : 8.0;
  }

  /**
   * T_1 of the visible, s: 10 s below 450 nm, 10·10^(0.02(λ−450)) s for 450–500 nm, 100 s above 500
   * nm (Table 2.5, rows T_1; [FR], [NO]). It marks where the photochemical limit of Table 2.3 (100
   * C_B J m⁻²) falls below the thermal one (10 W m⁻² × t): T_1 = 10 C_B up to 500 nm, so taking the
   * lower of the two limits, as {@link #eye} does, is the same as switching at T_1 (definition).
   */
  static double t1Visible(double n) {
    if (n < 450) {
      return 10;
    }
    return n <= 500 ? 10 * Math.pow(10, 0.02 * (n - 450)) : 100;
  }

  /**
   * 5.6×10³ t^0.25 J m⁻², the thermal limit of the ultraviolet and the far infrared: Table 2.2, row
   * 315–400 nm (10⁻⁹–10 s), the short-pulse branch of rows 303–314 nm, rows 1400–1500 and 1800–2600
   * nm (10⁻³–10 s) and row 2600 nm–1 mm (10⁻⁷–10 s) ([FR]). ICNIRP and IEC call it C_1; the
   * directive writes the formula out.
   */
  static double c1(double t) {
    return 5.6e3 * Math.pow(t, 0.25);
  }

  /**
   * One of the single-wavelength rows of Table 2.2 for 303–314 nm ([FR]): H = {@code dose} J m⁻²,
   * but 5.6×10³ t^0.25 J m⁻² for t &lt; {@code t1} s (where the two meet within rounding).
   */
  record UltravioletBRow(int nm, double dose, double t1) {}

  /**
   * Table 2.2, rows 303, 304, …, 314 nm ([FR]; the directive lists each nanometre rather than the
   * C_2 = 10^(0.2(λ−295)) and T_1 = 10^(0.8(λ−295)) × 10⁻¹⁵ s formulas of ICNIRP and IEC, and
   * rounds them: 60 J m⁻² at 304 nm where the formula gives 63).
   */
  static final List<UltravioletBRow> ULTRAVIOLET_B_ROWS =
      List.of(
          new UltravioletBRow(303, 40, 2.6e-9),
          new UltravioletBRow(304, 60, 1.3e-8),
          new UltravioletBRow(305, 100, 1.0e-7),
          new UltravioletBRow(306, 160, 6.7e-7),
          new UltravioletBRow(307, 250, 4.0e-6),
          new UltravioletBRow(308, 400, 2.6e-5),
          new UltravioletBRow(309, 630, 1.6e-4),
          new UltravioletBRow(310, 1.0e3, 1.0e-3),
          new UltravioletBRow(311, 1.6e3, 6.7e-3),
          new UltravioletBRow(312, 2.5e3, 4.0e-2),
          new UltravioletBRow(313, 4.0e3, 2.6e-1),
          new UltravioletBRow(314, 6.3e3, 1.6));

  /**
   * The row for 303 nm ≤ λ &lt; 315 nm: the listed nanometre at or below λ. Between two listed
   * wavelengths the lower one's row is the more restrictive (the doses rise with λ), which is what
   * note a of Table 2.2 asks where a wavelength falls under two limits.
   */
  static UltravioletBRow ultravioletBRow(double n) {
    return ULTRAVIOLET_B_ROWS.get((int) Math.floor(n) - 303);
  }

  // ---- Tables 2.2 / 2.3: the eye ----

  /**
   * Wavelengths (nm) where two bands of Tables 2.2 and 2.4 meet, both closed in the tables: note a
   * says the more restrictive limit applies there ([FR]).
   */
  private static final double[] SHARED_EDGES = {400, 1050, 1400, 1500, 1800, 2600};

  /**
   * The wavelength (nm) whose row governs at n: n itself, or, on an edge two bands share, just
   * below it when the lower band's row is the more restrictive (note a of Tables 2.2 and 2.4).
   */
  static double governingRow(double n, double t, DoubleBinaryOperator rows) {
    for (double edge : SHARED_EDGES) {
      if (n == edge) {
        double below = Math.nextDown(n);
        return rows.applyAsDouble(below, t) < rows.applyAsDouble(n, t) ? below : n;
      }
    }
    return n;
  }

  /**
   * Exposure limit value of the eye as radiant exposure over t, J m⁻², point source (C_E = 1), 180
   * nm ≤ λ ≤ 1 mm, 10⁻¹³ s ≤ t ≤ 3×10⁴ s: Table 2.2 for t &lt; 10 s, Table 2.3 from 10 s.
   */
  static double eye(double lambda, double t) {
    double n = nm(lambda);
    return eyeRows(governingRow(n, t, AnnexII::eyeRows), t);
  }

  /** The eye's row at n (nm), the bands taken as [lower, upper). */
  static double eyeRows(double n, double t) {
    if (n < 400) {
      return ultraviolet(n, t);
    }
    if (n < 1400) {
      return Math.min(retinalThermal(n, t), retinalPhotochemical(n, t));
    }
    return infrared(n, t);
  }

  /**
   * 180–400 nm, eye (Tables 2.2, 2.3) and skin (Table 2.4, which refers to the eye's rows), J m⁻²:
   *
   * <ul>
   *   <li>t &lt; 10⁻⁹ s: E = 3×10¹⁰ W m⁻² (Table 2.2, 180–400 nm, 10⁻¹³–10⁻⁹ s; Table 2.4, 180–400
   *       nm, &lt; 10⁻⁹ s; [FR]);
   *   <li>180–302 nm: H = 30 J m⁻² (Table 2.2, rows 180–280 and 280–302 nm, 10⁻⁹–10 s; [FR]); to
   *       3×10⁴ s (Table 2.3, from memory); 302–303 nm takes this row, the more restrictive of its
   *       neighbours (note a);
   *   <li>303–314 nm: the single-wavelength rows {@link #ULTRAVIOLET_B_ROWS} (Table 2.2, [FR]),
   *       held to 3×10⁴ s (Table 2.3, from memory);
   *   <li>315–400 nm: H = 5.6×10³ t^0.25 J m⁻² for 10⁻⁹–10 s (Table 2.2, row 315–400 nm; [FR]); 10⁴
   *       J m⁻² for 10–10³ s, E = 10 W m⁻² from 10³ s (Table 2.3, from memory).
   * </ul>
   */
  static double ultraviolet(double n, double t) {
    if (t < 1e-9) {
      return 3e10 * t;
    }
    if (n < 303) {
      return 30;
    }
    if (n < 315) {
      UltravioletBRow row = ultravioletBRow(n);
      return t < row.t1() ? c1(t) : row.dose();
    }
    if (t < SHORT_LONG) {
      return c1(t);
    }
    return t < 1e3 ? 1e4 : 10 * t;
  }

  /**
   * Retinal thermal limit, 400–1400 nm, J m⁻², C_E = 1:
   *
   * <ul>
   *   <li>400–1050 nm (Table 2.2, rows 400–700 and 700–1050 nm; [FR]): 1.5×10⁻⁴ C_A (10⁻¹³–10⁻¹¹
   *       s), 2.7×10⁴ t^0.75 C_A (10⁻¹¹–10⁻⁹ s), 5×10⁻³ C_A (10⁻⁹–1.8×10⁻⁵ s), 18 t^0.75 C_A
   *       (1.8×10⁻⁵–10 s);
   *   <li>1050–1400 nm (Table 2.2, row 1050–1400 nm; [FR]): 1.5×10⁻³ C_C, 2.7×10⁵ t^0.75 C_C,
   *       5×10⁻² C_C (10⁻⁹–5×10⁻⁵ s), 90 t^0.75 C_C (5×10⁻⁵–10 s);
   *   <li>from 10 s: E = 10 C_A C_C W m⁻² (Table 2.3, from memory; it continues 18 t^0.75 C_A and
   *       90 t^0.75 C_C at 10 s within 1 %, which the continuity test checks).
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
   * Retinal photochemical limit, 400–600 nm, t ≥ 10 s, point source: H = 100 C_B J m⁻² for 10–100
   * s, E = 1 C_B W m⁻² from 100 s (Table 2.3, from memory; the band 400–600 nm and its table are
   * Table 2.1 [FR], C_B and γ = 11 mrad up to 100 s are Table 2.5 [FR], [NO]). +∞ where it does not
   * apply.
   */
  static double retinalPhotochemical(double n, double t) {
    if (n >= 600 || t < SHORT_LONG) {
      return Double.POSITIVE_INFINITY;
    }
    return t < 100 ? 100 * cB(n) : cB(n) * t;
  }

  /**
   * 1400 nm–1 mm, eye (Tables 2.2, 2.3) and skin (Table 2.4, which refers to the eye's rows), J
   * m⁻²:
   *
   * <ul>
   *   <li>t &lt; 10⁻⁹ s: E = 10¹² W m⁻² (1400–1500 nm), 10¹³ (1500–1800 nm), 10¹² (1800–2600 nm),
   *       10¹¹ (2600 nm–1 mm) (Table 2.2 and Table 2.4, those rows, &lt; 10⁻⁹ s; [FR]);
   *   <li>1400–1500 and 1800–2600 nm: 10³ J m⁻² (10⁻⁹–10⁻³ s), then 5.6×10³ t^0.25 J m⁻² to 10 s
   *       (Table 2.2, rows 1400–1500 and 1800–2600 nm; [FR]);
   *   <li>1500–1800 nm: 10⁴ J m⁻² (10⁻⁹–10 s; Table 2.2, row 1500–1800 nm; [FR]);
   *   <li>2600 nm–1 mm: 100 J m⁻² (10⁻⁹–10⁻⁷ s), then 5.6×10³ t^0.25 J m⁻² to 10 s (Table 2.2, row
   *       2600 nm–10⁶ nm; [FR]);
   *   <li>from 10 s: E = 1000 W m⁻² (Table 2.3, from memory; the band 1400 nm–1 mm and its table
   *       are Table 2.1 [FR]).
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
   * Limiting aperture of the eye, m, at the row that governs ({@link #governingRow}):
   *
   * <ul>
   *   <li>400–1400 nm: 7 mm (Table 2.2, aperture column of rows 400–1400 nm; [FR]; the same from 10
   *       s, Table 2.3, from memory);
   *   <li>180–400 nm: 1 mm for t &lt; 0.3 s, 1.5 t^0.375 mm for 0.3–10 s (Table 2.2, aperture
   *       column of rows 180–400 nm; [FR]); 3.5 mm from 10 s (Table 2.3, from memory);
   *   <li>1400 nm–10⁵ nm: 1 mm for t ≤ 0.3 s, 1.5 t^0.375 mm for 0.3–10 s (Table 2.2, note b;
   *       [FR]); 3.5 mm from 10 s (Table 2.3, from memory);
   *   <li>10⁵ nm–1 mm: 11 mm (Table 2.2, note b; [FR]; the same from 10 s, from memory).
   * </ul>
   */
  static double eyeAperture(double lambda, double t) {
    double n = governingRow(nm(lambda), t, AnnexII::eyeRows);
    if (n >= 400 && n < 1400) {
      return 7e-3;
    }
    if (n >= 1e5) {
      return 11e-3;
    }
    boolean ultraviolet = n < 400;
    if (ultraviolet ? t < 0.3 : t <= 0.3) {
      return 1e-3;
    }
    return t < SHORT_LONG ? 1.5e-3 * Math.pow(t, 0.375) : 3.5e-3;
  }

  // ---- Table 2.4: the skin ----

  /**
   * Exposure limit value of the skin, J m⁻², Table 2.4 ([FR]): the ultraviolet and infrared rows
   * are those of the eye from 10⁻⁹ s ("see the eye's limits"; {@link #ultraviolet}, {@link
   * #infrared}) with the same sub-nanosecond irradiances; 400–1400 nm: E = 2×10¹¹ C_A W m⁻² below
   * 10⁻⁹ s, H = 200 C_A J m⁻² (10⁻⁹–10⁻⁷ s), 1.1×10⁴ C_A t^0.25 J m⁻² (10⁻⁷–10 s), E = 2×10³ C_A W
   * m⁻² (10 s–3×10⁴ s) (Table 2.4, rows 400–700 and 700–1400 nm).
   */
  static double skin(double lambda, double t) {
    double n = nm(lambda);
    return skinRows(governingRow(n, t, AnnexII::skinRows), t);
  }

  /** The skin's row at n (nm), the bands taken as [lower, upper). */
  static double skinRows(double n, double t) {
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

  /**
   * Limiting aperture of the skin, m: 3.5 mm at every wavelength and duration (Table 2.4, aperture
   * column, every row from 180 nm to 10⁶ nm; [FR]). The directive has no 11 mm skin aperture in the
   * far infrared, unlike IEC 60825-1.
   */
  static double skinAperture(double lambda) {
    return 3.5e-3;
  }

  // ---- Table 2.6: repetitive exposure ----

  /**
   * T_min of Table 2.6, s: pulses within it count as one pulse for rule 3. 1 ns (315 &lt; λ ≤ 400
   * nm), 18 µs (400 &lt; λ ≤ 1050 nm), 50 µs (1050 &lt; λ ≤ 1400 nm), 1 ms (1400 &lt; λ ≤ 1500 nm),
   * 10 s (1500 &lt; λ ≤ 1800 nm), 1 ms (1800 &lt; λ ≤ 2600 nm), 100 ns (2600 nm &lt; λ ≤ 1 mm)
   * (Table 2.6, rows T_min; [FR]; to 1800 nm also [CONS]). NaN up to 315 nm, where the table gives
   * none because the limits there are photochemical.
   */
  static double tMin(double n) {
    if (n <= 315) {
      return Double.NaN;
    }
    if (n <= 400) {
      return 1e-9;
    }
    if (n <= 1050) {
      return 18e-6;
    }
    if (n <= 1400) {
      return 50e-6;
    }
    if (n <= 1500) {
      return 1e-3;
    }
    if (n <= 1800) {
      return 10;
    }
    return n <= 2600 ? 1e-3 : 1e-7;
  }

  /** C_P = N^−0.25, Table 2.6 rule 3 ([FR], [CONS]), N the number of pulses (at least 1). */
  static double cP(double pulses) {
    return Math.pow(Math.max(1, pulses), -0.25);
  }
}
