package jonquil.lsp;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/** Markdown hovers read as plain text, for clients that show hover content only as plaintext. */
final class PlainMarkdown {
  private static final Pattern FENCE = Pattern.compile("^\\s*```.*$");
  private static final Pattern TABLE_RULE =
      Pattern.compile("^\\s*\\|?\\s*:?-{3,}:?\\s*(\\|\\s*:?-{3,}:?\\s*)*\\|?\\s*$");
  private static final Pattern HEADING = Pattern.compile("^\\s{0,3}#{1,6}\\s+");
  private static final Pattern LINK = Pattern.compile("\\[([^\\]]*)\\]\\(([^)\\s]*)\\)");
  private static final Pattern ESCAPE = Pattern.compile("\\\\([\\\\`*_|#\\[\\]()])");

  /** An escaped pipe while table cells are split: a private-use character no hover contains. */
  private static final String PIPE = "\uE000";

  private PlainMarkdown() {}

  /**
   * The text with its Markdown marks removed: code fences, table rules, headings' '#', '**',
   * backticks, link brackets and backslash escapes. Tables keep their cells, with ' | ' between
   * them; single '*' and '_' are left alone, since names contain '_'.
   */
  static String strip(String markdown) {
    if (markdown == null || markdown.isEmpty()) {
      return "";
    }
    List<String> out = new ArrayList<>();
    for (String line : markdown.split("\r\n|\r|\n", -1)) {
      if (FENCE.matcher(line).matches() || TABLE_RULE.matcher(line).matches()) {
        continue;
      }
      String l = HEADING.matcher(line).replaceFirst("");
      l = l.replace("\\|", PIPE);
      String trimmed = l.strip();
      if (trimmed.startsWith("|") && trimmed.endsWith("|") && trimmed.length() > 1) {
        List<String> cells = new ArrayList<>();
        for (String cell : trimmed.substring(1, trimmed.length() - 1).split("\\|", -1)) {
          cells.add(cell.strip());
        }
        l = String.join(" | ", cells).strip();
      }
      l = l.replace("**", "").replace("`", "");
      l = LINK.matcher(l).replaceAll("$1 ($2)");
      l = ESCAPE.matcher(l).replaceAll("$1");
      out.add(l.replace(PIPE, "|"));
    }
    return String.join("\n", out).strip();
  }
}
