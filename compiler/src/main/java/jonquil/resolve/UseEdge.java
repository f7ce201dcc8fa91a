package jonquil.resolve;

import java.nio.file.Path;
import jonquil.syntax.UseDecl;

/** A 'use' line that was found on disk: from the file containing it to the file it names. */
public record UseEdge(UseDecl decl, Path target) {}
