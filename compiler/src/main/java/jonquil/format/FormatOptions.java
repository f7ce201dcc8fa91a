package jonquil.format;

/**
 * How the formatter indents: an editor sends its own tab size and tab preference, the command line
 * uses {@link #DEFAULT}.
 *
 * @param indent columns per block level (with tabs: how wide a tab counts when lines are measured)
 * @param insertSpaces indent with spaces rather than one tab per level
 */
public record FormatOptions(int indent, boolean insertSpaces) {
  /** Two spaces per level. */
  public static final FormatOptions DEFAULT = new FormatOptions(2, true);

  public FormatOptions {
    if (indent < 0 || indent > 16) {
      throw new IllegalArgumentException("indent must be from 0 to 16 columns; got " + indent);
    }
  }

  /** The text of one indentation level. */
  String unit() {
    return insertSpaces ? " ".repeat(indent) : "\t";
  }
}
