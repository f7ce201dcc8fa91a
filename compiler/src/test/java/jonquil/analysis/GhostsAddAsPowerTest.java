package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import jonquil.Result;
import org.junit.jupiter.api.Test;

/**
 * Ghosts add as power wherever they end, whatever else the spec holds: a return pass written
 * elsewhere (which makes the spec a network, where written beams that meet interfere) must not
 * change how a chain's ghosts add at its laser.
 */
class GhostsAddAsPowerTest {
  /** Three uncoated windows between a laser and a probe; ghosts run back to the laser. */
  static final String CHAIN =
      "material crown = index 1.5\n"
          + "source s { wavelength 1064 nm; power 1 W; polarization linear 0 deg }\n"
          + "window w1 { material crown; thickness 3 mm }\n"
          + "window w2 { material crown; thickness 3 mm }\n"
          + "window w3 { material crown; thickness 3 mm }\n"
          + "probe p\n";

  static final String CHAIN_TRAIN =
      "  s -> 10 mm -> w1 -> 10 mm -> w2 -> 10 mm -> w3 -> 10 mm -> p\n";

  /** A second laser with a written double pass through a splitter: the spec becomes a network. */
  static final String ELSEWHERE =
      "source s2 { wavelength 633 nm; power 1 mW; polarization linear 0 deg }\n"
          + "splitter bs { ratio 50 %; aoi 45 deg }\n"
          + "mirror m { reflectance 100 %; aoi 0 deg }\n"
          + "dump d2\ndump d3\n";

  static final String ELSEWHERE_TRAIN =
      "  s2 -> 10 mm -> bs -> 10 mm -> m -> 10 mm -> bs.back\n"
          + "  bs.reflected -> 10 mm -> d2\n"
          + "  bs.side -> 10 mm -> d3\n";

  static final String REQUIRE = "require {\n  back reflection at s <= 1 W\n}\n";

  @Test
  void aReturnPassWrittenElsewhereLeavesTheGhostsOfAChainAddingAsPower() {
    Result alone = Bench.check(CHAIN + "train t {\n" + CHAIN_TRAIN + "}\n" + REQUIRE);
    Result network =
        Bench.check(
            CHAIN + ELSEWHERE + "train t {\n" + CHAIN_TRAIN + ELSEWHERE_TRAIN + "}\n" + REQUIRE);
    var a = alone.requirements().get(0);
    var b = network.requirements().get(0);
    // The same ghosts reach the same laser through the same windows: the same sum (definition).
    assertEquals(a.value().getAsDouble(), b.value().getAsDouble(), 1e-15);
    assertFalse(b.reason().contains("over the unknown phase"), b.reason());
    // Six uncoated faces, each ((n-1)/(n+1))^2 = 4 % at normal incidence (Hecht, Optics, 5th ed.,
    // eq. 4.67): the first face alone sends 40 mW back; the sum of all six is below 6 x 40 mW.
    double r = Math.pow(0.5 / 2.5, 2);
    assertEquals(true, a.value().getAsDouble() > r * 1.0, a.reason());
    assertEquals(true, a.value().getAsDouble() < 6 * r * 1.0, a.reason());
  }
}
