package jonquil.syntax;

import java.util.List;
import jonquil.source.TextRange;

/** {@code require { ... }}: the requirements the train must meet. */
public record RequireDecl(List<Requirement> requirements, TextRange range) {
  public RequireDecl {
    requirements = List.copyOf(requirements);
  }
}
