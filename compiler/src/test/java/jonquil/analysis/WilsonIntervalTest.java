package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The 95 % Wilson score interval (Wilson 1927, J. Am. Stat. Assoc. 22:209) against a published
 * table and against its own definition, the inversion of the score test.
 */
class WilsonIntervalTest {
  @Test
  void matchesThePublishedWorkedExamples() {
    // R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of
    // seven methods", Statistics in Medicine 17 (1998) 857-872, the table of its worked examples,
    // method "score, without continuity correction" (table number from memory), to 4 decimals.
    assertInterval(81, 263, 0.2553, 0.3662);
    assertInterval(15, 148, 0.0624, 0.1605);
    assertInterval(0, 20, 0.0000, 0.1611);
    assertInterval(1, 29, 0.0061, 0.1718);
  }

  @Test
  void allPassingBuildsStillLeaveALowerEnd() {
    // Definition: at p̂ = 1 the lower end is n / (n + z²); 400 / (400 + 1.95996²) = 0.990488.
    WilsonInterval i = WilsonInterval.of95(400, 400);
    assertEquals(0.990488, i.low(), 1e-6);
    assertEquals(1.0, i.high());
  }

  @Test
  void eachEndIsWhereTheScoreStatisticEqualsZ() {
    // Definition: the ends solve (p̂ − p)² = z² p (1 − p) / n, i.e. the score test is at its 5 %
    // two-sided level there. Checked over seeded random counts, independently of the closed form.
    SplittableRandom random = new SplittableRandom(20261202L);
    for (int k = 0; k < 500; k++) {
      int n = 1 + random.nextInt(5000);
      int x = random.nextInt(n + 1);
      double p = (double) x / n;
      WilsonInterval i = WilsonInterval.of95(x, n);
      assertTrue(i.low() <= p && p <= i.high(), x + "/" + n);
      for (double end : new double[] {i.low(), i.high()}) {
        if (end == 0 || end == 1) {
          continue; // an end on the boundary only where p̂ itself is 0 or 1
        }
        double score = Math.abs(p - end) / Math.sqrt(end * (1 - end) / n);
        assertEquals(WilsonInterval.Z95, score, 1e-7, x + "/" + n + " at " + end);
      }
    }
  }

  private static void assertInterval(int x, int n, double low, double high) {
    WilsonInterval i = WilsonInterval.of95(x, n);
    assertEquals(low, i.low(), 0.00005, x + "/" + n + " low");
    assertEquals(high, i.high(), 0.00005, x + "/" + n + " high");
  }
}
