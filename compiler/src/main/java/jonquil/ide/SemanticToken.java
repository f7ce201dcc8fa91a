package jonquil.ide;

/** One classified span of a file for an editor's highlighting, in UTF-16 offsets. */
public record SemanticToken(int start, int length, Type type, boolean declaration) {

  /** What a span is, as an editor colours it. */
  public enum Type {
    KEYWORD("keyword"),
    /** Kind words ("lens", "mirror"). */
    TYPE("type"),
    /** Declared and referenced names. */
    VARIABLE("variable"),
    /** Parameter keys, ports and measures. */
    PROPERTY("property"),
    NUMBER("number"),
    UNIT("unit"),
    STRING("string"),
    COMMENT("comment"),
    OPERATOR("operator");

    private final String word;

    Type(String word) {
      this.word = word;
    }

    /** The lower-case word tests and golden files show. */
    public String word() {
      return word;
    }
  }
}
