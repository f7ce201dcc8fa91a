package jonquil.resolve;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Every kind of declaration the language knows, with the word that introduces it, its role, its
 * output ports and its parameter table (see {@link KindTables}). To add a kind, follow "How to add
 * an element kind" in DEVELOPERS.md: a constant here, its table, its KindChecks case, its optical
 * response in analysis.ElementOptics and its README row.
 */
public enum ElementKind {
  SOURCE("source", Category.SOURCE, List.of("out")),
  MATERIAL("material", Category.MATERIAL, List.of()),
  COATING("coating", Category.COATING, List.of()),
  INTERFACE("interface", Category.OPTIC, List.of("through", "reflected")),
  POLARIZER("polarizer", Category.OPTIC, List.of("out")),
  WAVEPLATE("waveplate", Category.OPTIC, List.of("out")),
  ROTATOR("rotator", Category.OPTIC, List.of("out")),
  SPLITTER("splitter", Category.OPTIC, List.of("through", "reflected")),
  DEPOLARIZER("depolarizer", Category.OPTIC, List.of("out")),
  MIRROR("mirror", Category.OPTIC, List.of("out")),
  WINDOW("window", Category.OPTIC, List.of("through", "reflected")),
  PLATE("plate", Category.OPTIC, List.of("through", "reflected")),
  LENS("lens", Category.OPTIC, List.of("out")),
  APERTURE("aperture", Category.OPTIC, List.of("out")),
  FILTER("filter", Category.OPTIC, List.of("out")),
  RHOMB("rhomb", Category.OPTIC, List.of("out")),
  ISOLATOR("isolator", Category.OPTIC, List.of("out")),
  PROBE("probe", Category.PROBE, List.of("out")),
  DETECTOR("detector", Category.TERMINAL, List.of()),
  DUMP("dump", Category.TERMINAL, List.of());

  private final String word;
  private final Category category;
  private final List<String> ports;

  ElementKind(String word, Category category, List<String> ports) {
    this.word = word;
    this.category = category;
    this.ports = ports;
  }

  public String word() {
    return word;
  }

  public Category category() {
    return category;
  }

  /** Output ports; the first is where the beam goes when a path names no port. */
  public List<String> ports() {
    return ports;
  }

  /**
   * Ports whose light is a designed output: if no branch follows one, the writer most likely forgot
   * it. (A window's 'reflected' port is a ghost, expected to go unfollowed.)
   */
  public List<String> primaryPorts() {
    return this == SPLITTER ? ports : List.of();
  }

  /**
   * The faces light may enter this element by once it is placed: {@code front} (the first pass's
   * entry), {@code back} (against the light that left by {@code out} or {@code through}), and for a
   * four-port (splitter, window, plate, interface) {@code reflected} (against the reflected light)
   * and {@code side} (the second input, whose reflection joins {@code through}). Empty for what
   * light cannot enter twice: sources, beam stops, materials, coatings.
   */
  public List<String> entryFaces() {
    return switch (shape()) {
      case FOUR_PORT -> List.of("front", "back", "reflected", "side");
      case ONE_PORT -> List.of("front", "back");
      case NONE -> List.of();
    };
  }

  /**
   * Every port light may leave by: the forward {@link #ports()}, then those of returning light,
   * {@code front} (heading back out of the entry face) and, on a four-port, {@code side}.
   */
  public List<String> exits() {
    return switch (shape()) {
      case FOUR_PORT -> List.of("through", "reflected", "front", "side");
      case ONE_PORT -> List.of("out", "front");
      case NONE -> ports;
    };
  }

  /**
   * The port by which light that entered by {@code entry} and took the element's forward route
   * {@code forwardPort} leaves: the same physics, met from another face (a four-port is taken as a
   * cube, so transmission crosses to the opposite face and reflection turns to the adjacent one).
   */
  public String exitFor(String entry, String forwardPort) {
    if (entry.equals("front")) {
      return forwardPort;
    }
    boolean transmitted = !forwardPort.equals("reflected");
    return switch (entry) {
      case "back" -> transmitted ? "front" : "side";
      case "reflected" -> transmitted ? "side" : "front";
      case "side" -> transmitted ? "reflected" : "through";
      default -> throw new IllegalArgumentException("no entry face '" + entry + "'");
    };
  }

  /** How light can cross the element, which fixes its faces. */
  private enum Shape {
    FOUR_PORT,
    ONE_PORT,
    NONE
  }

  private Shape shape() {
    return switch (category) {
      case SOURCE, TERMINAL, MATERIAL, COATING, TRAIN -> Shape.NONE;
      case OPTIC, PROBE -> ports.size() == 2 ? Shape.FOUR_PORT : Shape.ONE_PORT;
    };
  }

  /** Every parameter of this kind's table, those it refuses (with their reasons) included. */
  public List<ParamSpec> params() {
    return KindTables.params(this);
  }

  /** The parameters this kind takes: its table without those it refuses. */
  public List<ParamSpec> takenParams() {
    return params().stream().filter(ParamSpec::taken).toList();
  }

  public KindRules rules() {
    return KindTables.rules(this);
  }

  public Optional<ParamSpec> param(String name) {
    // A plain loop: this runs for every property of every declaration.
    for (ParamSpec p : params()) {
      if (p.name().equals(name)) {
        return Optional.of(p);
      }
    }
    return Optional.empty();
  }

  private static final java.util.Map<String, ElementKind> BY_WORD =
      Arrays.stream(values())
          .collect(java.util.stream.Collectors.toUnmodifiableMap(k -> k.word, k -> k));

  public static Optional<ElementKind> byWord(String word) {
    return Optional.ofNullable(word == null ? null : BY_WORD.get(word));
  }

  public static List<String> words() {
    return Arrays.stream(values()).map(ElementKind::word).toList();
  }
}
