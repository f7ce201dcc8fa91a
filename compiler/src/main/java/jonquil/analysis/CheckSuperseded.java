package jonquil.analysis;

/**
 * Thrown out of a long analysis (a Monte Carlo yield) when the caller no longer wants its answer:
 * an editor's newer edit has made the check stale. Not a failure, so it is never an internal error.
 */
public final class CheckSuperseded extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public CheckSuperseded() {
    super("superseded by a newer check", null, false, false);
  }
}
