package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The one pulse-train arithmetic and the one row shape. Definitions (both standards' pulse rules,
 * IEC 60825-1:2014 clause 4.3 f and ANSI Z136.1-2014 §8.2.3): per pulse ≤ MPE(τ), ≤ MPE(T)/n, and
 * the standard's third rule; the most restrictive limits.
 */
class PulseTrainTest {
  static final PulseTrain.RuleNames NAMES = new PulseTrain.RuleNames("one", "average");

  /** A made-up MPE, J/m²: 10 J/m² up to 1 s, then 10 W/m² (definition of the row shape). */
  static final DoubleUnaryOperator MPE = t -> new LimitRows(1, 10, 1, 0, 0, 10).at(t);

  @Test
  void theMostRestrictiveRuleLimitsAndEveryRuleIsKept() {
    // 100 Hz for 10 s: n = 1000; single 10 J/m²; average MPE(10 s) / n = 100/1000 = 0.1 J/m².
    MaximumPermissibleExposure m =
        PulseTrain.limit(MPE, 1e-6, 100, 10, NAMES, null, 7e-3, "made up");
    assertEquals(10, m.singlePulse());
    // The three pulse rules of IEC 60825-1:2014, §A.3 (section number from memory), applied to
    // the made-up limit above: the radiant exposure is the smallest, and as an irradiance it is
    // the per-pulse limit × rate (definition).
    assertEquals(0.1, m.averagePower(), 1e-15);
    assertTrue(Double.isNaN(m.repetitivePulse()), "no third rule: NaN, not a number made up");
    assertEquals(0.1, m.radiantExposure(), 1e-15);
    assertEquals(10, m.irradiance(), 1e-12); // per-pulse limit × rate
    assertEquals("average", m.limitingCriterion());
  }

  @Test
  void aThirdRuleBelowTheOthersLimits() {
    PulseTrain.RepetitiveRule quarter =
        (mpe, single, pulses, rate) -> new PulseTrain.Limit(single * Math.pow(pulses, -0.25), "n");
    // n = 10 000 (1 kHz, 10 s): 10 × 10^-1 = 1 J/m² against average 100/10 000 = 0.01: average.
    assertEquals(
        "average",
        PulseTrain.limit(MPE, 1e-6, 1000, 10, NAMES, quarter, 7e-3, "").limitingCriterion());
    PulseTrain.RepetitiveRule tenth =
        (mpe, single, pulses, rate) -> new PulseTrain.Limit(1e-3, "r");
    MaximumPermissibleExposure m = PulseTrain.limit(MPE, 1e-6, 1000, 10, NAMES, tenth, 7e-3, "");
    assertEquals("r", m.limitingCriterion());
    assertEquals(1e-3, m.radiantExposure());
  }

  @Test
  void rowsAndDualLimits() {
    LimitRows rows = new LimitRows(1e-6, 2, 10, 3, 0.75, 4);
    assertEquals(2, rows.at(1e-7));
    assertEquals(3 * Math.pow(1, 0.75), rows.at(1));
    assertEquals(40, rows.at(10)); // the breakpoint belongs to the next row
    assertTrue(Double.isNaN(LimitRows.photochemical(650e-9, 50, 1, 1)), "above 600 nm");
    assertTrue(Double.isNaN(LimitRows.photochemical(450e-9, 5, 1, 1)), "below 10 s");
    assertEquals(7, LimitRows.photochemical(450e-9, 50, 7, 1));
    assertEquals(200, LimitRows.photochemical(450e-9, 200, 7, 1));
    assertEquals(3, LimitRows.lowerOf(3, Double.NaN));
    assertEquals(2, LimitRows.lowerOf(3, 2));
  }
}
