package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** The `lsp` subcommand: speaks framed JSON-RPC on its streams and ends when its input ends. */
class LspCommandTest {
  private static String frame(String json) {
    return "Content-Length: " + json.getBytes(StandardCharsets.UTF_8).length + "\r\n\r\n" + json;
  }

  @Test
  void answersInitializeAndExitsWithZeroAfterShutdownAndExit() throws Exception {
    String in = frame("{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{}}}")
        + frame("{\"jsonrpc\":\"2.0\",\"method\":\"initialized\",\"params\":{}}")
        + frame("{\"jsonrpc\":\"2.0\",\"id\":2,\"method\":\"shutdown\"}")
        + frame("{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    LspCommand command = new LspCommand(new ByteArrayInputStream(in.getBytes(StandardCharsets.UTF_8)), out,
        new NoAnswers());
    int code = CompletableFuture.supplyAsync(() -> {
      try {
        return command.call();
      } catch (Exception e) {
        throw new IllegalStateException(e);
      }
    }).get(10, TimeUnit.SECONDS);
    assertEquals(0, code);
    String written = out.toString(StandardCharsets.UTF_8);
    assertTrue(written.startsWith("Content-Length: "), "only protocol on the output: " + written);
    assertTrue(written.contains("\"serverInfo\""), written);
  }

  @Test
  void endsWithinTwoSecondsWhenInputClosesWithoutExit() throws Exception {
    String in = frame("{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{}}}");
    LspCommand command = new LspCommand(new ByteArrayInputStream(in.getBytes(StandardCharsets.UTF_8)),
        new ByteArrayOutputStream(), new NoAnswers());
    long start = System.nanoTime();
    int code = CompletableFuture.supplyAsync(() -> {
      try {
        return command.call();
      } catch (Exception e) {
        throw new IllegalStateException(e);
      }
    }).get(10, TimeUnit.SECONDS);
    assertTrue(System.nanoTime() - start < TimeUnit.SECONDS.toNanos(2), "took too long to notice stdin closed");
    assertEquals(1, code, "no shutdown was asked for");
  }
}
