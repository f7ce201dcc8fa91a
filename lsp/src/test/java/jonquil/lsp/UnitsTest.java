package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.junit.jupiter.api.Test;

/** The pieces under the protocol: URI keys, position conversion and the check worker. */
class UnitsTest {
  @Test
  void uriSpellingsOfOneFileGiveOneKey() {
    assertEquals(Documents.pathOf("file:///tmp/%5Bx%5D.jonq"), Documents.pathOf("file:///tmp/%5bx%5d.jonq"));
    assertEquals(Documents.pathOf("file:///c%3A/w/a.jonq"), Documents.pathOf("file:///C:/w/a.jonq"));
    assertEquals(Documents.pathOf("file:///c:/w/a.jonq"), Documents.pathOf("FILE://localhost/C%3a/w/./a.jonq"));
    assertEquals(Path.of("/tmp/a b.jonq"), Documents.pathOf("file:///tmp/a%20b.jonq").orElseThrow());
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
    // Past the line end clamps before the CRLF; past the last line clamps to the end; inside a pair never splits it.
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
    String out = u8.applyChange(text, new TextDocumentContentChangeEvent(new Range(new Position(0, 5), new Position(1, 0)), "X"));
    assertEquals("a😀Xc", out);
    assertEquals("whole", u8.applyChange(text, new TextDocumentContentChangeEvent("whole")));
  }

  @Test
  void theWorkerCoalescesAndSurvivesAThrowable() throws Exception {
    AtomicInteger runs = new AtomicInteger();
    AtomicInteger failures = new AtomicInteger();
    CountDownLatch second = new CountDownLatch(1);
    try (CheckScheduler s = new CheckScheduler(() -> {
      if (runs.incrementAndGet() == 1) {
        throw new StackOverflowError("deep");
      }
      second.countDown();
    }, t -> failures.incrementAndGet(), Duration.ofMillis(50), Duration.ofSeconds(1))) {
      for (int i = 0; i < 50; i++) {
        s.request();
      }
      long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
      while (failures.get() == 0 && System.nanoTime() < deadline) {
        Thread.sleep(10);
      }
      assertEquals(1, runs.get(), "fifty quick requests are one run");
      assertEquals(1, failures.get());
      s.request();
      assertTrue(second.await(5, TimeUnit.SECONDS), "the worker lives on after a Throwable");
    }
  }

  @Test
  void projectRootIsTheInnermostFolder() {
    Path file = Path.of("/w/a/b/c.jonq");
    assertEquals(Path.of("/w/a"), CheckCycle.projectRoot(file, List.of(Path.of("/w"), Path.of("/w/a"), Path.of("/x"))));
  }
}
