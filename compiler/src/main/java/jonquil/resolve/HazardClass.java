package jonquil.resolve;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** Laser hazard classes in increasing order of hazard, as named by the laser-safety standards. */
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

  public String label() {
    return label;
  }

  public static Optional<HazardClass> byLabel(String label) {
    return Arrays.stream(values()).filter(c -> c.label.equalsIgnoreCase(label)).findFirst();
  }

  public static List<String> labels() {
    return Arrays.stream(values()).map(HazardClass::label).toList();
  }
}
