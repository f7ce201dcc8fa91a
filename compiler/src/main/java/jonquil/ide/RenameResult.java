package jonquil.ide;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.diag.Edit;

/**
 * The edits of a rename in every file it touches, or why it was refused ({@code error} is null when
 * ok).
 */
public record RenameResult(Map<Path, List<Edit>> edits, String error) {
  public RenameResult {
    edits = jonquil.source.InOrder.copyOfLists(edits);
  }

  static RenameResult refused(String error) {
    return new RenameResult(Map.of(), error);
  }
}
