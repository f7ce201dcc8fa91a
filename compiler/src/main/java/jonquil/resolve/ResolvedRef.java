package jonquil.resolve;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** A side-table row: the name written at this range refers to that symbol. */
public record ResolvedRef(Path file, TextRange range, Symbol target) {}
