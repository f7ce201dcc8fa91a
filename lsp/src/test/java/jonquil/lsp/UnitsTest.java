package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import jonquil.source.ProjectRoot;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.junit.jupiter.api.Test;

/** The pieces under the protocol: URI keys, position conversion and the check worker. */
class UnitsTest {
  @Test
  void uriSpellingsOfOneFileGiveOneKey() {
    assertEquals(
        Documents.pathOf("file:///tmp/%5Bx%5D.jonq"), Documents.pathOf("file:///tmp/%5bx%5d.jonq"));
    assertEquals(
        Documents.pathOf("file:///c%3A/w/a.jonq"), Documents.pathOf("file:///C:/w/a.jonq"));
    assertEquals(
        Documents.pathOf("file:///c:/w/a.jonq"),
        Documents.pathOf("FILE://localhost/C%3a/w/./a.jonq"));
    assertEquals(
        Path.of("/tmp/a b.jonq"), Documents.pathOf("file:///tmp/a%20b.jonq").orElseThrow());
    assertEquals(Path.of("/tmp/a+b.jonq"), Documents.pathOf("file:///tmp/a+b.jonq").orElseThrow());
    assertTrue(Documents.pathOf("untitled:Untitled-1").isEmpty());
    assertTrue(Documents.pathOf("file:///tmp/%zz").isEmpty());
  }

  @Test
  void positionsInTheThreeEncodingsAndClamping() {
    SourceFile f = new SourceFile(Path.of("e.jonq"), "use \"😀é\" x\r\nnext\n");
    int x = f.text().indexOf('x');
    Convert u16 = new Convert(Convert.Encoding.UTF_16, p -> null);
    Convert u8 = new Convert(Convert.Encoding.UTF_8, p -> null);
    Convert u32 = new Convert(Convert.Encoding.UTF_32, p -> null);
    assertEquals(new Position(0, 10), u16.position(f, x));
    assertEquals(new Position(0, 13), u8.position(f, x));
    assertEquals(new Position(0, 9), u32.position(f, x));
    assertEquals(x, u16.offset(f, new Position(0, 10)));
    assertEquals(x, u8.offset(f, new Position(0, 13)));
    assertEquals(x, u32.offset(f, new Position(0, 9)));
    // Past the line end clamps before the CRLF; past the last line clamps to the end; inside a pair
    // never splits it.
    assertEquals(f.text().indexOf('\r'), u16.offset(f, new Position(0, 99)));
    assertEquals(f.text().length(), u16.offset(f, new Position(99, 0)));
    assertEquals(0, u16.offset(f, new Position(-1, -5)));
    assertEquals(5, u16.offset(f, new Position(0, 6)));
    assertEquals(new Position(1, 0), u16.position(f, f.text().indexOf("next")));
  }

  @Test
  void incrementalChangesApplyInTheNegotiatedEncoding() {
    Convert u8 = new Convert(Convert.Encoding.UTF_8, p -> null);
    String text = "a😀b\nc";
    String out =
        u8.applyChange(
            text,
            new TextDocumentContentChangeEvent(
                new Range(new Position(0, 5), new Position(1, 0)), "X"));
    assertEquals("a😀Xc", out);
    assertEquals("whole", u8.applyChange(text, new TextDocumentContentChangeEvent("whole")));
  }

  @Test
  void aRequestAfterAPauseRunsAtOnceAndRequestsDuringARunAreCoalescedIntoOne() throws Exception {
    AtomicInteger runs = new AtomicInteger();
    CountDownLatch firstStarted = new CountDownLatch(1);
    CountDownLatch releaseFirst = new CountDownLatch(1);
    CountDownLatch secondDone = new CountDownLatch(1);
    // A long debounce: the first run can start well before it only if the leading edge works.
    try (CheckScheduler s =
        new CheckScheduler(
            superseded -> {
              if (runs.incrementAndGet() == 1) {
                firstStarted.countDown();
                await(releaseFirst);
                return true;
              }
              secondDone.countDown();
              return true;
            },
            t -> {},
            Duration.ofMillis(2000),
            Duration.ofSeconds(10),
            () -> {},
            true)) {
      long asked = System.nanoTime();
      s.request();
      assertTrue(firstStarted.await(5, TimeUnit.SECONDS));
      assertTrue(
          System.nanoTime() - asked < TimeUnit.MILLISECONDS.toNanos(1000),
          "a request after a pause starts its run without waiting for the 2 s debounce");
      for (int i = 0; i < 49; i++) {
        s.request();
      }
      releaseFirst.countDown();
      assertTrue(
          secondDone.await(5, TimeUnit.SECONDS), "the requests made during the run get a run");
      Thread.sleep(500);
      assertEquals(2, runs.get(), "forty-nine requests in quick succession are one trailing run");
    }
  }

  @Test
  void aRunGivesUpWhenSupersededButSteadyRequestsStillGetAFinishedRunWithinTheMaxDelay()
      throws Exception {
    AtomicInteger gaveUp = new AtomicInteger();
    AtomicInteger finished = new AtomicInteger();
    try (CheckScheduler s =
        new CheckScheduler(
            superseded -> {
              // A long check that polls like the checker does between stages.
              for (int i = 0; i < 40; i++) {
                if (superseded.getAsBoolean()) {
                  gaveUp.incrementAndGet();
                  return false;
                }
                sleep(5);
              }
              finished.incrementAndGet();
              return true;
            },
            t -> {},
            Duration.ofMillis(20),
            Duration.ofMillis(400),
            () -> {},
            true)) {
      long end = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(2000);
      while (System.nanoTime() < end) {
        s.request(); // an edit every 10 ms: every run is superseded before it ends
        Thread.sleep(10);
      }
      assertTrue(gaveUp.get() > 0, "stale runs give up");
      assertTrue(
          finished.get() >= 1,
          "yet the 400 ms bound lets runs finish during steady typing: " + finished.get());
    }
  }

  @Test
  void theWorkerSurvivesAThrowable() throws Exception {
    AtomicInteger runs = new AtomicInteger();
    AtomicInteger failures = new AtomicInteger();
    CountDownLatch second = new CountDownLatch(1);
    try (CheckScheduler s =
        new CheckScheduler(
            () -> {
              if (runs.incrementAndGet() == 1) {
                throw new StackOverflowError("deep");
              }
              second.countDown();
            },
            t -> failures.incrementAndGet(),
            Duration.ofMillis(50),
            Duration.ofSeconds(1))) {
      s.request();
      long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
      while (failures.get() == 0 && System.nanoTime() < deadline) {
        Thread.sleep(10);
      }
      assertEquals(1, failures.get());
      s.request();
      assertTrue(second.await(5, TimeUnit.SECONDS), "the worker lives on after a Throwable");
    }
  }

  private static void await(CountDownLatch latch) {
    try {
      latch.await(5, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }

  private static void sleep(long millis) {
    try {
      Thread.sleep(millis);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }

  @Test
  void projectRootIsTheInnermostFolder() {
    Path file = Path.of("/w/a/b/c.jonq");
    assertEquals(
        Path.of("/w/a"),
        ProjectRoot.owning(file, List.of(Path.of("/w"), Path.of("/w/a"), Path.of("/x"))));
  }
}
