package jonquil.source;

import java.util.Collections;
import java.util.LinkedHashMap;
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
}
