package jonquil.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRef;
import jonquil.resolve.ResolvedRequirement;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * The analysis stage: solves a resolved spec's trains (power and polarization at every port, the
 * power budget, stray light) and judges its requirements. Pure: the same model always gives the
 * same answer.
 */
public final class Analyzer {
  /**
   * Relative budget error above which the model itself is wrong (DEVELOPERS.md, "Budget"): far
   * above the rounding of a long train's sums, far below any error a reader would notice.
   */
  public static final double CONSERVATION_TOLERANCE = 1e-9;

  /** What analysing one spec gives; no solution when the physics refused the model. */
  /**
   * @param lines the trains solved for each laser line alone, shortest first, where the sources
   *     carry two or more lines (the editor shows each line's figures from them); else empty
   */
  public record Analysis(
      java.util.Optional<TrainSolution> solution,
      List<RequirementOutcome> outcomes,
      List<Diagnostic> diagnostics,
      Map<Double, TrainSolution> lines) {
    Analysis(TrainSolution solution, List<RequirementOutcome> outcomes, List<Diagnostic> found) {
      this(java.util.Optional.of(solution), outcomes, found, Map.of());
    }
  }

  private Analyzer() {}

  public static Analysis analyze(ResolvedModel model) {
    return analyze(model, true);
  }

  /**
   * As above; without yields, a 'yield' requirement is reported as not evaluated (editors skip
   * them).
   */
  public static Analysis analyze(ResolvedModel model, boolean yields) {
    return analyze(model, yields, YieldDraws.DEFAULT);
  }

  /**
   * As above, drawing yields as {@code draws} says. A model the physics finds unphysical is
   * reported on its line, and none of its requirements is judged.
   */
  public static Analysis analyze(ResolvedModel model, boolean yields, YieldDraws draws) {
    return analyze(model, yields, draws, () -> false);
  }

  /**
   * As above; a yield stops drawing with {@link CheckSuperseded} once {@code superseded} says a
   * newer check wants the answer instead.
   */
  public static Analysis analyze(
      ResolvedModel model,
      boolean yields,
      YieldDraws draws,
      java.util.function.BooleanSupplier superseded) {
    try {
      return analyzeOrRefuse(model, yields, draws, superseded);
    } catch (UnphysicalModel refused) {
      return new Analysis(
          java.util.Optional.empty(),
          RequirementOutcome.noneEvaluated(model, "not evaluated: " + refused.getMessage()),
          List.of(refused.diagnostic()),
          Map.of());
    }
  }

  private static Analysis analyzeOrRefuse(
      ResolvedModel model,
      boolean yields,
      YieldDraws draws,
      java.util.function.BooleanSupplier superseded) {
    MaterialModel materials = new MaterialModel(model);
    ElementOptics optics = new ElementOptics(materials, new SurfaceModel(model, materials));
    // In the order solved, so the first solve that does not close is reported, whatever the JVM.
    Map<OptionalDouble, TrainSolution> solved = new LinkedHashMap<>();
    java.util.function.Function<OptionalDouble, TrainSolution> solve =
        wl -> solved.computeIfAbsent(wl, w -> new Propagator(model, optics, materials).solve(w));
    TrainSolution solution = solve.apply(OptionalDouble.empty());
    List<Diagnostic> diagnostics = new ArrayList<>();
    List<RequirementOutcome> outcomes = new ArrayList<>();
    if (!(solution.conservationError() <= CONSERVATION_TOLERANCE)) {
      // Fail closed: a model that creates or loses light judges nothing.
      conservationBroken(model, solution).ifPresent(diagnostics::add);
      outcomes.addAll(
          RequirementOutcome.noneEvaluated(
              model, "not evaluated: the power budget does not close"));
      return new Analysis(solution, outcomes, diagnostics);
    }
    for (ResolvedRequirement r : model.requirements()) {
      boolean deferred = r.yield().isPresent() && !yields;
      YieldMonteCarlo.Judged judged =
          r.yield().isEmpty()
              ? new YieldMonteCarlo.Judged(
                  RequirementEvaluator.evaluate(r, model, solve), java.util.Optional.empty())
              : yields
                  ? YieldMonteCarlo.evaluate(r, model, draws, superseded)
                  : new YieldMonteCarlo.Judged(
                      RequirementEvaluator.Verdict.notEvaluated(
                          "the yield is drawn after the quick check; its verdict follows"),
                      java.util.Optional.empty());
      RequirementEvaluator.Verdict v = judged.verdict();
      outcomes.add(outcome(r, v, judged.estimate()));
      if (!v.evaluated() && !deferred) {
        // Fail closed: what cannot be evaluated is not met. A yield an editor draws in its second
        // pass (CheckOptions.EDITOR, then FULL) is no finding yet: its verdict follows.
        diagnostics.add(
            Diagnostic.of(
                DiagnosticCode.REQUIREMENT_NOT_EVALUATED,
                r.file(),
                r.syntax().range(),
                "requirement not evaluated, so not met: " + v.text()));
      }
      if (v.evaluated()) {
        diagnostics.add(
            v.pass()
                ? Diagnostic.of(
                    DiagnosticCode.REQUIREMENT_MET,
                    r.file(),
                    r.syntax().range(),
                    verdict("requirement met", r, v))
                : Diagnostic.of(
                    DiagnosticCode.REQUIREMENT_FAILED,
                    r.file(),
                    r.syntax().range(),
                    verdict("requirement not met", r, v)));
      }
    }
    // The solves at other wavelengths that requirements asked for must close as well.
    solved.values().stream()
        .filter(s -> !(s.conservationError() <= CONSERVATION_TOLERANCE))
        .findFirst()
        .flatMap(s -> conservationBroken(model, s))
        .ifPresent(diagnostics::add);
    diagnostics.addAll(TerminalLimits.check(model, solution));
    diagnostics.addAll(StrayNotes.of(solution));
    diagnostics.addAll(CoherenceNotes.of(model, solution));
    for (Clip c : solution.clips()) {
      diagnostics.add(
          Diagnostic.of(
              DiagnosticCode.APERTURE_CLIPS,
              c.file(),
              c.range(),
              "'"
                  + c.element()
                  + "' cuts off "
                  + QuantityFormat.format(100 * c.fraction(), Dimension.DIMENSIONLESS)
                  + " % of the beam (1/e² radius against the "
                  + "aperture; more than 1 % is flagged, a common-practice threshold)"));
    }
    for (MaterialModel.OutOfRange o : materials.outOfRange()) {
      firstUse(model, o)
          .ifPresent(
              ref ->
                  diagnostics.add(
                      Diagnostic.of(
                          DiagnosticCode.MATERIAL_OUT_OF_RANGE,
                          ref.file(),
                          ref.range(),
                          "'"
                              + o.material().name()
                              + "' is used at "
                              + QuantityFormat.format(o.wavelength(), Dimension.LENGTH)
                              + ", outside the range of its published data ("
                              + QuantityFormat.format(o.valid().min(), Dimension.LENGTH)
                              + " to "
                              + QuantityFormat.format(o.valid().max(), Dimension.LENGTH)
                              + "); its index there is extrapolated")));
    }
    return new Analysis(
        java.util.Optional.of(solution),
        outcomes,
        diagnostics.stream().distinct().toList(),
        LineSolutions.of(model, solve));
  }

  /**
   * A budget that does not close is an error on the first train: every figure drawn from it is
   * suspect, so it must not pass as a JSON number only.
   */
  private static java.util.Optional<Diagnostic> conservationBroken(
      ResolvedModel model, TrainSolution s) {
    return model.trains().stream()
        .findFirst()
        .map(
            t ->
                Diagnostic.of(
                    DiagnosticCode.CONSERVATION_BROKEN,
                    t.file(),
                    t.range(),
                    "the power budget does not close: the sources give "
                        + QuantityFormat.format(s.sourcePower(), Dimension.POWER)
                        + " but absorbed, stopped, observed and stray light add to "
                        + QuantityFormat.format(
                            s.absorbed() + s.stopped() + s.observedAtPathEnds() + s.strayPower(),
                            Dimension.POWER)
                        + " (relative error "
                        + s.conservationError()
                        + ", more than 1e-9); no figure of this spec can be trusted, so its"
                        + " requirements are not evaluated"));
  }

  private static java.util.Optional<ResolvedRef> firstUse(
      ResolvedModel model, MaterialModel.OutOfRange o) {
    return model.references().stream()
        .filter(r -> r.target().name().equals(o.material().name()))
        .findFirst();
  }

  private static RequirementOutcome outcome(
      ResolvedRequirement r,
      RequirementEvaluator.Verdict v,
      java.util.Optional<YieldEstimate> estimate) {
    Path file = r.file();
    if (!v.evaluated()) {
      return RequirementOutcome.notEvaluated(file, r.syntax().range(), r.syntax().text(), v.text());
    }
    return new RequirementOutcome(
        file,
        r.syntax().range(),
        r.syntax().text(),
        v.pass() ? RequirementStatus.PASS : RequirementStatus.FAIL,
        OptionalDouble.of(v.value()),
        OptionalDouble.of(v.bound()),
        // A class is a label: how far one class is from another is no number.
        v.unit().equals("class") ? OptionalDouble.empty() : OptionalDouble.of(v.margin()),
        v.unit(),
        v.text(),
        v.shownUnit(),
        v.valueIsFloor(),
        estimate);
  }

  private static String verdict(
      String lead, ResolvedRequirement r, RequirementEvaluator.Verdict v) {
    String what =
        r.yield().isPresent()
            ? "yield"
            : !v.what().isEmpty() ? v.what() : r.measure().map(m -> m.word()).orElse("value");
    return lead
        + ": "
        + what
        + (v.valueIsFloor() ? " is at least " : " is ")
        + VerdictText.format(v.value(), v.shownUnit())
        + (v.text().isEmpty() ? "" : " (" + v.text() + ")")
        + ", bound "
        + VerdictText.format(v.bound(), v.shownUnit())
        + (v.unit().equals("class")
            ? ""
            : ", margin " + VerdictText.margin(v.value(), v.bound(), v.margin(), v.shownUnit()));
  }
}
