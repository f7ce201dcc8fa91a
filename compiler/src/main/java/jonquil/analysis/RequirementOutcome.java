package jonquil.analysis;

import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.source.TextRange;

/**
 * The verdict on one requirement line: computed value, bound and margin in SI units (the unit is
 * named by {@code siUnit}), plus a reason when it was not evaluated; a yield also carries the
 * builds it drew and the interval of its estimate.
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
    Optional<YieldEstimate> yield) {

  /** The verdict on a requirement without a yield. */
  public RequirementOutcome(
      Path file,
      TextRange range,
      String text,
      RequirementStatus status,
      OptionalDouble value,
      OptionalDouble bound,
      OptionalDouble margin,
      String siUnit,
      String reason) {
    this(file, range, text, status, value, bound, margin, siUnit, reason, Optional.empty());
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
        reason);
  }
}
