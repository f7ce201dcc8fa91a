package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The server survives bad framing: after a wrong, missing, negative or non-numeric Content-Length,
 * stray bytes or a body that is no JSON it answers the next well-framed request; unparsable JSON is
 * answered -32700 and an unknown request -32601 (JSON-RPC 2.0, section 5.1, "Error object"). Every
 * case writes raw bytes to the server's input and reads its framed output.
 */
class ServerSurvivesBadFramingTest {
  @TempDir Path dir;

  private PipedOutputStream toServer;
  private final BlockingQueue<JsonObject> fromServer = new LinkedBlockingQueue<>();
  private final ByteArrayOutputStream errBytes = new ByteArrayOutputStream();
  private CompletableFuture<Integer> exit;
  private int nextId = 100;

  @BeforeEach
  void start() throws Exception {
    toServer = new PipedOutputStream();
    PipedInputStream in = new PipedInputStream(toServer, 1 << 16);
    PipedInputStream out = new PipedInputStream(1 << 16);
    PipedOutputStream serverOut = new PipedOutputStream(out);
    LspCommand command =
        new LspCommand(
            in, serverOut, new PrintStream(errBytes, true, StandardCharsets.UTF_8), new StandIn());
    exit =
        CompletableFuture.supplyAsync(
            () -> {
              try {
                return command.call();
              } catch (Exception e) {
                throw new IllegalStateException(e);
              }
            });
    Thread reader = new Thread(() -> readFrames(out), "test-frame-reader");
    reader.setDaemon(true);
    reader.start();
    raw(
        frame(
            "{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":"
                + "{\"textDocument\":{\"codeAction\":{\"codeActionLiteralSupport\":"
                + "{\"codeActionKind\":{\"valueSet\":[\"quickfix\"]}}}}},\"rootUri\":\""
                + dir.toUri()
                + "\"}}"));
    assertEquals(1, answerTo(1).get("id").getAsInt());
    raw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"initialized\",\"params\":{}}"));
  }

  @AfterEach
  void stop() throws Exception {
    raw(frame("{\"jsonrpc\":\"2.0\",\"id\":2,\"method\":\"shutdown\"}"));
    raw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}"));
    assertEquals(0, exit.get(20, TimeUnit.SECONDS), "a clean exit after the bad input");
  }

  @Test
  void aMissingContentLengthIsSkippedAndTheNextRequestAnswered() throws Exception {
    raw("Content-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n" + request(7));
    assertStillAnswers();
  }

  @Test
  void aNonNumericContentLengthIsSkippedAndTheNextRequestAnswered() throws Exception {
    raw("Content-Length: twelve\r\n\r\n" + request(7));
    assertStillAnswers();
  }

  @Test
  void aNegativeContentLengthIsSkippedAndTheNextRequestAnswered() throws Exception {
    raw("Content-Length: -40\r\n\r\n" + request(7));
    assertStillAnswers();
  }

  @Test
  void aContentLengthPastTheIntegerRangeIsSkippedAndTheNextRequestAnswered() throws Exception {
    raw("Content-Length: 99999999999999\r\n\r\n" + request(7));
    assertStillAnswers();
  }

  @Test
  void aContentLengthShorterThanItsBodyCostsOnlyThatMessage() throws Exception {
    raw("Content-Length: 12\r\n\r\n" + request(7));
    assertStillAnswers();
  }

  @Test
  void aContentLengthLongerThanItsBodyCostsOnlyThatMessage() throws Exception {
    String body = request(7);
    raw("Content-Length: " + (body.length() + 30) + "\r\n\r\n" + body);
    assertStillAnswers();
  }

  @Test
  void strayBytesBetweenMessagesAreSkipped() throws Exception {
    raw("hello there\r\n\r\n\u0000\u00ff garbage\n");
    assertStillAnswers();
  }

  @Test
  void aBodyThatIsNoJsonIsAnsweredParseErrorAndTheServerGoesOn() throws Exception {
    raw(frame("{\"jsonrpc\":\"2.0\",\"id\":7,\"method\":"));
    JsonObject answer = fromServer.poll(10, TimeUnit.SECONDS);
    while (answer != null && answer.has("method")) {
      answer = fromServer.poll(10, TimeUnit.SECONDS); // the log line the server sends its client
    }
    assertTrue(answer != null, "no answer to unparsable JSON");
    // JSON-RPC asks for "id": null; LSP4J's writer leaves a null id out, which clients read alike
    assertTrue(!answer.has("id") || answer.get("id").isJsonNull(), answer.toString());
    assertEquals(-32700, answer.getAsJsonObject("error").get("code").getAsInt());
    assertStillAnswers();
  }

  @Test
  void anUnknownRequestIsAnsweredMethodNotFoundAndAnUnknownNotificationIgnored() throws Exception {
    raw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"jonquil/noSuchNotification\",\"params\":{}}"));
    raw(frame("{\"jsonrpc\":\"2.0\",\"id\":9,\"method\":\"jonquil/noSuchRequest\",\"params\":{}}"));
    JsonObject answer = answerTo(9);
    assertEquals(-32601, answer.getAsJsonObject("error").get("code").getAsInt(), "" + answer);
    assertStillAnswers();
  }

  @Test
  void aCodeActionWhoseDiagnosticCodeIsANumberAnObjectOrNullIsAnswered() throws Exception {
    Path spec = dir.resolve("a.jonq");
    Files.writeString(spec, "lens l1 { focal 3 }\n");
    String uri = spec.toUri().toString();
    raw(
        frame(
            "{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":"
                + "{\"uri\":\""
                + uri
                + "\",\"languageId\":\"jonquil\",\"version\":1,\"text\":\"lens l1 { focal 3 }\\n"
                + "\"}}}"));
    String[] codes = {"303", "{\"value\":\"J303\"}", "null", "\"J303\"", "[1,2]", "true"};
    int id = 20;
    for (String code : codes) {
      raw(
          frame(
              "{\"jsonrpc\":\"2.0\",\"id\":"
                  + id
                  + ",\"method\":\"textDocument/codeAction\",\"params\":{\"textDocument\":"
                  + "{\"uri\":\""
                  + uri
                  + "\"},\"range\":{\"start\":{\"line\":0,\"character\":10},\"end\":{\"line\":0,"
                  + "\"character\":17}},\"context\":{\"diagnostics\":[{\"range\":{\"start\":"
                  + "{\"line\":0,\"character\":10},\"end\":{\"line\":0,\"character\":17}},"
                  + "\"message\":\"m\",\"code\":"
                  + code
                  + "}]}}}"));
      JsonObject answer = answerTo(id);
      assertTrue(answer.has("result") || answer.has("error"), code + " -> " + answer);
      id++;
    }
    assertStillAnswers();
  }

  private void assertStillAnswers() throws Exception {
    int id = nextId++;
    raw(frame(request(id)));
    JsonObject answer = answerTo(id);
    assertTrue(answer.has("result"), "" + answer);
  }

  private static String request(int id) {
    return "{\"jsonrpc\":\"2.0\",\"id\":"
        + id
        + ",\"method\":\"workspace/symbol\",\"params\":{\"query\":\"x\"}}";
  }

  /** The answer to request {@code id}, skipping notifications and other answers. */
  private JsonObject answerTo(int id) throws InterruptedException {
    long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
    while (System.nanoTime() < end) {
      JsonObject m = fromServer.poll(100, TimeUnit.MILLISECONDS);
      if (m != null
          && m.has("id")
          && !m.has("method")
          && !m.get("id").isJsonNull()
          && m.get("id").getAsInt() == id) {
        return m;
      }
    }
    throw new AssertionError("no answer to request " + id + " within 10 s; stderr: " + errBytes);
  }

  private void raw(String text) throws IOException {
    toServer.write(text.getBytes(StandardCharsets.UTF_8));
    toServer.flush();
  }

  private static String frame(String json) {
    return "Content-Length: " + json.getBytes(StandardCharsets.UTF_8).length + "\r\n\r\n" + json;
  }

  /** Reads Content-Length frames as the server writes them; an unframed byte fails the reader. */
  private void readFrames(InputStream out) {
    try {
      while (true) {
        StringBuilder header = new StringBuilder();
        int c;
        while (!header.toString().endsWith("\r\n\r\n") && (c = out.read()) >= 0) {
          header.append((char) c);
        }
        if (!header.toString().endsWith("\r\n\r\n")) {
          return;
        }
        String line = header.toString().strip();
        if (!line.startsWith("Content-Length: ")) {
          throw new AssertionError("unframed output: " + line);
        }
        int length = Integer.parseInt(line.substring("Content-Length: ".length()));
        byte[] body = out.readNBytes(length);
        fromServer.add(
            JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject());
      }
    } catch (IOException e) {
      // the server closed its output
    }
  }
}
