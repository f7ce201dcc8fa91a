package jonquil;

/**
 * How much a check computes. The command line computes everything; an editor re-checks on
 * every pause in typing, so it leaves out the Monte Carlo yields (hundreds of re-solves),
 * which the CI gate still evaluates.
 */
public record CheckOptions(boolean yields) {
  public static final CheckOptions FULL = new CheckOptions(true);
  public static final CheckOptions EDITOR = new CheckOptions(false);
}
