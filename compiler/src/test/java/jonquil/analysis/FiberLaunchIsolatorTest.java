package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * The fiber-launch sample's isolator acts on the light its fiber face returns: what reaches the
 * laser is set by the isolator's parts, and grows when its Faraday rotator is off by a degree.
 */
class FiberLaunchIsolatorTest {
  static TrainSolution launch(String rotation) throws IOException {
    String spec = Files.readString(Repo.samples().resolve("fiber_launch.jonq"));
    spec = spec.replace("use \"parts/bench_parts.jonq\"", "");
    return Bench.solve(spec.replace("rotation 45 deg", "rotation " + rotation));
  }

  @Test
  void theBackReflectionAtTheLaserGrowsWhenTheRotatorIsOffByOneDegree() throws IOException {
    double aligned = launch("45 deg").returnedTo("seed").orElseThrow().power();
    double off = launch("46 deg").returnedTo("seed").orElseThrow().power();
    assertTrue(off > aligned, aligned + " then " + off);
    // Back through the exit polarizer the light is at 45°; the rotator turns it by 46° more, to
    // 91°, one degree off crossed with the entry polarizer (axis 0°, extinction ratio ER = 1000),
    // which passes cos²θ + sin²θ/ER of it (Malus's law for a partial polarizer, Hecht, Optics,
    // 5th ed., §8.2, from memory). Aligned, θ = 90° passes 1/ER. So off / aligned is
    // ER·sin²(1°) + cos²(1°), to within the forward leak of the exit polarizer (below 1e-3).
    double one = Math.toRadians(1);
    double expected = 1000 * Math.pow(Math.sin(one), 2) + Math.pow(Math.cos(one), 2);
    assertEquals(expected, off / aligned, 1e-3);
  }
}
