package jonquil.ide;

import jonquil.source.TextRange;

/** The Markdown shown for the thing under the cursor, and the range it describes. */
public record HoverInfo(String markdown, TextRange range) {}
