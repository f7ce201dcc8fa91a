package jonquil.diag;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** Another place that explains a diagnostic, e.g. the first declaration of a duplicate name. */
public record Related(Path file, TextRange range, String message) {}
