package jonquil.safety.directive;

import java.util.Locale;
import java.util.function.DoubleBinaryOperator;
import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.MpeCalculator;
import jonquil.safety.Outcome;
import jonquil.safety.PulseTrain;
import jonquil.safety.TableScope;

/**
 * What the eye and skin limits of Directive 2006/25/EC share: the range of Annex II (180 nm–1 mm,
 * 10⁻¹³ s–3×10⁴ s), the rules of Table 2.6 for pulse trains, and the answer restated with the table
 * and limiting aperture that apply at its wavelength and duration.
 */
abstract class AnnexIILimit extends MpeCalculator {
  static final PulseTrain.RuleNames NAMES =
      new PulseTrain.RuleNames(
          "rule 1 (single pulse)", "rule 2 (group of pulses over the exposure duration)");
  private static final String RULE3 = "rule 3 (cumulative thermal, C_P = N^-0.25)";

  /** Exposures and pulses the tables cover: from 10⁻¹³ s; the aperture is restated per answer. */
  private static final TableScope.Tissue RANGE =
      new TableScope.Tissue(Double.NaN, AnnexII.T_MIN, "1e-13 s");

  private final String tables;

  /**
   * @param tables every table the limit draws on, cited for a pulse train, whose single pulses and
   *     exposure duration may fall in different tables
   * @param limit the radiant-exposure limit (J m⁻²) at a wavelength (m) over a duration (s)
   */
  AnnexIILimit(String tables, DoubleBinaryOperator limit) {
    super(tables, tables + "; " + AnnexII.REPETITIVE, RANGE, NAMES, AnnexII.REPETITIVE, limit);
    this.tables = tables;
  }

  /** The table an answer at this wavelength and duration comes from. */
  abstract String table(double lambda, double t);

  /** The limiting aperture at this wavelength and duration, m. */
  @Override
  protected abstract double aperture(double lambda, double t);

  /** The limit, restated with its own table and aperture; every answer carries the caution. */
  final Outcome<MaximumPermissibleExposure> limit(Emission e, double exposureDuration) {
    Outcome<MaximumPermissibleExposure> o = evaluate(e, exposureDuration);
    if (!o.evaluated()) {
      return o;
    }
    MaximumPermissibleExposure m = o.get();
    double lambda = e.wavelength();
    boolean train = e.pulsed() && !e.singlePulseOnly();
    String table =
        (train ? tables : table(lambda, m.exposureDuration()))
            + "; "
            + AnnexII.FACTORS
            + (train ? "; " + AnnexII.REPETITIVE : "");
    return Outcome.of(m.restated(aperture(lambda, m.exposureDuration()), table), table);
  }

  @Override
  protected String wavelengthRefusal(double lambda) {
    if (lambda < AnnexII.LAMBDA_MIN || lambda > AnnexII.LAMBDA_MAX) {
      return wavelengthRefused(
          lambda, "is outside 180 nm to 1 mm, the range of " + AnnexII.TITLE + " (laser)");
    }
    return null;
  }

  @Override
  protected String rowsBelowShortestPulse() {
    return "the tables of " + AnnexII.TITLE + " start at 1e-13 s";
  }

  /**
   * Rule 3 of Table 2.6: each pulse ≤ the single-pulse limit × C_P, N the number of pulses; pulses
   * closer than T_min count as one pulse T_min long. None up to 315 nm, where Table 2.6 gives no
   * T_min. Applied to every limit from 315 nm, thermal or not: C_P ≤ 1, so where the directive
   * would not apply it this is stricter than the directive, never more lenient.
   */
  @Override
  protected PulseTrain.RepetitiveRule repetitiveRule(double lambda) {
    double tMin = AnnexII.tMin(AnnexII.nm(lambda));
    if (Double.isNaN(tMin)) {
      return null;
    }
    return (mpe, single, pulses, rate) -> {
      if (1 / rate < tMin) {
        double perGroup = rate * tMin;
        double groups = Math.max(1, pulses / perGroup);
        return new PulseTrain.Limit(
            mpe.applyAsDouble(tMin) * AnnexII.cP(groups) / perGroup,
            RULE3
                + ", pulses within T_min = "
                + fmt(tMin)
                + " s counted as one, N = "
                + fmt(groups)
                + ", C_P = "
                + fmt(AnnexII.cP(groups)));
      }
      return new PulseTrain.Limit(
          single * AnnexII.cP(pulses),
          RULE3 + ", N = " + fmt(pulses) + ", C_P = " + fmt(AnnexII.cP(pulses)));
    };
  }

  private static String fmt(double v) {
    return String.format(Locale.ROOT, "%.4g", v);
  }
}
