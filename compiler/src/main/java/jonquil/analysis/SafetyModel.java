package jonquil.analysis;

import java.util.Optional;
import jonquil.optics.beam.Irradiance;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.SafetyStandard;
import jonquil.safety.Classifier;
import jonquil.safety.Emission;
import jonquil.safety.ExposureDuration;
import jonquil.safety.Eyewear;
import jonquil.safety.HazardClass;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Nohd;
import jonquil.safety.OcularLimit;
import jonquil.safety.OcularMpe;
import jonquil.safety.OpticalDensity;
import jonquil.safety.Outcome;
import jonquil.safety.Viewing;
import jonquil.safety.ansi.AnsiOcularMpe;
import jonquil.safety.directive.DirectiveEyeLimit;

/**
 * Eye-safety figures of the solved train: the hazard class, NOHD and eyewear OD of a source, and
 * the exposure at a probe against the ocular limit of the chosen standard (IEC 60825-1:2014 unless
 * the spec or the command line chooses another; the hazard class is IEC's alone, the other
 * standards defining no classes here). Every figure keeps its standard and the caution.
 */
final class SafetyModel {
  /**
   * Exposure duration when nothing states one, for accidental intrabeam viewing ({@link
   * ExposureDuration#byDefault}): 0.25 s (the aversion response) in the visible, 10 s outside it,
   * 30 000 s in the ultraviolet.
   */
  static ExposureDuration defaultExposure(double wavelength) {
    return ExposureDuration.byDefault(wavelength, Viewing.DIRECT);
  }

  /** The seconds of {@link #defaultExposure}. */
  static double defaultExposureTime(double wavelength) {
    return defaultExposure(wavelength).seconds();
  }

  private SafetyModel() {}

  /** The emission of a source, or at a place carrying {@code power} of it. */
  static Emission emission(double wavelength, double power, Optional<Pulses> pulses) {
    if (!(power > 0)) {
      // A place no light reaches (after a 0 % mirror, say): the emission of nothing, whatever its
      // source's pulses, so its exposure, OD and NOHD are zero (a pulse train of no energy is no
      // emission the safety core takes).
      return Emission.continuous(wavelength, 0);
    }
    if (pulses.isEmpty()) {
      return Emission.continuous(wavelength, power);
    }
    Pulses p = pulses.get();
    if (p.single()) {
      return Emission.singlePulse(wavelength, p.energy(power), p.duration());
    }
    return Emission.pulseTrain(wavelength, p.energy(power), p.duration(), p.repetitionRate());
  }

  static Outcome<HazardClass> hazardClass(ResolvedElement source, PortValue exit) {
    if (exit.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", "IEC 60825-1:2014");
    }
    var mode = exit.mode().get();
    return Classifier.classify(
        emission(exit.wavelength(), exit.power(), exit.pulses()),
        2 * mode.radius(),
        2 * mode.divergence());
  }

  /** The ocular limit of a standard. */
  static OcularLimit ocularLimit(SafetyStandard standard) {
    return switch (standard) {
      case IEC_60825_1 -> OcularLimit.IEC;
      case DIRECTIVE_2006_25 -> DirectiveEyeLimit::at;
      case ANSI_Z136_1 -> AnsiOcularMpe::at;
    };
  }

  /** The ocular limit of a standard for an emission over an exposure duration (s). */
  static Outcome<MaximumPermissibleExposure> ocularMpe(
      SafetyStandard standard, Emission e, double exposureTime) {
    return ocularLimit(standard).at(e, exposureTime);
  }

  /** The limiting aperture of a standard's ocular limit here, m; 7 mm where it has none. */
  static double limitingAperture(
      SafetyStandard standard, double wavelength, PortValue at, double exposureTime) {
    var mpe = ocularMpe(standard, emission(wavelength, at.power(), at.pulses()), exposureTime);
    return mpe.evaluated() ? mpe.get().apertureDiameter() : OcularMpe.LIMITING_APERTURE;
  }

  static Outcome<Double> nohd(SafetyStandard standard, ResolvedElement source, PortValue exit) {
    if (exit.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", standard.title());
    }
    var mode = exit.mode().get();
    double wl = exit.wavelength();
    return Nohd.of(
        ocularLimit(standard),
        emission(wl, exit.power(), exit.pulses()),
        2 * mode.radius(),
        2 * mode.divergence(),
        defaultExposureTime(wl));
  }

  /**
   * Exposure at a place as a fraction of the ocular MPE, averaged over the 7 mm limiting aperture.
   */
  static Outcome<Double> mpeFraction(double wavelength, PortValue at, double exposureTime) {
    return mpeFraction(wavelength, at, exposureTime, Double.POSITIVE_INFINITY);
  }

  /**
   * As above, averaged over a probe's own aperture where it is smaller than the limiting aperture
   * (a smaller aperture sees a higher mean irradiance). A larger one would dilute the exposure
   * below what the standard measures, so the limiting aperture bounds it: fail closed.
   */
  static Outcome<Double> mpeFraction(
      double wavelength, PortValue at, double exposureTime, double probeAperture) {
    return mpeFraction(SafetyStandard.IEC_60825_1, wavelength, at, exposureTime, probeAperture);
  }

  /** As above, against the ocular limit of {@code standard}, over its own limiting aperture. */
  static Outcome<Double> mpeFraction(
      SafetyStandard standard,
      double wavelength,
      PortValue at,
      double exposureTime,
      double probeAperture) {
    if (at.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", standard.title());
    }
    Emission e = emission(wavelength, at.power(), at.pulses());
    var mpe = ocularMpe(standard, e, exposureTime);
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), mpe.standard());
    }
    double radius = at.mode().get().radius();
    double aperture = Math.min(mpe.get().apertureDiameter(), probeAperture);
    double fraction =
        e.pulsed()
            ? Irradiance.meanOverAperture(e.pulseEnergy(), radius, aperture)
                / mpe.get().radiantExposure()
            : Irradiance.meanOverAperture(e.averagePower(), radius, aperture)
                / mpe.get().irradiance();
    return Outcome.of(fraction, mpe.standard());
  }

  static Outcome<OpticalDensity> eyewear(
      SafetyStandard standard, double wavelength, PortValue at, double exposureTime) {
    if (at.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", standard.title());
    }
    return Eyewear.required(
        ocularLimit(standard),
        emission(wavelength, at.power(), at.pulses()),
        2 * at.mode().get().radius(),
        exposureTime,
        1);
  }
}
