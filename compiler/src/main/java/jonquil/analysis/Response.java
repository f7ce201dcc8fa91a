package jonquil.analysis;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.optics.Jones;

/**
 * What one element does to one incoming beam: the beams at its ports, what it absorbs, its ghosts;
 * and, for the hover, the Jones matrix behind each port (none for an element that depolarizes or
 * stops the light) and an interface's surface figures.
 */
record Response(
    Map<String, TracedBeam> ports,
    double absorbed,
    List<Ghost> ghosts,
    double clipped,
    Map<String, Jones> jones,
    Optional<SurfaceAtAngle> surface) {
  Response {
    ports = jonquil.source.InOrder.copyOf(ports);
    ghosts = List.copyOf(ghosts);
    jones = jonquil.source.InOrder.copyOf(jones);
  }

  Response(Map<String, TracedBeam> ports, double absorbed, List<Ghost> ghosts) {
    this(ports, absorbed, ghosts, 0, Map.of(), Optional.empty());
  }

  /** The same response, noting the fraction of the beam an aperture cut off. */
  Response clipping(double fraction) {
    return new Response(ports, absorbed, ghosts, fraction, jones, surface);
  }

  /** The same response with the Jones matrix behind each port named. */
  Response withJones(Map<String, Jones> byPort) {
    return new Response(ports, absorbed, ghosts, clipped, byPort, surface);
  }

  /** The same response with an interface's figures. */
  Response withSurface(SurfaceAtAngle figures) {
    return new Response(ports, absorbed, ghosts, clipped, jones, Optional.of(figures));
  }

  static Response absorbedAll(TracedBeam in) {
    return new Response(Map.of(), in.power(), List.of());
  }

  /** Builds a response and books as absorbed whatever the ports and ghosts do not carry. */
  static Response balance(TracedBeam in, Map<String, TracedBeam> ports, List<Ghost> ghosts) {
    double out =
        ports.values().stream().mapToDouble(TracedBeam::power).sum()
            + ghosts.stream().mapToDouble(g -> g.beam().power()).sum();
    return new Response(ports, Math.max(0, in.power() - out), ghosts);
  }
}
