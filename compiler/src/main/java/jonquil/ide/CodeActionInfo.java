package jonquil.ide;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.diag.Diagnostic;
import jonquil.diag.Edit;

/**
 * A quick fix for one diagnostic: its title, whether it is the preferred one, and its edits in each
 * file.
 */
public record CodeActionInfo(
    String title,
    String kind,
    boolean preferred,
    Diagnostic diagnostic,
    Map<Path, List<Edit>> edits) {
  public CodeActionInfo {
    edits = jonquil.source.InOrder.copyOfLists(edits);
  }
}
