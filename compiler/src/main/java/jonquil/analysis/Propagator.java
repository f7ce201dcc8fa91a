package jonquil.analysis;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.optics.Coherency;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.resolve.Symbol;

/**
 * Walks the beam-path graph from every source, element by element, and books every watt: at each
 * port, absorbed, stopped by a dump or detector, observed at a probe that ends a path, or stray.
 * The graph is a tree (each element sits in one place and each port feeds at most one path), so a
 * depth-first walk visits every beam once; it keeps its own stack, so nesting has no depth limit.
 */
final class Propagator {
  private final ResolvedModel model;
  private final ElementOptics optics;
  private final MaterialModel materials;

  private final Map<String, ResolvedTrain.BeamPath> branches = new HashMap<>();
  private final Map<String, Coherency> portLight = new LinkedHashMap<>();
  private final Map<String, PortValue> ports = new LinkedHashMap<>();
  private final Map<String, double[]> budgetTotals = new LinkedHashMap<>();
  private final Map<String, Map<String, Double>> budgetPorts = new LinkedHashMap<>();
  private final List<StrayBeam> stray = new ArrayList<>();
  private final Map<String, PortValue> incident = new LinkedHashMap<>();
  private final List<Clip> clips = new ArrayList<>();
  private final Map<Symbol, Optional<Pulses>> pulses = new HashMap<>();
  private final Map<String, PortJones> jones = new LinkedHashMap<>();
  private final Map<String, SurfaceAtAngle> surfaces = new LinkedHashMap<>();
  private double sourcePower;
  private double absorbed;
  private double stopped;
  private double observed;

  Propagator(ResolvedModel model, ElementOptics optics, MaterialModel materials) {
    this.model = model;
    this.optics = optics;
    this.materials = materials;
  }

  TrainSolution solve(OptionalDouble wavelengthOverride) {
    for (ResolvedTrain train : model.trains()) {
      for (ResolvedTrain.BeamPath path : train.paths()) {
        path.branchFrom().ifPresent(b -> branches.put(b.element().name() + "." + b.port(), path));
      }
    }
    for (ResolvedTrain train : model.trains()) {
      for (ResolvedTrain.BeamPath path : train.paths()) {
        if (path.branchFrom().isPresent()
            || path.steps().isEmpty()
            || !(path.steps().get(0) instanceof ResolvedTrain.Element start)) {
          continue;
        }
        Optional<ResolvedElement> source = model.element(start.symbol());
        if (source.isEmpty() || source.get().kind() != ElementKind.SOURCE) {
          continue;
        }
        double wl =
            wavelengthOverride.orElse(
                source.get().number(Param.WAVELENGTH, "wavelength").orElse(1e-6));
        pulses.put(start.symbol(), Pulses.of(source.get()));
        List<TracedBeam> beams =
            SourceBeams.of(
                source.get(), wavelengthOverride, materials.index(Medium.AMBIENT, wl).getReal());
        double emitted = beams.stream().mapToDouble(TracedBeam::power).sum();
        sourcePower += emitted;
        record(start.symbol().name(), "out", start, beams);
        portAlias(start.symbol().name(), "out");
        walk(path, 1, beams);
      }
    }
    List<ElementBudget> budgets = new ArrayList<>();
    budgetTotals.forEach(
        (name, t) -> budgets.add(new ElementBudget(name, t[0], budgetPorts.get(name), t[1], t[2])));
    return new TrainSolution(
        ports,
        incident,
        budgets,
        stray,
        clips,
        sourcePower,
        absorbed,
        stopped,
        observed,
        jones,
        surfaces);
  }

  /**
   * Follows one path and every branch that leaves it with an explicit stack, not recursion, so a
   * spec may nest branches as deep as it likes. The order is that of a depth-first walk: at an
   * element, each port that is not the path's exit (in the kind's port order) is followed to its
   * end before the path goes on, so every total is summed in one defined order.
   */
  private void walk(ResolvedTrain.BeamPath path, int from, List<TracedBeam> arriving) {
    Deque<Work> stack = new ArrayDeque<>();
    stack.push(new Resume(path, from, arriving, null));
    while (!stack.isEmpty()) {
      Work next = stack.pop();
      if (next instanceof Resume r) {
        resume(r, stack);
      } else if (next instanceof Leak l) {
        stray.add(l.beam());
      }
    }
  }

  /** What is left to do: a path to go on with, or light to book as stray at its turn. */
  private sealed interface Work permits Resume, Leak {}

  /** Go on along {@code path} from step {@code from}, with {@code last} the element before it. */
  private record Resume(
      ResolvedTrain.BeamPath path, int from, List<TracedBeam> beams, ResolvedTrain.Element last)
      implements Work {}

  /** Light that leaves a port no path follows. */
  private record Leak(StrayBeam beam) implements Work {}

  private void resume(Resume at, Deque<Work> stack) {
    ResolvedTrain.BeamPath path = at.path();
    List<TracedBeam> beams = at.beams();
    ResolvedTrain.Element last = at.last();
    for (int i = at.from(); i < path.steps().size(); i++) {
      ResolvedTrain.Step step = path.steps().get(i);
      if (step instanceof ResolvedTrain.Gap gap) {
        beams = across(gap, beams);
        continue;
      }
      ResolvedTrain.Element placed = (ResolvedTrain.Element) step;
      last = placed;
      Optional<ResolvedElement> element = model.element(placed.symbol());
      if (element.isEmpty()) {
        return;
      }
      List<Work> sideways = new ArrayList<>();
      beams = pass(element.get(), placed, beams, sideways);
      if (placed.symbol().category() == Category.TERMINAL) {
        return;
      }
      if (!sideways.isEmpty()) {
        // The side ports first, in port order; then this path, from the next step.
        stack.push(new Resume(path, i + 1, beams, last));
        for (int k = sideways.size() - 1; k >= 0; k--) {
          stack.push(sideways.get(k));
        }
        return;
      }
    }
    if (last == null || beams.isEmpty()) {
      return;
    }
    double leaving = beams.stream().mapToDouble(TracedBeam::power).sum();
    if (last.symbol().category() == Category.PROBE) {
      observed += leaving;
    } else {
      String origin = last.symbol().name() + "." + last.exitPort();
      stray.add(
          new StrayBeam(
              origin,
              "leaves '" + origin + "' at the end of a path",
              leaving,
              false,
              last.symbol().file(),
              last.range()));
    }
  }

  private List<TracedBeam> across(ResolvedTrain.Gap gap, List<TracedBeam> beams) {
    List<TracedBeam> out = new ArrayList<>();
    for (TracedBeam b : beams) {
      TracedBeam in = gap.medium().map(m -> b.in(Medium.of(m))).orElse(b);
      double n = materials.index(in.medium(), in.wavelength()).getReal();
      // A medium change at the start of a gap is a flat interface for the beam's mode.
      in =
          in.withMode(
              in.mode()
                  .map(g -> g.index() == n ? g : g.intoMedium(n))
                  .map(g -> g.propagate(gap.length())));
      double t = Math.exp(-materials.absorption(in.medium(), in.wavelength()) * gap.length());
      absorbed += in.power() * (1 - t);
      out.add(in.with(in.light().scaled(t)));
    }
    return out;
  }

  /**
   * One element acting on every arriving line; continues with the beams at the exit port and adds
   * to {@code sideways} what its other ports lead to, in port order.
   */
  private List<TracedBeam> pass(
      ResolvedElement element,
      ResolvedTrain.Element placed,
      List<TracedBeam> beams,
      List<Work> sideways) {
    String name = placed.symbol().name();
    double[] totals = budgetTotals.computeIfAbsent(name, k -> new double[3]);
    Map<String, Double> byPort = budgetPorts.computeIfAbsent(name, k -> new LinkedHashMap<>());
    Map<String, List<TracedBeam>> atPorts = new LinkedHashMap<>();
    for (String port : element.kind().ports()) {
      atPorts.put(port, new ArrayList<>());
    }
    incident.put(name, value(name, "", placed, beams));
    double clippedMost = 0;
    for (TracedBeam b : beams) {
      totals[0] += b.power();
      Response r = optics.respond(element, b);
      // The hover shows one matrix per port: the one for the first line that arrives.
      r.jones()
          .forEach(
              (port, j) ->
                  jones.putIfAbsent(
                      name + "." + port, new PortJones(name, port, b.wavelength(), j)));
      r.surface().ifPresent(f -> surfaces.putIfAbsent(name, f));
      clippedMost = Math.max(clippedMost, r.clipped());
      totals[1] += r.absorbed();
      if (placed.symbol().category() == Category.TERMINAL) {
        stopped += r.absorbed();
      } else {
        absorbed += r.absorbed();
      }
      r.ports()
          .forEach((port, beam) -> atPorts.computeIfAbsent(port, k -> new ArrayList<>()).add(beam));
      for (Ghost g : r.ghosts()) {
        totals[2] += g.beam().power();
        stray.add(
            new StrayBeam(
                name,
                g.label() + " of '" + name + "'" + (g.backward() ? ", heading back" : ""),
                g.beam().power(),
                g.backward(),
                placed.symbol().file(),
                placed.range(),
                java.util.OptionalDouble.of(b.wavelength())));
      }
    }
    if (jonquil.optics.beam.Clipping.significant(1 - clippedMost)) {
      clips.add(new Clip(name, clippedMost, placed.symbol().file(), placed.range()));
    }
    if (placed.symbol().category() == Category.TERMINAL) {
      record(name, "", placed, beams);
      return List.of();
    }
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      byPort.merge(
          e.getKey(), e.getValue().stream().mapToDouble(TracedBeam::power).sum(), Double::sum);
      record(name, e.getKey(), placed, e.getValue());
    }
    portAlias(name, placed.exitPort());
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      if (e.getKey().equals(placed.exitPort())) {
        continue;
      }
      String key = name + "." + e.getKey();
      ResolvedTrain.BeamPath branch = branches.get(key);
      if (branch != null) {
        sideways.add(new Resume(branch, 0, e.getValue(), null));
      } else {
        double p = e.getValue().stream().mapToDouble(TracedBeam::power).sum();
        Vec3 arriving = beams.isEmpty() ? Vec3.Z : beams.get(0).frame().k();
        boolean backward =
            e.getValue().stream().anyMatch(b -> b.frame().k().dot(arriving) < -0.999);
        sideways.add(
            new Leak(
                new StrayBeam(
                    key,
                    "leaves '" + key + "', which no path follows",
                    p,
                    backward,
                    placed.symbol().file(),
                    placed.range())));
      }
    }
    return atPorts.getOrDefault(placed.exitPort(), List.of());
  }

  private void record(
      String element, String port, ResolvedTrain.Element placed, List<TracedBeam> beams) {
    String key = port.isEmpty() ? element : element + "." + port;
    PortValue v = value(element, port, placed, beams);
    Coherency total = portLight.merge(key, v.light(), Coherency::plus);
    ports.put(
        key,
        new PortValue(
            element,
            port,
            v.file(),
            v.range(),
            total,
            v.vertical(),
            v.mode(),
            v.pulses(),
            v.index(),
            v.wavelength()));
  }

  /**
   * The light of all lines at one place, in the table frame. Its mode and pulses are those of the
   * strongest line (exposure is judged on one beam size; lines usually share it).
   */
  private PortValue value(
      String element, String port, ResolvedTrain.Element placed, List<TracedBeam> beams) {
    Coherency sum = Coherency.ZERO;
    boolean vertical = false;
    TracedBeam strongest = null;
    for (TracedBeam b : beams) {
      sum = sum.plus(b.light().inFrameRotatedBy(b.frame().tableAngle()));
      vertical |= b.frame().vertical();
      if (strongest == null || b.power() > strongest.power()) {
        strongest = b;
      }
    }
    Optional<jonquil.optics.beam.GaussianBeam> mode =
        strongest == null ? Optional.empty() : strongest.mode();
    Optional<Pulses> train =
        strongest == null
            ? Optional.empty()
            : pulses.getOrDefault(strongest.source(), Optional.empty());
    double index =
        strongest == null
            ? 1
            : materials.index(strongest.medium(), strongest.wavelength()).getReal();
    double wavelength = strongest == null ? 0 : strongest.wavelength();
    return new PortValue(
        element,
        port,
        placed.symbol().file(),
        placed.range(),
        sum,
        vertical,
        mode,
        train,
        index,
        wavelength);
  }

  /** "element" alone names the port its path leaves by. */
  private void portAlias(String element, String exitPort) {
    PortValue exit = ports.get(element + "." + exitPort);
    if (exit != null) {
      ports.put(element, exit);
    }
  }

  /** Symbols are looked up by name in the root scope; kept for readability of callers. */
  static String key(Symbol s, Optional<String> port) {
    return port.map(p -> s.name() + "." + p).orElse(s.name());
  }
}
