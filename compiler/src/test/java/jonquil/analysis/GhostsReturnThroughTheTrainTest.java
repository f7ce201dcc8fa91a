package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.SplittableRandom;
import jonquil.resolve.Symbol;
import org.junit.jupiter.api.Test;

/**
 * A backward ghost of a one-way train runs back through the real elements before it, by the same
 * reverse pass as a written return pass, to where it ends: the source's output (its back
 * reflection), a dump, or a port no path follows.
 */
class GhostsReturnThroughTheTrainTest {
  private static final String LASER =
      "ambient vacuum\n"
          + "source s { wavelength 1064 nm; power 1 W; polarization linear 0 deg }\n"
          + "material glass = index 1.5\n";

  /** Fresnel normal-incidence reflectance ((n-1)/(n+1))^2, Hecht, Optics, 5th ed., eq. 4.67. */
  private static final double R_FACE = Math.pow(0.5 / 2.5, 2);

  /**
   * An uncoated lossless plate's two faces summed incoherently, R = 2r/(1+r) (the geometric series
   * of the multiple reflections, common practice).
   */
  private static final double R_PLATE = 2 * R_FACE / (1 + R_FACE);

  private static double returned(TrainSolution s) {
    return s.returnedTo("s").map(c -> c.power()).orElse(0.0);
  }

  private static Optional<Symbol> place(String spec, String name) {
    return Bench.check(spec)
        .models()
        .values()
        .iterator()
        .next()
        .element(name)
        .map(jonquil.resolve.ResolvedElement::symbol);
  }

  @Test
  void aWindowsGhostReturnsToTheSourceTimesTheRoundTripTransmissionOfAFilterBeforeIt() {
    TrainSolution s =
        Bench.solve(
            LASER
                + """
                filter f { transmission 50 % }
                window w { material glass; aoi 0 deg; thickness 3 mm }
                dump d1
                train t { s -> 10 mm -> f -> 10 mm -> w -> 10 mm -> d1 }
                """);
    // The window takes 0.5 W and sends R_PLATE of it back; the filter passes half of that back
    // again (its transmission met twice, definition).
    assertEquals(0.5 * R_PLATE * 0.5, returned(s), 1e-12);
    assertEquals(0, s.conservationError(), 1e-9);
  }

  @Test
  void aLensGhostCrossesATiltedPolarizerBackAsItCame() {
    TrainSolution s =
        Bench.solve(
            LASER
                + """
                polarizer p { axis 45 deg }
                lens l { focal 100 mm; material glass }
                dump d1
                train t { s -> 10 mm -> p -> 10 mm -> l -> 10 mm -> d1 }
                """);
    // Malus's law passes cos²45° = ½ forward (Hecht, Optics, 5th ed., eq. 8.22, from memory); the
    // lens's reflection is still linear at 45°, so the ideal polarizer passes all of it back.
    assertEquals(0.5 * R_PLATE, returned(s), 1e-12);
    assertEquals(0, s.conservationError(), 1e-9);
  }

  @Test
  void anIsolatorBlocksTheGhostOfAWindowAfterItByItsPolarizersExtinction() {
    String isolator =
        LASER
            + """
            polarizer p_in { axis 0 deg; extinction 1000 }
            rotator faraday { rotation 45 deg; type faraday }
            polarizer p_out { axis 45 deg; extinction 1000 }
            window w { material glass; aoi 0 deg; thickness 3 mm }
            dump d1
            train t {
              s -> 10 mm -> p_in -> 10 mm -> faraday -> 10 mm -> p_out -> 10 mm -> w -> 10 mm -> d1
            }
            """;
    // Forward the light leaves p_out at 45° with all its power; the ghost passes p_out back at 45°,
    // the Faraday rotator turns it on by 45° to 90°, crossed with p_in, which passes 1/ER of it
    // (extinction ratio, definition).
    TrainSolution isolated = Bench.solve(isolator);
    assertEquals(R_PLATE / 1000, returned(isolated), 1e-9 * R_PLATE);
    // An optically active (reciprocal) rotator turns the ghost back to 0°: all of it returns.
    TrainSolution reciprocal = Bench.solve(isolator.replace("type faraday", "type reciprocal"));
    assertEquals(R_PLATE, returned(reciprocal), 1e-12);
    // back reflection at the source is what returned, no longer every backward beam as a bound.
    Optional<Symbol> laser = place(isolator, "s");
    assertEquals(returned(isolated), isolated.backReflected(laser), 1e-15);
    // At the window it is what the window sends back.
    assertEquals(R_PLATE, isolated.backReflected(place(isolator, "w")), 1e-12);
    assertEquals(0, isolated.conservationError(), 1e-9);
  }

  @Test
  void aLensGhostBackThroughASplitterEndsInTheDumpOnItsFourthFace() {
    TrainSolution s =
        Bench.solve(
            LASER
                + """
                splitter bs { ratio 30 %; aoi 45 deg }
                lens l { focal 100 mm; material glass }
                dump d1
                dump d2
                dump d3
                train t {
                  s -> 10 mm -> bs -> 10 mm -> l -> 10 mm -> d1
                  bs.reflected -> 10 mm -> d2
                  bs.side -> 10 mm -> d3
                }
                """);
    // The lens takes the 0.7 W the splitter passes and sends R_PLATE of it back (its two faces,
    // as a thin plate); from behind the splitter reflects 30 % of that to its fourth face, where
    // the dump stops it, and passes 70 % back to the source (definition of the split).
    double ghost = 0.7 * R_PLATE;
    assertEquals(0.3 * ghost, s.port("d3").orElseThrow().power(), 1e-12);
    assertEquals(0.7 * ghost, returned(s), 1e-12);
    assertEquals(0, s.conservationError(), 1e-9);
  }

  @Test
  void onSeededRandomTrainsOfGhostingPartsEveryWattIsBooked() {
    SplittableRandom rnd = new SplittableRandom(20261203L);
    String[] parts = {
      "window w%d { material glass; aoi 0 deg; thickness 2 mm }",
      "lens w%d { focal 50 mm; material glass }",
      "waveplate w%d { retardance 0.25 wave at 1064 nm; fast_axis 30 deg; coating ar 1 %% }",
      "filter w%d { transmission 60 %% }",
      "polarizer w%d { axis 30 deg; extinction 100 }",
      "rotator w%d { rotation 45 deg; type faraday }",
      "splitter w%d { ratio 40 %%; aoi 45 deg }"
    };
    for (int n = 0; n < 30; n++) {
      StringBuilder spec = new StringBuilder(LASER);
      StringBuilder train = new StringBuilder("train t {\n  s");
      int count = 1 + rnd.nextInt(6);
      for (int i = 0; i < count; i++) {
        spec.append(String.format(parts[rnd.nextInt(parts.length)], i)).append('\n');
        train.append(" -> 10 mm -> w").append(i);
      }
      spec.append("dump end\n").append(train).append(" -> 10 mm -> end\n}\n");
      TrainSolution s = Bench.solve(spec.toString());
      assertTrue(s.conservationError() <= 1e-9, s.conservationError() + " for\n" + spec);
      assertTrue(returned(s) <= s.sourcePower(), spec::toString);
    }
  }
}
