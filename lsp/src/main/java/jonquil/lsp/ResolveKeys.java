package jonquil.lsp;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.InlayHint;

/**
 * The {@code data} a completion item or an inlay hint carries so that a later resolve request finds
 * what it came from: written into the item, and read back (foreign or malformed data reads as
 * none).
 */
final class ResolveKeys {
  private ResolveKeys() {}

  /**
   * Names a completion item for a later completionItem/resolve: the answer it came in, and its
   * place there.
   */
  record CompletionKey(long answer, int index) {}

  /**
   * Names a hint for a later inlayHint/resolve: its document (as the client spells the URI), the
   * state of it the hint was computed from (its version, null for a file the editor has not open,
   * and a hash of the text) and the offset of the step it follows.
   */
  record HintKey(String uri, Integer version, int textHash, int offset) {}

  static JsonObject data(CompletionKey key) {
    JsonObject data = new JsonObject();
    data.addProperty("answer", key.answer());
    data.addProperty("index", key.index());
    return data;
  }

  static JsonObject data(HintKey key) {
    JsonObject data = new JsonObject();
    data.addProperty("uri", key.uri());
    if (key.version() != null) {
      data.addProperty("version", key.version());
    }
    data.addProperty("text", key.textHash());
    data.addProperty("offset", key.offset());
    return data;
  }

  /** The key a completion resolve request carries back, if it is one of ours. */
  static Optional<CompletionKey> completionKey(CompletionItem item) {
    return read(
        item == null ? null : item.getData(),
        List.of("answer", "index"),
        List.of(),
        o -> new CompletionKey(o.get("answer").getAsLong(), o.get("index").getAsInt()));
  }

  /** The key an inlay-hint resolve request carries back, if it is one of ours. */
  static Optional<HintKey> hintKey(InlayHint hint) {
    return read(
        hint == null ? null : hint.getData(),
        List.of("uri", "text", "offset"),
        List.of("version"),
        o ->
            new HintKey(
                o.get("uri").getAsString(),
                o.has("version") ? o.get("version").getAsInt() : null,
                o.get("text").getAsInt(),
                o.get("offset").getAsInt()));
  }

  /**
   * Reads a key from {@code data} when it is an object whose {@code required} members, and its
   * {@code optional} ones that are present, are plain values; anything else is someone else's data.
   */
  private static <K> Optional<K> read(
      Object data, List<String> required, List<String> optional, Function<JsonObject, K> key) {
    if (!(data instanceof JsonObject o)) {
      return Optional.empty();
    }
    for (String name : required) {
      JsonElement member = o.get(name);
      if (member == null || !member.isJsonPrimitive()) {
        return Optional.empty();
      }
    }
    for (String name : optional) {
      JsonElement member = o.get(name);
      if (member != null && !member.isJsonPrimitive()) {
        return Optional.empty();
      }
    }
    try {
      return Optional.of(key.apply(o));
    } catch (RuntimeException e) {
      return Optional.empty(); // not numbers: someone else's data
    }
  }
}
