package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/**
 * A yield is a seeded Monte Carlo estimate: the spec's content seeds it (so a run is reproducible),
 * '--seed' gives another draw, the builds can be set on the line or for the run, and a verdict that
 * its 95 % interval does not settle fails and says so.
 */
class YieldIsReproducibleAndSettledTest {
  /** Polarizer axis 45° ± 10° on linear 0° light: half the builds give P >= 5 mW (Malus). */
  static String spec(String yieldLine) {
    return """
    source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
    polarizer p45 { axis 45 deg ± 10 deg }
    probe mid
    train t { s -> 10 mm -> p45 -> 10 mm -> mid }
    require {
    """
        + yieldLine
        + "\n}\n";
  }

  static RequirementOutcome run(String spec, YieldDraws draws) {
    Path root = Bench.ROOT;
    Path file = root.resolve("test.jonq");
    Result r =
        Checker.check(
            Workspace.withOverlay(root, Map.of(file, spec)),
            List.of(file),
            CheckOptions.FULL.withDraws(draws));
    return r.requirements().get(0);
  }

  @Test
  void theSameSpecDrawsTheSameBuildsAndASeedDrawsOthers() {
    String s = spec("yield >= 40 % for power at mid >= 5 mW");
    RequirementOutcome first = run(s, YieldDraws.DEFAULT);
    RequirementOutcome again = run(s, YieldDraws.DEFAULT);
    assertEquals(first, again);
    YieldEstimate a = first.yield().orElseThrow();
    YieldEstimate b = run(s, new YieldDraws(400, OptionalLong.of(1))).yield().orElseThrow();
    YieldEstimate c = run(s, new YieldDraws(400, OptionalLong.of(2))).yield().orElseThrow();
    assertNotEquals(a.seed(), b.seed());
    assertNotEquals(b.seed(), c.seed());
    // Three draws of the same half-passing spec: the counts differ, which one fixed seed never did.
    assertTrue(a.passes() != b.passes() || b.passes() != c.passes(), a + " " + b + " " + c);
    assertEquals(b, run(s, new YieldDraws(400, OptionalLong.of(1))).yield().orElseThrow());
  }

  @Test
  void aChangeOfValueDrawsNewBuildsButLayoutAndCommentsDoNot() {
    String s = spec("yield >= 40 % for power at mid >= 5 mW");
    long seed = run(s, YieldDraws.DEFAULT).yield().orElseThrow().seed();
    String relaid =
        "// a comment\n" + s.replace("{ axis 45 deg ± 10 deg }", "{\n  axis 45 deg ± 10 deg\n}");
    assertEquals(seed, run(relaid, YieldDraws.DEFAULT).yield().orElseThrow().seed());
    String changed = s.replace("± 10 deg", "± 11 deg");
    assertNotEquals(seed, run(changed, YieldDraws.DEFAULT).yield().orElseThrow().seed());
  }

  @Test
  void theBuildsCanBeSetForTheRun() {
    String s = spec("yield >= 40 % for power at mid >= 5 mW");
    assertEquals(400, run(s, YieldDraws.DEFAULT).yield().orElseThrow().builds());
    assertEquals(
        2000, run(s, new YieldDraws(2000, OptionalLong.empty())).yield().orElseThrow().builds());
  }

  @Test
  void theLinesOwnBuildsWinOverTheRuns() {
    String s = spec("yield >= 40 % over 1500 builds for power at mid >= 5 mW");
    assertEquals(1500, run(s, YieldDraws.DEFAULT).yield().orElseThrow().builds());
    assertEquals(
        1500, run(s, new YieldDraws(3000, OptionalLong.empty())).yield().orElseThrow().builds());
  }

  @Test
  void moreBuildsSettleWhatFewerCouldNot() {
    // The true yield is 50 % (Malus, see spec()); a bound of 46 % is inside the interval of 400
    // builds (about ±4.9 %, the Wilson half-width at p̂ = 0.5) but outside that of 10 000 (±1 %).
    String few = spec("yield >= 46 % over 400 builds for power at mid >= 5 mW");
    String many = spec("yield >= 46 % over 10000 builds for power at mid >= 5 mW");
    RequirementOutcome unsettled = run(few, new YieldDraws(400, OptionalLong.of(4)));
    RequirementOutcome settled = run(many, new YieldDraws(400, OptionalLong.of(3)));
    assertTrue(settled.yield().orElseThrow().settled(), settled.toString());
    assertEquals(RequirementStatus.PASS, settled.status());
    // With seed 4, 188 of the 400 builds pass: interval 42.16 % .. 51.9 %, across the bound.
    assertFalse(unsettled.yield().orElseThrow().settled(), unsettled.toString());
    assertEquals(RequirementStatus.FAIL, unsettled.status());
  }

  @Test
  void anIntervalThatStraddlesTheBoundFailsAndSaysSo() {
    // The true yield is 50 %: a bound of 50 % sits inside any honest interval around it.
    RequirementOutcome o = run(spec("yield >= 50 % for power at mid >= 5 mW"), YieldDraws.DEFAULT);
    YieldEstimate y = o.yield().orElseThrow();
    assertFalse(y.settled());
    assertTrue(y.interval().low() < 0.5 && y.interval().high() > 0.5, y.toString());
    assertEquals(RequirementStatus.FAIL, o.status());
    assertTrue(o.margin().getAsDouble() < 0);
    assertTrue(o.reason().contains("straddles the bound"), o.reason());
    assertTrue(o.reason().contains("raise the builds"), o.reason());
  }

  @Test
  void aSettledPassHasItsMarginFromTheIntervalsLowerEnd() {
    RequirementOutcome o = run(spec("yield >= 40 % for power at mid >= 5 mW"), YieldDraws.DEFAULT);
    YieldEstimate y = o.yield().orElseThrow();
    assertTrue(y.settled());
    assertEquals(RequirementStatus.PASS, o.status());
    assertEquals(y.interval().low() - 0.40, o.margin().getAsDouble(), 1e-15);
    assertEquals(y.fraction(), o.value().getAsDouble(), 1e-15);
  }

  @Test
  void anUpperBoundIsSettledByTheIntervalsUpperEnd() {
    RequirementOutcome o = run(spec("yield <= 60 % for power at mid >= 5 mW"), YieldDraws.DEFAULT);
    YieldEstimate y = o.yield().orElseThrow();
    assertEquals(RequirementStatus.PASS, o.status());
    assertEquals(0.60 - y.interval().high(), o.margin().getAsDouble(), 1e-15);
  }

  @Test
  void theFindingOfAnUnsettledYieldIsAnError() {
    Path file = Bench.ROOT.resolve("test.jonq");
    Result r =
        Checker.check(
            Workspace.withOverlay(
                Bench.ROOT, Map.of(file, spec("yield >= 50 % for power at mid >= 5 mW"))),
            List.of(file));
    assertTrue(
        r.diagnostics().stream()
            .anyMatch(
                d ->
                    d.code() == DiagnosticCode.REQUIREMENT_FAILED
                        && d.message().contains("not settled")),
        r.diagnostics().toString());
  }
}
