package jonquil.ide;

/**
 * A span an editor may fold: a block ({@code "region"}) or a comment running over several lines
 * ({@code "comment"}).
 */
public record FoldingRangeInfo(int startOffset, int endOffset, String kind) {}
