package jonquil.syntax;

import jonquil.source.TextRange;

/** {@code use "parts.jonq"}: brings the declarations of another file into scope. */
public record UseDecl(String target, TextRange targetRange, TextRange range) {}
