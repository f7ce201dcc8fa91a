package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Retained heap stays flat over 10 000 didChange and 1 000 open/close cycles of distinct files.
 * Method: warm the server with the same kinds of traffic, let it go quiet, run the collector until
 * the used heap stops falling and take that as the baseline; then run the soak, go quiet, collect
 * the same way and compare. The bound is 10 % of the baseline or 8 MB, whichever is larger (the
 * floor absorbs collector noise on a small heap). A leak of one document text (about 2 KB) per edit
 * would retain about 20 MB; one retained check result per closed file, far more.
 */
class MemorySoakTest {
  static final int CHANGES = 10_000;
  static final int OPEN_CLOSE = 1_000;
  static final long FLOOR_BYTES = 8L << 20;

  @TempDir Path dir;

  @Test
  void retainedHeapStaysFlat() throws Exception {
    Path repo = Path.of(System.getProperty("jonquil.repo", "..")).toAbsolutePath().normalize();
    String sample =
        Files.readString(repo.resolve("samples/optical_trap.jonq"))
            .replace(
                "use \"parts/bench_parts.jonq\"\n",
                "material demo_crown = index 1.5\nmaterial saline = water\n");
    Files.writeString(dir.resolve(".jonquil-root"), "");
    String main = dir.resolve("main.jonq").toUri().toString();
    try (LspHarness h = new LspHarness(new StandIn(), Duration.ofMillis(5))) {
      h.initialize(dir);
      h.open(main, 1, sample);
      int[] version = {1};
      traffic(h, main, sample, version, 500, 50, "warm");
      long baseline = settledHeap(h);

      traffic(h, main, sample, version, CHANGES, OPEN_CLOSE, "soak");
      long after = settledHeap(h);

      long bound = Math.max(baseline / 10, FLOOR_BYTES);
      long max = Runtime.getRuntime().maxMemory();
      System.err.printf(
          "memory soak: baseline %.1f MB, after %.1f MB, max heap %.0f MB%n",
          mb(baseline), mb(after), mb(max));
      assertTrue(
          after - baseline < bound,
          String.format(
              "retained heap grew from %.1f MB to %.1f MB (bound +%.1f MB)",
              mb(baseline), mb(after), mb(bound)));
      assertEquals(1, h.server.documents.snapshot().size(), "only the main document is still open");
    }
  }

  /**
   * Edits that keep the text's size (type a digit, delete it) and open/close cycles of distinct
   * files, interleaved.
   */
  private static void traffic(
      LspHarness h,
      String main,
      String sample,
      int[] version,
      int changes,
      int cycles,
      String prefix)
      throws Exception {
    int line = 1;
    int everyCycle = Math.max(1, changes / cycles);
    for (int i = 0; i < changes; i++) {
      Position at = new Position(line, 0);
      TextDocumentContentChangeEvent change =
          i % 2 == 0
              ? new TextDocumentContentChangeEvent(new Range(at, at), "7")
              : new TextDocumentContentChangeEvent(new Range(at, new Position(line, 1)), "");
      h.change(main, ++version[0], change);
      if (i % everyCycle == 0) {
        String other =
            h.server
                .convert()
                .uri(
                    Path.of(
                        Documents.pathOf(main).orElseThrow().getParent().toString(),
                        prefix + "-" + i + ".jonq"));
        h.open(other, 1, sample);
        if (i % (everyCycle * 50) == 0) {
          h.client.await(other, p -> Integer.valueOf(1).equals(p.getVersion()));
        }
        h.close(other);
      }
      if (i % 500 == 499 || i == changes - 1) {
        int v = version[0];
        h.client.await(main, p -> Integer.valueOf(v).equals(p.getVersion()));
        h.client.forget(); // the test's client must not be what grows
      }
    }
  }

  /**
   * The used heap after the server went quiet and repeated collections stopped freeing more than 1
   * %.
   */
  private static long settledHeap(LspHarness h) throws InterruptedException {
    // Past the debounce and past the editor's second, full pass (the yields), which on a loaded
    // machine can take seconds: a check still running holds its model and would count as growth.
    Thread.sleep(300);
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
    while (!h.server.checksIdle() && System.nanoTime() < deadline) {
      TimeUnit.MILLISECONDS.sleep(20);
    }
    assertTrue(h.server.checksIdle(), "the server still checks a minute after the last edit");
    Thread.sleep(100); // the publication of the last check
    h.client.forget();
    long previous = Long.MAX_VALUE;
    long used = used();
    for (int i = 0; i < 10 && used < previous - previous / 100; i++) {
      previous = used;
      System.gc();
      TimeUnit.MILLISECONDS.sleep(100);
      used = used();
    }
    return used;
  }

  private static long used() {
    return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
  }

  private static double mb(long bytes) {
    return bytes / (1024.0 * 1024.0);
  }
}
