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
    Map<String, List<PortArrival>> arrivals) {

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
    Map<String, List<PortArrival>> arriving = new java.util.LinkedHashMap<>();
    arrivals.forEach((port, list) -> arriving.put(port, List.copyOf(list)));
    arrivals = java.util.Collections.unmodifiableMap(arriving);
  }

  /** A solution where no beams of one line meet again (a tree of paths). */
  public TrainSolution(
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
      Map<String, SurfaceAtAngle> surfaces) {
    this(
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
        Map.of());
  }

  /**
   * The beams of one line that meet at a place, in the order light reached it; empty where none
   * meet. The key is that of the place's {@link PortValue#key()}: "element.port" for light leaving
   * a port (the element alone when it has no port), and "element" for the light arriving at an
   * element with ports, as {@link #incidentAt} keys it. Beams that met travel on together, so every
   * place downstream of a meeting lists them too; the port's {@link PortValue} keeps their
   * incoherent sum, which the interference range is centred on.
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
   * The light heading back from one place: an element's own backward ghosts and ports; at a source
   * (or with no place) every backward beam of the train, since Jonquil does not trace light back
   * through the elements before it (an upper bound on what returns to the source).
   */
  public double backReflected(Optional<jonquil.resolve.Symbol> at) {
    if (at.isEmpty() || at.get().category() == jonquil.resolve.Category.SOURCE) {
      return backReflected();
    }
    String name = at.get().name();
    return stray.stream()
        .filter(StrayBeam::backward)
        .filter(b -> b.origin().equals(name) || b.origin().startsWith(name + "."))
        .mapToDouble(StrayBeam::power)
        .sum();
  }

  /** |source − accounted| / source: zero up to rounding when the budget closes. */
  public double conservationError() {
    double accounted = absorbed + stopped + observedAtPathEnds + strayPower();
    return sourcePower == 0 ? Math.abs(accounted) : Math.abs(sourcePower - accounted) / sourcePower;
  }
}
