package jonquil.analysis;

/**
 * A yield found by Monte Carlo: how many toleranced builds were drawn and passed, the 95 % Wilson
 * score interval of the pass fraction, whether that interval lies wholly on one side of the bound
 * ({@code settled}), and the seed the builds were drawn from.
 */
public record YieldEstimate(
    int builds, int passes, WilsonInterval interval, boolean settled, long seed) {
  public double fraction() {
    return (double) passes / builds;
  }

  /** The seed as 16 hex digits, the form reports print. */
  public String seedHex() {
    return String.format(java.util.Locale.ROOT, "%016x", seed);
  }
}
