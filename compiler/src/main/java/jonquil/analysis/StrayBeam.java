package jonquil.analysis;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** Light that leaves the train without reaching a probe, a detector or a dump. */
public record StrayBeam(
    String origin,
    String description,
    double power,
    boolean backward,
    Path file,
    TextRange range) {}
