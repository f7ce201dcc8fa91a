package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.analysis.PortArrival;
import jonquil.analysis.TrainSolution;
import jonquil.optics.Jones;
import jonquil.optics.JonesVector;
import org.junit.jupiter.api.Test;

/** The hover on a splitter where two arms of one line meet shows visibility and power range. */
class InterferenceHoverTest {
  static final String SPEC =
      "source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg; coherence_length 1 m"
          + " }\nsplitter bs { ratio 50 % }\ndetector d1\ndetector d2\n"
          + "train t {\n  s -> 100 mm -> $0bs.through -> 100 mm -> d1\n"
          + "  bs.reflected -> 100 mm -> d2\n}\n";

  static String hover(double hwpAngle) {
    Specs.Checked c = Specs.check(SPEC);
    Result r = c.result();
    TrainSolution s = r.solutions().get(c.file());
    String line = PortArrival.lineKey("s", 0);
    JonesVector in = JonesVector.linear(0, 0.25e-3);
    List<PortArrival> arms =
        List.of(
            new PortArrival(line, 633e-9, in, 0.2),
            new PortArrival(
                line, 633e-9, in.transformedBy(Jones.retarder(Math.PI, hwpAngle)), 0.2));
    TrainSolution met = s.withArrivals(Map.of("bs.through", arms));
    Result withArms =
        new Result(
            r.files(),
            r.trees(),
            r.diagnostics(),
            r.requirements(),
            r.models(),
            Map.of(c.file(), met));
    return EditorFeatures.standard().hover(withArms, c.file(), c.offset()).orElseThrow().markdown();
  }

  @Test
  void theMeetingPortShowsVisibilityAndPowerOverPhase() {
    String md = hover(Math.toRadians(22.5));
    // A half-wave plate at 22.5° in one arm: V = |cos 45°| = 0.7071 (definition of the overlap of
    // linear states 45° apart).
    assertTrue(
        md.contains("Interference at `through`: line 633 nm, 2 beams meet; visibility 0.7071"), md);
    assertTrue(md.contains("over their relative phase"), md);
  }

  @Test
  void aRecombiningSplitterOfANetworkShowsTheArmsThePropagationBroughtThere() {
    Specs.Checked c =
        Specs.check(
            """
            source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg }
            splitter split { ratio 50 %; aoi 45 deg }
            splitter $0recombine { ratio 50 %; aoi 45 deg }
            waveplate hwp { retardance 0.5 wave at 633 nm; fast_axis 30 deg }
            detector d1
            detector d2
            train mz {
              s -> 100 mm -> split.through -> 300 mm -> recombine.through -> 100 mm -> d1
              split.reflected -> 150 mm -> hwp -> 150 mm -> recombine.side -> 100 mm -> d2
            }
            """);
    String md =
        EditorFeatures.standard().hover(c.result(), c.file(), c.offset()).orElseThrow().markdown();
    // A half-wave plate at 30°: one arm turned by 60°, V = |cos 60°| = 0.5 at zero path difference
    // (definition of the overlap of linear states; Hecht, Optics, 5th ed., §8.7.1, from memory).
    assertTrue(
        md.contains("Interference at `through`: line 633 nm, 2 beams meet; visibility 0.5;"), md);
    assertTrue(
        md.contains("Interference at `reflected`: line 633 nm, 2 beams meet; visibility 0.5;"), md);
  }

  @Test
  void aSourceShowsTheCoherenceLengthOfItsLines() {
    Specs.Checked c =
        Specs.check("source $0s { wavelength 633 nm; power 1 mW; linewidth 1 MHz }\n");
    String md =
        EditorFeatures.standard().hover(c.result(), c.file(), c.offset()).orElseThrow().markdown();
    // Lc = c/(πΔν) = 95.43 m at 1 MHz (Goodman, Statistical Optics, §5.2; from memory).
    assertTrue(md.contains("**Coherence length**: 95.43 m"), md);
  }

  @Test
  void noInterferenceLineWhereNothingMeets() {
    Specs.Checked c = Specs.check(SPEC);
    String md =
        EditorFeatures.standard().hover(c.result(), c.file(), c.offset()).orElseThrow().markdown();
    assertFalse(md.contains("Interference"), md);
  }
}
