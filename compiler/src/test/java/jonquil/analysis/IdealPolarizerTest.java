package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** A polarizer with no extinction stated is ideal: the crossed state does not pass at all. */
class IdealPolarizerTest {
  private static final String UNPOLARIZED =
      "source s { wavelength 633 nm; power 8 mW; polarization unpolarized }\n";

  @Test
  void crossedIdealPolarizersPassNothing() {
    TrainSolution s =
        Bench.solve(
            UNPOLARIZED
                + """
                polarizer a { axis 0 deg }
                polarizer b { axis 90 deg }
                probe p
                train t { s -> 10 mm -> a -> 10 mm -> b -> 10 mm -> p }
                """);
    // Crossed ideal polarizers: cos² 90° = 0 (Malus's law, Hecht, Optics, 5th ed. 2017,
    // eq. 8.24, from memory), with nothing leaking. What remains is the rounding of 90° in
    // radians (cos(π/2) is 6·10⁻¹⁷ in doubles, squared twice over): far below 10⁻³⁰ of the
    // source, where a finite default extinction of 10¹² left 10⁻¹² of it.
    assertEquals(0.0, s.port("p").orElseThrow().power(), 8e-3 * 1e-30);
  }

  @Test
  void aFortyFiveDegreePolarizerBetweenCrossedOnesPassesAnEighth() {
    TrainSolution s =
        Bench.solve(
            UNPOLARIZED
                + """
                polarizer a { axis 0 deg }
                polarizer m { axis 45 deg }
                polarizer b { axis 90 deg }
                probe p
                train t { s -> 10 mm -> a -> 10 mm -> m -> 10 mm -> b -> 10 mm -> p }
                """);
    // Unpolarized in: ½ · cos² 45° · cos² 45° = 1/8 (Malus's law, Hecht, Optics, 5th ed. 2017,
    // eq. 8.24, from memory); 8 mW gives 1 mW. A finite default extinction leaks at first
    // order here (2·10⁻⁶ of the result for an extinction of 10¹²), so the tolerance is tight.
    assertEquals(1e-3, s.port("p").orElseThrow().power(), 1e-15);
  }
}
