package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.resolve.ElementKind;
import jonquil.testing.Repo;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every watt is accounted for: source power = absorbed + stopped + observed at path ends + stray,
 * to 1e-9 of the source power, for every sample and for random trains; and no passive element puts
 * out more than it takes in.
 */
class ConservationTest {
  static Stream<Path> benches() throws IOException {
    return Repo.sampleFiles().stream().filter(p -> p.getParent().equals(Repo.samples()));
  }

  @ParameterizedTest
  @MethodSource("benches")
  void everySampleClosesItsPowerBudget(Path sample) {
    Result r = Checker.check(Workspace.onDisk(Repo.samples()), List.of(sample));
    TrainSolution s = r.solutions().values().iterator().next();
    assertTrue(s.sourcePower() > 0);
    assertTrue(s.conservationError() < 1e-9, sample + ": error " + s.conservationError());
    assertPassive(s);
  }

  @RepeatedTest(60)
  void randomTrainsCloseTheirBudgetAndNoElementAddsPower(RepetitionInfo info) {
    SplittableRandom random = new SplittableRandom(7919L * info.getCurrentRepetition());
    String spec = randomSpec(random);
    TrainSolution s = Bench.solve(spec);
    assertTrue(s.conservationError() < 1e-9, "error " + s.conservationError() + " for\n" + spec);
    assertPassive(s);
    s.ports()
        .values()
        .forEach(
            v -> {
              double dop = v.light().dop();
              assertTrue(
                  dop >= 0 && dop <= 1 + 1e-12, "DOP " + dop + " at " + v.key() + " for\n" + spec);
            });
  }

  static void assertPassive(TrainSolution s) {
    for (ElementBudget b : s.budgets()) {
      double out = b.out().values().stream().mapToDouble(Double::doubleValue).sum() + b.ghosts();
      assertFalse(
          out > b.in() * (1 + 1e-12) + 1e-15,
          b.element() + " puts out " + out + " W from " + b.in() + " W");
      assertTrue(
          Math.abs(b.in() - out - b.absorbed()) <= 1e-12 * Math.max(1, b.in()),
          b.element() + " leaks");
    }
  }

  /**
   * A source, then a random chain of passive elements with random settings, ending at a probe or
   * dump.
   */
  /** The kinds that sit in a path and pass light on: every one is drawn. */
  static final List<ElementKind> OPTICS =
      java.util.Arrays.stream(ElementKind.values())
          .filter(k -> k.category() == jonquil.resolve.Category.OPTIC)
          .toList();

  static String randomSpec(SplittableRandom r) {
    StringBuilder decl = new StringBuilder();
    StringBuilder path = new StringBuilder("src");
    List<String> branches = new ArrayList<>();
    String[] states = {
      "linear %.1f deg",
      "circular right",
      "circular left",
      "unpolarized",
      "partial 0.6 linear %.1f deg",
      "elliptical %.1f deg 0.3"
    };
    decl.append(
        String.format(
            Locale.ROOT,
            "source src { wavelength %.0f nm; power %.3f W; polarization %s }%n",
            400 + r.nextDouble() * 1200,
            0.001 + r.nextDouble() * 10,
            String.format(Locale.ROOT, states[r.nextInt(states.length)], r.nextDouble() * 180)));
    decl.append("material g = index 1.")
        .append(4 + r.nextInt(4))
        .append(" k 0.0000")
        .append(1 + r.nextInt(9))
        .append('\n');
    // A rhomb's glass, dense enough to reflect totally inside whatever medium an interface leads
    // into (2.6 sin 45 deg = 1.84 > 1.7, the densest 'g').
    decl.append("material h = index 2.6\n");
    int count = 1 + r.nextInt(12);
    for (int i = 0; i < count; i++) {
      String name = "e" + i;
      double angle = r.nextDouble() * 180;
      // Every optic kind is drawn, and the switch names every kind: a new kind is a compile error
      // here until the budget is checked on it (and the Jones report, JonesReportTest).
      ElementKind kind = OPTICS.get(r.nextInt(OPTICS.size()));
      String line =
          switch (kind) {
            case POLARIZER ->
                String.format(
                    Locale.ROOT,
                    "polarizer %s { axis %.2f deg; extinction %.0f; transmission %.0f %% }",
                    name,
                    angle,
                    10 + r.nextDouble() * 1e5,
                    50 + r.nextDouble() * 50);
            case WAVEPLATE ->
                String.format(
                    Locale.ROOT,
                    "waveplate %s { retardance %.3f wave at 800 nm; fast_axis %.2f deg }",
                    name,
                    r.nextDouble(),
                    angle);
            case ROTATOR ->
                String.format(
                    Locale.ROOT,
                    "rotator %s { rotation %.2f deg; transmission 97 %% }",
                    name,
                    angle);
            case MIRROR ->
                String.format(
                    Locale.ROOT,
                    "mirror %s { metal %s; aoi %.1f deg; plane %.1f deg }",
                    name,
                    new String[] {"silver", "gold", "aluminium", "copper"}[r.nextInt(4)],
                    r.nextDouble() * 80,
                    angle);
            case WINDOW ->
                String.format(
                    Locale.ROOT,
                    "window %s { material g; thickness %.2f mm; aoi %.1f deg; plane %.1f deg }",
                    name,
                    0.1 + r.nextDouble() * 20,
                    r.nextDouble() * 80,
                    angle);
            case LENS ->
                String.format(
                    Locale.ROOT,
                    "lens %s { focal %.0f mm; material g }",
                    name,
                    10 + r.nextDouble() * 200);
            case FILTER ->
                String.format(Locale.ROOT, "filter %s { od OD %.2f }", name, r.nextDouble() * 3);
            case DEPOLARIZER ->
                String.format(
                    Locale.ROOT,
                    "depolarizer %s { depolarization %.0f %% }",
                    name,
                    r.nextDouble() * 100);
            case RHOMB ->
                String.format(
                    Locale.ROOT,
                    "rhomb %s { material h; aoi %.1f deg; axis %.1f deg }",
                    name,
                    45 + r.nextDouble() * 40,
                    angle);
            case SPLITTER -> {
              String split =
                  r.nextBoolean()
                      ? String.format(
                          Locale.ROOT,
                          "splitter %s { polarizing; extinction %.0f; aoi 45 deg; plane %.1f deg }",
                          name,
                          10 + r.nextDouble() * 1e4,
                          angle)
                      : String.format(
                          Locale.ROOT, "splitter %s { ratio %.0f %% }", name, r.nextDouble() * 100);
              if (r.nextBoolean()) {
                branches.add(name + ".reflected -> 10 mm -> d" + i);
                decl.append("dump d").append(i).append('\n');
              }
              yield split;
            }
            case PLATE ->
                String.format(
                    Locale.ROOT,
                    "plate %s { material g; thickness %.2f mm; aoi %.1f deg }",
                    name,
                    0.1 + r.nextDouble() * 5,
                    r.nextDouble() * 60);
            case INTERFACE ->
                String.format(
                    Locale.ROOT,
                    "interface %s { from air; to g; aoi %.1f deg; plane %.1f deg }",
                    name,
                    r.nextDouble() * 80,
                    angle);
            case APERTURE ->
                String.format(
                    Locale.ROOT,
                    "aperture %s { diameter %.2f mm }",
                    name,
                    0.5 + r.nextDouble() * 20);
            case ISOLATOR ->
                String.format(
                    Locale.ROOT,
                    "isolator %s { isolation %.0f dB; insertion_loss %.1f dB }",
                    name,
                    20 + r.nextDouble() * 30,
                    r.nextDouble() * 2);
            case SOURCE, MATERIAL, COATING, PROBE, DETECTOR, DUMP ->
                throw new IllegalStateException("not an optic: " + kind);
          };
      decl.append(line).append('\n');
      path.append(" -> ")
          .append(String.format(Locale.ROOT, "%.1f mm", 1 + r.nextDouble() * 500))
          .append(" -> ")
          .append(name);
    }
    decl.append(r.nextBoolean() ? "probe end\n" : "dump end\n");
    path.append(" -> 10 mm -> end");
    StringBuilder spec = new StringBuilder(decl).append("train t {\n  ").append(path).append('\n');
    branches.forEach(b -> spec.append("  ").append(b).append('\n'));
    return spec.append("}\n").toString();
  }
}
