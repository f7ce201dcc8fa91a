package jonquil.ide;

/** One thing that may be written at the cursor, so an editor can offer it. */
public record CompletionItemInfo(String label, Kind kind, String detail, String documentation) {

  /** What an item names. */
  public enum Kind {
    KEYWORD("keyword"),
    /** An element kind word ("lens"). */
    KIND("kind"),
    PARAMETER("parameter"),
    ELEMENT("element"),
    PORT("port"),
    MATERIAL("material"),
    UNIT("unit"),
    MEASURE("measure");

    private final String word;

    Kind(String word) {
      this.word = word;
    }

    /** The lower-case word tests show. */
    public String word() {
      return word;
    }
  }
}
