package jonquil.lsp;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.function.Consumer;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.jsonrpc.MessageConsumer;
import org.eclipse.lsp4j.jsonrpc.MessageIssueException;
import org.eclipse.lsp4j.jsonrpc.MessageIssueHandler;
import org.eclipse.lsp4j.jsonrpc.MessageProducer;
import org.eclipse.lsp4j.jsonrpc.RemoteEndpoint;
import org.eclipse.lsp4j.jsonrpc.json.ConcurrentMessageProcessor;
import org.eclipse.lsp4j.jsonrpc.json.MessageJsonHandler;
import org.eclipse.lsp4j.jsonrpc.messages.Message;
import org.eclipse.lsp4j.jsonrpc.messages.MessageIssue;
import org.eclipse.lsp4j.jsonrpc.messages.RequestMessage;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/**
 * Reads the client's messages through a {@link FrameReader} instead of LSP4J's reader, which stops
 * reading for good at the first bad frame or unreadable body: here a body that is no JSON is
 * answered -32700, one that is no message -32600, and a request whose params LSP4J cannot read
 * -32602 (JSON-RPC 2.0, section 5.1), and the next message is read.
 */
final class MessageReader implements MessageProducer, Closeable {
  private final InputStream in;
  private final FrameReader frames;
  private final MessageJsonHandler json;
  private final MessageIssueHandler issues;
  private final Consumer<String> log;
  private volatile boolean running = true;

  private MessageReader(
      InputStream in, MessageJsonHandler json, MessageIssueHandler issues, Consumer<String> log) {
    this.in = in;
    this.frames = new FrameReader(in, log);
    this.json = json;
    this.issues = issues;
    this.log = log;
  }

  /** LSP4J's server launcher with this reader in place of its own. */
  static Launcher<LanguageClient> serverLauncher(
      LanguageServer server,
      InputStream in,
      OutputStream out,
      ExecutorService executor,
      Consumer<String> log) {
    return new LSPLauncher.Builder<LanguageClient>() {
      private MessageJsonHandler handler;
      private RemoteEndpoint endpoint;

      @Override
      protected MessageJsonHandler createJsonHandler() {
        handler = super.createJsonHandler();
        return handler;
      }

      @Override
      protected RemoteEndpoint createRemoteEndpoint(MessageJsonHandler jsonHandler) {
        endpoint = super.createRemoteEndpoint(jsonHandler);
        return endpoint;
      }

      @Override
      protected ConcurrentMessageProcessor createMessageProcessor(
          MessageProducer ignored, MessageConsumer consumer, LanguageClient proxy) {
        return super.createMessageProcessor(
            new MessageReader(input, handler, endpoint, log), consumer, proxy);
      }
    }.setLocalService(server)
        .setRemoteInterface(LanguageClient.class)
        .setInput(in)
        .setOutput(out)
        .setExecutorService(executor)
        .create();
  }

  @Override
  public void listen(MessageConsumer consumer) {
    try {
      byte[] body;
      while (running && (body = frames.next()) != null) {
        String content = new String(body, StandardCharsets.UTF_8);
        Message message;
        try {
          message = json.parseMessage(content);
        } catch (MessageIssueException e) {
          // LSP4J takes a body cut off after its id for a response and only logs it
          if (noJson(content) != null) {
            answerUnreadable(content, e);
          } else {
            issues.handle(e.getRpcMessage(), e.getIssues());
          }
          continue;
        } catch (RuntimeException e) {
          answerUnreadable(content, e);
          continue;
        }
        consumer.consume(message);
      }
    } catch (IOException e) {
      log.accept("stopped reading the client's messages: " + e.getMessage());
    }
  }

  @Override
  public void close() {
    running = false;
    try {
      in.close();
    } catch (IOException e) {
      // closing ends the read that waits on it; a stream that cannot close is already gone
    }
  }

  /** Answers a body LSP4J could not read, as JSON-RPC asks, or logs it when no answer is due. */
  private void answerUnreadable(String content, RuntimeException why) {
    String noJson = noJson(content);
    if (noJson != null) {
      answer(null, ResponseErrorCode.ParseError, "the message is no JSON: " + noJson);
      return;
    }
    JsonElement tree = JsonParser.parseString(content);
    if (!tree.isJsonObject()) {
      answer(null, ResponseErrorCode.InvalidRequest, "a message must be a JSON object");
      return;
    }
    JsonObject object = tree.getAsJsonObject();
    JsonElement id = object.get("id");
    boolean request = object.has("method") && id != null && id.isJsonPrimitive();
    if (request) {
      answer(
          id.getAsJsonPrimitive(),
          ResponseErrorCode.InvalidParams,
          "the params of " + object.get("method") + " could not be read: " + why.getMessage());
    } else if (object.has("method") && id == null) {
      log.accept("ignored notification " + object.get("method") + ": " + why.getMessage());
    } else {
      answer(null, ResponseErrorCode.InvalidRequest, "unreadable message: " + why.getMessage());
    }
  }

  /** Why {@code content} is no JSON text, or null when it is one. */
  private static String noJson(String content) {
    try {
      JsonParser.parseString(content);
      return null;
    } catch (RuntimeException e) {
      return e.getMessage();
    }
  }

  private void answer(JsonPrimitive id, ResponseErrorCode code, String message) {
    RequestMessage request = new RequestMessage();
    request.setJsonrpc("2.0");
    if (id != null) {
      if (id.isNumber()) {
        request.setId(id.getAsInt());
      } else {
        request.setId(id.getAsString());
      }
    }
    log.accept(message);
    issues.handle(request, List.of(new MessageIssue(message, code.getValue())));
  }
}
