package jonquil.ide;

import java.util.List;
import jonquil.source.TextRange;

/**
 * One node of a file's outline: a declaration, train, path, require block or line, so an editor can
 * show and navigate the structure; {@code detail} is the word that introduced it as written (the
 * kind word of a declaration, e.g. "mirror"), and {@code selectionRange} lies inside {@code range}.
 */
public record SymbolInfo(
    String name,
    Kind kind,
    String detail,
    TextRange range,
    TextRange selectionRange,
    List<SymbolInfo> children) {
  public SymbolInfo {
    children = List.copyOf(children);
  }

  /** What an outline node is. */
  public enum Kind {
    USE,
    /** A declaration of an optical element (other than a source, a material or a coating). */
    ELEMENT,
    SOURCE,
    /** A declared material or coating. */
    MATERIAL,
    TRAIN,
    PATH,
    REQUIRE,
    REQUIREMENT,
    PARAMETER;

    /** The kind of a declaration from its kind word as written. */
    static Kind ofDeclaration(String kindWord) {
      return switch (kindWord) {
        case "source" -> SOURCE;
        case "material", "coating" -> MATERIAL;
        default -> ELEMENT;
      };
    }
  }

  /** A copy without children, as a search lists declarations. */
  SymbolInfo withoutChildren() {
    return new SymbolInfo(name, kind, detail, range, selectionRange, List.of());
  }
}
