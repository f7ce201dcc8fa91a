package jonquil.resolve;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import jonquil.source.TextRange;
import jonquil.syntax.Requirement;

/**
 * A requirement with its measure, places and bounds checked and converted to SI, ready for an
 * analysis to evaluate. {@code valid} is false when the line had errors; {@code yieldBuilds} is the
 * number of builds the line names ('over 2000 builds'); {@code line} the vacuum wavelength of the
 * one laser line the requirement judges ('for line 532 nm'), empty for all lines together; {@code
 * viewing} how a safety requirement's light meets the eye ('for viewing diffuse').
 */
public record ResolvedRequirement(
    Path file,
    Requirement syntax,
    Optional<Measure> measure,
    Optional<Target> at,
    Optional<Target> from,
    Optional<Target> to,
    boolean everywhere,
    List<Criterion> criteria,
    Optional<Band> band,
    Optional<Criterion> yield,
    boolean valid,
    OptionalInt yieldBuilds,
    java.util.OptionalDouble line,
    ViewingTerms viewing) {

  public ResolvedRequirement {
    criteria = List.copyOf(criteria);
  }

  /** A named place: an element, optionally one of its output ports. */
  public record Target(Symbol symbol, Optional<String> port, TextRange range) {}

  /** One bound on one measure; for 'is' conditions {@code state} holds the checked state. */
  public record Criterion(
      Measure measure,
      Relation relation,
      double low,
      double high,
      boolean relativeToSource,
      Optional<Value.Group> state,
      TextRange range) {}

  /** How a computed value is compared with the bound. */
  public enum Relation {
    AT_MOST,
    BELOW,
    AT_LEAST,
    ABOVE,
    EQUAL,
    WITHIN,
    IS
  }

  /** 'over wavelength a .. b', in metres. */
  public record Band(double low, double high, TextRange range) {}
}
