package jonquil.analysis;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The power and polarization everywhere along the trains of one spec, and the budget that accounts
 * for every watt: source power = absorbed + stopped + stray.
 */
public record TrainSolution(
    Map<String, PortValue> ports,
    Map<String, PortValue> incident,
    List<ElementBudget> budgets,
    List<StrayBeam> stray,
    List<Clip> clips,
    double sourcePower,
    double absorbed,
    double stopped,
    double observedAtPathEnds,
    Map<String, PortJones> jones,
    Map<String, SurfaceAtAngle> surfaces,
    Map<String, jonquil.optics.Coherency> returned,
    Map<String, Double> sentBack,
    List<ElementPass> passes,
    Map<String, List<PortArrival>> arrivals,
    List<jonquil.source.TextRange> unsettledLoops) {

  /**
   * Maps keep the order the propagation filled them in (the order light travels the paths), so
   * every output lists them the same way on every run.
   */
  public TrainSolution {
    jones = jonquil.source.InOrder.copyOf(jones);
    surfaces = jonquil.source.InOrder.copyOf(surfaces);
    ports = jonquil.source.InOrder.copyOf(ports);
    incident = jonquil.source.InOrder.copyOf(incident);
    budgets = List.copyOf(budgets);
    stray = List.copyOf(stray);
    clips = List.copyOf(clips);
    returned = jonquil.source.InOrder.copyOf(returned);
    sentBack = jonquil.source.InOrder.copyOf(sentBack);
    passes = List.copyOf(passes);
    arrivals = jonquil.source.InOrder.copyOfLists(arrivals);
    unsettledLoops = List.copyOf(unsettledLoops);
  }

  /** The same solution with {@code next} as the beams that meet, by place (tests place them). */
  public TrainSolution withArrivals(Map<String, List<PortArrival>> next) {
    return new TrainSolution(
        ports,
        incident,
        budgets,
        stray,
        clips,
        sourcePower,
        absorbed,
        stopped,
        observedAtPathEnds,
        jones,
        surfaces,
        returned,
        sentBack,
        passes,
        next,
        unsettledLoops);
  }

  /** The passes of light through one element, in the order light takes them. */
  public List<ElementPass> passesOf(String element) {
    return passes.stream().filter(p -> p.element().equals(element)).toList();
  }

  /**
   * The beams of one line that meet at a place, in the order light reached it; empty where none
   * meet. The key is that of the place's {@link PortValue#key()}: "element.port" for light leaving
   * a port (the element alone when it has no port), and "element" for the light arriving at an
   * element with ports by its front face (a first pass, a loop coming round), as {@link
   * #incidentAt} keys it; light entering by another face runs another way and is met at the ports
   * it leaves by. Beams that met travel on together, so every place downstream of a meeting lists
   * them too; the port's {@link PortValue} keeps their incoherent sum, which the interference range
   * is centred on.
   */
  public List<PortArrival> arrivalsAt(String port) {
    return arrivals.getOrDefault(port, List.of());
  }

  /** The light arriving at an element, before it acts. */
  public Optional<PortValue> incidentAt(String element) {
    return Optional.ofNullable(incident.get(element));
  }

  /** The Jones matrices behind an element's ports, in the order of its ports. */
  public java.util.List<PortJones> jonesOf(String element, java.util.List<String> portOrder) {
    return portOrder.stream()
        .map(p -> jones.get(element + "." + p))
        .filter(java.util.Objects::nonNull)
        .toList();
  }

  /** An interface's figures as the light met it. */
  public Optional<SurfaceAtAngle> surfaceOf(String element) {
    return Optional.ofNullable(surfaces.get(element));
  }

  public Optional<PortValue> port(String key) {
    return Optional.ofNullable(ports.get(key));
  }

  public double strayPower() {
    return stray.stream().mapToDouble(StrayBeam::power).sum();
  }

  public double backReflected() {
    return stray.stream().filter(StrayBeam::backward).mapToDouble(StrayBeam::power).sum();
  }

  /**
   * The light heading back from one place. At an element: what its first pass sent back (its
   * backward ghosts and ports, traced on through the train) and the backward light booked as stray
   * there. At a source: the power that returned to its output, traced back through the real
   * elements before it by the same reverse pass as a written return pass (ghosts included, so an
   * isolator upstream blocks a downstream window's ghost), plus any light heading back that the
   * walk could not follow to its end (into a step reached from elsewhere), counted as if it
   * returned. With no place: every backward beam of the train.
   */
  public double backReflected(Optional<jonquil.resolve.Symbol> at) {
    if (at.isEmpty()) {
      return backReflected();
    }
    String name = at.get().name();
    if (at.get().category() == jonquil.resolve.Category.SOURCE) {
      return stray.stream()
          .filter(StrayBeam::backward)
          .filter(b -> b.origin().equals(name) || !returned.containsKey(b.origin()))
          .mapToDouble(StrayBeam::power)
          .sum();
    }
    return sentBack.getOrDefault(name, 0.0)
        + stray.stream()
            .filter(StrayBeam::backward)
            .filter(b -> b.origin().equals(name) || b.origin().startsWith(name + "."))
            .mapToDouble(StrayBeam::power)
            .sum();
  }

  /**
   * Where the beams that run back to a source's output are kept for interference: two beams of one
   * line that return (the two arms of a Michelson, say) meet there, and the power they bring back
   * depends on their relative phase like any port's where beams meet.
   */
  public static String returnKey(String source) {
    return source + ".back";
  }

  /** The light that ran back along its paths to a source's output, in the table frame. */
  public Optional<jonquil.optics.Coherency> returnedTo(String source) {
    return Optional.ofNullable(returned.get(source));
  }

  /** |source − accounted| / source: zero up to rounding when the budget closes. */
  public double conservationError() {
    double accounted = absorbed + stopped + observedAtPathEnds + strayPower();
    return sourcePower == 0 ? Math.abs(accounted) : Math.abs(sourcePower - accounted) / sourcePower;
  }
}
