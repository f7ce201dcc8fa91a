package jonquil.format;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import jonquil.diag.Edit;
import jonquil.source.TextRange;

/**
 * Cuts the formatter's whole-file rewrite into line hunks, because an editor's range formatting
 * must change only what the selection touches while the formatter formats whole files. Text in,
 * text edits out: no knowledge of the language.
 */
public final class FormatHunks {
  /** Past this many changed lines the diff stops looking for a finer cut and makes one hunk. */
  static final int MAX_CHANGES = 2000;

  /**
   * Old lines {@code [firstLine, endLine)} at UTF-16 offsets {@code [start, end)} become {@code
   * newText}.
   */
  public record Hunk(int firstLine, int endLine, int start, int end, String newText) {}

  private FormatHunks() {}

  /** The edits of the hunks that touch old lines {@code firstLine..lastLine} (inclusive). */
  public static List<Edit> within(
      Path file, String before, String after, int firstLine, int lastLine) {
    List<Edit> out = new ArrayList<>();
    for (Hunk h : hunks(before, after)) {
      boolean touches =
          h.endLine() > h.firstLine()
              ? h.firstLine() <= lastLine && h.endLine() > firstLine
              : h.firstLine() >= firstLine
                  && h.firstLine() <= lastLine + 1; // a pure insertion at a line boundary
      if (touches) {
        out.add(new Edit(file, new TextRange(h.start(), h.end()), h.newText()));
      }
    }
    return out;
  }

  /** The line hunks that turn {@code before} into {@code after}, in order and not overlapping. */
  public static List<Hunk> hunks(String before, String after) {
    List<String> a = splitLines(before);
    List<String> b = splitLines(after);
    int[] starts = new int[a.size() + 1];
    for (int i = 0; i < a.size(); i++) {
      starts[i + 1] = starts[i] + a.get(i).length();
    }
    int prefix = 0;
    while (prefix < a.size() && prefix < b.size() && a.get(prefix).equals(b.get(prefix))) {
      prefix++;
    }
    int suffix = 0;
    while (suffix < a.size() - prefix
        && suffix < b.size() - prefix
        && a.get(a.size() - 1 - suffix).equals(b.get(b.size() - 1 - suffix))) {
      suffix++;
    }
    List<String> midA = a.subList(prefix, a.size() - suffix);
    List<String> midB = b.subList(prefix, b.size() - suffix);
    boolean[][] changed = changedLines(midA, midB);
    List<Hunk> out = new ArrayList<>();
    int i = 0;
    int j = 0;
    while (i < midA.size() || j < midB.size()) {
      if (i < midA.size() && j < midB.size() && !changed[0][i] && !changed[1][j]) {
        i++;
        j++;
        continue;
      }
      int i0 = i;
      int j0 = j;
      while (i < midA.size() && changed[0][i]) {
        i++;
      }
      while (j < midB.size() && changed[1][j]) {
        j++;
      }
      StringBuilder text = new StringBuilder();
      for (int k = j0; k < j; k++) {
        text.append(midB.get(k));
      }
      out.add(
          new Hunk(
              prefix + i0, prefix + i, starts[prefix + i0], starts[prefix + i], text.toString()));
    }
    return out;
  }

  /**
   * Marks the lines of {@code a} deleted and of {@code b} inserted by a shortest edit script (the
   * greedy O((N+M)D) method of E. W. Myers, 1986, "An O(ND) difference algorithm and its
   * variations", Algorithmica 1:251-266); past {@link #MAX_CHANGES} every line is marked.
   */
  static boolean[][] changedLines(List<String> a, List<String> b) {
    int n = a.size();
    int m = b.size();
    boolean[] deleted = new boolean[n];
    boolean[] inserted = new boolean[m];
    int max = n + m;
    if (max == 0) {
      return new boolean[][] {deleted, inserted};
    }
    int offset = max + 1;
    int[] v = new int[2 * max + 3];
    List<int[]> trace = new ArrayList<>();
    int found = -1;
    for (int d = 0; d <= Math.min(max, MAX_CHANGES) && found < 0; d++) {
      trace.add(Arrays.copyOfRange(v, offset - d - 1, offset + d + 2));
      for (int k = -d; k <= d; k += 2) {
        int x =
            k == -d || (k != d && v[offset + k - 1] < v[offset + k + 1])
                ? v[offset + k + 1]
                : v[offset + k - 1] + 1;
        int y = x - k;
        while (x < n && y < m && a.get(x).equals(b.get(y))) {
          x++;
          y++;
        }
        v[offset + k] = x;
        if (x >= n && y >= m) {
          found = d;
          break;
        }
      }
    }
    if (found < 0) {
      Arrays.fill(deleted, true);
      Arrays.fill(inserted, true);
      return new boolean[][] {deleted, inserted};
    }
    int x = n;
    int y = m;
    for (int d = found; d > 0; d--) {
      int[] saved = trace.get(d); // v as it was before step d, for k in [-d-1, d+1]
      int k = x - y;
      boolean down = k == -d || (k != d && saved[k - 1 + d + 1] < saved[k + 1 + d + 1]);
      int prevK = down ? k + 1 : k - 1;
      int prevX = saved[prevK + d + 1];
      int prevY = prevX - prevK;
      // The step is one insertion (down) or one deletion, then equal lines up to (x, y).
      if (down) {
        inserted[prevY] = true;
      } else {
        deleted[prevX] = true;
      }
      x = prevX;
      y = prevY;
    }
    return new boolean[][] {deleted, inserted};
  }

  /** Lines with their terminators (LF, CRLF or CR), so that joining them gives the text back. */
  public static List<String> splitLines(String text) {
    List<String> out = new ArrayList<>();
    int start = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\n' || c == '\r') {
        if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
          i++;
        }
        out.add(text.substring(start, i + 1));
        start = i + 1;
      }
    }
    if (start < text.length()) {
      out.add(text.substring(start));
    }
    return out;
  }
}
