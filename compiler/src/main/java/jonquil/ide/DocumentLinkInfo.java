package jonquil.ide;

import java.nio.file.Path;
import jonquil.source.TextRange;

/**
 * A file named in a spec ({@code use "..."} or {@code table "..."}) that an editor can open; the
 * range is inside the quotes.
 */
public record DocumentLinkInfo(TextRange range, Path target) {}
