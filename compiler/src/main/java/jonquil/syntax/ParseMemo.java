package jonquil.syntax;

import java.nio.file.Path;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * What an editor keeps between checks so that an edit costs a parse of what it touched: each file's
 * last parse, whole (a file whose text did not change is not parsed again) and by top-level
 * statement (an unchanged statement keeps its tree, moved if text before it grew or shrank).
 * Parsing stays a pure function of the text; this is only its memory. Not thread-safe: one memo per
 * checking thread.
 */
public final class ParseMemo {
  /** A statement's tree as parsed at UTF-16 offset {@code start}. */
  record Kept(int start, Object statement) {}

  private final Map<Path, ParseResult> whole = new HashMap<>();
  private final Map<Path, Map<String, Kept>> statements = new HashMap<>();
  private int reused;
  private int parsed;

  /** The last parse of this file if its text is the same, else null. */
  ParseResult unchanged(jonquil.source.SourceFile source) {
    ParseResult last = whole.get(source.path());
    return last != null && last.source().text().equals(source.text()) ? last : null;
  }

  Map<String, Kept> statementsOf(Path file) {
    return statements.getOrDefault(file, Map.of());
  }

  void remember(ParseResult result, Map<String, Kept> byText, int reusedNow, int parsedNow) {
    whole.put(result.source().path(), result);
    statements.put(result.source().path(), byText);
    reused = reusedNow;
    parsed = parsedNow;
  }

  /** Keeps only these files: the memo holds what the latest checks read, no more. */
  public void retainOnly(Collection<Path> files) {
    Set<Path> keep = new HashSet<>(files);
    whole.keySet().retainAll(keep);
    statements.keySet().retainAll(keep);
  }

  /** Statements the last statement-wise parse took from the memo. */
  public int lastReused() {
    return reused;
  }

  /** Statements the last statement-wise parse had to parse. */
  public int lastParsed() {
    return parsed;
  }
}
