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
import jonquil.diag.DiagnosticCode;
import jonquil.optics.Coherency;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.resolve.Symbol;

/**
 * Walks the network of element faces from every source and books every watt: at each port,
 * absorbed, stopped by a dump or detector, observed at a probe that ends a path, or stray. Light is
 * linear in its coherency matrix, so each beam travels on its own and beams that meet add as
 * powers: a path that enters an element placed elsewhere ({@link ResolvedTrain.Entry}) sends its
 * light through that element again, and what leaves goes on wherever that port leads. Without
 * entries the network is a tree and the walk is today's depth-first order; a closed loop is summed
 * round trip by round trip until what is left is below {@link #SETTLED} of the source. The walk
 * keeps its own stack, so nesting has no depth limit.
 */
final class Propagator {
  private final ResolvedModel model;
  private final ElementOptics optics;
  private final MaterialModel materials;

  /** What is left of a loop's light, relative to its source, when its round trips stop. */
  static final double SETTLED = 1e-12;

  /** Round trips through one entry after which a loop that has not settled is an error. */
  static final int MOST_ROUND_TRIPS = 100_000;

  /** Where light leaving each port goes on: "element.port" → the path and step. */
  private final Map<String, Resume> continuations = new HashMap<>();

  private final Map<Symbol, ElementOptics.FaceFrames> frames = new HashMap<>();

  /** Where each element is placed: its path and step, to retrace light heading back from it. */
  private final Map<Symbol, Resume> placements = new HashMap<>();

  /** Light that ran back along its paths to a source's output, by source, in the table frame. */
  private final Map<String, Coherency> returned = new LinkedHashMap<>();

  /** Light each element sent heading back on its first pass (backward ghosts and ports), watts. */
  private final Map<String, Double> sentBack = new LinkedHashMap<>();

  private final Map<ResolvedTrain.Entry, int[]> visits = new HashMap<>();
  private final java.util.Set<Symbol> entered = new java.util.HashSet<>();

  /** Each path's place in the order the trains write them (ghosts waiting run back in it). */
  private final Map<ResolvedTrain.BeamPath, Integer> pathOrder = new HashMap<>();

  private final List<ElementPass> passes = new ArrayList<>();
  private final Map<String, List<PortArrival>> arrivals = new LinkedHashMap<>();
  private final List<ResolvedTrain.Entry> unsettled = new ArrayList<>();
  private double emitted;
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
        path.branchFrom()
            .ifPresent(
                b -> continuations.put(b.element().name() + "." + b.port(), resumeAt(path, 0)));
      }
    }
    for (ResolvedTrain train : model.trains()) {
      for (ResolvedTrain.BeamPath path : train.paths()) {
        pathOrder.putIfAbsent(path, pathOrder.size());
        for (int i = 0; i < path.steps().size(); i++) {
          if (path.steps().get(i) instanceof ResolvedTrain.Element el) {
            placements.putIfAbsent(el.symbol(), new Resume(path, i, List.of(), null));
            continuations.putIfAbsent(
                el.symbol().name() + "." + el.exitPort(), resumeAt(path, i + 1));
          } else if (path.steps().get(i) instanceof ResolvedTrain.Entry en) {
            entered.add(en.symbol());
            if (i + 1 < path.steps().size()) {
              continuations.putIfAbsent(
                  en.symbol().name() + "." + en.exitPort(), resumeAt(path, i + 1));
            }
          }
        }
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
        emitted = beams.stream().mapToDouble(TracedBeam::power).sum();
        sourcePower += emitted;
        visits.clear();
        record(start.symbol().name(), "out", exit(start), beams);
        portAlias(start.symbol().name(), "out");
        walk(path, 1, beams);
      }
    }
    if (!unsettled.isEmpty()) {
      ResolvedTrain.Entry loop = unsettled.get(0);
      throw new UnphysicalModel(
          DiagnosticCode.LOOP_DOES_NOT_SETTLE,
          loop.symbol().file(),
          loop.range(),
          "light entering '"
              + loop.symbol().name()
              + "."
              + loop.face()
              + "' goes round a closed loop that does not die out after "
              + MOST_ROUND_TRIPS
              + " round trips (its round-trip gain is 1 or more): make one of its reflectors"
              + " partial, or add the loss that stops it");
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
        surfaces,
        returned,
        sentBack,
        passes,
        meetings(),
        unsettled.stream().map(ResolvedTrain.Entry::range).toList());
  }

  /** The places where two beams of one line arrive, with every beam that arrives there. */
  private Map<String, List<PortArrival>> meetings() {
    Map<String, List<PortArrival>> out = new LinkedHashMap<>();
    arrivals.forEach(
        (key, at) -> {
          java.util.Set<String> lines = new java.util.HashSet<>();
          if (!at.stream().allMatch(a -> lines.add(a.line()))) {
            out.put(key, at);
          }
        });
    return out;
  }

  /** Going on along {@code path} from step {@code from}, the element before it as the last. */
  private static Resume resumeAt(ResolvedTrain.BeamPath path, int from) {
    Exit last = null;
    if (from > 0) {
      ResolvedTrain.Step before = path.steps().get(from - 1);
      if (before instanceof ResolvedTrain.Element el) {
        last = exit(el);
      } else if (before instanceof ResolvedTrain.Entry en) {
        last = new Exit(en.symbol(), en.exitPort(), en.range());
      }
    }
    return new Resume(path, from, List.of(), last);
  }

  private static Exit exit(ResolvedTrain.Element el) {
    return new Exit(el.symbol(), el.exitPort(), el.range());
  }

  /** Where light leaves: an element, the port it leaves by, the step that placed it. */
  private record Exit(Symbol symbol, String port, jonquil.source.TextRange range) {}

  /**
   * Follows one path and every branch that leaves it with an explicit stack, not recursion, so a
   * spec may nest branches as deep as it likes. The order is that of a depth-first walk: at an
   * element, each port that is not the path's exit (in the kind's port order) is followed to its
   * end before the path goes on, so every total is summed in one defined order.
   */
  private void walk(ResolvedTrain.BeamPath path, int from, List<TracedBeam> arriving) {
    Deque<Work> stack = new ArrayDeque<>();
    // Ghosts running back wait here, by the step they run back from, until the light going
    // forward is done; then the one furthest along goes first, and every ghost waiting at a step
    // crosses the elements before it together with the others, as one beam per line. The reverse
    // pass is linear in the light, so n ghosts of a chain cost n element passes instead of n²/2.
    java.util.TreeMap<WaitingGhosts, List<TracedBeam>> waiting = new java.util.TreeMap<>();
    stack.push(new Resume(path, from, arriving, null));
    while (true) {
      while (!stack.isEmpty()) {
        Work next = stack.pop();
        if (next instanceof Resume r) {
          resume(r, stack);
        } else if (next instanceof Leak l) {
          stray.add(l.beam());
        } else if (next instanceof Retrace back && back.ghost()) {
          waiting
              .computeIfAbsent(
                  new WaitingGhosts(back.at(), pathOrder.get(back.path()), back.path()),
                  k -> new ArrayList<>())
              .addAll(back.beams());
        } else if (next instanceof Retrace back) {
          retrace(back, stack);
        }
      }
      if (waiting.isEmpty()) {
        return;
      }
      Map.Entry<WaitingGhosts, List<TracedBeam>> first = waiting.pollFirstEntry();
      retrace(
          new Retrace(first.getKey().path(), first.getKey().at(), together(first.getValue()), true),
          stack);
    }
  }

  /**
   * Ghosts waiting to run back from step {@code at} of a path; the furthest step first, then the
   * paths in the order the trains write them.
   */
  private record WaitingGhosts(int at, int order, ResolvedTrain.BeamPath path)
      implements Comparable<WaitingGhosts> {
    @Override
    public int compareTo(WaitingGhosts o) {
      return at != o.at ? Integer.compare(o.at, at) : Integer.compare(order, o.order);
    }
  }

  /**
   * Ghost beams of one line in one frame and medium added into one, in the order they came. Ghosts
   * add as power (they record no arrival, so their optical paths meet nothing) and add to no
   * element's incident light, so the merged beam keeps the size and path of its strongest part
   * (they matter only for clipping at an aperture).
   */
  private static List<TracedBeam> together(List<TracedBeam> beams) {
    Map<List<Object>, TracedBeam> by = new LinkedHashMap<>();
    for (TracedBeam b : beams) {
      by.merge(
          List.of(b.source(), b.line(), b.wavelength(), b.frame(), b.medium()),
          b,
          (a, c) -> {
            TracedBeam strong = a.power() >= c.power() ? a : c;
            return new TracedBeam(
                a.source(),
                a.line(),
                a.wavelength(),
                a.light().plus(c.light()),
                a.frame(),
                a.medium(),
                strong.mode(),
                strong.opticalPath());
          });
    }
    return List.copyOf(by.values());
  }

  /** What is left to do: a path to go on with, or light to book as stray at its turn. */
  private sealed interface Work permits Resume, Leak, Retrace {}

  /**
   * Light heading back out of the front of the element at step {@code at} of {@code path}: it runs
   * the path backwards, entering each element before it by the face its light had left by, to the
   * path's start (a source, or the port a branch left by). A {@code ghost} is light no path names
   * (a first pass's backward ghost or port): it takes the same way back, but the elements it
   * crosses neither list it among their passes nor add it to the light incident on them (their
   * exposure, hover and Jones report read the passes the spec writes).
   */
  private record Retrace(ResolvedTrain.BeamPath path, int at, List<TracedBeam> beams, boolean ghost)
      implements Work {}

  /** Go on along {@code path} from step {@code from}, with {@code last} the element before it. */
  private record Resume(ResolvedTrain.BeamPath path, int from, List<TracedBeam> beams, Exit last)
      implements Work {
    Resume with(List<TracedBeam> next) {
      return new Resume(path, from, next, last);
    }
  }

  /** Light that leaves a port no path follows. */
  private record Leak(StrayBeam beam) implements Work {}

  private void resume(Resume at, Deque<Work> stack) {
    ResolvedTrain.BeamPath path = at.path();
    List<TracedBeam> beams = at.beams();
    Exit last = at.last();
    for (int i = at.from(); i < path.steps().size(); i++) {
      ResolvedTrain.Step step = path.steps().get(i);
      if (step instanceof ResolvedTrain.Gap gap) {
        beams = across(gap, beams);
        continue;
      }
      if (step instanceof ResolvedTrain.Entry entry) {
        Optional<ResolvedElement> element = model.element(entry.symbol());
        if (element.isEmpty()) {
          return;
        }
        boolean inline = i + 1 < path.steps().size();
        List<Work> sideways = new ArrayList<>();
        beams = enter(element.get(), entry, beams, sideways, inline, false);
        last = new Exit(entry.symbol(), entry.exitPort(), entry.range());
        if (!inline || beams.isEmpty()) {
          pushAll(stack, sideways, null);
          return;
        }
        pushAll(stack, sideways, new Resume(path, i + 1, beams, last));
        return;
      }
      ResolvedTrain.Element placed = (ResolvedTrain.Element) step;
      last = exit(placed);
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
        pushAll(stack, sideways, new Resume(path, i + 1, beams, last));
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
      String origin = last.symbol().name() + "." + last.port();
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
      out.add(
          new TracedBeam(
              in.source(),
              in.line(),
              in.wavelength(),
              in.light().scaled(t),
              in.frame(),
              in.medium(),
              in.mode(),
              in.opticalPath() + n * gap.length()));
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
    incident.merge(name, value(name, "", placed.symbol(), placed.range(), beams), Propagator::plus);
    if (placed.symbol().category() != Category.TERMINAL) {
      arrive(name, beams); // a terminal's light is kept where it stops, below
    }
    double clippedMost = 0;
    for (TracedBeam b : beams) {
      totals[0] += b.power();
      Response r = optics.respond(element, b);
      if (!frames.containsKey(placed.symbol())) {
        TracedBeam leaving =
            r.ports().get(element.kind().ports().isEmpty() ? "" : element.kind().ports().get(0));
        frames.put(
            placed.symbol(),
            new ElementOptics.FaceFrames(b.frame(), leaving == null ? b.frame() : leaving.frame()));
      }
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
      ghosts(placed.symbol(), placed.range(), r, b.wavelength(), totals, sideways, true);
    }
    if (jonquil.optics.beam.Clipping.significant(1 - clippedMost)) {
      clips.add(new Clip(name, clippedMost, placed.symbol().file(), placed.range()));
    }
    if (placed.symbol().category() == Category.TERMINAL) {
      record(name, "", exit(placed), beams);
      return List.of();
    }
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      byPort.merge(
          e.getKey(), e.getValue().stream().mapToDouble(TracedBeam::power).sum(), Double::sum);
      record(name, e.getKey(), exit(placed), e.getValue());
    }
    if (entered.contains(placed.symbol())) {
      passes.add(passOf(name, "front", false, beams, atPorts));
    }
    portAlias(name, placed.exitPort());
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      if (e.getKey().equals(placed.exitPort())) {
        continue;
      }
      String key = name + "." + e.getKey();
      Resume branch = continuations.get(key);
      if (branch != null) {
        sideways.add(branch.with(e.getValue()));
      } else {
        double p = e.getValue().stream().mapToDouble(TracedBeam::power).sum();
        Vec3 arriving = beams.isEmpty() ? Vec3.Z : beams.get(0).frame().k();
        boolean backward =
            e.getValue().stream().anyMatch(b -> b.frame().k().dot(arriving) < -0.999);
        if (backward) {
          // Straight back (a window or plate at normal incidence): back through the train.
          sideways.add(headingBack(placed.symbol(), e.getValue()));
          continue;
        }
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

  /**
   * Light entering an element placed elsewhere: every line through the element from that face,
   * booked like a first pass. Returns the light of the path's own exit when the path goes on
   * ({@code inline}); what leaves by any other port goes where that port leads.
   */
  private List<TracedBeam> enter(
      ResolvedElement element,
      ResolvedTrain.Entry entry,
      List<TracedBeam> beams,
      List<Work> sideways,
      boolean inline,
      boolean ghost) {
    String name = entry.symbol().name();
    double arriving = beams.stream().mapToDouble(TracedBeam::power).sum();
    int[] count = visits.computeIfAbsent(entry, k -> new int[1]);
    count[0]++;
    if (count[0] > 1 && arriving < SETTLED * emitted) {
      // What a loop has left after its round trips: below the settling bound, booked as absorbed
      // so the budget still closes.
      absorbed += arriving;
      return List.of();
    }
    if (count[0] > MOST_ROUND_TRIPS) {
      if (!unsettled.contains(entry)) {
        unsettled.add(entry);
      }
      absorbed += arriving;
      return List.of();
    }
    double[] totals = budgetTotals.computeIfAbsent(name, k -> new double[3]);
    Map<String, Double> byPort = budgetPorts.computeIfAbsent(name, k -> new LinkedHashMap<>());
    Map<String, List<TracedBeam>> atPorts = new LinkedHashMap<>();
    for (String port : element.kind().exits()) {
      atPorts.put(port, new ArrayList<>());
    }
    if (!ghost) {
      incident.merge(name, value(name, "", entry.symbol(), entry.range(), beams), Propagator::plus);
      if (entry.face().equals("front")) {
        arrive(name, beams); // with the first pass: light by another face runs another way
      }
    }
    ElementOptics.FaceFrames faces =
        frames.getOrDefault(
            entry.symbol(),
            new ElementOptics.FaceFrames(
                beams.isEmpty() ? BeamFrame.SOURCE : beams.get(0).frame().mirrored(),
                beams.isEmpty() ? BeamFrame.SOURCE : beams.get(0).frame().mirrored()));
    Exit at = new Exit(entry.symbol(), entry.exitPort(), entry.range());
    for (TracedBeam b : beams) {
      totals[0] += b.power();
      Response r = optics.respondFrom(element, b, entry.face(), faces);
      r.jones()
          .forEach(
              (port, j) ->
                  jones.putIfAbsent(
                      name + "." + port, new PortJones(name, port, b.wavelength(), j)));
      totals[1] += r.absorbed();
      absorbed += r.absorbed();
      r.ports()
          .forEach((port, beam) -> atPorts.computeIfAbsent(port, k -> new ArrayList<>()).add(beam));
      ghosts(entry.symbol(), entry.range(), r, b.wavelength(), totals, sideways, false);
    }
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      double p = e.getValue().stream().mapToDouble(TracedBeam::power).sum();
      byPort.merge(e.getKey(), p, Double::sum);
      record(name, e.getKey(), at, e.getValue());
    }
    if (!ghost) {
      passes.add(
          passOf(
              name,
              entry.face(),
              entry.face().equals("back") || entry.face().equals("reflected"),
              beams,
              atPorts));
    }
    for (Map.Entry<String, List<TracedBeam>> e : atPorts.entrySet()) {
      if (inline && e.getKey().equals(entry.exitPort())) {
        continue;
      }
      if (e.getValue().isEmpty()) {
        continue;
      }
      String key = name + "." + e.getKey();
      Resume next = continuations.get(key);
      Resume placement = placements.get(entry.symbol());
      if (next != null) {
        sideways.add(next.with(e.getValue()));
      } else if (e.getKey().equals("front") && placement != null) {
        sideways.add(new Retrace(placement.path(), placement.from(), e.getValue(), ghost));
      } else {
        double p = e.getValue().stream().mapToDouble(TracedBeam::power).sum();
        sideways.add(
            new Leak(
                new StrayBeam(
                    key,
                    "leaves '" + key + "', which no path follows",
                    p,
                    e.getKey().equals("front"),
                    entry.symbol().file(),
                    entry.range())));
      }
    }
    return inline ? atPorts.getOrDefault(entry.exitPort(), List.of()) : List.of();
  }

  /**
   * Runs light back along a path from the front of step {@code at}: distances as forward, each
   * element entered by the face its first pass left by ({@code reflected} when that pass left by
   * it, else {@code back}), its other exits going where they lead. At a source the light is booked
   * as returned to it (heading back, so counted by {@code back reflection}); at a branch's start it
   * enters the element the branch left, by the face of that port.
   */
  private void retrace(Retrace back, Deque<Work> stack) {
    List<TracedBeam> beams = back.beams();
    ResolvedTrain.BeamPath path = back.path();
    for (int i = back.at() - 1; i >= 0 && !beams.isEmpty(); i--) {
      ResolvedTrain.Step step = path.steps().get(i);
      if (step instanceof ResolvedTrain.Gap gap) {
        beams = across(gap, beams);
        continue;
      }
      if (step instanceof ResolvedTrain.Entry en) {
        // Light that came in by an entry came from elsewhere: its way back is not this path's.
        stray.add(backLeak(en.symbol(), en.range(), beams));
        return;
      }
      ResolvedTrain.Element el = (ResolvedTrain.Element) step;
      if (el.symbol().category() == Category.SOURCE) {
        Coherency c = Coherency.ZERO;
        for (TracedBeam b : beams) {
          c = c.plus(b.light().inFrameRotatedBy(b.frame().tableAngle()));
        }
        returned.merge(el.symbol().name(), c, Coherency::plus);
        if (!back.ghost()) {
          // Written return passes meet there and interfere (a Michelson's arms); ghosts add as
          // power, here as everywhere: their phases are set by no path the spec writes.
          arrive(TrainSolution.returnKey(el.symbol().name()), beams);
        }
        // Each line's light keeps its wavelength, for the note's by-line list (ghosts of several
        // lines may run back together).
        Map<Double, Double> byLine = new LinkedHashMap<>();
        for (TracedBeam b : beams) {
          byLine.merge(b.wavelength(), b.power(), Double::sum);
        }
        byLine.forEach(
            (wl, power) ->
                stray.add(
                    new StrayBeam(
                        el.symbol().name(),
                        "returns to source '" + el.symbol().name() + "' along its path",
                        power,
                        true,
                        el.symbol().file(),
                        el.range(),
                        OptionalDouble.of(wl))));
        return;
      }
      String face = el.exitPort().equals("reflected") ? "reflected" : "back";
      if (el.symbol().kind().orElseThrow().entryFaces().isEmpty()) {
        stray.add(backLeak(el.symbol(), el.range(), beams));
        return;
      }
      reenter(el.symbol(), face, el.range(), beams, back.ghost(), stack);
      return;
    }
    if (beams.isEmpty() || path.branchFrom().isEmpty()) {
      return;
    }
    ResolvedTrain.PortRef from = path.branchFrom().get();
    String face =
        switch (from.port()) {
          case "through", "out" -> "back";
          case "reflected" -> "reflected";
          case "side" -> "side";
          default -> "front";
        };
    reenter(from.element(), face, from.range(), beams, back.ghost(), stack);
  }

  /**
   * Light entering {@code symbol} by {@code face} on its way back; what leaves goes where it leads,
   * its front exit back along the element's own path.
   */
  private void reenter(
      Symbol symbol,
      String face,
      jonquil.source.TextRange range,
      List<TracedBeam> beams,
      boolean ghost,
      Deque<Work> stack) {
    Optional<ResolvedElement> element = model.element(symbol);
    if (element.isEmpty()) {
      return;
    }
    ElementKind kind = element.get().kind();
    List<Work> sideways = new ArrayList<>();
    enter(
        element.get(),
        new ResolvedTrain.Entry(symbol, face, kind.exitFor(face, kind.ports().get(0)), range),
        beams,
        sideways,
        false,
        ghost);
    pushAll(stack, sideways, null);
  }

  /**
   * Books the ghosts of one element's response to one beam. On a first pass ({@code traced}) a
   * backward ghost runs back through the train ({@link #headingBack}); a forward ghost, and every
   * ghost of light meeting an element again (second order: a reverse pass that a face reflects
   * forward again), is booked as stray where it arises.
   */
  private void ghosts(
      Symbol symbol,
      jonquil.source.TextRange range,
      Response r,
      double wavelength,
      double[] totals,
      List<Work> sideways,
      boolean traced) {
    String name = symbol.name();
    for (Ghost g : r.ghosts()) {
      totals[2] += g.beam().power();
      if (traced && g.backward()) {
        sideways.add(headingBack(symbol, List.of(g.beam())));
        continue;
      }
      stray.add(
          new StrayBeam(
              name,
              g.label() + " of '" + name + "'" + (g.backward() ? ", heading back" : ""),
              g.beam().power(),
              g.backward(),
              symbol.file(),
              range,
              OptionalDouble.of(wavelength)));
    }
  }

  /**
   * Light a first pass sends straight back out of the element's entry face, which no path names:
   * where a path starts at the element's {@code front} it goes on along it; otherwise it runs back
   * along the path that placed the element, through the real elements before it, to the source's
   * output, a dump, or a port no path follows (see {@link #retrace}).
   */
  private Work headingBack(Symbol symbol, List<TracedBeam> beams) {
    sentBack.merge(symbol.name(), beams.stream().mapToDouble(TracedBeam::power).sum(), Double::sum);
    Resume next = continuations.get(symbol.name() + ".front");
    if (next != null) {
      return next.with(beams);
    }
    Resume placement = placements.get(symbol);
    return new Retrace(placement.path(), placement.from(), beams, true);
  }

  private static StrayBeam backLeak(
      Symbol symbol, jonquil.source.TextRange range, List<TracedBeam> beams) {
    double p = beams.stream().mapToDouble(TracedBeam::power).sum();
    return new StrayBeam(
        symbol.name(),
        "heads back into '" + symbol.name() + "', where it is not followed further",
        p,
        true,
        symbol.file(),
        range);
  }

  /** The side ports first, in port order; then {@code then}, if any. */
  private static void pushAll(Deque<Work> stack, List<Work> sideways, Work then) {
    if (then != null) {
      stack.push(then);
    }
    for (int k = sideways.size() - 1; k >= 0; k--) {
      stack.push(sideways.get(k));
    }
  }

  private ElementPass passOf(
      String name,
      String face,
      boolean backward,
      List<TracedBeam> beams,
      Map<String, List<TracedBeam>> atPorts) {
    Coherency in = Coherency.ZERO;
    for (TracedBeam b : beams) {
      in = in.plus(b.light().inFrameRotatedBy(b.frame().tableAngle()));
    }
    Coherency out = Coherency.ZERO;
    for (List<TracedBeam> leaving : atPorts.values()) {
      for (TracedBeam b : leaving) {
        out = out.plus(b.light().inFrameRotatedBy(b.frame().tableAngle()));
      }
    }
    return new ElementPass(name, face, backward, in, out);
  }

  private static PortValue plus(PortValue a, PortValue b) {
    return new PortValue(
        a.element(),
        a.port(),
        a.file(),
        a.range(),
        a.light().plus(b.light()),
        a.vertical(),
        a.mode(),
        a.pulses(),
        a.index(),
        a.wavelength());
  }

  private void record(String element, String port, Exit placed, List<TracedBeam> beams) {
    String key = port.isEmpty() ? element : element + "." + port;
    arrive(key, beams);
    PortValue v = value(element, port, placed.symbol(), placed.range(), beams);
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
   * Keeps each beam arriving at a place, for interference where beams of one line meet again; only
   * a network (a spec with entries) can bring them together. A beam of no light does not arrive.
   */
  private void arrive(String key, List<TracedBeam> beams) {
    if (entered.isEmpty()) {
      return;
    }
    List<PortArrival> here = arrivals.computeIfAbsent(key, k -> new ArrayList<>());
    for (TracedBeam b : beams) {
      if (b.power() > 0) {
        here.add(arrival(b));
      }
    }
  }

  /**
   * A beam's arrival, its field in the table frame. Partially polarized light arrives as its two
   * polarized parts, which a coherency matrix cannot pair between routes (PortArrival).
   */
  private static PortArrival arrival(TracedBeam b) {
    Coherency c = b.light().inFrameRotatedBy(b.frame().tableAngle());
    List<jonquil.optics.JonesVector> parts = c.polarizedParts();
    boolean pure = c.dop() > 1 - 1e-9;
    return new PortArrival(
        PortArrival.lineKey(b.source().name(), b.line()),
        b.wavelength(),
        parts.get(0),
        b.opticalPath(),
        pure ? jonquil.optics.JonesVector.ZERO : parts.get(1),
        pure);
  }

  /**
   * The light of all lines at one place, in the table frame. Its mode and pulses are those of the
   * strongest line (exposure is judged on one beam size; lines usually share it).
   */
  private PortValue value(
      String element,
      String port,
      Symbol symbol,
      jonquil.source.TextRange range,
      List<TracedBeam> beams) {
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
        element, port, symbol.file(), range, sum, vertical, mode, train, index, wavelength);
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
