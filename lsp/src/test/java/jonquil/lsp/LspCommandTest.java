package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The `lsp` subcommand: speaks framed JSON-RPC on its streams and ends when its input ends. */
class LspCommandTest {
  static final Pattern CHECK_LINE =
      Pattern.compile(
          "^jonquil lsp: debug: check: 1 open, 1 files read, (\\d+) diagnostics, \\d+ ms$",
          Pattern.MULTILINE);
  static final Pattern HOVER_LINE =
      Pattern.compile(
          "^jonquil lsp: debug: request textDocument/hover: answered in \\d+ ms$",
          Pattern.MULTILINE);

  @TempDir Path dir;

  private static String frame(String json) {
    return "Content-Length: " + json.getBytes(StandardCharsets.UTF_8).length + "\r\n\r\n" + json;
  }

  @Test
  void answersInitializeAndExitsWithZeroAfterShutdownAndExit() throws Exception {
    String in =
        frame(
                "{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{}}}")
            + frame("{\"jsonrpc\":\"2.0\",\"method\":\"initialized\",\"params\":{}}")
            + frame("{\"jsonrpc\":\"2.0\",\"id\":2,\"method\":\"shutdown\"}")
            + frame("{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    LspCommand command =
        new LspCommand(
            new ByteArrayInputStream(in.getBytes(StandardCharsets.UTF_8)), out, new StandIn());
    int code =
        CompletableFuture.supplyAsync(
                () -> {
                  try {
                    return command.call();
                  } catch (Exception e) {
                    throw new IllegalStateException(e);
                  }
                })
            .get(10, TimeUnit.SECONDS);
    assertEquals(0, code);
    String written = out.toString(StandardCharsets.UTF_8);
    assertTrue(written.startsWith("Content-Length: "), "only protocol on the output: " + written);
    assertTrue(written.contains("\"serverInfo\""), written);
  }

  @Test
  void endsWithinTwoSecondsWhenInputClosesWithoutExit() throws Exception {
    String in =
        frame(
            "{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{}}}");
    LspCommand command =
        new LspCommand(
            new ByteArrayInputStream(in.getBytes(StandardCharsets.UTF_8)),
            new ByteArrayOutputStream(),
            new StandIn());
    long start = System.nanoTime();
    int code =
        CompletableFuture.supplyAsync(
                () -> {
                  try {
                    return command.call();
                  } catch (Exception e) {
                    throw new IllegalStateException(e);
                  }
                })
            .get(10, TimeUnit.SECONDS);
    assertTrue(
        System.nanoTime() - start < TimeUnit.SECONDS.toNanos(2),
        "took too long to notice stdin closed");
    assertEquals(1, code, "no shutdown was asked for");
  }

  @Test
  void verboseWritesALinePerCheckAndPerRequestToStandardErrorAndOnlyProtocolToStandardOutput()
      throws Exception {
    Session verbose = session("--verbose");
    Matcher check = CHECK_LINE.matcher(verbose.err);
    assertTrue(check.find(), "no check line on stderr: " + verbose.err);
    assertEquals(
        verbose.published(),
        Integer.parseInt(check.group(1)),
        "the check line counts what was published");
    assertTrue(verbose.published() > 0, "the spec has a mistake");
    assertTrue(HOVER_LINE.matcher(verbose.err).find(), "no request line on stderr: " + verbose.err);
    assertEquals(List.of(), verbose.unframed, "stdout carries framed messages only");

    Session quiet = session();
    assertTrue(quiet.published() > 0, "the quiet server checks too");
    assertTrue(!quiet.err.contains("debug:"), "debug lines only with --verbose: " + quiet.err);
    assertEquals(List.of(), quiet.unframed, "stdout carries framed messages only");
  }

  /**
   * What one session wrote: its stderr, its framed messages, and any stdout bytes outside a frame.
   */
  record Session(String err, List<JsonObject> messages, List<String> unframed) {
    int published() {
      for (JsonObject m : messages) {
        if (m.has("method")
            && m.get("method").getAsString().equals("textDocument/publishDiagnostics")) {
          return m.getAsJsonObject("params").getAsJsonArray("diagnostics").size();
        }
      }
      throw new AssertionError("nothing was published");
    }
  }

  /**
   * Opens a spec with a unitless focal length, hovers once after its check, then shuts down and
   * exits.
   */
  private Session session(String... args) throws Exception {
    Path spec = dir.resolve("bench.jonq");
    String text = "source seed { wavelength 1064 nm; power 2 W }\nlens l1 { focal 3 }\n";
    Files.writeString(spec, text);
    String uri = spec.toUri().toString();
    PipedOutputStream toServer = new PipedOutputStream();
    PipedInputStream in = new PipedInputStream(toServer, 1 << 16);
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream errBytes = new ByteArrayOutputStream();
    PrintStream err = new PrintStream(errBytes, true, StandardCharsets.UTF_8);
    LspCommand command = new LspCommand(in, out, err, new StandIn());
    new CommandLine(command).parseArgs(args);
    CompletableFuture<Integer> code =
        CompletableFuture.supplyAsync(
            () -> {
              try {
                return command.call();
              } catch (Exception e) {
                throw new IllegalStateException(e);
              }
            });
    send(
        toServer,
        "{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{},"
            + "\"rootUri\":\""
            + dir.toUri()
            + "\"}}");
    send(toServer, "{\"jsonrpc\":\"2.0\",\"method\":\"initialized\",\"params\":{}}");
    send(
        toServer,
        "{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":"
            + "{\"uri\":\""
            + uri
            + "\",\"languageId\":\"jonquil\",\"version\":1,\"text\":\""
            + text.replace("\n", "\\n")
            + "\"}}}");
    send(
        toServer,
        "{\"jsonrpc\":\"2.0\",\"id\":2,\"method\":\"textDocument/hover\",\"params\":{\"textDocument\":"
            + "{\"uri\":\""
            + uri
            + "\"},\"position\":{\"line\":1,\"character\":6}}}");
    boolean verbose = args.length > 0;
    // The hover waits for the check; the check's own line is written just after it publishes.
    await(
        () ->
            out.toString(StandardCharsets.UTF_8).contains("\"id\":2")
                && out.toString(StandardCharsets.UTF_8).contains("publishDiagnostics")
                && (!verbose
                    || CHECK_LINE.matcher(errBytes.toString(StandardCharsets.UTF_8)).find()));
    send(toServer, "{\"jsonrpc\":\"2.0\",\"id\":3,\"method\":\"shutdown\"}");
    send(toServer, "{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}");
    assertEquals(0, code.get(20, TimeUnit.SECONDS));
    toServer.close();
    List<JsonObject> messages = new ArrayList<>();
    List<String> unframed = new ArrayList<>();
    unframe(out.toByteArray(), messages, unframed);
    return new Session(errBytes.toString(StandardCharsets.UTF_8), messages, unframed);
  }

  private static void send(PipedOutputStream to, String json) throws IOException {
    to.write(frame(json).getBytes(StandardCharsets.UTF_8));
    to.flush();
  }

  private static void await(BooleanSupplier done) throws InterruptedException {
    long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
    while (!done.getAsBoolean()) {
      if (System.nanoTime() > end) {
        throw new AssertionError("the server did not answer within 30 s");
      }
      Thread.sleep(20);
    }
  }

  /**
   * Splits stdout into Content-Length frames; whatever does not parse as one is collected in {@code
   * unframed}.
   */
  private static void unframe(byte[] bytes, List<JsonObject> messages, List<String> unframed) {
    Pattern header = Pattern.compile("Content-Length: (\\d+)\r\n\r\n");
    int at = 0;
    while (at < bytes.length) {
      String rest =
          new String(bytes, at, Math.min(64, bytes.length - at), StandardCharsets.US_ASCII);
      Matcher m = header.matcher(rest);
      if (!m.lookingAt()) {
        unframed.add(new String(bytes, at, bytes.length - at, StandardCharsets.UTF_8));
        return;
      }
      int start = at + m.end();
      int length = Integer.parseInt(m.group(1));
      messages.add(
          JsonParser.parseString(new String(bytes, start, length, StandardCharsets.UTF_8))
              .getAsJsonObject());
      at = start + length;
    }
  }
}
