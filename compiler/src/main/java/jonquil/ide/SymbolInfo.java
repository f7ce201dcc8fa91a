package jonquil.ide;

import java.util.List;
import jonquil.source.TextRange;

/**
 * One node of a file's outline: a declaration, train, path, require block or line, so an editor can
 * show and navigate the structure; {@code selectionRange} lies inside {@code range}.
 */
public record SymbolInfo(
    String name,
    String kind,
    TextRange range,
    TextRange selectionRange,
    List<SymbolInfo> children) {
  public SymbolInfo {
    children = List.copyOf(children);
  }
}
