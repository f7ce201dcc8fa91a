package jonquil.source;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Unmodifiable copies that iterate in the order they were filled. Records copy their maps through
 * this rather than Map.copyOf, whose iteration order changes from one JVM start to the next: the
 * checker's outputs must be the same bytes for the same input on every run.
 */
public final class InOrder {
  private InOrder() {}

  public static <K, V> Map<K, V> copyOf(Map<K, V> m) {
    return Collections.unmodifiableMap(new LinkedHashMap<>(m));
  }

  /** A copy in the same order whose values are lists copied too: edits per file, for example. */
  public static <K, V> Map<K, List<V>> copyOfLists(Map<K, List<V>> m) {
    Map<K, List<V>> out = new LinkedHashMap<>();
    m.forEach((k, v) -> out.put(k, List.copyOf(v)));
    return Collections.unmodifiableMap(out);
  }

  /** Two entries in the order given (Map.of would iterate them in a per-JVM order). */
  public static <K, V> Map<K, V> of(K k1, V v1, K k2, V v2) {
    Map<K, V> m = new LinkedHashMap<>();
    m.put(k1, v1);
    m.put(k2, v2);
    if (m.size() != 2) {
      throw new IllegalArgumentException("duplicate key: " + k1);
    }
    return Collections.unmodifiableMap(m);
  }
}
