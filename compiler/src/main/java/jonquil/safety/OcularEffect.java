package jonquil.safety;

/**
 * The biological effect on the eye that a wavelength's limit protects against, which decides
 * whether the exposures of several laser lines add. IEC 60825-1:2014, 4.3 (radiation of several
 * wavelengths) and its table of additivity of effects on the eye: lines in the same effect range
 * are judged together, the sum of each line's exposure over its own limit not exceeding 1; lines in
 * different ranges are judged apart. The retinal hazard region (400 nm to 1400 nm) is one range.
 * The standard splits the rest (ultraviolet, far infrared) into ranges acting on the cornea and
 * lens; this version takes them as one range, which adds more lines than the table and so is never
 * more lenient than it.
 */
public enum OcularEffect {
  /** 400 nm to 1400 nm: light that the eye focuses on the retina. */
  RETINA("the retina (400 nm to 1400 nm)"),
  /** Below 400 nm and above 1400 nm: absorbed by the cornea and lens. */
  ANTERIOR_EYE("the cornea and lens (below 400 nm, above 1400 nm)");

  private final String description;

  OcularEffect(String description) {
    this.description = description;
  }

  /** The effect range of one vacuum wavelength in metres. */
  public static OcularEffect of(double wavelength) {
    return wavelength >= 400e-9 && wavelength < 1400e-9 ? RETINA : ANTERIOR_EYE;
  }

  /** What the range acts on, for findings. */
  public String description() {
    return description;
  }

  /** Where the rule comes from, for findings. */
  public static final String RULE =
      "IEC 60825-1:2014, 4.3: lines acting on the same part of the eye add as the sum of their"
          + " ratios to the limit";
}
