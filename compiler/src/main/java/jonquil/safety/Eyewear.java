package jonquil.safety;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalInt;
import jonquil.optics.beam.Irradiance;

/**
 * Why it exists: the optical density protective eyewear needs, OD = log10(H/MPE), where H is the
 * anticipated exposure (ANSI Z136.1-2014, eyewear OD formula; EN 207 uses the same ratio — clause
 * numbers from memory; formula and worked example confirmed by a university laser-safety "Sample
 * calculations" appendix, see EyewearTest). Never negative: 0 means the exposure is already at or
 * below the MPE.
 */
public final class Eyewear {
  private Eyewear() {}

  static final String FORMULA = "OD = log10(H/MPE), ANSI Z136.1-2014 (eyewear)";

  /** The bare formula; exposure and MPE in the same unit. */
  public static Outcome<Double> forLimit(double exposure, double mpe) {
    if (!(mpe > 0) || !(exposure >= 0)) {
      throw new IllegalArgumentException("need mpe > 0 and exposure >= 0");
    }
    return Outcome.of(od(exposure, mpe), FORMULA);
  }

  /**
   * OD for the direct beam at the point where its 1/e² diameter is beamDiameter: averaged over the
   * MPE's limiting aperture (7 mm in the retinal band, smaller beyond it) and at the Gaussian peak.
   * cw: irradiance against the irradiance MPE; pulsed: per-pulse radiant exposure against the
   * per-pulse MPE.
   */
  public static Outcome<OpticalDensity> required(
      Emission e, double beamDiameter, double exposureDuration) {
    return required(e, beamDiameter, exposureDuration, 1);
  }

  /**
   * As above against the MPE raised by the extended-source factor c6 ({@link ExtendedSource}), 1
   * for a point source.
   */
  public static Outcome<OpticalDensity> required(
      Emission e, double beamDiameter, double exposureDuration, double c6) {
    return required(OcularLimit.IEC, e, beamDiameter, exposureDuration, c6);
  }

  /** As above, against {@code limit}'s MPE and limiting aperture. */
  public static Outcome<OpticalDensity> required(
      OcularLimit limit, Emission e, double beamDiameter, double exposureDuration, double c6) {
    if (!(c6 >= 1)) {
      throw new IllegalArgumentException("C6 is at least 1");
    }
    if (!(beamDiameter > 0)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m");
    }
    Outcome<MaximumPermissibleExposure> mpe = limit.at(e, exposureDuration);
    String standard = FORMULA + "; MPE: " + mpe.standard();
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), standard);
    }
    double q = e.pulsed() ? e.pulseEnergy() : e.averagePower();
    double h = c6 * (e.pulsed() ? mpe.get().radiantExposure() : mpe.get().irradiance());
    double ap = Irradiance.meanOverAperture(q, beamDiameter / 2, mpe.get().apertureDiameter());
    double peak = Irradiance.peak(q, beamDiameter / 2);
    return Outcome.of(new OpticalDensity(od(ap, h), od(peak, h), ap, peak, h), standard);
  }

  private static double od(double exposure, double mpe) {
    return exposure <= mpe ? 0.0 : Math.log10(exposure / mpe);
  }

  /**
   * EN 207:2017, Annex B Table B.1: the power or energy density a filter of scale number LBn
   * withstands while holding the transmission to 10^-n, as base·10^n. Restated publicly (the "EN
   * 207" encyclopedia article and an open laser-safety handbook's "Choosing eyewear" page give the
   * same table); the pulse-count correction N^(1/4) over 5 s is from memory.
   */
  public static final String EN207 = "EN 207:2017, Annex B Table B.1";

  /**
   * EN 208:2009, Annex B Table B.1: alignment eyewear of scale number RBn brings a visible beam of
   * up to 10^(n-3) W (cw, pulses over 0.2 ms) or 2·10^(n-7) J per pulse (1 ns to 0.2 ms, times
   * N^(1/4), N the pulses in 10 s) through the 7 mm pupil down to the Class 2 limit. Restated
   * publicly by eyewear makers' EN 208 guides; the RB5 ceiling and the test are from memory.
   */
  public static final String EN208 = "EN 208:2009, Annex B Table B.1";

  private static final String EN207_CW_TEST = "5 s of continuous irradiation (EN 207:2017)";
  private static final String EN207_PULSE_TEST = "50 pulses (EN 207:2017)";
  private static final String EN208_TEST =
      "transmits at most the Class 2 limit (1 mW, 0.25 s aversion response) and withstands 10 s"
          + " or 100 pulses (EN 208:2009, from memory)";

  /** EN 207 working mode: D (cw or over 0.25 s), I (1 µs–0.25 s), R (1 ns–1 µs), M (≤ 1 ns). */
  public static String en207Mode(Emission e) {
    if (!e.pulsed() || e.pulseDuration() > 0.25) {
      return "D";
    }
    if (e.pulseDuration() > 1e-6) {
      return "I";
    }
    return e.pulseDuration() > 1e-9 ? "R" : "M";
  }

  /**
   * The EN 207 scale numbers for this emission where the 1/e² beam diameter is beamDiameter: the
   * density is the power (energy) over the 1/e² area, π w², which is never below the mean inside
   * it. A pulse train needs both its D level (average power) and its pulse level.
   */
  public static Outcome<List<ProtectionLevel>> en207(Emission e, double beamDiameter) {
    if (!(beamDiameter > 0)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m");
    }
    double nm = CorrectionFactors.nm(e.wavelength());
    if (nm < 180 || nm > 1e6) {
      return Outcome.notEvaluated(
          String.format(Locale.ROOT, "%.1f nm is outside EN 207's 180 nm to 1 mm", nm), EN207);
    }
    int band = nm <= 315 ? 0 : nm <= 1400 ? 1 : 2;
    double area = Math.PI * beamDiameter * beamDiameter / 4;
    List<ProtectionLevel> out = new ArrayList<>();
    String mode = en207Mode(e);
    if (!e.singlePulseOnly() || mode.equals("D")) {
      double power = e.singlePulseOnly() ? e.pulseEnergy() / e.pulseDuration() : e.averagePower();
      double[] base = {1e-3, 10, 1e3};
      Outcome<ProtectionLevel> d =
          en207Level(
              e,
              "D",
              power / area,
              base[band],
              e.pulsed() ? "average power over the 1/e2 beam area" : "power over the 1/e2 area",
              EN207_CW_TEST);
      if (!d.evaluated()) {
        return Outcome.notEvaluated(d.reason(), EN207);
      }
      out.add(d.get());
    }
    if (e.pulsed() && !mode.equals("D")) {
      double h = e.pulseEnergy() / area;
      double n = e.singlePulseOnly() ? 1 : Math.max(1, e.repetitionRate() * 5);
      double value;
      double base;
      String basis;
      if (band == 1) {
        value = h * Math.pow(n, 0.25);
        base = mode.equals("M") ? 1.5e-4 : 5e-3;
        basis =
            String.format(
                Locale.ROOT,
                "pulse energy over the 1/e2 area x N^(1/4), N = %s pulses in 5 s",
                trim(n));
      } else if (mode.equals("M")) {
        value = h / e.pulseDuration();
        base = band == 0 ? 3e10 : 1e11;
        basis = "peak power over the 1/e2 area";
      } else {
        value = h;
        base = band == 0 ? 3e1 : 1e2;
        basis = "pulse energy over the 1/e2 area";
      }
      Outcome<ProtectionLevel> p = en207Level(e, mode, value, base, basis, EN207_PULSE_TEST);
      if (!p.evaluated()) {
        return Outcome.notEvaluated(p.reason(), EN207);
      }
      out.add(p.get());
    }
    return Outcome.of(List.copyOf(out), EN207);
  }

  private static Outcome<ProtectionLevel> en207Level(
      Emission e, String mode, double value, double base, String basis, String test) {
    OptionalInt n = scale(value, base, 10);
    if (n.isEmpty()) {
      return Outcome.notEvaluated(
          "the " + mode + " density is beyond LB10, the top of EN 207's scale", EN207);
    }
    return Outcome.of(
        new ProtectionLevel(
            EN207 + (mode.equals("D") ? "" : ", N^(1/4) window from memory"),
            mode,
            n.getAsInt(),
            mode + " " + Math.round(CorrectionFactors.nm(e.wavelength())) + " LB" + n.getAsInt(),
            value,
            basis,
            test),
        EN207);
  }

  /**
   * The EN 208 alignment scale number for a visible beam (400–700 nm) of 1/e² diameter
   * beamDiameter: the power (energy) through the 7 mm pupil against Table B.1.
   */
  public static Outcome<ProtectionLevel> en208(Emission e, double beamDiameter) {
    if (!(beamDiameter > 0)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m");
    }
    double nm = CorrectionFactors.nm(e.wavelength());
    if (nm < 400 || nm > 700) {
      return Outcome.notEvaluated(
          String.format(Locale.ROOT, "EN 208 covers visible lasers, 400-700 nm, not %.1f nm", nm),
          EN208);
    }
    if (e.pulsed() && e.pulseDuration() < 1e-9) {
      return Outcome.notEvaluated("EN 208 has no scale for pulses shorter than 1 ns", EN208);
    }
    double pupil = OcularMpe.LIMITING_APERTURE;
    double fraction =
        Irradiance.meanOverAperture(1, beamDiameter / 2, pupil) * Math.PI * pupil * pupil / 4;
    boolean asPower = !e.pulsed() || e.pulseDuration() > 2e-4;
    double value;
    String basis;
    double base;
    if (asPower) {
      value = e.averagePower() * fraction;
      base = 1e-3;
      basis = "power through the 7 mm pupil";
    } else {
      double n = e.singlePulseOnly() ? 1 : Math.max(1, e.repetitionRate() * 10);
      value = e.pulseEnergy() * fraction * Math.pow(n, 0.25);
      base = 2e-7;
      basis =
          String.format(
              Locale.ROOT,
              "pulse energy through the 7 mm pupil x N^(1/4), N = %s pulses in 10 s",
              trim(n));
    }
    OptionalInt n = scale(value, base, 5);
    if (n.isEmpty()) {
      return Outcome.notEvaluated(
          "beyond RB5, the top of EN 208's scale: alignment eyewear does not suffice, choose"
              + " full protection under EN 207",
          EN208);
    }
    return Outcome.of(
        new ProtectionLevel(
            EN208,
            asPower ? "cw" : "pulsed",
            n.getAsInt(),
            Math.round(nm) + " RB" + n.getAsInt(),
            value,
            basis,
            EN208_TEST),
        EN208);
  }

  /** The smallest n in 1..max with value ≤ base·10^n (the tables round up), or empty. */
  static OptionalInt scale(double value, double base, int max) {
    for (int n = 1; n <= max; n++) {
      if (value <= base * Math.pow(10, n) * (1 + 1e-9)) {
        return OptionalInt.of(n);
      }
    }
    return OptionalInt.empty();
  }

  private static String trim(double n) {
    return n == Math.rint(n) ? Long.toString((long) n) : String.format(Locale.ROOT, "%.3g", n);
  }
}
