package jonquil.resolve;

import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The name of every parameter an element kind may take, declared once: {@link KindTables} builds
 * its tables from these constants and analyses read values through them, so a misspelled parameter
 * does not compile.
 */
public enum Param {
  PLANE("plane"),
  AOI("aoi"),
  DAMAGE("damage"),
  COATING("coating"),
  WAVELENGTH("wavelength"),
  LINE("line"),
  POWER("power"),
  PULSE_ENERGY("pulse_energy"),
  PULSE_DURATION("pulse_duration"),
  REPETITION_RATE("repetition_rate"),
  LINEWIDTH("linewidth"),
  COHERENCE_LENGTH("coherence_length"),
  POLARIZATION("polarization"),
  BEAM("beam"),
  CATALOG("catalog"),
  INDEX("index"),
  K("k"),
  SELLMEIER("sellmeier"),
  CAUCHY("cauchy"),
  TABLE("table"),
  ORDINARY("ordinary"),
  EXTRAORDINARY("extraordinary"),
  ABSORPTION("absorption"),
  TEMPERATURE("temperature"),
  VALID("valid"),
  LAYER("layer"),
  FROM("from"),
  TO("to"),
  AXIS("axis"),
  EXTINCTION("extinction"),
  TRANSMISSION("transmission"),
  RETARDANCE("retardance"),
  FAST_AXIS("fast_axis"),
  ORDER("order"),
  MATERIAL("material"),
  THICKNESS("thickness"),
  ROTATION("rotation"),
  TYPE("type"),
  POLARIZING("polarizing"),
  RATIO("ratio"),
  TRANSMIT_P("transmit_p"),
  TRANSMIT_S("transmit_s"),
  REFLECT_S("reflect_s"),
  REFLECT_P("reflect_p"),
  DEPOLARIZATION("depolarization"),
  METAL("metal"),
  REFLECTANCE("reflectance"),
  THEN("then"),
  WEDGE("wedge"),
  FOCAL("focal"),
  CLEAR_APERTURE("clear_aperture"),
  DIAMETER("diameter"),
  OD("od"),
  BAND("band"),
  BLOCKING("blocking"),
  REFLECTIONS("reflections"),
  APERTURE("aperture"),
  EXPOSURE_TIME("exposure_time"),
  RESPONSIVITY("responsivity"),
  RATING("rating"),
  INSERTION_LOSS("insertion_loss"),
  ISOLATION("isolation");

  private final String word;
  private volatile Set<String> slots;

  Param(String word) {
    this.word = word;
  }

  /** The spelling in a spec. */
  public String word() {
    return word;
  }

  /**
   * The slot names this parameter's shape gives its values, over every kind that takes it (read
   * from the tables on first use, since the tables are built from these constants).
   */
  public Set<String> slots() {
    Set<String> s = slots;
    if (s == null) {
      Set<String> out = new LinkedHashSet<>();
      for (ElementKind kind : ElementKind.values()) {
        kind.param(word)
            .ifPresent(
                p ->
                    Shape.leaves(p.shape()).stream()
                        .map(ValueChecker::slotOf)
                        .filter(java.util.Objects::nonNull)
                        .forEach(out::add));
      }
      s = java.util.Collections.unmodifiableSet(new java.util.TreeSet<>(out));
      slots = s;
    }
    return s;
  }

  /** Fails when code reads a slot that this parameter's shape never fills (a misspelled slot). */
  String checkSlot(String slot) {
    if (!slots().contains(slot)) {
      throw new IllegalArgumentException(
          "parameter '" + word + "' has no slot '" + slot + "'; its slots are " + slots());
    }
    return slot;
  }

  public static List<String> words() {
    return Arrays.stream(values()).map(Param::word).toList();
  }
}
