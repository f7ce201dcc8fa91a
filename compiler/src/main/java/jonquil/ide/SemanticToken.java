package jonquil.ide;

/**
 * One classified span of a file for an editor's highlighting, in UTF-16 offsets; {@code type} is
 * one of "keyword", "type" (kind words), "variable" (names), "property" (parameter keys, ports,
 * measures), "number", "unit", "string", "comment" or "operator".
 */
public record SemanticToken(int start, int length, String type, boolean declaration) {}
