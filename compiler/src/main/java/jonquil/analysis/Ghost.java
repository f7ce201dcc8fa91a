package jonquil.analysis;

/**
 * Light that leaves an element other than through a port: surface reflections, often heading back.
 */
public record Ghost(String label, TracedBeam beam, boolean backward) {}
