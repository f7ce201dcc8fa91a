package jonquil.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.analysis.ElementBudget;
import jonquil.analysis.PortValue;
import jonquil.analysis.TrainSolution;
import jonquil.resolve.Category;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * The text report's power budget ({@code --budget}): for each path, in the order light travels it,
 * each element with the power in, the power out by the port the path follows, the loss between them
 * in dB and the share of what the sources emit. It shows the analysis's budget and computes no
 * physics of its own.
 */
final class BudgetTable {
  private static final String NONE = "—";
  private static final List<String> HEADER =
      List.of("element", "power in", "power out", "loss", "share of source");

  private BudgetTable() {}

  /** The tables of every checked file, one block per path, blocks separated by a blank line. */
  static List<String> lines(CheckRun run) {
    List<String> lines = new ArrayList<>();
    for (Map.Entry<Path, TrainSolution> e : run.result().solutions().entrySet()) {
      ResolvedModel model = run.result().models().get(e.getKey());
      if (model != null) {
        add(lines, run.cwd(), e.getKey(), model, e.getValue());
      }
    }
    return lines;
  }

  /** Appends one checked file's tables to {@code lines}, after a blank line if it has any. */
  static void add(
      List<String> lines, Path cwd, Path checked, ResolvedModel model, TrainSolution s) {
    String file = PathText.oneLine(PathText.relative(cwd, checked));
    for (ResolvedTrain train : model.trains()) {
      String trainName = train.name().map(n -> "train '" + n + "'").orElse("the train");
      for (ResolvedTrain.BeamPath path : train.paths()) {
        if (!lines.isEmpty()) {
          lines.add("");
        }
        lines.add(
            "power budget, "
                + file
                + ", "
                + trainName
                + ", path "
                + from(path)
                + " (sources emit "
                + QuantityFormat.format(s.sourcePower(), Dimension.POWER)
                + "):");
        lines.addAll(table(path, s));
      }
    }
  }

  private static String from(ResolvedTrain.BeamPath path) {
    return path.branchFrom()
        .map(b -> "from '" + b.element().name() + "." + b.port() + "'")
        .orElseGet(
            () ->
                path.steps().isEmpty()
                        || !(path.steps().get(0) instanceof ResolvedTrain.Element first)
                    ? "(empty)"
                    : "from '" + first.symbol().name() + "'");
  }

  private static List<String> table(ResolvedTrain.BeamPath path, TrainSolution s) {
    List<List<String>> rows = new ArrayList<>();
    rows.add(HEADER);
    for (ResolvedTrain.Step step : path.steps()) {
      if (step instanceof ResolvedTrain.Element placed) {
        rows.add(row(placed, s));
      }
    }
    int[] width = new int[HEADER.size()];
    for (List<String> r : rows) {
      for (int i = 0; i < r.size(); i++) {
        width[i] = Math.max(width[i], length(r.get(i)));
      }
    }
    List<String> lines = new ArrayList<>();
    for (List<String> r : rows) {
      StringBuilder line = new StringBuilder(" ");
      for (int i = 0; i < r.size(); i++) {
        String cell = r.get(i);
        String pad = " ".repeat(width[i] - length(cell));
        // Names read from the left, numbers line up on the right.
        line.append("  ").append(i == 0 ? cell + pad : pad + cell);
      }
      lines.add(line.toString().stripTrailing());
    }
    return lines;
  }

  private static List<String> row(ResolvedTrain.Element placed, TrainSolution s) {
    String name = placed.symbol().name();
    Optional<ElementBudget> budget =
        s.budgets().stream().filter(b -> b.element().equals(name)).findFirst();
    if (placed.symbol().category() == Category.SOURCE) {
      Optional<PortValue> emitted = s.port(name + ".out");
      return List.of(
          name,
          NONE,
          emitted.map(p -> power(p.power())).orElse(NONE),
          NONE,
          emitted.map(p -> share(p.power(), s)).orElse(NONE));
    }
    if (budget.isEmpty()) {
      return List.of(name, NONE, NONE, NONE, NONE); // no light reached it
    }
    ElementBudget b = budget.get();
    boolean ends =
        placed.symbol().category() == Category.TERMINAL
            || placed.symbol().category() == Category.PROBE
            || !b.out().containsKey(placed.exitPort());
    if (ends) {
      return List.of(name, power(b.in()), NONE, NONE, share(b.in(), s));
    }
    double leaving = b.out().get(placed.exitPort());
    String port = b.out().size() > 1 ? " (" + placed.exitPort() + ")" : "";
    return List.of(
        name, power(b.in()), power(leaving) + port, decibels(b.in(), leaving), share(leaving, s));
  }

  private static String power(double watts) {
    return QuantityFormat.format(watts, Dimension.POWER);
  }

  /** The loss from in to out, 10·log₁₀(in/out): positive when power is lost. */
  private static String decibels(double in, double out) {
    if (in <= 0) {
      return NONE;
    }
    if (out <= 0) {
      return "all";
    }
    // Three decimals, as a power meter reads; rounding noise of a lossless element shows 0.000.
    return String.format(java.util.Locale.ROOT, "%.3f dB", 10 * Math.log10(in / out) + 0.0)
        .replace("-0.000", "0.000");
  }

  private static String share(double watts, TrainSolution s) {
    return s.sourcePower() <= 0
        ? NONE
        : String.format(java.util.Locale.ROOT, "%.2f %%", 100 * watts / s.sourcePower());
  }

  private static int length(String s) {
    return s.codePointCount(0, s.length());
  }
}
