package jonquil.safety;

import java.util.function.DoubleBinaryOperator;
import jonquil.optics.beam.Clipping;

/**
 * Why it exists: an estimate of the laser product class under IEC 60825-1:2014 (Ed. 3) for a
 * Gaussian beam from 180 nm to 1 mm, point or extended source, from the AELs of Tables 3 (Class
 * 1/1M), 5 (Class 2/2M), 6 (Class 3R) and 8 (Class 3B) ({@link AccessibleEmissionLimits}).
 *
 * <p>Measurement (Table 10 of Ed. 3, from memory): condition 1 (optically aided, telescope) = 50 mm
 * aperture at 2000 mm, for 302.5–4000 nm only (glass optics pass nothing else; that Class 1M and 2M
 * exist only from 302.5 nm to 4000 nm is confirmed by published class summaries of Ed. 3, see
 * ClassSpectrumTest); condition 3 (naked eye) = 7 mm aperture at 100 mm, or the limiting aperture
 * where that is larger (11 mm above 100 µm), both from the exit, which is taken as the reference
 * point and the beam waist. The accessible emission is the power (energy) through the aperture: P ·
 * (1 − exp(−D²/(2w²))), w the 1/e² radius at that distance ({@link jonquil.optics.beam.Clipping}).
 *
 * <p>Decision: Class 1 (2) when both conditions are within the Class 1 (2) AEL; 1M (2M) when only
 * condition 3 is, and condition 1 stays within the Class 3B AEL; 3R, 3B, 4 decided on condition 3
 * (an assumption: see the report). Class 2/2M only for 400–700 nm. Time bases: 100 s (Class 1, 1M,
 * non-visible 3R above 400 nm), 3×10⁴ s at or below 400 nm, 0.25 s (Class 2, 2M, visible 3R).
 * Pulses: single-pulse, average-power and repetitive (T_i grouping and C5, {@link PulseRules})
 * rules of clause 4.3 f), for every class including the single-pulse Class 3B limit.
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

  static final String TABLES_EXTENDED =
      Ed3.EDITION
          + ", clause 4.3 and Tables 3 (Class 1/1M), 5 (Class 2/2M), 6 (Class 3R), 8 (Class 3B), 9"
          + " (correction factors, C6 for the given angular subtense), 10 (measurement conditions 1"
          + " and 3)";

  /** The class alone, point source. */
  public static Outcome<HazardClass> classify(
      Emission e, double beamDiameterAtAperture, double divergence) {
    return classify(e, beamDiameterAtAperture, divergence, ExtendedSource.ALPHA_MIN);
  }

  /** The class alone, for an apparent source of angular subtense alpha (rad). */
  public static Outcome<HazardClass> classify(
      Emission e, double beamDiameterAtAperture, double divergence, double alpha) {
    Outcome<Classification> c = assess(e, beamDiameterAtAperture, divergence, alpha);
    if (c.evaluated()) {
      return Outcome.of(c.get().hazardClass(), c.standard());
    }
    return c.atLeast().isPresent()
        ? Outcome.notEvaluatedAtLeast(c.atLeast().get().hazardClass(), c.reason(), c.standard())
        : Outcome.notEvaluated(c.reason(), c.standard());
  }

  /**
   * The class and its measurement geometry, point source.
   *
   * @param beamDiameterAtAperture 1/e² diameter at the exit, m
   * @param divergence full-angle 1/e² divergence, rad
   */
  public static Outcome<Classification> assess(
      Emission e, double beamDiameterAtAperture, double divergence) {
    return assess(e, beamDiameterAtAperture, divergence, ExtendedSource.ALPHA_MIN);
  }

  /**
   * The class and its measurement geometry for an apparent source of angular subtense alpha (rad);
   * at or below α_min = 1.5 mrad the point-source class.
   */
  public static Outcome<Classification> assess(
      Emission e, double beamDiameterAtAperture, double divergence, double alpha) {
    if (!(beamDiameterAtAperture > 0) || !(divergence >= 0) || !Double.isFinite(divergence)) {
      throw new IllegalArgumentException("beam diameter must be > 0 m and divergence >= 0 rad");
    }
    ExtendedSource.requireAlpha(alpha);
    String tables = alpha <= ExtendedSource.ALPHA_MIN ? TABLES : TABLES_EXTENDED;
    String refusal = OcularMpe.coverage(e.wavelength());
    if (refusal != null) {
      return Outcome.notEvaluated(refusal, tables);
    }
    if (e.pulsed() && e.pulseDuration() < TableScope.T_MIN_IEC) {
      return Outcome.notEvaluated("pulses shorter than 100 fs: below the tables", tables);
    }
    if (e.pulsed() && e.pulseDuration() * e.repetitionRate() >= 1) {
      return Outcome.notEvaluated(
          "pulse duration × repetition rate ≥ 1: describe the emission as continuous", tables);
    }
    double lambda = e.wavelength();
    double nm = CorrectionFactors.nm(lambda);
    boolean condition1Applies = nm >= 302.5 && nm < 4000;
    double aperture3 = Math.max(COND3_APERTURE, LimitingAperture.eye(lambda, 100));
    double f1 =
        condition1Applies
            ? Clipping.transmittedFraction(
                radiusAt(beamDiameterAtAperture, divergence, COND1_DISTANCE), COND1_APERTURE)
            : 0;
    double f3 =
        Clipping.transmittedFraction(
            radiusAt(beamDiameterAtAperture, divergence, COND3_DISTANCE), aperture3);
    boolean visible = Ed3.visible(lambda);
    Limits limits = new Limits(e, alpha, tables);

    DoubleBinaryOperator class1 = (l, t) -> AccessibleEmissionLimits.class1(l, t, alpha);
    DoubleBinaryOperator class2 = (l, t) -> AccessibleEmissionLimits.class2(l, t, alpha);
    DoubleBinaryOperator class3r = (l, t) -> AccessibleEmissionLimits.class3r(l, t, alpha);
    double base1 = AccessibleEmissionLimits.class1TimeBase(lambda);
    double base3r = visible ? Ed3.TIME_BASE_CLASS2 : base1;

    boolean c1cond3 = limits.within(f3, class1, base1);
    boolean c1cond1 = !condition1Applies || limits.within(f1, class1, base1);
    if (c1cond3 && c1cond1) {
      return result(
          HazardClass.CLASS_1,
          f1,
          f3,
          condition1Applies
              ? "within the Class 1 AEL under conditions 1 and 3"
              : "within the Class 1 AEL under condition 3 (condition 1 does not apply here)",
          tables);
    }
    // Order of the classes in the standard: 1, 1M, 2, 2M, 3R, 3B, 4; the first whose limits are
    // met.
    if (c1cond3) {
      return bounded(
          limits, f1, f3, HazardClass.CLASS_1M, "Class 1 AEL met under condition 3 only");
    }
    boolean c2cond3 = visible && limits.within(f3, class2, Ed3.TIME_BASE_CLASS2);
    boolean c2cond1 = visible && limits.within(f1, class2, Ed3.TIME_BASE_CLASS2);
    if (c2cond3 && c2cond1) {
      return result(
          HazardClass.CLASS_2, f1, f3, "within the Class 2 AEL under conditions 1 and 3", tables);
    }
    if (c2cond3) {
      return bounded(
          limits, f1, f3, HazardClass.CLASS_2M, "Class 2 AEL met under condition 3 only");
    }
    if (limits.within(f3, class3r, base3r)) {
      return result(
          HazardClass.CLASS_3R,
          f1,
          f3,
          "within the Class 3R AEL (5 × Class " + (visible ? "2" : "1") + ") under condition 3",
          tables);
    }
    if (Double.isNaN(limits.class3b(e.pulsed() ? e.pulseDuration() : base1))) {
      return Outcome.notEvaluatedAtLeast(
          new Classification(HazardClass.CLASS_3B, f1, f3, "above the Class 3R AEL"),
          "above Class 3R; Class 3B or 4 depends on the Class 3B AEL (Table 8), which is not"
              + " implemented at this wavelength",
          tables);
    }
    double averageThrough = e.averagePower() * f3;
    double cw3b = limits.class3b(base1) / base1;
    String cwText = cw3b == Ed3.CLASS_3B_CW ? "0.5 W" : cw3b + " W";
    if (!e.pulsed()) {
      return averageThrough <= cw3b
          ? result(
              HazardClass.CLASS_3B,
              f1,
              f3,
              "within the Class 3B AEL (" + cwText + ") under condition 3",
              tables)
          : result(
              HazardClass.CLASS_4,
              f1,
              f3,
              "above the Class 3B AEL (" + cwText + ") under condition 3",
              tables);
    }
    if (averageThrough > cw3b) {
      return result(
          HazardClass.CLASS_4,
          f1,
          f3,
          "average power through condition 3 above the Class 3B AEL (" + cwText + ")",
          tables);
    }
    return limits.within(f3, limits::class3b, base1)
        ? result(
            HazardClass.CLASS_3B,
            f1,
            f3,
            "pulses within the Class 3B AEL (Table 8, single pulse, average power and"
                + " repetitive-pulse rules) under condition 3",
            tables)
        : result(
            HazardClass.CLASS_4,
            f1,
            f3,
            "pulses above the Class 3B AEL (Table 8) under condition 3",
            tables);
  }

  /**
   * Whether the accessible emission through the aperture (fraction f) meets an AEL under all pulse
   * rules, point source.
   */
  static boolean within(Emission e, double f, DoubleBinaryOperator ael, double timeBase) {
    return new Limits(e, ExtendedSource.ALPHA_MIN, TABLES).within(f, ael, timeBase);
  }

  /** One emission judged against the AELs of one source size. */
  private record Limits(Emission e, double alpha, String tables) {
    double class3b(double lambda, double t) {
      return AccessibleEmissionLimits.class3b(lambda, t, alpha);
    }

    double class3b(double t) {
      return class3b(e.wavelength(), t);
    }

    /** Every pulse rule of clause 4.3 f) against the AEL; an AEL that is NaN is not met. */
    boolean within(double f, DoubleBinaryOperator ael, double timeBase) {
      double lambda = e.wavelength();
      if (!e.pulsed()) {
        return e.averagePower() * f * timeBase <= ael.applyAsDouble(lambda, timeBase);
      }
      double q = e.pulseEnergy() * f;
      double tau = e.pulseDuration();
      double single = ael.applyAsDouble(lambda, tau);
      if (!(q <= single)) {
        return false; // rule 1
      }
      if (e.singlePulseOnly()) {
        return true;
      }
      double rate = e.repetitionRate();
      if (q * rate * timeBase > ael.applyAsDouble(lambda, timeBase)) {
        return false; // rule 2
      }
      PulseTrain.Limit third =
          PulseRules.repetitive(lambda, alpha, tau)
              .apply(t -> ael.applyAsDouble(lambda, t), single, rate * timeBase, rate);
      return q <= third.perPulse(); // rule 3
    }
  }

  /** 1M / 2M: condition 1 must stay within the Class 3B AEL under every pulse rule. */
  private static Outcome<Classification> bounded(
      Limits limits, double f1, double f3, HazardClass c, String basis) {
    // Every lower class's limits were not met, so the class is at least c.
    Classification floor = new Classification(c, f1, f3, basis);
    Emission e = limits.e();
    if (e.pulsed() && Double.isNaN(limits.class3b(e.pulseDuration()))) {
      return Outcome.notEvaluatedAtLeast(
          floor,
          basis
              + "; the Class 3B limit under condition 1 that bounds "
              + c
              + " is not implemented for pulses at this wavelength",
          limits.tables());
    }
    boolean bound =
        e.pulsed()
            ? limits.within(
                f1, limits::class3b, AccessibleEmissionLimits.class1TimeBase(e.wavelength()))
            : e.averagePower() * f1 <= Ed3.CLASS_3B_CW;
    if (!bound) {
      return Outcome.notEvaluatedAtLeast(
          floor,
          basis + ", but condition 1 exceeds the Class 3B AEL (0.5 W): not evaluated",
          limits.tables());
    }
    return result(c, f1, f3, basis + "; condition 1 within the Class 3B AEL", limits.tables());
  }

  private static Outcome<Classification> result(
      HazardClass c, double f1, double f3, String basis, String tables) {
    return Outcome.of(new Classification(c, f1, f3, basis), tables);
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
