package jonquil.safety;

import java.util.function.DoubleBinaryOperator;
import jonquil.optics.beam.Clipping;

/**
 * Why it exists: an estimate of the laser product class under IEC 60825-1:2014 (Ed. 3) for a
 * point-source Gaussian beam, from the AELs of Tables 3 (Class 1/1M), 5 (Class 2/2M), 6 (Class 3R)
 * and 8 (Class 3B).
 *
 * <p>Measurement (Table 10 of Ed. 3, from memory): condition 1 (optically aided, telescope) = 50 mm
 * aperture at 2000 mm; condition 3 (naked eye) = 7 mm aperture at 100 mm, both from the exit, which
 * is taken as the reference point and the beam waist. The accessible emission is the power (energy)
 * through the aperture: P · (1 − exp(−D²/(2w²))), w the 1/e² radius at that distance ({@link
 * jonquil.optics.beam.Clipping}).
 *
 * <p>Decision: Class 1 (2) when both conditions are within the Class 1 (2) AEL; 1M (2M) when only
 * condition 3 is, and condition 1 stays within the Class 3B AEL (cw only); 3R, 3B, 4 decided on
 * condition 3 (an assumption: see the report). Class 2/2M only for 400–700 nm. Time bases: 100 s
 * (Class 1, 1M, non-visible 3R), 0.25 s (Class 2, 2M, visible 3R). Pulses: single-pulse,
 * average-power and repetitive (T_i grouping, C5 = 1 for point sources) rules of clause 4.3 f). The
 * Class 3B AEL for single pulses is not implemented: a pulsed source above 3R is Class 4 if its
 * average power exceeds 0.5 W, otherwise not evaluated.
 */
public final class Classifier {
  private Classifier() {}

  static final double COND1_APERTURE = 50e-3;
  static final double COND1_DISTANCE = 2.0;
  static final double COND3_APERTURE = 7e-3;
  static final double COND3_DISTANCE = 0.1;

  static final String TABLES =
      Ed3.EDITION
          + ", clause 4.3 and Tables 3 (Class 1/1M), 5 (Class 2/2M), 6 (Class 3R), 8 (Class 3B), 9"
          + " (correction factors), 10 (measurement conditions 1 and 3); point source, C6 = 1";

  /** The class alone. */
  public static Outcome<HazardClass> classify(
      Emission e, double beamDiameterAtAperture, double divergence) {
    Outcome<Classification> c = assess(e, beamDiameterAtAperture, divergence);
    if (c.evaluated()) {
      return Outcome.of(c.get().hazardClass(), c.standard());
    }
    return c.atLeast().isPresent()
        ? Outcome.notEvaluatedAtLeast(c.atLeast().get().hazardClass(), c.reason(), c.standard())
        : Outcome.notEvaluated(c.reason(), c.standard());
  }

  /**
   * The class and its measurement geometry.
   *
   * @param beamDiameterAtAperture 1/e² diameter at the exit, m
   * @param divergence full-angle 1/e² divergence, rad
   */
  public static Outcome<Classification> assess(
      Emission e, double beamDiameterAtAperture, double divergence) {
    if (!(beamDiameterAtAperture > 0) || !(divergence >= 0) || !Double.isFinite(divergence)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m and divergence >= 0 rad");
    }
    String refusal = OcularMpe.coverage(e.wavelength());
    if (refusal != null) {
      return Outcome.notEvaluated(refusal, TABLES);
    }
    if (e.pulsed() && e.pulseDuration() < TableScope.T_MIN_EYE) {
      return Outcome.notEvaluated("pulses shorter than 10 ps: not implemented", TABLES);
    }
    if (e.pulsed() && e.pulseDuration() * e.repetitionRate() >= 1) {
      return Outcome.notEvaluated(
          "pulse duration × repetition rate ≥ 1: describe the emission as continuous", TABLES);
    }
    double lambda = e.wavelength();
    double f1 =
        Clipping.transmittedFraction(
            radiusAt(beamDiameterAtAperture, divergence, COND1_DISTANCE), COND1_APERTURE);
    double f3 =
        Clipping.transmittedFraction(
            radiusAt(beamDiameterAtAperture, divergence, COND3_DISTANCE), COND3_APERTURE);
    boolean visible = Ed3.visible(lambda);

    DoubleBinaryOperator class1 = Ed3::class1Ael;
    DoubleBinaryOperator class2 = Ed3::class2Ael;
    DoubleBinaryOperator class3r = Ed3::class3rAel;
    double base3r = visible ? Ed3.TIME_BASE_CLASS2 : Ed3.TIME_BASE_CLASS1;

    boolean c1cond3 = within(e, f3, class1, Ed3.TIME_BASE_CLASS1);
    boolean c1cond1 = within(e, f1, class1, Ed3.TIME_BASE_CLASS1);
    if (c1cond3 && c1cond1) {
      return result(HazardClass.CLASS_1, f1, f3, "within the Class 1 AEL under conditions 1 and 3");
    }
    // Order of the classes in the standard: 1, 1M, 2, 2M, 3R, 3B, 4; the first whose limits are
    // met.
    if (c1cond3) {
      return bounded(e, f1, f3, HazardClass.CLASS_1M, "Class 1 AEL met under condition 3 only");
    }
    boolean c2cond3 = visible && within(e, f3, class2, Ed3.TIME_BASE_CLASS2);
    boolean c2cond1 = visible && within(e, f1, class2, Ed3.TIME_BASE_CLASS2);
    if (c2cond3 && c2cond1) {
      return result(HazardClass.CLASS_2, f1, f3, "within the Class 2 AEL under conditions 1 and 3");
    }
    if (c2cond3) {
      return bounded(e, f1, f3, HazardClass.CLASS_2M, "Class 2 AEL met under condition 3 only");
    }
    if (within(e, f3, class3r, base3r)) {
      return result(
          HazardClass.CLASS_3R,
          f1,
          f3,
          "within the Class 3R AEL (5 × Class " + (visible ? "2" : "1") + ") under condition 3");
    }
    double averageThrough = e.averagePower() * f3;
    if (!e.pulsed()) {
      return averageThrough <= Ed3.CLASS_3B_CW
          ? result(
              HazardClass.CLASS_3B, f1, f3, "within the Class 3B AEL (0.5 W) under condition 3")
          : result(HazardClass.CLASS_4, f1, f3, "above the Class 3B AEL (0.5 W) under condition 3");
    }
    if (averageThrough > Ed3.CLASS_3B_CW) {
      return result(
          HazardClass.CLASS_4,
          f1,
          f3,
          "average power through condition 3 above the Class 3B AEL (0.5 W)");
    }
    return Outcome.notEvaluatedAtLeast(
        new Classification(HazardClass.CLASS_3B, f1, f3, "above the Class 3R AEL"),
        "above Class 3R; Class 3B or 4 depends on the single-pulse Class 3B AEL (Table 8),"
            + " which is not implemented",
        TABLES);
  }

  /**
   * Whether the accessible emission through the aperture (fraction f) meets an AEL under all pulse
   * rules.
   */
  static boolean within(Emission e, double f, DoubleBinaryOperator ael, double timeBase) {
    double lambda = e.wavelength();
    if (!e.pulsed()) {
      return e.averagePower() * f * timeBase <= ael.applyAsDouble(lambda, timeBase);
    }
    double q = e.pulseEnergy() * f;
    double tau = e.pulseDuration();
    if (q > ael.applyAsDouble(lambda, tau)) {
      return false; // rule 1
    }
    if (e.singlePulseOnly()) {
      return true;
    }
    double rate = e.repetitionRate();
    if (q * rate * timeBase > ael.applyAsDouble(lambda, timeBase)) {
      return false; // rule 2
    }
    double ti = CorrectionFactors.pulseGroupTime(lambda);
    if (1 / rate < ti) {
      return q * rate * ti <= ael.applyAsDouble(lambda, ti); // rule 3, pulses within T_i added
    }
    return true; // rule 3 with C5 = 1 equals rule 1
  }

  /** 1M / 2M: condition 1 must stay within the Class 3B AEL (cw only; pulses not implemented). */
  private static Outcome<Classification> bounded(
      Emission e, double f1, double f3, HazardClass c, String basis) {
    // Every lower class's limits were not met, so the class is at least c.
    Classification floor = new Classification(c, f1, f3, basis);
    if (e.pulsed()) {
      return Outcome.notEvaluatedAtLeast(
          floor,
          basis
              + "; the Class 3B limit under condition 1 that bounds "
              + c
              + " is not implemented for pulses",
          TABLES);
    }
    if (e.averagePower() * f1 > Ed3.CLASS_3B_CW) {
      return Outcome.notEvaluatedAtLeast(
          floor,
          basis + ", but condition 1 exceeds the Class 3B AEL (0.5 W): not evaluated",
          TABLES);
    }
    return result(c, f1, f3, basis + "; condition 1 within the Class 3B AEL");
  }

  private static Outcome<Classification> result(HazardClass c, double f1, double f3, String basis) {
    return Outcome.of(new Classification(c, f1, f3, basis), TABLES);
  }

  /**
   * The 1/e² radius at distance z from the exit of the beam the classification assumes: a round
   * Gaussian beam with its waist at the exit, diameter d(z) = √(d₀² + (φ z)²) for the full-angle
   * 1/e² divergence φ (far-field approximation).
   */
  private static double radiusAt(double exitDiameter, double divergence, double z) {
    return Math.hypot(exitDiameter, divergence * z) / 2;
  }
}
