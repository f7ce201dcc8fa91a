package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Severity;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

/**
 * No accepted spec creates light: a parameter set whose fractions add to more than 100 % is refused
 * on the line that states it (J618), and every spec that is accepted closes its power budget to
 * 1e-9 of the source, or the budget error is itself an error finding (J617), never only a number.
 */
class EnergyIsNeverCreatedTest {
  private static final Path ROOT = Path.of("/virtual/energy").toAbsolutePath();

  private static Result check(String spec) {
    Path file = ROOT.resolve("test.jonq");
    return Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
  }

  private static String bench(String splitter) {
    return "source laser { wavelength 1064 nm; power 1 W; polarization linear 30 deg }\n"
        + splitter
        + "\n"
        + "dump d1\ndump d2\n"
        + "train t {\n  laser -> 10 mm -> bs.through -> 10 mm -> d1\n"
        + "  bs.reflected -> 10 mm -> d2\n}\n";
  }

  @Test
  void aSplitterGivingOneAndAHalfWattsFromOneIsRefusedOnItsLine() {
    Result r = check(bench("splitter bs { ratio 50 %; transmit_p 100 %; transmit_s 100 % }"));
    List<Diagnostic> refused =
        r.diagnostics().stream()
            .filter(d -> d.code() == DiagnosticCode.ENERGY_NOT_CONSERVED_BY_PARAMETERS)
            .toList();
    assertEquals(1, refused.size(), r.diagnostics().toString());
    assertEquals(Severity.ERROR, refused.get(0).severity());
    assertTrue(refused.get(0).message().contains("up to 150 %"), refused.get(0).message());
    assertTrue(r.solutions().isEmpty(), "a refused spec is not analysed");
  }

  @Test
  void aToleranceThatCanTipTheSumIsRefusedToo() {
    Result r = check(bench("splitter bs { ratio 50 % ± 1 %; transmit_p 50 % }"));
    assertTrue(
        r.diagnostics().stream()
            .anyMatch(d -> d.code() == DiagnosticCode.ENERGY_NOT_CONSERVED_BY_PARAMETERS),
        r.diagnostics().toString());
  }

  @Test
  void aDefaultYieldsToAStatedFractionRatherThanCreatingLight() {
    // Definition: with 'reflect_s 100 %' stated, the default s transmittance (transmit_p / 1000)
    // would add 0.095 %; the default gives way instead, and the budget closes.
    Result r = check(bench("splitter bs { polarizing; reflect_s 100 %; reflect_p 10 % }"));
    assertFalse(r.fails(false), r.diagnostics().toString());
    TrainSolution s = r.solutions().values().iterator().next();
    assertTrue(s.conservationError() <= 1e-9, "error " + s.conservationError());
  }

  @RepeatedTest(80)
  void everyAcceptedRandomSplitterClosesItsBudgetAndEveryRefusalIsOnItsLine(RepetitionInfo info) {
    SplittableRandom random = new SplittableRandom(104_729L * info.getCurrentRepetition());
    String splitter = randomSplitter(random);
    String spec = bench(splitter);
    Result r = check(spec);
    List<Diagnostic> errors =
        r.diagnostics().stream().filter(d -> d.severity() == Severity.ERROR).toList();
    if (!errors.isEmpty()) {
      for (Diagnostic d : errors) {
        assertEquals(
            DiagnosticCode.ENERGY_NOT_CONSERVED_BY_PARAMETERS, d.code(), d + " for\n" + spec);
        assertEquals(1, lineOf(spec, d.range().start()), d + " for\n" + spec);
      }
      return;
    }
    TrainSolution s = r.solutions().values().iterator().next();
    assertTrue(s.conservationError() <= 1e-9, "error " + s.conservationError() + " for\n" + spec);
    ConservationTest.assertPassive(s);
  }

  /** Any subset of the fractions a splitter states, at random values (many sums above 100 %). */
  private static String randomSplitter(SplittableRandom r) {
    List<String> parts = new ArrayList<>();
    boolean polarizing = r.nextBoolean();
    if (polarizing) {
      parts.add("polarizing");
      if (r.nextBoolean()) {
        parts.add(String.format(Locale.ROOT, "extinction %.0f", 1 + r.nextDouble() * 1e4));
      }
    } else if (r.nextInt(3) > 0) {
      parts.add(percent("ratio", r));
    } else {
      parts.add(percent("reflect_s", r));
      parts.add(percent("reflect_p", r));
    }
    for (String name : new String[] {"transmit_p", "transmit_s", "reflect_s", "reflect_p"}) {
      boolean stated = parts.stream().anyMatch(p -> p.startsWith(name));
      if (!stated && r.nextInt(3) == 0) {
        if (!polarizing && name.startsWith("reflect") && parts.get(0).startsWith("ratio")) {
          continue; // 'ratio' and the reflectances exclude each other
        }
        if (!polarizing && name.startsWith("reflect")) {
          continue; // reflect_s and reflect_p come as a pair (added above)
        }
        parts.add(percent(name, r));
      }
    }
    return "splitter bs { "
        + String.join("; ", parts)
        + (r.nextBoolean() ? "; coating ar 0.5 %" : "")
        + " }";
  }

  private static String percent(String name, SplittableRandom r) {
    return String.format(Locale.ROOT, "%s %.1f %%", name, r.nextDouble() * 100);
  }

  private static int lineOf(String spec, int offset) {
    return (int) spec.substring(0, offset).chars().filter(c -> c == '\n').count();
  }
}
