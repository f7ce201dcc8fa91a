package jonquil;

import java.util.Optional;
import jonquil.analysis.YieldDraws;
import jonquil.resolve.SafetyStandard;

/**
 * How much a check computes. The command line computes everything. An editor re-checks on every
 * pause in typing, so it first checks without the Monte Carlo yields (hundreds of re-solves) and
 * publishes, then checks in full and publishes again unless a newer edit stopped it: the editor
 * ends with the command line's verdicts. A workspace index needs only names, so it stops after
 * resolution and computes no physics at all. A standard given here ('check --standard') gates the
 * safety requirements in place of the one the spec chooses.
 */
public record CheckOptions(
    boolean yields, boolean analyses, YieldDraws draws, Optional<SafetyStandard> standard) {
  public static final CheckOptions FULL = new CheckOptions(true, true);
  public static final CheckOptions EDITOR = new CheckOptions(false, true);

  /** Parse and resolve only: declarations, scopes and name references, no analysis. */
  public static final CheckOptions NAMES = new CheckOptions(false, false);

  /** Yields, if computed, drawn with the default builds and the spec's own seed. */
  public CheckOptions(boolean yields, boolean analyses) {
    this(yields, analyses, YieldDraws.DEFAULT);
  }

  /** Yields drawn as {@code draws} says; the spec's own standard. */
  public CheckOptions(boolean yields, boolean analyses, YieldDraws draws) {
    this(yields, analyses, draws, Optional.empty());
  }

  /** The same, with yields drawn as {@code draws} says ('--builds', '--seed'). */
  public CheckOptions withDraws(YieldDraws draws) {
    return new CheckOptions(yields, analyses, draws, standard);
  }

  /** The same, with {@code chosen} gating the safety requirements whatever the spec says. */
  public CheckOptions withStandard(SafetyStandard chosen) {
    return new CheckOptions(yields, analyses, draws, Optional.of(chosen));
  }
}
