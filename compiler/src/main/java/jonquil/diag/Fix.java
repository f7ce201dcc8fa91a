package jonquil.diag;

import java.util.List;

/** A suggested change that would resolve a diagnostic, offered to editors as a quick fix. */
public record Fix(String title, List<Edit> edits) {
  public Fix {
    edits = List.copyOf(edits);
  }
}
