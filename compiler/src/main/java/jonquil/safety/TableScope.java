package jonquil.safety;

/**
 * The part of the MPE tables that both implemented standards share, IEC 60825-1:2014 (Ed. 3) and
 * ANSI Z136.1-2014, written once: where the implemented rows start and end, and the limiting
 * apertures the exposures are averaged over. Each standard's own end of the ocular wavelength range
 * stays with its table.
 */
public final class TableScope {
  private TableScope() {}

  /**
   * Lowest wavelength of the rows both standards share as implemented, m: the retinal hazard
   * region; ANSI's implemented rows start here, IEC's at {@link #LAMBDA_MIN_IEC}.
   */
  public static final double LAMBDA_MIN = 400e-9;

  /** Upper end of the evaluated skin range, m (skin rows 400–1400 nm of both tables). */
  public static final double LAMBDA_MAX_SKIN = 1400e-9;

  /** Longest exposure the tables cover, s (3×10⁴ s in both; from memory for ANSI). */
  public static final double T_MAX = 3e4;

  /**
   * Shortest pulse evaluated for the eye under ANSI, s: its 100 fs–10 ps rows are not implemented,
   * so shorter pulses are "not evaluated" there. IEC's rows run from {@link #T_MIN_IEC}.
   */
  public static final double T_MIN_EYE = 1e-11;

  /** Shortest pulse evaluated for the skin under ANSI, s (rows from 1 ns; IEC: T_MIN_IEC). */
  public static final double T_MIN_SKIN = 1e-9;

  /**
   * Limiting aperture for the eye, 400–1400 nm: 7 mm (IEC Table A.3, ANSI Table 8; both from
   * memory; the 7 mm pupil is confirmed by the sources cited in Ed3; cross-checked: Directive
   * 2006/25/EC, Annex II, Table 2.2, aperture column, rows 400–1400 nm).
   */
  public static final double APERTURE_EYE = 7e-3;

  /**
   * Limiting aperture for the skin, 400–1400 nm: 3.5 mm (IEC Table A.3, ANSI Table 8; memory;
   * cross-checked: Directive 2006/25/EC, Annex II, Table 2.4, aperture column, rows 400–1400 nm).
   */
  public static final double APERTURE_SKIN = 3.5e-3;

  /**
   * Shortest exposure the IEC 60825-1:2014 (Ed. 3) tables cover, s: 10⁻¹³ s (100 fs), Table A.1 and
   * A.5 (from memory; cross-checked: Directive 2006/25/EC, Annex II, Table 2.2, first column,
   * 10⁻¹³–10⁻¹¹ s).
   */
  public static final double T_MIN_IEC = 1e-13;

  /**
   * Shortest wavelength of the IEC tables, m (180 nm, Table A.1; from memory; cross-checked:
   * Directive 2006/25/EC, Annex II, Table 2.2, first row, 180–280 nm).
   */
  public static final double LAMBDA_MIN_IEC = 180e-9;

  /**
   * Longest wavelength of the IEC tables, m (1 mm, Table A.1; from memory; cross-checked: Directive
   * 2006/25/EC, Annex II, Table 2.2, last row, 2600–10⁶ nm).
   */
  public static final double LAMBDA_MAX_IEC = 1e-3;

  /** What an MPE protects: its limiting aperture and the shortest pulse its rows cover (s). */
  public record Tissue(double aperture, double shortestPulse, String shortestPulseText) {
    public static final Tissue EYE = new Tissue(APERTURE_EYE, T_MIN_EYE, "10 ps");
    public static final Tissue SKIN = new Tissue(APERTURE_SKIN, T_MIN_SKIN, "1 ns");

    /** The eye under IEC Ed. 3: rows from 100 fs (aperture per band: {@link LimitingAperture}). */
    public static final Tissue IEC_EYE = new Tissue(APERTURE_EYE, T_MIN_IEC, "100 fs");

    /** The skin under IEC Ed. 3: rows from 100 fs (aperture per band: {@link LimitingAperture}). */
    public static final Tissue IEC_SKIN = new Tissue(APERTURE_SKIN, T_MIN_IEC, "100 fs");
  }
}
