package jonquil.safety;

/**
 * One limit of the tables at a wavelength and duration, with the biological effect it protects,
 * and, where a second limit of another effect also applies there, which one was the more lenient:
 * the tables say the stricter governs and the finding says which.
 *
 * @param exposure radiant exposure over the duration, J/m² (or energy, J, for an AEL)
 * @param effect the effect whose limit governs, e.g. "retinal photochemical"
 * @param lenient the effect of the other limit that also applied, empty when only one applies
 */
record GoverningLimit(double exposure, String effect, String lenient) {

  static GoverningLimit only(double exposure, String effect) {
    return new GoverningLimit(exposure, effect, "");
  }

  /** The stricter of two limits; b may be NaN where it does not apply. */
  static GoverningLimit stricter(double a, String effectA, double b, String effectB) {
    if (Double.isNaN(b)) {
      return only(a, effectA);
    }
    return b < a
        ? new GoverningLimit(b, effectB, effectA)
        : new GoverningLimit(a, effectA, effectB);
  }

  /** The same effects, the value scaled (by an aperture area, a class multiple). */
  GoverningLimit times(double k) {
    return new GoverningLimit(exposure * k, effect, lenient);
  }

  /** In words: "retinal photochemical (stricter than retinal thermal)". */
  String describe() {
    return lenient.isEmpty() ? effect : effect + " (stricter than " + lenient + ")";
  }
}
