package jonquil.diag;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** Replace one range of one file with new text: the unit of every suggested fix. */
public record Edit(Path file, TextRange range, String newText) {}
