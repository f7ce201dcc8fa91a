package jonquil.format;

import java.util.List;
import java.util.Optional;
import jonquil.diag.Edit;
import jonquil.diag.Severity;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.SpecParser;
import jonquil.syntax.TokenKind;

/**
 * Rewrites a spec in the one canonical layout, so that diffs show changed facts and never changed
 * spacing. Only whitespace, line breaks and the inline separator ';' ever change: every other token
 * and every comment stays, in the same order (see package-info for the rules).
 */
public final class Formatter {
  private Formatter() {}

  /**
   * The canonical text of {@code file}, or empty when it has syntax errors: a broken file is never
   * formatted, since recovery could only guess what it means.
   */
  public static Optional<String> format(SourceFile file, FormatOptions options) {
    if (hasSyntaxErrors(file)) {
      return Optional.empty();
    }
    String formatted = render(file.text(), options);
    // A layout bug must never cost the writer a token: keep the text as it was instead.
    boolean safe =
        sameTokens(file.text(), formatted)
            && !hasSyntaxErrors(new SourceFile(file.path(), formatted));
    return Optional.of(safe ? formatted : file.text());
  }

  /**
   * The edits that format {@code file}: none when it is already canonical or has syntax errors,
   * else one replacement of the whole text.
   */
  public static List<Edit> edits(SourceFile file, FormatOptions options) {
    return format(file, options)
        .filter(formatted -> !formatted.equals(file.text()))
        .map(
            formatted ->
                List.of(new Edit(file.path(), new TextRange(0, file.text().length()), formatted)))
        .orElse(List.of());
  }

  static boolean hasSyntaxErrors(SourceFile file) {
    return SpecParser.parse(file).diagnostics().stream()
        .anyMatch(d -> d.severity() == Severity.ERROR);
  }

  /** The layout alone, without the safety net; the caller has checked that the text parses. */
  static String render(String text, FormatOptions options) {
    String newline = LineEnding.of(text);
    StringBuilder result = new StringBuilder();
    if (text.startsWith("\uFEFF")) {
      result.append('\uFEFF'); // a byte-order mark is the file's encoding label, not layout
    }
    for (Line line : Layout.lines(WrittenToken.of(text), options)) {
      result.append(WrittenToken.stripTrailingSpace(line.text())).append(newline);
    }
    return result.toString();
  }

  /** True when both texts hold the same tokens and comments in the same order, separators aside. */
  static boolean sameTokens(String before, String after) {
    return tokens(before).equals(tokens(after));
  }

  /** The tokens that carry what the writer wrote: everything but line breaks and ';'. */
  static List<String> tokens(String text) {
    return WrittenToken.of(text).stream()
        .filter(l -> l.kind() != TokenKind.NEWLINE && l.kind() != TokenKind.SEMICOLON)
        .map(l -> l.kind() + " " + l.text())
        .toList();
  }
}
