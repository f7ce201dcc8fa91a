package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import jonquil.Result;
import jonquil.ide.EditorFeatures;
import jonquil.ide.HoverInfo;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseMessage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** $/cancelRequest answers a slow request with -32800 at once and frees the worker it held. */
class CancellationTest {
  @TempDir Path dir;

  @Test
  void cancellingSlowHoversAnswers32800QuicklyAndFreesBothWorkers() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    String text = "material glass = index 1.5\n";
    Path file = dir.resolve("slow.jonq");
    Files.writeString(file, text);
    String uri = file.toUri().toString();
    CountDownLatch never = new CountDownLatch(1);
    CountDownLatch started = new CountDownLatch(2);
    AtomicInteger interrupted = new AtomicInteger();
    EditorFeatures slow =
        new StandIn() {
          @Override
          public Optional<HoverInfo> hover(Result result, Path f, int offset) {
            if (offset == 0) {
              started.countDown();
              try {
                never.await(); // only an interrupt ends this
              } catch (InterruptedException e) {
                interrupted.incrementAndGet();
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted");
              }
            }
            return Optional.of(new HoverInfo("fast", null));
          }
        };
    try (LspHarness h = new LspHarness(slow)) {
      h.initialize(dir);
      h.open(uri, 1, text);
      var service = h.remote.getTextDocumentService();
      TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
      // Two slow requests hold both request workers.
      CompletableFuture<Hover> first = service.hover(new HoverParams(doc, new Position(0, 0)));
      CompletableFuture<Hover> second = service.hover(new HoverParams(doc, new Position(0, 0)));
      assertTrue(started.await(10, TimeUnit.SECONDS), "both slow hovers are running");

      long sent = System.nanoTime();
      first.cancel(true); // the LSP4J client sends $/cancelRequest
      second.cancel(true);
      List<ResponseMessage> cancelled = awaitCancelled(h, 2);
      long millis = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - sent);
      assertEquals(2, cancelled.size());
      // LSP4J answers -32800 as soon as the reader takes $/cancelRequest; the body's interrupt is
      // separate.
      assertTrue(millis < 100, "cancellation answered after " + millis + " ms");
      System.err.println("cancellation: both -32800 answers after " + millis + " ms");

      // Both workers are free again: a third request is answered although the latch never opens.
      Hover next = service.hover(new HoverParams(doc, new Position(0, 3))).get(5, TimeUnit.SECONDS);
      assertEquals("fast", next.getContents().getRight().getValue());
      assertEquals(2, interrupted.get(), "the cancelled bodies were interrupted");
      assertEquals(
          0,
          h.responses.stream()
              .filter(
                  r ->
                      r.getError() != null
                          && r.getError().getCode()
                              != ResponseErrorCode.RequestCancelled.getValue())
              .count(),
          "no other error");
    }
  }

  @Test
  void repliesAreWrittenByAThreadThatCancelsNeverInterrupt() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    String text =
        "material glass = index 1.5\nwindow w1 {\n  material   glass\n  thickness  2 mm\n}\n";
    Path file = dir.resolve("writer.jonq");
    Files.writeString(file, text);
    String uri = file.toUri().toString();
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir);
      h.open(uri, 1, text);
      var service = h.remote.getTextDocumentService();
      TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
      for (int i = 0; i < 5; i++) {
        assertTrue(
            service.hover(new HoverParams(doc, new Position(1, 8))).get(10, TimeUnit.SECONDS)
                != null);
      }
      // A cancel interrupts the request worker; had it been writing a reply to a channel-backed
      // stream, the interrupt would close the channel and silence the server. So no worker writes.
      assertTrue(
          h.serverWriters.contains("jonquil-replies"), "replies are written: " + h.serverWriters);
      assertTrue(
          h.serverWriters.stream().noneMatch(t -> t.startsWith("jonquil-request-")),
          "a request worker wrote to the output: " + h.serverWriters);
    }
  }

  private static List<ResponseMessage> awaitCancelled(LspHarness h, int count)
      throws InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
    while (true) {
      List<ResponseMessage> found;
      synchronized (h.responses) {
        found =
            h.responses.stream()
                .filter(
                    r ->
                        r.getError() != null
                            && r.getError().getCode()
                                == ResponseErrorCode.RequestCancelled.getValue())
                .toList();
      }
      if (found.size() >= count || System.nanoTime() > deadline) {
        return found;
      }
      Thread.sleep(2);
    }
  }
}
