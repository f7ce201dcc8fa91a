package jonquil.resolve;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import jonquil.units.Dimension;

/** The quantities a requirement can bound, with the words that name them and where they apply. */
public enum Measure {
  POWER(Bound.POWER_OR_RELATIVE, Where.AT, "power"),
  TRANSMISSION(Bound.RATIO_OR_DB, Where.BETWEEN, "transmission"),
  IRRADIANCE(
      Bound.IRRADIANCE,
      Where.AT_OR_EVERYWHERE,
      "irradiance",
      "irradiance average",
      "average irradiance"),
  /**
   * The peak in time and space: for a pulsed beam the Gaussian centre at the pulse's peak power,
   * for a continuous one the centre of the beam. The unqualified word 'peak' always means this.
   */
  PEAK_IRRADIANCE(Bound.IRRADIANCE, Where.AT_OR_EVERYWHERE, "irradiance peak", "peak irradiance"),
  /** The spatial peak of the average irradiance, 2P/(πw²) with the average power. */
  AVERAGE_PEAK_IRRADIANCE(
      Bound.IRRADIANCE,
      Where.AT_OR_EVERYWHERE,
      "irradiance average peak",
      "peak average irradiance"),
  FLUENCE(Bound.FLUENCE, Where.AT_OR_EVERYWHERE, "fluence"),
  PEAK_FIELD(Bound.FIELD, Where.AT_OR_EVERYWHERE, "peak field", "field"),
  PEAK_POWER(Bound.POWER, Where.AT, "peak power"),
  PULSE_ENERGY(Bound.ENERGY, Where.AT, "pulse energy"),
  BEAM_RADIUS(Bound.LENGTH, Where.AT, "beam radius"),
  DAMAGE_MARGIN(Bound.PLAIN, Where.AT_OR_EVERYWHERE, "margin damage", "damage margin"),
  HAZARD_CLASS(Bound.HAZARD_CLASS, Where.AT, "hazard class", "class"),
  EXPOSURE(Bound.RATIO, Where.AT, "exposure"),
  EYEWEAR_OD(Bound.DENSITY, Where.AT, "eyewear od", "eyewear"),
  NOHD(Bound.LENGTH, Where.AT, "nohd"),
  STRAY(Bound.POWER, Where.NONE, "stray"),
  BACK_REFLECTION(Bound.POWER_OR_RELATIVE, Where.OPTIONAL_AT, "back reflection", "back_reflection"),
  POLARIZATION(Bound.STATE, Where.AT, "polarization"),
  AZIMUTH(Bound.ANGLE, Where.AT, "azimuth"),
  ELLIPTICITY(Bound.ANGLE, Where.AT, "ellipticity"),
  HANDEDNESS(Bound.HANDEDNESS, Where.AT, "handedness"),
  EXTINCTION(Bound.RATIO_OR_DB, Where.AT, "'>= 1000' or '>= 30 dB'", List.of("extinction")),
  DOP(Bound.RATIO, Where.AT, "dop", "degree of polarization"),
  /**
   * The contrast (Pmax − Pmin)/(Pmax + Pmin) of the fringes where two beams of one laser line meet
   * again, over their unknown relative phase: power balance × polarization overlap × coherence
   * factor ({@link jonquil.optics.Interference}).
   */
  VISIBILITY(Bound.RATIO, Where.AT, "'>= 0.9' or '>= 90 %'", List.of("visibility"));

  /**
   * How the bound is written: the dimension of its number (none for plain numbers, ratios, classes
   * and states), an example of a whole bound for messages, an example value, and the unit words an
   * editor offers when the bound has no dimension.
   */
  public enum Bound {
    POWER(Dimension.POWER, "'< 5 mW'", "5 mW"),
    POWER_OR_RELATIVE(Dimension.POWER, "'>= 400 mW' or '>= -3 dB'", "400 mW"),
    RATIO(null, "'<= 50 %'", "50 %", "%", "ppm"),
    RATIO_OR_DB(null, "'>= 90 %' or '>= -0.5 dB'", "90 %", "dB", "%"),
    IRRADIANCE(Dimension.IRRADIANCE, "'<= 1 kW/cm2'", "1 kW/cm2"),
    FLUENCE(Dimension.FLUENCE, "'<= 2 J/cm2'", "2 J/cm2"),
    FIELD(Dimension.ELECTRIC_FIELD, "'<= 1 MV/m'", "1 MV/m"),
    ENERGY(Dimension.ENERGY, "'<= 1 mJ'", "1 mJ"),
    LENGTH(Dimension.LENGTH, "'<= 2 m'", "2 m"),
    ANGLE(Dimension.ANGLE, "'<= 2 deg'", "2 deg"),
    PLAIN(null, "'>= 2'", "2"),
    HAZARD_CLASS(null, "'<= 3R'", "3R"),
    DENSITY(null, "'<= OD 4'", "OD 4"),
    STATE(null, "'is linear 90 deg ± 2 deg'", "linear 90 deg"),
    HANDEDNESS(null, "'is right'", "right");

    private final Dimension dimension;
    private final String example;
    private final String value;
    private final List<String> units;

    Bound(Dimension dimension, String example, String value, String... units) {
      this.dimension = dimension;
      this.example = example;
      this.value = value;
      this.units = List.of(units);
    }

    /** The dimension of the bound's number; empty when it is not a physical quantity. */
    public Optional<Dimension> dimension() {
      return Optional.ofNullable(dimension);
    }

    /** A whole bound as written after the measure, quoted: "'<= 1 kW/cm2'". */
    public String example() {
      return example;
    }

    /** An example of the bound's value alone, for messages about the value: "1 kW/cm2". */
    public String value() {
      return value;
    }

    /** Unit words an editor offers for a bound without a dimension ('%', 'dB'). */
    public List<String> units() {
      return units;
    }
  }

  /** Which places the measure takes. */
  public enum Where {
    AT,
    AT_OR_EVERYWHERE,
    BETWEEN,
    NONE,
    OPTIONAL_AT
  }

  private final Bound bound;
  private final Where where;
  private final List<String> spellings;
  private final String example;

  Measure(Bound bound, Where where, String... spellings) {
    this(bound, where, bound.example(), List.of(spellings));
  }

  /** A measure whose bound reads differently from the rest of its bound form. */
  Measure(Bound bound, Where where, String example, List<String> spellings) {
    this.bound = bound;
    this.where = where;
    this.example = example;
    this.spellings = List.copyOf(spellings);
  }

  /** An example of a whole bound on this measure, for messages. */
  public String example() {
    return example;
  }

  public Bound bound() {
    return bound;
  }

  public Where where() {
    return where;
  }

  /** The canonical spelling. */
  public String word() {
    return spellings.get(0);
  }

  public static Optional<Measure> bySpelling(String text) {
    return Arrays.stream(values()).filter(m -> m.spellings.contains(text)).findFirst();
  }

  public static List<String> spellings() {
    return Arrays.stream(values()).flatMap(m -> m.spellings.stream()).toList();
  }

  /**
   * Whether how the light meets the eye ('for viewing', 'for duration', ...) changes this measure:
   * the eye-safety figures of a place. A hazard class has the standard's own conditions.
   */
  public boolean viewed() {
    return switch (this) {
      case EXPOSURE, EYEWEAR_OD, NOHD -> true;
      case POWER,
          TRANSMISSION,
          IRRADIANCE,
          PEAK_IRRADIANCE,
          AVERAGE_PEAK_IRRADIANCE,
          FLUENCE,
          PEAK_FIELD,
          PEAK_POWER,
          PULSE_ENERGY,
          BEAM_RADIUS,
          DAMAGE_MARGIN,
          HAZARD_CLASS,
          STRAY,
          BACK_REFLECTION,
          POLARIZATION,
          AZIMUTH,
          ELLIPTICITY,
          HANDEDNESS,
          EXTINCTION,
          DOP,
          VISIBILITY ->
          false;
    };
  }

  /** Measures that may follow a polarization requirement after a comma. */
  public boolean polarizationDetail() {
    return this == AZIMUTH
        || this == ELLIPTICITY
        || this == HANDEDNESS
        || this == EXTINCTION
        || this == DOP;
  }
}
