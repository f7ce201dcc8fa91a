package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import jonquil.diag.Edit;
import org.junit.jupiter.api.Test;

/** The line hunks that range formatting applies: they rebuild the new text and stay local. */
class FormatHunksTest {
  @Test
  void hunksRebuildTheNewTextFromTheOld() {
    SplittableRandom random = new SplittableRandom(20240611);
    String[] pool = {"a\n", "b\n", "c\n", "\n", "  d\n", "e\r\n", "f"};
    for (int round = 0; round < 2000; round++) {
      String before = randomText(random, pool);
      String after = randomText(random, pool);
      StringBuilder rebuilt = new StringBuilder(before);
      List<FormatHunks.Hunk> hunks = FormatHunks.hunks(before, after);
      for (int i = hunks.size() - 1; i >= 0; i--) {
        FormatHunks.Hunk hk = hunks.get(i);
        rebuilt.replace(hk.start(), hk.end(), hk.newText());
      }
      assertEquals(after, rebuilt.toString(), "from " + before + " to " + after);
      int changedLines =
          hunks.stream()
              .mapToInt(
                  hk -> hk.endLine() - hk.firstLine() + FormatHunks.splitLines(hk.newText()).size())
              .sum();
      int bound = FormatHunks.splitLines(before).size() + FormatHunks.splitLines(after).size();
      assertTrue(changedLines <= bound);
    }
  }

  private static String randomText(SplittableRandom random, String[] pool) {
    StringBuilder s = new StringBuilder();
    int n = random.nextInt(12);
    for (int i = 0; i < n; i++) {
      String piece = pool[random.nextInt(pool.length)];
      s.append(piece.endsWith("\n") || i == n - 1 ? piece : piece + "\n");
    }
    return s.toString();
  }

  @Test
  void withinKeepsOnlyTheHunksTouchingTheSelectedLines() {
    String before = "a\nB\nc\nD\ne\n";
    String after = "a\nb\nc\nd\ne\n";
    Path file = Path.of("f.jonq");
    List<Edit> second = FormatHunks.within(file, before, after, 1, 1);
    assertEquals(List.of(new Edit(file, new jonquil.source.TextRange(2, 4), "b\n")), second);
    assertEquals(2, FormatHunks.within(file, before, after, 0, 4).size());
    assertEquals(List.of(), FormatHunks.within(file, before, after, 2, 2));
  }
}
