package jonquil.syntax;

import java.util.List;
import java.util.Optional;
import jonquil.source.TextRange;

/**
 * A named part of the spec: {@code lens obj { focal 3 mm }}, {@code material cover = index 1.523}
 * or a bare {@code probe trap}. The kind is kept as written; the checker validates it.
 */
public record Declaration(
    Name kind,
    Name name,
    Optional<List<Arg>> shorthand,
    List<Property> properties,
    TextRange range) {
  public Declaration {
    shorthand = shorthand.map(List::copyOf);
    properties = List.copyOf(properties);
  }
}
