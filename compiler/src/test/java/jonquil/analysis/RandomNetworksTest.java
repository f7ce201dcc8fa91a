package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Properties of seeded random networks: light through a chain of parts, back from a partial
 * retro-mirror through every part again, and a loop; the budget closes, no passive part adds power,
 * and a reciprocal chain passes as much light backward as forward.
 */
class RandomNetworksTest {
  static final int NETWORKS = 40;

  /** A random passive part, declared under {@code name}; reciprocal unless {@code faraday}. */
  static String part(SplittableRandom rnd, String name, boolean allowFaraday) {
    int angle = rnd.nextInt(180);
    return switch (rnd.nextInt(allowFaraday ? 6 : 5)) {
      case 0 ->
          "polarizer "
              + name
              + " { axis "
              + angle
              + " deg; extinction "
              + (10 + rnd.nextInt(1000))
              + " }";
      case 1 ->
          "waveplate "
              + name
              + " { retardance "
              + rnd.nextInt(360)
              + " deg; fast_axis "
              + angle
              + " deg }";
      case 2 ->
          "rotator "
              + name
              + " { rotation "
              + angle
              + " deg; transmission "
              + (50 + rnd.nextInt(51))
              + " % }";
      case 3 -> "splitter " + name + " { ratio " + rnd.nextInt(101) + " %; aoi 0 deg }";
      case 4 -> "filter " + name + " { transmission " + rnd.nextInt(101) + " % }";
      default -> "rotator " + name + " { rotation " + angle + " deg; type faraday }";
    };
  }

  static String polarization(SplittableRandom rnd) {
    return rnd.nextBoolean() ? "unpolarized" : "linear " + rnd.nextInt(180) + " deg";
  }

  @Test
  void everyRandomNetworkClosesItsBudgetAndNoPassivePartAddsPower() {
    SplittableRandom rnd = new SplittableRandom(20261203L);
    for (int n = 0; n < NETWORKS; n++) {
      int count = 1 + rnd.nextInt(5);
      StringBuilder spec = new StringBuilder();
      spec.append("source s { wavelength 1064 nm; power 1 W; polarization ")
          .append(polarization(rnd))
          .append(" }\n");
      List<String> names = new ArrayList<>();
      for (int i = 0; i < count; i++) {
        names.add("e" + i);
        spec.append(part(rnd, "e" + i, true)).append('\n');
      }
      spec.append("mirror retro { reflectance ")
          .append(rnd.nextInt(101))
          .append(" %; aoi 0 deg }\n");
      spec.append("splitter m1 { ratio ").append(rnd.nextInt(100)).append(" %; aoi 0 deg }\n");
      spec.append("splitter m2 { ratio ").append(rnd.nextInt(100)).append(" %; aoi 0 deg }\n");
      spec.append("probe back_out\nprobe out\ndump d1\n");
      spec.append("train t {\n  s -> 10 mm -> m1 -> 10 mm -> m2");
      for (String e : names) {
        spec.append(" -> 10 mm -> ").append(e);
      }
      spec.append(" -> 10 mm -> retro");
      for (int i = names.size() - 1; i >= 0; i--) {
        spec.append(" -> 10 mm -> ").append(names.get(i)).append(".back");
      }
      spec.append(" -> 10 mm -> back_out\n");
      // A loop between the two partial reflectors ahead of the chain.
      spec.append("  m2.reflected -> 10 mm -> m1.back\n  m1.side -> 10 mm -> m2.front\n");
      spec.append("  m1.reflected -> 10 mm -> d1\n}\n");
      TrainSolution s = Bench.solve(spec.toString());
      assertTrue(s.conservationError() <= 1e-9, s.conservationError() + " for\n" + spec);
      for (ElementBudget b : s.budgets()) {
        double out = b.out().values().stream().mapToDouble(Double::doubleValue).sum() + b.ghosts();
        assertTrue(out <= b.in() * (1 + 1e-12) + 1e-15, b + " adds power in\n" + spec);
      }
      for (ElementPass p : s.passes()) {
        assertTrue(p.powerOut() <= p.powerIn() * (1 + 1e-12) + 1e-15, p + " in\n" + spec);
      }
    }
  }

  @Test
  void aReciprocalChainPassesAsMuchUnpolarizedLightBackwardAsForward() {
    SplittableRandom rnd = new SplittableRandom(1203L);
    for (int n = 0; n < NETWORKS; n++) {
      int count = 1 + rnd.nextInt(6);
      StringBuilder spec = new StringBuilder();
      spec.append("source a { wavelength 1064 nm; power 1 W; polarization unpolarized }\n");
      spec.append("source b { wavelength 1064 nm; power 1 W; polarization unpolarized }\n");
      for (int i = 0; i < count; i++) {
        // Tilted, so that a splitter's reflection leaves the chain: at normal incidence it would
        // run back along b's return path to at_a with a's light, which is not what is compared.
        spec.append(part(rnd, "e" + i, false).replace("aoi 0 deg", "aoi 45 deg")).append('\n');
      }
      spec.append("probe at_b\nprobe at_a\ntrain t {\n  a");
      for (int i = 0; i < count; i++) {
        spec.append(" -> 10 mm -> e").append(i);
      }
      spec.append(" -> 10 mm -> at_b\n  b");
      for (int i = count - 1; i >= 0; i--) {
        spec.append(" -> 10 mm -> e").append(i).append(".back");
      }
      spec.append(" -> 10 mm -> at_a\n}\n");
      TrainSolution s = Bench.solve(spec.toString());
      // Reciprocity: the reverse matrix M·Jᵀ·M has the Frobenius norm of J, and unpolarized
      // light passes ½·Σ|Jij|² either way (Potton, Rep. Prog. Phys. 67 (2004) 717, §2, from
      // memory).
      assertEquals(
          s.port("at_b").orElseThrow().power(),
          s.port("at_a").orElseThrow().power(),
          1e-12,
          spec::toString);
    }
  }
}
