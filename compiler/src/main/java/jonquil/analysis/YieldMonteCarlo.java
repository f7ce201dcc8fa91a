package jonquil.analysis;

import java.util.HashMap;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.function.Function;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;

/**
 * Judges a 'yield' requirement: draws toleranced builds of the spec (every '±' uniform within its
 * half-width, {@link Tolerances}), counts the builds that meet the requirement, and compares the 95
 * % Wilson interval of that fraction with the yield bound. A verdict the interval does not settle
 * fails: the gate fails closed, and the finding says to raise the builds.
 */
final class YieldMonteCarlo {
  private YieldMonteCarlo() {}

  /** The verdict and, when builds were drawn, what they gave. */
  record Judged(RequirementEvaluator.Verdict verdict, java.util.Optional<YieldEstimate> estimate) {}

  static Judged evaluate(
      ResolvedRequirement r,
      ResolvedModel model,
      YieldDraws draws,
      java.util.function.BooleanSupplier superseded) {
    if (!Tolerances.any(model)) {
      return new Judged(
          RequirementEvaluator.Verdict.notEvaluated(
              "the spec states no tolerances ('± ...'), so every build is the same; "
                  + "check the requirement itself without 'yield'"),
          java.util.Optional.empty());
    }
    int builds = r.yieldBuilds().orElse(draws.builds());
    long seed = ModelDigest.seed(model, draws.seed());
    SplittableRandom random = new SplittableRandom(seed);
    int passes = 0;
    for (int i = 0; i < builds; i++) {
      if (superseded.getAsBoolean()) {
        throw new CheckSuperseded(); // an editor's newer edit: this answer would never be shown
      }
      ResolvedModel build = Tolerances.draw(model, random);
      MaterialModel m = new MaterialModel(build);
      ElementOptics optics = new ElementOptics(m, new SurfaceModel(build, m));
      Map<OptionalDouble, TrainSolution> solved = new HashMap<>();
      Function<OptionalDouble, TrainSolution> solve =
          wl -> solved.computeIfAbsent(wl, w -> new Propagator(build, optics, m).solve(w));
      RequirementEvaluator.Verdict v = RequirementEvaluator.evaluate(r, build, solve);
      if (!v.evaluated()) {
        return new Judged(
            RequirementEvaluator.Verdict.notEvaluated(
                "the yield's requirement cannot be evaluated in build "
                    + (i + 1)
                    + ": "
                    + v.text()),
            java.util.Optional.empty());
      }
      if (v.pass()) {
        passes++;
      }
    }
    WilsonInterval interval = WilsonInterval.of95(passes, builds);
    Criterion bound = r.yield().orElseThrow();
    double fraction = (double) passes / builds;
    Side side = side(bound, interval);
    YieldEstimate estimate =
        new YieldEstimate(builds, passes, interval, side != Side.STRADDLES, seed);
    String counted =
        passes
            + " of "
            + builds
            + " toleranced builds pass, uniform within each '±'; 95 % Wilson interval "
            + VerdictText.format(interval.low(), "%")
            + " .. "
            + VerdictText.format(interval.high(), "%");
    String note =
        switch (side) {
          case PASSES, FAILS -> counted + "; margin from the interval's less favourable end";
          case STRADDLES ->
              counted
                  + "; not settled: the 95 % interval straddles the bound, so the requirement"
                  + " is not shown to be met; raise the builds (now "
                  + builds
                  + ")";
        };
    return new Judged(
        RequirementEvaluator.verdict(
            side == Side.PASSES, fraction, bound.low(), margin(bound, interval), "%", note),
        java.util.Optional.of(estimate));
  }

  /** Where the interval lies against the bound. */
  private enum Side {
    PASSES,
    FAILS,
    STRADDLES
  }

  private static Side side(Criterion bound, WilsonInterval i) {
    double b = bound.low();
    return switch (bound.relation()) {
      case AT_LEAST -> i.low() >= b ? Side.PASSES : i.high() < b ? Side.FAILS : Side.STRADDLES;
      case ABOVE -> i.low() > b ? Side.PASSES : i.high() <= b ? Side.FAILS : Side.STRADDLES;
      case AT_MOST -> i.high() <= b ? Side.PASSES : i.low() > b ? Side.FAILS : Side.STRADDLES;
      case BELOW -> i.high() < b ? Side.PASSES : i.low() >= b ? Side.FAILS : Side.STRADDLES;
      // The resolver gives a yield a one-sided bound only: no interval can settle an equality.
      case EQUAL, WITHIN, IS ->
          throw new IllegalArgumentException("a yield is bounded from one side only");
    };
  }

  /** Inside the bound by the interval's nearer end: positive only when the verdict is settled. */
  private static double margin(Criterion bound, WilsonInterval i) {
    double b = bound.low();
    return switch (bound.relation()) {
      case AT_LEAST, ABOVE -> i.low() - b;
      case AT_MOST, BELOW -> b - i.high();
      case EQUAL, WITHIN, IS ->
          throw new IllegalArgumentException("a yield is bounded from one side only");
    };
  }
}
