package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleBinaryOperator;
import org.junit.jupiter.api.Test;

/**
 * Properties of the IEC 60825-1:2014 (Ed. 3) limits over the whole spectrum, on seeded random
 * wavelengths, durations and source sizes:
 *
 * <ul>
 *   <li>MPE (eye and skin) and the Class 1 AEL are continuous in duration at every row breakpoint
 *       of every band: a jump larger than the tables' own rounding ({@link #ROUNDING}) fails;
 *   <li>they are continuous in wavelength at every band edge, except at the steps the tables
 *       themselves make ({@link #STEPS}), where the side the tables make stricter must be the
 *       stricter one;
 *   <li>where two limits apply (ultraviolet photochemical and thermal; retinal photochemical and
 *       thermal), the reported limit is the stricter and the governing effect named is its effect.
 * </ul>
 */
class LimitContinuityPropertyTest {
  static final long SEED = 60_825_2014L;
  static final int DRAWS = 400;

  /**
   * The tables quote one or two significant figures, so adjacent rows meet only within rounding;
   * the widest join is C2(302.5 nm) = 31.6 J/m² against the 30 J/m² of the row below it (Table A.1,
   * from memory), 5.4 %.
   */
  static final double ROUNDING = 1.06;

  /** A band of the tables and the durations (s) at which its rows change. */
  record Band(double loNm, double hiNm, double... breakpoints) {}

  /** The step at 10 ps that the retinal rows make (×2, from memory: 1e-3 to 2e-3 C4 J/m²). */
  static final double RETINAL_PS_STEP = 1e-11;

  static final List<Band> EYE_BANDS =
      List.of(
          new Band(180, 302.5, 1e-9, 10),
          new Band(302.5, 315, 1e-9, 10),
          new Band(315, 400, 1e-9, 10, 1e3),
          new Band(400, 1050, 5e-6, 10, 100),
          new Band(1050, 1250, 1.3e-5, 10),
          new Band(1400, 1500, 1e-9, 1e-3, 0.35, 10),
          new Band(1500, 1800, 1e-9, 0.35, 10),
          new Band(1800, 2600, 1e-9, 1e-3, 0.35, 10),
          new Band(2600, 1e5, 1e-9, 1e-7, 0.35, 10),
          new Band(1e5, 1e6, 1e-9, 1e-7, 10));

  /** Which side of a band edge the tables make stricter, over a range of durations. */
  enum Side {
    BELOW,
    ABOVE
  }

  /** A step the tables make at a band edge (from memory, each with its reason). */
  record Step(String tissue, double nm, double fromT, double toT, Side stricter, String why) {}

  static final List<Step> STEPS =
      List.of(
          new Step("eye", 315, 1e3, 3e4, Side.BELOW, "UV-B dose stays C2; UV-A allows 10 W/m2"),
          new Step("skin", 315, 1e3, 3e4, Side.BELOW, "the same rows on the skin"),
          new Step("eye", 400, 1e-13, 3e4, Side.ABOVE, "the retinal hazard region begins"),
          new Step("skin", 400, 1e-13, 3e4, Side.BELOW, "UV rows below the 400-1400 nm skin rows"),
          new Step("eye", 1050, 1e-13, 1.3e-5, Side.BELOW, "T_i 5 us -> 13 us, 2e-3 C4 -> 2e-2"),
          new Step("skin", 1400, 1e-7, 3e4, Side.ABOVE, "far-infrared rows below 2000 C4 W/m2"),
          new Step("eye", 1500, 1e-13, 10, Side.BELOW, "1500-1800 nm allows 1e4 J/m2"),
          new Step("skin", 1500, 1e-13, 10, Side.BELOW, "the same rows on the skin"),
          new Step("eye", 1800, 1e-13, 10, Side.ABOVE, "1800-2600 nm back to 1e3 J/m2"),
          new Step("skin", 1800, 1e-13, 10, Side.ABOVE, "the same rows on the skin"),
          new Step("eye", 2600, 1e-13, 1e-3, Side.ABOVE, "2600 nm-1 mm: 100 J/m2 to 100 ns"),
          new Step("skin", 2600, 1e-13, 1e-3, Side.ABOVE, "the same rows on the skin"));

  static final double[] EYE_EDGES = {
    302.5, 315, 400, 450, 600, 700, 1050, 1150, 1200, 1500, 1800, 2600, 1e5
  };
  static final double[] SKIN_EDGES = {302.5, 315, 400, 700, 1050, 1400, 1500, 1800, 2600, 1e5};

  static double eye(double nm, double t) {
    return Ed3.ocularLimit(nm * 1e-9, t, ExtendedSource.ALPHA_MIN).exposure();
  }

  static double skin(double nm, double t) {
    return Ed3.skinLimit(nm * 1e-9, t).exposure();
  }

  static double class1(double nm, double t) {
    return AccessibleEmissionLimits.class1(nm * 1e-9, t, ExtendedSource.ALPHA_MIN);
  }

  static double logUniform(SplittableRandom rnd, double lo, double hi) {
    return Math.exp(Math.log(lo) + rnd.nextDouble() * (Math.log(hi) - Math.log(lo)));
  }

  static void assertJoins(double below, double above, String where) {
    double ratio = above / below;
    assertTrue(
        ratio <= ROUNDING && ratio >= 1 / ROUNDING,
        where + ": " + below + " -> " + above + " (x" + ratio + ")");
  }

  @Test
  void everyRowJoinsItsNeighbourInDuration() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    for (int i = 0; i < DRAWS; i++) {
      for (Band b : EYE_BANDS) {
        double nm = b.loNm() + rnd.nextDouble() * (b.hiNm() - b.loNm());
        for (double t : b.breakpoints()) {
          double before = t * (1 - 1e-9);
          String at = nm + " nm at " + t + " s";
          assertJoins(eye(nm, before), eye(nm, t), "eye MPE, " + at);
          assertJoins(skin(nm, before), skin(nm, t), "skin MPE, " + at);
          assertJoins(class1(nm, before), class1(nm, t), "Class 1 AEL, " + at);
        }
      }
    }
  }

  @Test
  void retinalRowsStepOnlyWhereTheTablesDo() {
    // From memory: Table A.1 below 10 ps is half the 10 ps-5 us row (1e-3 against 2e-3 C4 J/m2).
    SplittableRandom rnd = new SplittableRandom(SEED + 1);
    for (int i = 0; i < DRAWS; i++) {
      double nm = 400 + rnd.nextDouble() * 850;
      double ratio = eye(nm, RETINAL_PS_STEP) / eye(nm, RETINAL_PS_STEP * (1 - 1e-9));
      assertEquals(2.0, ratio, 1e-9, nm + " nm at 10 ps");
    }
  }

  @Test
  void extendedSourceRowsJoinInDuration() {
    SplittableRandom rnd = new SplittableRandom(SEED + 2);
    for (int i = 0; i < DRAWS; i++) {
      double nm = 400 + rnd.nextDouble() * 850;
      double alpha = logUniform(rnd, ExtendedSource.ALPHA_MIN, 0.3);
      double t2 = ExtendedSource.t2(alpha);
      // C6 follows alpha_max(t) (625 us, 0.25 s); the rising row ends at T2 (Table 9, from memory).
      for (double t : new double[] {nm < 1050 ? 5e-6 : 1.3e-5, 625e-6, 0.25, t2}) {
        double before = Ed3.retinalThermal(nm * 1e-9, t * (1 - 1e-9), alpha);
        assertJoins(before, Ed3.retinalThermal(nm * 1e-9, t, alpha), nm + " nm, " + alpha + " rad");
      }
      // gamma_ph changes form at 100 s and 1e4 s (Directive 2006/25/EC Table 2.5).
      for (double t : new double[] {100, 1e4}) {
        double before = Ed3.retinalPhotochemical(Math.min(nm, 599) * 1e-9, t * (1 - 1e-9), alpha);
        double after = Ed3.retinalPhotochemical(Math.min(nm, 599) * 1e-9, t, alpha);
        assertJoins(before, after, "photochemical, " + alpha + " rad at " + t + " s");
      }
    }
  }

  @Test
  void bandEdgesJoinOrStepTheWayTheTablesDo() {
    SplittableRandom rnd = new SplittableRandom(SEED + 3);
    for (int i = 0; i < DRAWS; i++) {
      double t = logUniform(rnd, 1e-13, 3e4);
      for (double edge : EYE_EDGES) {
        check("eye", edge, t, LimitContinuityPropertyTest::eye);
      }
      for (double edge : SKIN_EDGES) {
        check("skin", edge, t, LimitContinuityPropertyTest::skin);
      }
    }
  }

  private static void check(String tissue, double edge, double t, DoubleBinaryOperator limit) {
    double below = limit.applyAsDouble(edge * (1 - 1e-9), t);
    double above = limit.applyAsDouble(edge, t);
    String where = tissue + " at " + edge + " nm, " + t + " s";
    for (Step s : STEPS) {
      if (s.tissue().equals(tissue) && s.nm() == edge && t >= s.fromT() && t < s.toT()) {
        // Near where the rows cross, the sides may differ by the rounding only.
        boolean ok =
            s.stricter() == Side.BELOW ? below <= above * ROUNDING : above <= below * ROUNDING;
        assertTrue(ok, where + ": " + s.why() + ", but " + below + " -> " + above);
        return;
      }
    }
    assertJoins(below, above, where);
  }

  @Test
  void theStricterOfTwoLimitsIsReportedAndNamed() {
    SplittableRandom rnd = new SplittableRandom(SEED + 4);
    for (int i = 0; i < DRAWS; i++) {
      double t = logUniform(rnd, 1e-9, 3e4);
      double uv = 180 + rnd.nextDouble() * 220;
      double thermal = Ed3Ultraviolet.thermal(t);
      double dose = Ed3Ultraviolet.photochemical(uv * 1e-9, t);
      checkStricter(uv, t, ExtendedSource.ALPHA_MIN, dose, thermal, Ed3Ultraviolet.PHOTOCHEMICAL);

      double blue = 400 + rnd.nextDouble() * 200;
      double alpha = rnd.nextBoolean() ? 0 : logUniform(rnd, 1e-3, 0.3);
      double retinalThermal = Ed3.retinalThermal(blue * 1e-9, t, alpha);
      double retinalPhoto = Ed3.retinalPhotochemical(blue * 1e-9, t, alpha);
      checkStricter(blue, t, alpha, retinalPhoto, retinalThermal, Ed3.RETINAL_PHOTOCHEMICAL);
    }
  }

  /** photochemical may be NaN (not applying), thermal may be NaN (UV beyond 10 s). */
  private static void checkStricter(
      double nm, double t, double alpha, double photo, double thermal, String photoName) {
    Outcome<MaximumPermissibleExposure> o =
        OcularMpe.at(Emission.continuous(nm * 1e-9, 1e-3), t, alpha);
    String where = nm + " nm, " + t + " s, " + alpha + " rad";
    assertTrue(o.evaluated(), where + ": " + o.reason());
    double expected =
        Double.isNaN(photo) ? thermal : Double.isNaN(thermal) ? photo : Math.min(photo, thermal);
    // Definition: the stricter of the two applicable limits governs (Table A.1 notes).
    assertEquals(expected, o.get().radiantExposure(), expected * 1e-12, where);
    boolean photoGoverns = !Double.isNaN(photo) && (Double.isNaN(thermal) || photo < thermal);
    assertEquals(
        photoGoverns, o.get().governingLimit().startsWith(photoName), o.get().governingLimit());
    boolean both = !Double.isNaN(photo) && !Double.isNaN(thermal);
    assertEquals(both, o.get().governingLimit().contains("stricter than"), where);
  }
}
