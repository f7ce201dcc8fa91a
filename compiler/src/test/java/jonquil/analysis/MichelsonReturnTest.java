package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.Result;
import org.junit.jupiter.api.Test;

/**
 * A Michelson sends half its light back towards its laser, and that half is a fringe too: the two
 * arms meet again at the splitter's front, the output complementary to the detector's. A {@code
 * back reflection} bound at the source is judged over the phase, at the bright fringe included.
 */
class MichelsonReturnTest {
  /**
   * 4 mW, a lossless 50/50 plate splitter, two lossless retro mirrors; the detector on the side.
   */
  static String spec(String coherence, String require) {
    return "source s { wavelength 1550 nm; power 4 mW; polarization linear 0 deg"
        + coherence
        + " }\n"
        + "splitter bs { ratio 50 %; aoi 45 deg }\n"
        + "mirror ref { reflectance 100 %; aoi 0 deg }\n"
        + "mirror meas { reflectance 100 %; aoi 0 deg }\n"
        + "detector pd\n"
        + "train michelson {\n"
        + "  s -> 100 mm -> bs -> 150 mm -> ref -> 150 mm -> bs.back\n"
        + "  bs.reflected -> 170 mm -> meas -> 170 mm -> bs.reflected\n"
        + "  bs.side -> 60 mm -> pd\n"
        + "}\n"
        + "require {\n"
        + require
        + "}\n";
  }

  @Test
  void theLightBackAtTheLaserIsJudgedAtItsBrightFringe() {
    Result r = Bench.check(spec("", "  back reflection at s <= 3 mW\n"));
    var back = r.requirements().get(0);
    // Each arm returns 4 mW x 0.5 x 0.5 = 1 mW towards the laser; parallel states of equal power
    // swing between 0 and (1 + 1 + 2 sqrt(1 x 1)) = 4 mW over the phase (two-beam interference,
    // Hecht, Optics, 5th ed., eq. 9.14): the bound fails at the bright fringe.
    assertEquals(RequirementStatus.FAIL, back.status(), back.reason());
    assertEquals(4e-3, back.value().getAsDouble(), 1e-12);
    assertTrue(back.reason().contains("over the unknown phase"), back.reason());
  }

  @Test
  void whatReturnsAndWhatReachesTheDetectorAreComplementary() {
    // Lossless: at every phase the detector's fringe and the returned one add up to the input
    // (energy conservation, definition), so the two ranges are the same 0 .. 4 mW.
    Result r = Bench.check(spec("", "  back reflection at s >= 0 W\n  power at pd <= 4 mW\n"));
    var back = r.requirements().get(0);
    var pd = r.requirements().get(1);
    assertTrue(back.reason().contains(".. 4 mW"), back.reason());
    assertTrue(pd.reason().contains(".. 4 mW"), pd.reason());
  }

  @Test
  void beyondTheCoherenceLengthTheReturnAddsAsPower() {
    // The arms differ by 2 x 20 mm = 40 mm of path; a 1 mm coherence length leaves no fringe:
    // 1 mW + 1 mW = 2 mW come back whatever the phase (incoherent sum, definition).
    Result r = Bench.check(spec("; coherence_length 1 mm", "  back reflection at s <= 3 mW\n"));
    var back = r.requirements().get(0);
    assertEquals(RequirementStatus.PASS, back.status(), back.reason());
    assertEquals(2e-3, back.value().getAsDouble(), 1e-12);
  }
}
