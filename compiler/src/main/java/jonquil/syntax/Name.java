package jonquil.syntax;

import jonquil.source.TextRange;

/** An identifier or keyword as written, with where it was written. */
public record Name(String text, TextRange range) {}
