package jonquil.optics.material;

import java.util.Objects;

/** The published source of a catalog entry's data, so every number can be traced to a paper. */
public record Reference(String citation) {
  public Reference {
    Objects.requireNonNull(citation, "citation");
    if (citation.isBlank()) {
      throw new IllegalArgumentException("a reference needs a citation");
    }
  }
}
