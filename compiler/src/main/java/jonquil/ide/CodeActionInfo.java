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
    edits =
        jonquil.source.InOrder.copyOf(
            edits.entrySet().stream()
                .collect(
                    java.util.stream.Collectors.toMap(
                        Map.Entry::getKey,
                        e -> List.copyOf(e.getValue()),
                        (a, b) -> a,
                        java.util.LinkedHashMap::new)));
  }
}
