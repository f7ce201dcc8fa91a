package jonquil.ide;

/**
 * One thing that may be written at the cursor, so an editor can offer it; {@code kind} is one of
 * "keyword", "kind", "parameter", "element", "port", "material", "unit" or "measure".
 */
public record CompletionItemInfo(String label, String kind, String detail, String documentation) {}
