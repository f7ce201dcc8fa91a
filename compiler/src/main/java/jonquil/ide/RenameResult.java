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

  static RenameResult refused(String error) {
    return new RenameResult(Map.of(), error);
  }
}
