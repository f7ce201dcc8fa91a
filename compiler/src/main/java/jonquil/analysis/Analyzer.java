package jonquil.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
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
  /** Stray beams weaker than this fraction of the source power are not worth a note. */
  static final double STRAY_NOTE_THRESHOLD = 1e-9;

  /** What analysing one spec gives. */
  public record Analysis(
      TrainSolution solution, List<RequirementOutcome> outcomes, List<Diagnostic> diagnostics) {}

  private Analyzer() {}

  public static Analysis analyze(ResolvedModel model) {
    return analyze(model, true);
  }

  /**
   * As above; without yields, a 'yield' requirement is reported as not evaluated (editors skip
   * them).
   */
  public static Analysis analyze(ResolvedModel model, boolean yields) {
    MaterialModel materials = new MaterialModel(model);
    ElementOptics optics = new ElementOptics(materials, new SurfaceModel(model, materials));
    Map<OptionalDouble, TrainSolution> solved = new HashMap<>();
    java.util.function.Function<OptionalDouble, TrainSolution> solve =
        wl -> solved.computeIfAbsent(wl, w -> new Propagator(model, optics, materials).solve(w));
    TrainSolution solution = solve.apply(OptionalDouble.empty());
    List<Diagnostic> diagnostics = new ArrayList<>();
    List<RequirementOutcome> outcomes = new ArrayList<>();
    for (ResolvedRequirement r : model.requirements()) {
      RequirementEvaluator.Verdict v =
          r.yield().isPresent() && !yields
              ? RequirementEvaluator.Verdict.notEvaluated(
                  "yields are computed by 'jonquil check', not while typing")
              : RequirementEvaluator.evaluate(r, model, solve);
      outcomes.add(outcome(r, v));
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
    diagnostics.addAll(TerminalLimits.check(model, solution));
    for (StrayBeam s : solution.stray()) {
      if (s.power() > STRAY_NOTE_THRESHOLD * solution.sourcePower() && s.file() != null) {
        diagnostics.add(
            Diagnostic.of(
                DiagnosticCode.STRAY_BEAM,
                s.file(),
                s.range(),
                "stray light: "
                    + QuantityFormat.format(s.power(), Dimension.POWER)
                    + " "
                    + s.description()));
      }
    }
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
    return new Analysis(solution, outcomes, diagnostics.stream().distinct().toList());
  }

  private static java.util.Optional<ResolvedRef> firstUse(
      ResolvedModel model, MaterialModel.OutOfRange o) {
    return model.references().stream()
        .filter(r -> r.target().name().equals(o.material().name()))
        .findFirst();
  }

  private static RequirementOutcome outcome(ResolvedRequirement r, RequirementEvaluator.Verdict v) {
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
        OptionalDouble.of(v.margin()),
        v.unit(),
        v.text());
  }

  private static String verdict(
      String lead, ResolvedRequirement r, RequirementEvaluator.Verdict v) {
    String what = r.yield().isPresent() ? "yield" : r.measure().map(m -> m.word()).orElse("value");
    return lead
        + ": "
        + what
        + " is "
        + VerdictText.format(v.value(), v.unit())
        + (v.text().isEmpty() ? "" : " (" + v.text() + ")")
        + ", bound "
        + VerdictText.format(v.bound(), v.unit())
        + (v.unit().equals("class") ? "" : ", margin " + VerdictText.format(v.margin(), v.unit()));
  }
}
