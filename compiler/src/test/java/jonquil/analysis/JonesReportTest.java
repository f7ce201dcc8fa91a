package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import jonquil.optics.Coherency;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

/**
 * The Jones matrix the hover shows for a port is the one the analysis applied: on seeded random
 * chains, J·ρ·J† of the light arriving at an element equals the light leaving its port. Checked up
 * to the first mirror, while the beam's frame is the table frame (after a reflection the solution
 * reports light in the table frame, the matrices in the beam's).
 */
class JonesReportTest {
  @RepeatedTest(60)
  void eachPortsMatrixTakesTheArrivingLightToTheLeavingLight(RepetitionInfo info) {
    SplittableRandom random = new SplittableRandom(104_729L * info.getCurrentRepetition());
    String spec = ConservationTest.randomSpec(random);
    TrainSolution s = Bench.solve(spec);
    int checked = 0;
    for (String line : spec.split("\n")) {
      String[] words = line.split(" ");
      if (words.length < 2 || !words[1].matches("e\\d+")) {
        continue;
      }
      if (words[0].equals("mirror")) {
        break;
      }
      String name = words[1];
      List<PortJones> matrices = s.jonesOf(name, List.of("out", "through"));
      if (words[0].equals("depolarizer")) {
        assertTrue(matrices.isEmpty(), "a depolarizer has no Jones matrix");
        continue;
      }
      assertEquals(1, matrices.size(), name + " in\n" + spec);
      Coherency in = s.incidentAt(name).orElseThrow().light();
      PortJones j = matrices.get(0);
      double[] expected = in.transform(j.matrix()).stokes();
      double[] actual = s.port(name + "." + j.port()).orElseThrow().light().stokes();
      double scale = Math.max(in.power(), 1e-300);
      for (int k = 0; k < 4; k++) {
        assertEquals(
            expected[k], actual[k], 1e-9 * scale, "S" + k + " after " + name + " in\n" + spec);
      }
      checked++;
    }
    assertTrue(
        checked > 0 || spec.contains("mirror e0") || spec.contains("depolarizer e0"),
        "nothing checked in\n" + spec);
  }
}
