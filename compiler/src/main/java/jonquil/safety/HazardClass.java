package jonquil.safety;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The laser product classes of IEC 60825-1:2014 (Ed. 3), clause 5 / Tables 3–8, in increasing order
 * of hazard: the one hazard class that {@link Classifier} computes and that a spec's 'hazard class'
 * requirement bounds, so the two can never drift apart.
 */
public enum HazardClass {
  CLASS_1("1"),
  CLASS_1M("1M"),
  CLASS_2("2"),
  CLASS_2M("2M"),
  CLASS_3R("3R"),
  CLASS_3B("3B"),
  CLASS_4("4");

  private final String label;

  HazardClass(String label) {
    this.label = label;
  }

  /** The class as the standards write it: "1", "1M", ..., "4". */
  public String label() {
    return label;
  }

  /** The class written {@code text} ("3r" reads as 3R), or empty when it names none. */
  public static Optional<HazardClass> parse(String text) {
    return Arrays.stream(values()).filter(c -> c.label.equalsIgnoreCase(text)).findFirst();
  }

  /** Every label, in increasing order of hazard. */
  public static List<String> labels() {
    return Arrays.stream(values()).map(HazardClass::label).toList();
  }

  /**
   * The class's place in the order of hazard, 0 for Class 1 to 6 for Class 4: the number a
   * requirement's bound, verdict and report carry, since requirements compare numbers. Only {@link
   * #ofRank} reads it back.
   */
  public int rank() {
    return ordinal();
  }

  /** The class of rank {@code rank}, or empty when the number is not a class's rank. */
  public static Optional<HazardClass> ofRank(double rank) {
    HazardClass[] all = values();
    return rank == Math.rint(rank) && rank >= 0 && rank < all.length
        ? Optional.of(all[(int) rank])
        : Optional.empty();
  }
}
