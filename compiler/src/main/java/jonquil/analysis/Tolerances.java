package jonquil.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.TreeMap;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;

/**
 * One toleranced build of a spec: every number written with '± t' (a quantity, a fraction, a ratio,
 * a count such as an index or M², a density, a distance) is drawn uniformly from its interval (the
 * usual reading of a ± tolerance when nothing more is known), the rest kept as written. The
 * resolver refuses a tolerance that reaches outside its value's range, so every draw is a possible
 * build and none is clipped. Seeded, so a yield is reproducible.
 */
final class Tolerances {
  private Tolerances() {}

  /** True when anything in the model carries a tolerance. */
  static boolean any(ResolvedModel model) {
    for (ResolvedElement e : model.elements().values()) {
      for (List<Value.Group> groups : e.params().values()) {
        for (Value.Group g : groups) {
          if (hasTolerance(g)) {
            return true;
          }
        }
      }
    }
    return model.trains().stream()
        .flatMap(t -> t.paths().stream())
        .flatMap(p -> p.steps().stream())
        .anyMatch(s -> s instanceof ResolvedTrain.Gap gap && gap.tolerance().isPresent());
  }

  /**
   * The order in which builds draw elements and their parameters: by name, never by the order a map
   * was filled in, which may differ from one JVM start to the next.
   */
  static final Comparator<ResolvedElement> CANONICAL =
      Comparator.comparing((ResolvedElement e) -> e.symbol().name())
          .thenComparing(
              e -> e.symbol().file() == null ? "" : e.symbol().file().getFileName().toString())
          .thenComparingInt(e -> e.symbol().nameNode().map(n -> n.range().start()).orElse(-1));

  static List<ResolvedElement> canonical(ResolvedModel model) {
    return model.elements().values().stream().sorted(CANONICAL).toList();
  }

  static ResolvedModel draw(ResolvedModel model, SplittableRandom random) {
    Map<Symbol, ResolvedElement> drawn = new HashMap<>();
    for (ResolvedElement e : canonical(model)) {
      Map<String, List<Value.Group>> params = new TreeMap<>();
      new TreeMap<>(e.params())
          .forEach(
              (name, groups) ->
                  params.put(name, groups.stream().map(g -> draw(g, random)).toList()));
      Map<String, List<Value.Group>> inOrder = new LinkedHashMap<>();
      e.params().keySet().forEach(k -> inOrder.put(k, params.get(k)));
      drawn.put(e.symbol(), new ResolvedElement(e.symbol(), e.kind(), inOrder));
    }
    Map<Symbol, ResolvedElement> elements = new LinkedHashMap<>();
    model.elements().keySet().forEach(symbol -> elements.put(symbol, drawn.get(symbol)));
    List<ResolvedTrain> trains = new ArrayList<>();
    for (ResolvedTrain t : model.trains()) {
      List<ResolvedTrain.BeamPath> paths = new ArrayList<>();
      for (ResolvedTrain.BeamPath p : t.paths()) {
        List<ResolvedTrain.Step> steps = new ArrayList<>();
        for (ResolvedTrain.Step s : p.steps()) {
          if (s instanceof ResolvedTrain.Gap gap && gap.tolerance().isPresent()) {
            double half = gap.tolerance().getAsDouble();
            double length = gap.length() + (2 * random.nextDouble() - 1) * half;
            steps.add(
                new ResolvedTrain.Gap(length, OptionalDouble.empty(), gap.medium(), gap.range()));
          } else {
            steps.add(s);
          }
        }
        paths.add(new ResolvedTrain.BeamPath(p.branchFrom(), steps, p.range()));
      }
      trains.add(new ResolvedTrain(t.file(), t.name(), paths, t.range()));
    }
    return new ResolvedModel(
        model.root(),
        model.scopes(),
        elements,
        trains,
        model.requirements(),
        model.references(),
        model.diagnostics(),
        model.ambient(),
        model.standard());
  }

  private static Value.Group draw(Value.Group g, SplittableRandom random) {
    Map<String, Value> slots = new TreeMap<>();
    new TreeMap<>(g.slots()).forEach((k, v) -> slots.put(k, draw(v, random)));
    Map<String, Value> inOrder = new LinkedHashMap<>();
    g.slots().keySet().forEach(k -> inOrder.put(k, slots.get(k)));
    return new Value.Group(
        inOrder, g.items().stream().map(i -> draw(i, random)).toList(), g.range());
  }

  private static Value draw(Value v, SplittableRandom random) {
    if (v instanceof Value.Num n && n.tolerance().isPresent()) {
      double half = n.tolerance().getAsDouble();
      return new Value.Num(
          n.si() + (2 * random.nextDouble() - 1) * half,
          n.dimension(),
          OptionalDouble.empty(),
          n.range());
    }
    if (v instanceof Value.Group g) {
      return draw(g, random);
    }
    return v;
  }

  private static boolean hasTolerance(Value.Group g) {
    for (Value v : g.slots().values()) {
      if (v instanceof Value.Num n && n.tolerance().isPresent()) {
        return true;
      }
      if (v instanceof Value.Group inner && hasTolerance(inner)) {
        return true;
      }
    }
    return g.items().stream().anyMatch(Tolerances::hasTolerance);
  }
}
