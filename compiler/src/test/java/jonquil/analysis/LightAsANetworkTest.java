package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Light that meets an element more than once: return passes by reciprocity, a Faraday rotator's
 * non-reciprocity, an isolator built from parts, beams combined into one, and a closed loop; each
 * expected value names its source.
 */
class LightAsANetworkTest {
  static String source(double azimuthDeg) {
    return "source s { wavelength 1064 nm; power 1 W; polarization linear "
        + azimuthDeg
        + " deg }\n";
  }

  static final String RETRO = "mirror retro { reflectance 100 %; aoi 0 deg }\nprobe back_out\n";

  @Test
  void aDoublePassThroughAQuarterWavePlateAt45DegreesActsAsAHalfWavePlate() {
    TrainSolution s =
        Bench.solve(
            source(30)
                + RETRO
                + """
                waveplate qwp { retardance 90 deg; fast_axis 45 deg }
                train t {
                  s -> 100 mm -> qwp -> 30 mm -> retro -> 30 mm -> qwp.back -> 100 mm -> back_out
                }
                """);
    var light = s.port("back_out").orElseThrow().light();
    // A half-wave plate with its fast axis at 45° maps a linear azimuth θ to 90° − θ (Hecht,
    // Optics, 5th ed., §8.7.2, from memory): 30° → 60° in the lab. The returning beam's table
    // frame has x' = −x (it runs along −z, definition of the table frame), so 60° reads −60°.
    assertEquals(-60, Math.toDegrees(light.azimuth()), 1e-9);
    assertEquals(1, light.dop(), 1e-12); // a retarder keeps the light fully polarized (definition)
    assertEquals(1, light.power(), 1e-12); // lossless plate and ideal mirror (definition)
  }

  @Test
  void aFaradayRotatorTurnsTwiceItsAngleOnADoublePassAReciprocalRotatorUndoesItself() {
    String bench =
        source(0)
            + RETRO
            + """
            rotator rot { rotation 45 deg; type TYPE }
            train t { s -> 100 mm -> rot -> 30 mm -> retro -> 30 mm -> rot.back -> 100 mm -> back_out }
            """;
    var faraday =
        Bench.solve(bench.replace("TYPE", "faraday")).port("back_out").orElseThrow().light();
    var reciprocal =
        Bench.solve(bench.replace("TYPE", "reciprocal")).port("back_out").orElseThrow().light();
    // Faraday rotation keeps its sense against the magnetic field, not the beam, so the return
    // pass adds: 2 × 45° = 90° (Saleh & Teich, Fundamentals of Photonics, 2nd ed., §6.4B, from
    // memory). Optical activity retraces itself: 0° (same section).
    assertEquals(90, Math.abs(Math.toDegrees(faraday.azimuth())), 1e-9);
    assertEquals(0, Math.toDegrees(reciprocal.azimuth()), 1e-9);
  }

  static String isolator(double extinction, double rotationDeg) {
    return source(0)
        + RETRO
        + """
        polarizer entry { axis 0 deg; extinction %s }
        rotator faraday { rotation %s deg; type faraday }
        polarizer exit { axis 45 deg; extinction %s }
        train t {
          s -> 50 mm -> entry -> 10 mm -> faraday -> 10 mm -> exit -> 100 mm -> retro
            -> 100 mm -> exit.back -> 10 mm -> faraday.back -> 10 mm -> entry.back
            -> 50 mm -> back_out
        }
        """
            .formatted(extinction, rotationDeg, extinction);
  }

  @Test
  void anIsolatorOfPolarizerFaradayPolarizerIsLimitedByItsPolarizersExtinction() {
    double returned = Bench.solve(isolator(1e4, 45)).port("back_out").orElseThrow().power();
    // The returning light reaches the entry polarizer crossed (turned by 2 × 45°), so it passes
    // 1/ER of its power (definition of the extinction ratio); everything else passed fully.
    assertEquals(1e-4, returned, 1e-12);
  }

  @Test
  void anIsolatorWhoseRotatorIsOffByOneDegreeReturnsMore() {
    double ideal = Bench.solve(isolator(1e300, 45)).port("back_out").orElseThrow().power();
    double off = Bench.solve(isolator(1e300, 46)).port("back_out").orElseThrow().power();
    double one = Math.toRadians(1);
    // Malus's law (Hecht, Optics, 5th ed., §8.2, from memory) at the exit polarizer, met at 1°
    // going out (cos² 1°; the light returns along its axis), and at the entry polarizer, met at
    // 2 × 46° − 1° = 91° coming back (sin² 1°): cos²(1°)·sin²(1°).
    assertEquals(Math.pow(Math.cos(one), 2) * Math.pow(Math.sin(one), 2), off, 1e-15);
    assertEquals(0, ideal, 1e-12); // ideal polarizers: nothing returns (definition)
  }

  @Test
  void aLosslessLoopOfTwoPartialReflectorsSumsToTheIncoherentAirySum() {
    double r1 = 0.4;
    double r2 = 0.7;
    TrainSolution s =
        Bench.solve(
            source(0)
                + """
                splitter m1 { ratio 40 %; aoi 0 deg }
                splitter m2 { ratio 70 %; aoi 0 deg }
                probe out
                dump d1
                train t {
                  s -> 100 mm -> m1 -> 50 mm -> m2 -> 100 mm -> out
                  m2.reflected -> 50 mm -> m1.back
                  m1.side -> 50 mm -> m2.front
                  m1.reflected -> 100 mm -> d1
                }
                """);
    // Incoherent Fabry–Perot (a thick plate's multiple reflections summed in power):
    // T = T1·T2 / (1 − R1·R2) (Born & Wolf, Principles of Optics, 7th ed., §7.6.1, from memory,
    // in its incoherent form).
    double t = (1 - r1) * (1 - r2) / (1 - r1 * r2);
    assertEquals(t, s.port("out").orElseThrow().power(), 1e-11);
    assertEquals(0, s.conservationError(), 1e-9); // the budget closes (definition)
  }

  @Test
  void twoSourcesCombinedOnADichroicShareOneBeam() {
    TrainSolution s =
        Bench.solve(
            """
            source blue { wavelength 488 nm; power 10 mW; polarization linear 0 deg }
            source red { wavelength 640 nm; power 20 mW; polarization linear 0 deg }
            splitter dc { ratio 90 %; aoi 45 deg }
            probe fiber
            dump d1
            train t {
              blue -> 50 mm -> dc -> 100 mm -> fiber
              red -> 50 mm -> dc.side
              dc.reflected -> 20 mm -> d1
            }
            """);
    // Blue passes 10 % of 10 mW; red enters by the second input and its reflection, 90 % of
    // 20 mW, joins the through beam (definition of the splitter's ratio).
    assertEquals(0.001 + 0.018, s.port("fiber").orElseThrow().power(), 1e-15);
    assertEquals(0.009 + 0.002, s.port("dc.reflected").orElseThrow().power(), 1e-15);
    List<ElementPass> passes = s.passesOf("dc");
    assertEquals(2, passes.size());
    assertEquals("front", passes.get(0).face());
    assertEquals("side", passes.get(1).face());
  }

  @Test
  void lightHeadingBackRunsThroughTheIsolatorToTheSource() {
    TrainSolution s =
        Bench.solve(
            source(0)
                + """
                polarizer entry { axis 0 deg; extinction 10000 }
                rotator faraday { rotation 45 deg; type faraday }
                polarizer exit { axis 45 deg; extinction 10000 }
                mirror facet { reflectance 4 %; aoi 0 deg }
                train t {
                  s -> 50 mm -> entry -> 10 mm -> faraday -> 10 mm -> exit -> 100 mm -> facet
                    -> 100 mm -> exit.back
                }
                """);
    // The facet returns 4 % (definition of reflectance); the isolator passes 1/ER of it back, the
    // returning light meeting the entry polarizer crossed (definition of the extinction ratio).
    assertEquals(0.04 / 1e4, s.returnedTo("s").orElseThrow().power(), 1e-15);
    assertEquals(0.04 / 1e4, s.backReflected(), 1e-15); // nothing else heads back (definition)
    assertEquals(0, s.conservationError(), 1e-9); // the budget closes (definition)
  }

  static double returnedThrough(String isolator) {
    TrainSolution s =
        Bench.solve(
            source(0)
                + RETRO
                + isolator
                + """
                train t { s -> 50 mm -> iso -> 100 mm -> retro -> 100 mm -> iso.back -> 50 mm -> back_out }
                """);
    return s.port("back_out").orElseThrow().power();
  }

  @Test
  void anIsolatorElementPassesItsInsertionLossForwardAndItsIsolationBackward() {
    double independent = returnedThrough("isolator iso { isolation 30 dB; insertion_loss 1 dB }\n");
    double dependent = returnedThrough("isolator iso { isolation 30 dB; type dependent }\n");
    // Independent: forward 10^(−0.1), backward 10^(−3) (definitions of insertion loss and
    // isolation in dB).
    assertEquals(Math.pow(10, -0.1) * 1e-3, independent, 1e-15);
    // Dependent, lossless: the light at 0° passes the entry polarizer, turns to 45°, passes the
    // exit polarizer; back, it turns to 90° and meets the entry polarizer crossed: 1/ER of it
    // passes (definition of the extinction ratio).
    assertEquals(1e-3, dependent, 1e-15);
  }
}
