package jonquil.ide;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** A place in a file, so that editor answers can point across the files of a spec. */
public record Location(Path file, TextRange range) {}
