package jonquil.analysis;

import java.util.Optional;
import jonquil.optics.beam.Irradiance;
import jonquil.resolve.ResolvedElement;
import jonquil.safety.Classifier;
import jonquil.safety.Emission;
import jonquil.safety.Eyewear;
import jonquil.safety.HazardClass;
import jonquil.safety.Nohd;
import jonquil.safety.OcularMpe;
import jonquil.safety.OpticalDensity;
import jonquil.safety.Outcome;

/**
 * Eye-safety figures of the solved train: the hazard class, NOHD and eyewear OD of a source, and
 * the exposure at a probe against the ocular MPE (IEC 60825-1:2014 as implemented in
 * jonquil.safety). Every figure keeps its standard and the caution.
 */
final class SafetyModel {
  /**
   * Exposure duration when a probe states none: 0.25 s (the aversion response) in the visible, 10 s
   * in the near infrared. Common practice for accidental intrabeam viewing.
   */
  static double defaultExposureTime(double wavelength) {
    return wavelength >= 400e-9 && wavelength <= 700e-9 ? 0.25 : 10;
  }

  private SafetyModel() {}

  /** The emission of a source, or at a place carrying {@code power} of it. */
  static Emission emission(double wavelength, double power, Optional<Pulses> pulses) {
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

  static Outcome<Double> nohd(ResolvedElement source, PortValue exit) {
    if (exit.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", "IEC 60825-1:2014");
    }
    var mode = exit.mode().get();
    double wl = exit.wavelength();
    return Nohd.of(
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
    if (at.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", "IEC 60825-1:2014");
    }
    Emission e = emission(wavelength, at.power(), at.pulses());
    var mpe = OcularMpe.at(e, exposureTime);
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), mpe.standard());
    }
    double radius = at.mode().get().radius();
    double aperture = Math.min(OcularMpe.LIMITING_APERTURE, probeAperture);
    double fraction =
        e.pulsed()
            ? Irradiance.meanOverAperture(e.pulseEnergy(), radius, aperture)
                / mpe.get().radiantExposure()
            : Irradiance.meanOverAperture(e.averagePower(), radius, aperture)
                / mpe.get().irradiance();
    return Outcome.of(fraction, mpe.standard());
  }

  static Outcome<OpticalDensity> eyewear(double wavelength, PortValue at, double exposureTime) {
    if (at.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", "IEC 60825-1:2014");
    }
    return Eyewear.required(
        emission(wavelength, at.power(), at.pulses()), 2 * at.mode().get().radius(), exposureTime);
  }
}
