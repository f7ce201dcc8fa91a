package jonquil.analysis;

/**
 * The 95 % Wilson score interval of a binomial proportion: the proportions p for which the score
 * test |p̂ − p| ≤ z·√(p(1 − p)/n) does not reject, solved as a quadratic in p (E. B. Wilson,
 * "Probable inference, the law of succession, and statistical inference", J. Am. Stat. Assoc. 22
 * (1927) 209–212, his interval for the true probability). Unlike p̂ ± z·√(p̂(1 − p̂)/n) it stays
 * inside [0, 1] and does not collapse to a point when every build passes, the usual case here.
 */
public record WilsonInterval(double low, double high) {
  /** The two-sided 95 % point of the standard normal distribution (definition: Φ⁻¹(0.975)). */
  static final double Z95 = 1.959963984540054;

  static WilsonInterval of95(int passes, int trials) {
    if (trials <= 0 || passes < 0 || passes > trials) {
      throw new IllegalArgumentException(passes + " of " + trials);
    }
    double n = trials;
    double p = passes / n;
    double z2 = Z95 * Z95;
    double centre = (p + z2 / (2 * n)) / (1 + z2 / n);
    double half = Z95 / (1 + z2 / n) * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n));
    // The ends are exact at p̂ = 0 and p̂ = 1; rounding must not push them past [0, 1].
    double low = passes == 0 ? 0 : Math.max(0, centre - half);
    double high = passes == trials ? 1 : Math.min(1, centre + half);
    return new WilsonInterval(low, high);
  }
}
