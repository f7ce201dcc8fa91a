package jonquil.safety;

import java.util.Locale;

/**
 * The exposure duration a safety figure assumes, with the reason it was chosen, so every finding
 * can say "0.25 s: aversion response, visible" rather than a bare number.
 *
 * @param seconds the exposure duration, s
 * @param reason why this duration: stated by the user, or the guidance the default follows
 */
public record ExposureDuration(double seconds, String reason) {

  /** Longest duration the guidance uses: deliberate viewing over a working day, s. */
  public static final double DELIBERATE = 3e4;

  public ExposureDuration {
    if (!(seconds > 0) || !Double.isFinite(seconds)) {
      throw new IllegalArgumentException("exposure duration must be > 0 s and finite");
    }
  }

  /** A duration the spec states, with where it was stated. */
  public static ExposureDuration stated(double seconds, String where) {
    return new ExposureDuration(seconds, "stated " + where);
  }

  /**
   * The default when nothing is stated. The durations are the hazard-evaluation guidance both
   * standards give (IEC 60825-1:2014 time bases, clause 4.3 e, and ANSI Z136.1-2014, 8.2.x; the
   * clause numbers are from memory, the durations are common practice): 0.25 s, the aversion
   * response, for accidental intrabeam viewing in the visible; 10 s outside it, where no blink
   * protects and eye movements end an accidental exposure; 100 s for a diffuse reflection, which is
   * no bright point and does not trigger aversion (the time base for unintended long-term viewing);
   * 30 000 s in the ultraviolet, where the dose accumulates over a working day.
   */
  public static ExposureDuration byDefault(double wavelength, Viewing viewing) {
    double nm = CorrectionFactors.nm(wavelength);
    if (nm < 400) {
      return new ExposureDuration(
          DELIBERATE, "ultraviolet: the dose accumulates over a working day (default)");
    }
    return switch (viewing) {
      case DIRECT, SPECULAR ->
          nm <= 700
              ? new ExposureDuration(
                  0.25, "aversion response, visible, accidental intrabeam viewing (default)")
              : new ExposureDuration(
                  10, "no aversion response outside 400-700 nm; eye movements, 10 s (default)");
      case DIFFUSE ->
          new ExposureDuration(
              100, "diffuse viewing triggers no aversion response; unintended viewing (default)");
    };
  }

  /** Deliberate long-term viewing, the longest duration of the tables. */
  public static ExposureDuration deliberate() {
    return new ExposureDuration(DELIBERATE, "deliberate long-term viewing, a working day (stated)");
  }

  /** "0.25 s: aversion response, visible ...": the figure and its reason, for findings. */
  public String text() {
    return String.format(Locale.ROOT, "%s s: %s", number(seconds), reason);
  }

  private static String number(double s) {
    return s == Math.rint(s) && Math.abs(s) < 1e15
        ? Long.toString((long) s)
        : String.format(Locale.ROOT, "%.4g", s).replaceFirst("\\.?0+$", "");
  }
}
