package jonquil.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.source.TextRange;

/**
 * The verdict on one requirement line: computed value, bound and margin in SI units (the unit is
 * named by {@code siUnit}), plus a reason when it was not evaluated. {@code shownUnit} is the unit
 * people read them in, that of the bound as written ("dB", "%"); a hazard class has no margin.
 * {@code valueIsLowerBound}: the value was not computed, only known to be at least this (a source
 * above Class 3R is at least Class 3B). A yield also carries the builds it drew and the interval of
 * its estimate.
 */
public record RequirementOutcome(
    Path file,
    TextRange range,
    String text,
    RequirementStatus status,
    OptionalDouble value,
    OptionalDouble bound,
    OptionalDouble margin,
    String siUnit,
    String reason,
    String shownUnit,
    boolean valueIsLowerBound,
    Optional<YieldEstimate> yield) {

  /** Every requirement of {@code model}, none of them evaluated, for {@code reason}. */
  public static List<RequirementOutcome> noneEvaluated(ResolvedModel model, String reason) {
    List<RequirementOutcome> outcomes = new ArrayList<>();
    for (ResolvedRequirement r : model.requirements()) {
      outcomes.add(notEvaluated(r.file(), r.syntax().range(), r.syntax().text(), reason));
    }
    return outcomes;
  }

  public static RequirementOutcome notEvaluated(
      Path file, TextRange range, String text, String reason) {
    return new RequirementOutcome(
        file,
        range,
        text,
        RequirementStatus.NOT_EVALUATED,
        OptionalDouble.empty(),
        OptionalDouble.empty(),
        OptionalDouble.empty(),
        "",
        reason,
        "",
        false,
        Optional.empty());
  }
}
