package jonquil.lsp;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.Pipe;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.GeneralClientCapabilities;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.InitializedParams;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.ProgressParams;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.RegistrationParams;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.WorkDoneProgressCreateParams;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseMessage;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/**
 * An in-process LSP4J client wired to a real server over pipes, so tests speak the actual JSON-RPC
 * protocol.
 */
final class LspHarness implements AutoCloseable {
  static final Duration WAIT = Duration.ofSeconds(20);

  /** The client side: records every notification the server pushes. */
  static final class RecordingClient implements LanguageClient {
    final List<PublishDiagnosticsParams> published = new ArrayList<>();
    final List<MessageParams> logs = new ArrayList<>();
    final List<RegistrationParams> registrations = new ArrayList<>();

    /** The tokens the server asked to create, and every $/progress it sent, in order. */
    final List<String> progressTokens = new ArrayList<>();

    final List<ProgressParams> progress = new ArrayList<>();

    @Override
    public synchronized CompletableFuture<Void> registerCapability(RegistrationParams params) {
      registrations.add(params);
      return CompletableFuture.completedFuture(null);
    }

    @Override
    public synchronized CompletableFuture<Void> createProgress(
        WorkDoneProgressCreateParams params) {
      progressTokens.add(IndexProgress.progressToken(params.getToken()));
      return CompletableFuture.completedFuture(null);
    }

    @Override
    public synchronized void notifyProgress(ProgressParams params) {
      progress.add(params);
      notifyAll();
    }

    /** Waits until a $/progress matches {@code test}; fails the test after {@link #WAIT}. */
    synchronized ProgressParams awaitProgress(Predicate<ProgressParams> test)
        throws InterruptedException {
      long deadline = System.nanoTime() + WAIT.toNanos();
      while (true) {
        for (ProgressParams p : progress) {
          if (test.test(p)) {
            return p;
          }
        }
        long left = deadline - System.nanoTime();
        if (left <= 0) {
          throw new AssertionError("no matching $/progress; got " + progress);
        }
        wait(Math.max(1, left / 1_000_000));
      }
    }

    /**
     * Drops what was recorded so far (long soak runs would otherwise measure the client's memory).
     */
    synchronized void forget() {
      published.clear();
      logs.clear();
    }

    @Override
    public void telemetryEvent(Object object) {}

    @Override
    public synchronized void publishDiagnostics(PublishDiagnosticsParams diagnostics) {
      published.add(diagnostics);
      notifyAll();
    }

    @Override
    public void showMessage(MessageParams messageParams) {}

    @Override
    public CompletableFuture<MessageActionItem> showMessageRequest(
        ShowMessageRequestParams requestParams) {
      return CompletableFuture.completedFuture(null);
    }

    @Override
    public synchronized void logMessage(MessageParams message) {
      logs.add(message);
    }

    synchronized List<PublishDiagnosticsParams> publishedFor(String uri) {
      return published.stream().filter(p -> p.getUri().equals(uri)).toList();
    }

    /**
     * Waits for a publish for {@code uri} matching {@code test}; fails the test after {@link
     * #WAIT}.
     */
    synchronized PublishDiagnosticsParams await(
        String uri, Predicate<PublishDiagnosticsParams> test) throws InterruptedException {
      long deadline = System.nanoTime() + WAIT.toNanos();
      int seen = 0;
      while (true) {
        for (; seen < published.size(); seen++) {
          PublishDiagnosticsParams p = published.get(seen);
          if (p.getUri().equals(uri) && test.test(p)) {
            return p;
          }
        }
        long left = deadline - System.nanoTime();
        if (left <= 0) {
          throw new AssertionError(
              "no matching publishDiagnostics for " + uri + "; got " + published);
        }
        wait(Math.max(1, left / 1_000_000));
      }
    }
  }

  final JonquilLanguageServer server;
  final RecordingClient client = new RecordingClient();
  final LanguageServer remote;
  private final ExecutorService threads =
      Executors.newCachedThreadPool(
          r -> {
            Thread t = new Thread(r, "harness");
            t.setDaemon(true);
            return t;
          });
  private final OutputStream clientOut;
  private final OutputStream serverOut;

  /**
   * The names of the server's threads that wrote to its output, so a test can see who writes
   * replies.
   */
  final java.util.Set<String> serverWriters = java.util.concurrent.ConcurrentHashMap.newKeySet();

  /** Every response the client received, as it came off the wire (error codes included). */
  final List<ResponseMessage> responses = java.util.Collections.synchronizedList(new ArrayList<>());

  /**
   * Completes when the server's message loop ends: while it is not done, the server still reads.
   */
  final java.util.concurrent.Future<Void> serverListening;

  LspHarness(EditorFeatures answers) throws IOException {
    this(answers, JonquilLanguageServer.DEBOUNCE);
  }

  LspHarness(EditorFeatures answers, Duration debounce) throws IOException {
    this(answers, debounce, true);
  }

  /**
   * With {@code checkAfterPause} false, no check runs before {@code debounce} has passed since the
   * last edit.
   */
  LspHarness(EditorFeatures answers, Duration debounce, boolean checkAfterPause)
      throws IOException {
    Pipe toServer = Pipe.open();
    Pipe toClient = Pipe.open();
    InputStream serverIn = Channels.newInputStream(toServer.source());
    clientOut = Channels.newOutputStream(toServer.sink());
    InputStream clientIn = Channels.newInputStream(toClient.source());
    OutputStream sink = Channels.newOutputStream(toClient.sink());
    serverOut =
        new java.io.FilterOutputStream(sink) {
          @Override
          public void write(byte[] b, int off, int len) throws IOException {
            serverWriters.add(Thread.currentThread().getName());
            sink.write(b, off, len);
          }
        };
    server = new JonquilLanguageServer(answers, debounce, checkAfterPause);
    Launcher<LanguageClient> serverSide =
        LSPLauncher.createServerLauncher(server, serverIn, serverOut, threads, null);
    server.connect(serverSide.getRemoteProxy());
    serverListening = serverSide.startListening();
    Launcher<LanguageServer> clientSide =
        new LSPLauncher.Builder<LanguageServer>()
            .setLocalService(client)
            .setRemoteInterface(LanguageServer.class)
            .setInput(clientIn)
            .setOutput(clientOut)
            .setExecutorService(threads)
            .wrapMessages(
                next ->
                    message -> {
                      if (message instanceof ResponseMessage) {
                        responses.add((ResponseMessage) message);
                      }
                      next.consume(message);
                    })
            .create();
    clientSide.startListening();
    remote = clientSide.getRemoteProxy();
  }

  LspHarness() throws IOException {
    this(new StandIn());
  }

  /** Initializes with UTF-16 positions (or the given encodings offered) and a root folder. */
  InitializeResult initialize(Path root, String... encodings) throws Exception {
    ClientCapabilities caps = new ClientCapabilities();
    if (encodings.length > 0) {
      GeneralClientCapabilities general = new GeneralClientCapabilities();
      general.setPositionEncodings(List.of(encodings));
      caps.setGeneral(general);
    }
    return initialize(root, caps);
  }

  /** Initializes with the given client capabilities and a root folder. */
  InitializeResult initialize(Path root, ClientCapabilities caps) throws Exception {
    InitializeParams params = new InitializeParams();
    params.setProcessId(null);
    params.setRootUri(root == null ? null : root.toUri().toString());
    params.setCapabilities(caps);
    InitializeResult result = remote.initialize(params).get(WAIT.toSeconds(), TimeUnit.SECONDS);
    remote.initialized(new InitializedParams());
    return result;
  }

  /** Initializes with the given client capabilities and these workspace folders (no root URI). */
  InitializeResult initialize(List<Path> folders, ClientCapabilities caps) throws Exception {
    InitializeParams params = new InitializeParams();
    params.setProcessId(null);
    List<org.eclipse.lsp4j.WorkspaceFolder> list = new ArrayList<>();
    for (Path f : folders) {
      list.add(
          new org.eclipse.lsp4j.WorkspaceFolder(f.toUri().toString(), f.getFileName().toString()));
    }
    params.setWorkspaceFolders(list);
    params.setCapabilities(caps);
    InitializeResult result = remote.initialize(params).get(WAIT.toSeconds(), TimeUnit.SECONDS);
    remote.initialized(new InitializedParams());
    return result;
  }

  void open(String uri, int version, String text) {
    remote
        .getTextDocumentService()
        .didOpen(
            new DidOpenTextDocumentParams(new TextDocumentItem(uri, "jonquil", version, text)));
  }

  void changeAll(String uri, int version, String text) {
    remote
        .getTextDocumentService()
        .didChange(
            new DidChangeTextDocumentParams(
                new VersionedTextDocumentIdentifier(uri, version),
                List.of(new TextDocumentContentChangeEvent(text))));
  }

  void change(String uri, int version, TextDocumentContentChangeEvent change) {
    remote
        .getTextDocumentService()
        .didChange(
            new DidChangeTextDocumentParams(
                new VersionedTextDocumentIdentifier(uri, version), List.of(change)));
  }

  void close(String uri) {
    remote
        .getTextDocumentService()
        .didClose(new DidCloseTextDocumentParams(new TextDocumentIdentifier(uri)));
  }

  @Override
  public void close() throws IOException {
    // Closing both write ends lets each reader see the end of its stream and stop by itself.
    server.close();
    clientOut.close();
    serverOut.close();
    threads.shutdown();
  }
}
