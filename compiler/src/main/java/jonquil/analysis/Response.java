package jonquil.analysis;

import java.util.List;
import java.util.Map;

/** What one element does to one incoming beam: the beams at its ports, what it absorbs, its ghosts. */
record Response(Map<String, Beam> ports, double absorbed, List<Ghost> ghosts, double clipped) {
  Response {
    ports = Map.copyOf(ports);
    ghosts = List.copyOf(ghosts);
  }

  Response(Map<String, Beam> ports, double absorbed, List<Ghost> ghosts) {
    this(ports, absorbed, ghosts, 0);
  }

  /** The same response, noting the fraction of the beam an aperture cut off. */
  Response clipping(double fraction) {
    return new Response(ports, absorbed, ghosts, fraction);
  }

  static Response absorbedAll(Beam in) {
    return new Response(Map.of(), in.power(), List.of());
  }

  /** Builds a response and books as absorbed whatever the ports and ghosts do not carry. */
  static Response balance(Beam in, Map<String, Beam> ports, List<Ghost> ghosts) {
    double out = ports.values().stream().mapToDouble(Beam::power).sum() + ghosts.stream().mapToDouble(g -> g.beam().power()).sum();
    return new Response(ports, Math.max(0, in.power() - out), ghosts);
  }
}
