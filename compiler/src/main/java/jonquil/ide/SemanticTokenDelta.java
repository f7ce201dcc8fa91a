package jonquil.ide;

import java.util.List;
import java.util.Optional;

/**
 * The change from one encoded token array to the next as one splice over the part that differs, so
 * an editor that holds the old array receives only what changed: delete {@code deleteCount} numbers
 * at {@code start} and insert {@code data} there.
 */
public record SemanticTokenDelta(int start, int deleteCount, List<Integer> data) {
  public SemanticTokenDelta {
    data = List.copyOf(data);
  }

  /** The one splice turning {@code before} into {@code after}; empty when they are equal. */
  public static Optional<SemanticTokenDelta> between(List<Integer> before, List<Integer> after) {
    int prefix = 0;
    int most = Math.min(before.size(), after.size());
    while (prefix < most && before.get(prefix).equals(after.get(prefix))) {
      prefix++;
    }
    int suffix = 0;
    while (suffix < most - prefix
        && before.get(before.size() - 1 - suffix).equals(after.get(after.size() - 1 - suffix))) {
      suffix++;
    }
    int deleted = before.size() - prefix - suffix;
    List<Integer> inserted = after.subList(prefix, after.size() - suffix);
    if (deleted == 0 && inserted.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(new SemanticTokenDelta(prefix, deleted, inserted));
  }

  /** {@code before} with the splice applied. */
  public List<Integer> applyTo(List<Integer> before) {
    List<Integer> out = new java.util.ArrayList<>(before.subList(0, start));
    out.addAll(data);
    out.addAll(before.subList(start + deleteCount, before.size()));
    return out;
  }
}
