package jonquil.resolve;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

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
  PEAK_IRRADIANCE(Bound.IRRADIANCE, Where.AT_OR_EVERYWHERE, "irradiance peak", "peak irradiance"),
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
  EXTINCTION(Bound.RATIO_OR_DB, Where.AT, "extinction"),
  DOP(Bound.RATIO, Where.AT, "dop", "degree of polarization");

  /** How the bound is written. */
  public enum Bound {
    POWER,
    POWER_OR_RELATIVE,
    RATIO,
    RATIO_OR_DB,
    IRRADIANCE,
    FLUENCE,
    FIELD,
    ENERGY,
    LENGTH,
    ANGLE,
    PLAIN,
    HAZARD_CLASS,
    DENSITY,
    STATE,
    HANDEDNESS
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

  Measure(Bound bound, Where where, String... spellings) {
    this.bound = bound;
    this.where = where;
    this.spellings = List.of(spellings);
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

  /** Measures that may follow a polarization requirement after a comma. */
  public boolean polarizationDetail() {
    return this == AZIMUTH
        || this == ELLIPTICITY
        || this == HANDEDNESS
        || this == EXTINCTION
        || this == DOP;
  }
}
