package jonquil.analysis;

import java.util.OptionalLong;

/**
 * How Monte Carlo yields are drawn: the number of builds when a requirement names none, and an
 * optional seed that is hashed in after the spec's own content (so changing it gives another draw,
 * and leaving it out still gives the same draw on every run).
 */
public record YieldDraws(int builds, OptionalLong seed) {
  /**
   * Builds when neither the requirement nor the command line says: enough that a spec whose every
   * build passes settles a 99 % bound (the 95 % Wilson interval of 400 of 400 starts at 99.05 %),
   * and few enough for a check to stay interactive.
   */
  public static final int DEFAULT_BUILDS = 400;

  /** The most builds a requirement or the command line may ask for (each is a full solve). */
  public static final int MAX_BUILDS = jonquil.resolve.YieldBuilds.MAX;

  public static final YieldDraws DEFAULT = new YieldDraws(DEFAULT_BUILDS, OptionalLong.empty());

  public YieldDraws {
    if (builds < 1 || builds > MAX_BUILDS) {
      throw new IllegalArgumentException("builds must be 1 to " + MAX_BUILDS + ": " + builds);
    }
  }
}
