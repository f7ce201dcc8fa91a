package jonquil.safety;

import java.util.function.DoubleBinaryOperator;

/**
 * The flow every MPE follows, whatever the standard and the tissue, written once: refuse what the
 * tables do not cover, then continuous wave, a single pulse or a pulse train by {@link PulseTrain};
 * each calculator plugs in its standard's table, coverage and repetitive-pulse rule, and every
 * answer carries the caution.
 */
public abstract class MpeCalculator {
  private final String table;
  private final String trainTable;
  private final TableScope.Tissue tissue;
  private final PulseTrain.RuleNames rules;
  private final String rulesCited;
  private final DoubleBinaryOperator mpe;

  /**
   * @param table standard, edition and tables the figure comes from
   * @param trainTable the same for a pulse train, with its pulse rules
   * @param tissue what the MPE protects: its limiting aperture and the shortest pulse covered
   * @param rules the standard's names for the single-pulse and average-power rules
   * @param rulesCited what a pulse train the pulse rules cannot judge is refused under
   * @param mpe the radiant-exposure MPE (J/m²) at a wavelength (m) over a duration (s), inside the
   *     covered range
   */
  protected MpeCalculator(
      String table,
      String trainTable,
      TableScope.Tissue tissue,
      PulseTrain.RuleNames rules,
      String rulesCited,
      DoubleBinaryOperator mpe) {
    this.table = table;
    this.trainTable = trainTable;
    this.tissue = tissue;
    this.rules = rules;
    this.rulesCited = rulesCited;
    this.mpe = mpe;
  }

  /** Why the wavelength is outside the implemented rows, or null when it is inside. */
  protected abstract String wavelengthRefusal(double lambda);

  /**
   * Why an exposure duration (cw or a train) is outside (0, 3×10⁴ s] or below the shortest pulse,
   * or null when it is inside.
   */
  protected String durationRefusal(double t) {
    if (!(t > 0) || !Double.isFinite(t)) {
      return "exposure duration must be > 0 s";
    }
    if (t > TableScope.T_MAX) {
      return "exposure duration " + seconds(t) + " exceeds 30000 s, the end of the tables";
    }
    if (t < tissue.shortestPulse()) {
      return "exposure duration "
          + seconds(t)
          + " is below "
          + tissue.shortestPulseText()
          + "; not implemented";
    }
    return null;
  }

  /**
   * Why a pulse of duration tau (alone, or in a train) is outside the rows, or null: shorter than
   * the shortest pulse, or longer than the tables.
   */
  private String pulseRefusal(double tau, boolean single) {
    if (tau < tissue.shortestPulse()) {
      return "pulse duration "
          + seconds(tau)
          + " is below "
          + tissue.shortestPulseText()
          + ": "
          + rowsBelowShortestPulse();
    }
    return longPulseRefusal(tau, single);
  }

  /** What a refusal of a pulse shorter than the rows says of the rows below them. */
  protected abstract String rowsBelowShortestPulse();

  /**
   * Why a pulse longer than the rows is refused, or null. Here a single one; a train of them is
   * left to the train checks.
   */
  protected String longPulseRefusal(double tau, boolean single) {
    return single && tau > TableScope.T_MAX ? "pulse longer than 3e4 s" : null;
  }

  /** The standard's repetitive-pulse rule at this wavelength; null where it applies none. */
  protected PulseTrain.RepetitiveRule repetitiveRule(double lambda) {
    return null;
  }

  /** The repetitive-pulse rule for this train; by default the wavelength's. */
  protected PulseTrain.RepetitiveRule repetitiveRule(Emission e) {
    return repetitiveRule(e.wavelength());
  }

  /** The limiting aperture for an exposure of duration t, m; by default the tissue's. */
  protected double aperture(double lambda, double t) {
    return tissue.aperture();
  }

  /**
   * The effect whose limit governs at (lambda, t), in words, with the more lenient one that also
   * applied; empty where the calculator does not say.
   */
  protected String governing(double lambda, double t) {
    return "";
  }

  /** Why a train its pulse rules could otherwise judge is still refused, or null. */
  protected String trainRefusal(Emission e) {
    return null;
  }

  /**
   * The MPE for an emission and an exposure duration (s). Continuous wave: MPE(T). Single pulse:
   * MPE(τ), T ignored. Pulse train: the standard's per-pulse limit (see {@link PulseTrain}).
   */
  public final Outcome<MaximumPermissibleExposure> evaluate(Emission e, double exposureDuration) {
    String refusal = wavelengthRefusal(e.wavelength());
    if (refusal == null && !e.singlePulseOnly()) {
      refusal = durationRefusal(exposureDuration);
    }
    if (refusal == null && e.pulsed()) {
      refusal = pulseRefusal(e.pulseDuration(), e.singlePulseOnly());
    }
    if (refusal != null) {
      return Outcome.notEvaluated(refusal, table);
    }
    if (!e.pulsed()) {
      return once(e.wavelength(), exposureDuration, "continuous wave", false);
    }
    if (e.singlePulseOnly()) {
      return once(e.wavelength(), e.pulseDuration(), rules.singlePulse(), true);
    }
    String trainRefusal = e.trainProblem(exposureDuration);
    if (trainRefusal == null) {
      trainRefusal = trainRefusal(e);
    }
    if (trainRefusal != null) {
      return Outcome.notEvaluated(trainRefusal, rulesCited);
    }
    double lambda = e.wavelength();
    MaximumPermissibleExposure train =
        PulseTrain.limit(
            t -> mpe.applyAsDouble(lambda, t),
            e.pulseDuration(),
            e.repetitionRate(),
            exposureDuration,
            rules,
            repetitiveRule(e),
            tissue.aperture(),
            trainTable);
    // The aperture of the pulse: never larger than that of the whole exposure, so never diluting.
    double limitedAt =
        train.limitingCriterion().equals(rules.averagePower())
            ? exposureDuration
            : e.pulseDuration();
    String governing = governing(lambda, limitedAt);
    return Outcome.of(
        train.with(aperture(lambda, e.pulseDuration()), governing), cited(trainTable, governing));
  }

  /**
   * The tables cited, and where two limits applied, which one governed: a reader of the figure
   * learns it wherever the standard is shown.
   */
  private static String cited(String tables, String governing) {
    return governing.contains("stricter than")
        ? tables + "; governing limit: " + governing
        : tables;
  }

  /** One exposure of duration t: continuous wave over t, or a single pulse t long. */
  private Outcome<MaximumPermissibleExposure> once(
      double lambda, double t, String criterion, boolean singlePulse) {
    double h = mpe.applyAsDouble(lambda, t);
    double single = singlePulse ? h : Double.NaN;
    String governing = governing(lambda, t);
    return Outcome.of(
        new MaximumPermissibleExposure(
            h,
            h / t,
            t,
            aperture(lambda, t),
            single,
            Double.NaN,
            Double.NaN,
            criterion,
            table,
            governing),
        cited(table, governing));
  }

  /** A duration for a message, in the unit that suits it ("300 fs", "18 µs", "10 s"). */
  public static String seconds(double t) {
    return jonquil.units.QuantityFormat.format(t, jonquil.units.Dimension.TIME);
  }

  /** A refusal of a wavelength, quoted in nanometres to one decimal, and {@code why}. */
  protected static String wavelengthRefused(double lambda, String why) {
    return "wavelength "
        + String.format(java.util.Locale.ROOT, "%.1f", CorrectionFactors.nm(lambda))
        + " nm "
        + why;
  }
}
