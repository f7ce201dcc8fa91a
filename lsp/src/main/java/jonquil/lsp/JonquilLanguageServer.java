package jonquil.lsp;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.atomic.AtomicReference;
import jonquil.cli.ToolVersion;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.InitializedParams;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.RegistrationParams;
import org.eclipse.lsp4j.ServerInfo;
import org.eclipse.lsp4j.WorkDoneProgressCancelParams;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageClientAware;
import org.eclipse.lsp4j.services.LanguageServer;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.eclipse.lsp4j.services.WorkspaceService;

/**
 * The server's lifecycle and plumbing, with a guard that turns any handler failure into an error
 * response, never a dead server.
 */
public final class JonquilLanguageServer implements LanguageServer, LanguageClientAware {
  static final Duration DEBOUNCE = Duration.ofMillis(100);
  static final Duration MAX_DELAY = Duration.ofMillis(1000);

  /** How long a request waits for the check of the version it was asked about. */
  static final Duration FRESH_WAIT = Duration.ofSeconds(5);

  private enum State {
    NEW,
    RUNNING,
    SHUT_DOWN,
    EXITED
  }

  final EditorFeatures answers;
  final Documents documents = new Documents();
  final Snapshots snapshots = new Snapshots();
  final WorkspaceIndex index;
  private final CheckCycle cycle;
  private final CheckScheduler scheduler;
  final RequestPipeline requests;

  private final JonquilTextDocumentService textDocuments;
  private final JonquilWorkspaceService workspace;
  private final CompletableFuture<Integer> exitCode = new CompletableFuture<>();
  private final AtomicReference<State> state = new AtomicReference<>(State.NEW);
  private volatile LanguageClient client;
  private volatile Convert convert = new Convert(Convert.Encoding.UTF_16, documents::uriOf);
  private volatile SemanticTokenEncoding tokenEncoding = new SemanticTokenEncoding(false);
  private volatile ClientSupport support = ClientSupport.of(null);
  private volatile Folders folders = new Folders(List.of(), 0);

  /**
   * Where `jonquil lsp --verbose` writes its debug lines (standard error), or null when they are
   * off.
   */
  private final PrintStream debug;

  /**
   * The workspace folders, and how many times they were set (so a request can wait for a check
   * under them).
   */
  record Folders(List<Path> paths, long generation) {
    Folders {
      paths = List.copyOf(paths);
    }
  }

  public JonquilLanguageServer() {
    this(EditorFeatures.standard());
  }

  public JonquilLanguageServer(EditorFeatures answers) {
    this(answers, DEBOUNCE, true, null);
  }

  /** A server that writes a debug line per check and per request to {@code debug} (null: none). */
  public JonquilLanguageServer(EditorFeatures answers, PrintStream debug) {
    this(answers, DEBOUNCE, true, debug);
  }

  /**
   * A server whose checks wait {@code debounce} after the last edit (tests and benchmarks shorten
   * it).
   */
  JonquilLanguageServer(EditorFeatures answers, Duration debounce) {
    this(answers, debounce, true, null);
  }

  /**
   * As above; with {@code checkAfterPause} false even an edit after a pause waits for the debounce
   * (for tests).
   */
  JonquilLanguageServer(EditorFeatures answers, Duration debounce, boolean checkAfterPause) {
    this(answers, debounce, checkAfterPause, null);
  }

  private JonquilLanguageServer(
      EditorFeatures answers, Duration debounce, boolean checkAfterPause, PrintStream debug) {
    this.answers = answers;
    this.debug = debug;
    this.cycle =
        new CheckCycle(
            documents,
            snapshots,
            () -> folders,
            () -> convert,
            () -> client,
            () -> support.pullDiagnostics());
    this.scheduler =
        new CheckScheduler(
            debug == null ? cycle : this::timedCheck,
            this::checkFailed,
            debounce,
            MAX_DELAY.compareTo(debounce) > 0 ? MAX_DELAY : debounce,
            debug == null ? WarmUp::run : this::timedWarmUp,
            checkAfterPause);
    this.index = new WorkspaceIndex(answers, documents, () -> client, this::log);
    this.requests = new RequestPipeline(this);
    this.textDocuments = new JonquilTextDocumentService(this);
    this.workspace = new JonquilWorkspaceService(this);
  }

  @Override
  public void connect(LanguageClient client) {
    this.client = client;
  }

  @Override
  public CompletableFuture<InitializeResult> initialize(InitializeParams params) {
    try {
      if (!state.compareAndSet(State.NEW, State.RUNNING)) {
        return CompletableFuture.failedFuture(
            new ResponseErrorException(
                new ResponseError(
                    ResponseErrorCode.InvalidRequest, "initialize was already received", null)));
      }
      ClientCapabilities caps =
          params.getCapabilities() != null ? params.getCapabilities() : new ClientCapabilities();
      support = ClientSupport.of(caps);
      convert = new Convert(Convert.Encoding.negotiate(caps), documents::uriOf);
      tokenEncoding =
          new SemanticTokenEncoding(support.semanticTokenType(SemanticTokenEncoding.UNIT_TOKEN));
      folders = new Folders(foldersOf(params), folders.generation() + 1);
      return CompletableFuture.completedFuture(
          new InitializeResult(
              ServerFeatures.of(support, convert.encoding(), tokenEncoding),
              new ServerInfo("jonquil", ToolVersion.current())));
    } catch (RuntimeException e) {
      return CompletableFuture.failedFuture(requests.asResponseError("initialize", e));
    }
  }

  @SuppressWarnings("deprecation")
  private static List<Path> foldersOf(InitializeParams params) {
    List<Path> out = new ArrayList<>();
    if (params.getWorkspaceFolders() != null) {
      for (WorkspaceFolder f : params.getWorkspaceFolders()) {
        Documents.pathOf(f.getUri()).ifPresent(out::add);
      }
    }
    if (out.isEmpty() && params.getRootUri() != null) {
      Documents.pathOf(params.getRootUri()).ifPresent(out::add);
    }
    if (out.isEmpty() && params.getRootPath() != null) {
      try {
        out.add(Path.of(params.getRootPath()).toAbsolutePath().normalize());
      } catch (RuntimeException e) {
        // an unusable root path: documents find their own root
      }
    }
    return List.copyOf(out);
  }

  @Override
  public void initialized(InitializedParams params) {
    log(
        MessageType.Log,
        "jonquil language server ready (positions in " + convert.encoding().wire() + ")");
    LanguageClient c = client;
    boolean watching = c != null && support.watchedFilesRegistration();
    index.start(folders.paths(), support.workDoneProgress(), watching);
    if (watching) {
      // Never wait for the reply here: this runs on the reader thread, which must read it.
      c.registerCapability(new RegistrationParams(List.of(ServerFeatures.fileWatching())))
          .whenComplete(
              (ok, error) -> {
                if (error != null) {
                  index.notWatched();
                  log(
                      MessageType.Warning,
                      "the editor refused file watching ("
                          + describe(error)
                          + "); used files are still re-read on every check");
                }
              });
    }
  }

  @Override
  public CompletableFuture<Object> shutdown() {
    if (state.get() == State.NEW) {
      return CompletableFuture.failedFuture(RequestPipeline.notInitialized());
    }
    state.set(State.SHUT_DOWN);
    return CompletableFuture.completedFuture(null);
  }

  @Override
  public void exit() {
    State was = state.getAndSet(State.EXITED);
    close();
    exitCode.complete(was == State.SHUT_DOWN ? 0 : 1);
  }

  /** True before initialize: requests are refused with -32002. */
  boolean notYetInitialized() {
    return state.get() == State.NEW;
  }

  /** True between initialize and shutdown: requests are answered. */
  boolean running() {
    return state.get() == State.RUNNING;
  }

  /** The workspace folders with their generation, as a request waits for a check under them. */
  Folders folderState() {
    return folders;
  }

  /** Whether `--verbose` debug lines are on. */
  boolean debugging() {
    return debug != null;
  }

  /**
   * Completes with the process exit status once the client sent {@code exit}: 0 after shutdown,
   * else 1.
   */
  public CompletableFuture<Integer> exitCode() {
    return exitCode;
  }

  /** True once the client asked for shutdown (so that losing stdin afterwards is a clean end). */
  public boolean shutdownRequested() {
    State s = state.get();
    return s == State.SHUT_DOWN || (s == State.EXITED && exitCode.getNow(1) == 0);
  }

  /** Stops the check worker, the index worker and the request pool. */
  public void close() {
    scheduler.close();
    index.close();
    requests.close();
  }

  @Override
  public TextDocumentService getTextDocumentService() {
    return textDocuments;
  }

  @Override
  public WorkspaceService getWorkspaceService() {
    return workspace;
  }

  // ---- plumbing for the services ----

  Convert convert() {
    return convert;
  }

  SemanticTokenEncoding tokenEncoding() {
    return tokenEncoding;
  }

  /** What the client said it supports (nothing before initialize). */
  ClientSupport clientSupport() {
    return support;
  }

  /**
   * Replaces the workspace folders; called on the reader thread only, so the generation never goes
   * back.
   */
  void setFolders(List<Path> newFolders) {
    folders = new Folders(newFolders, folders.generation() + 1);
    index.setFolders(newFolders);
  }

  List<Path> folders() {
    return folders.paths();
  }

  /**
   * An open buffer changed (or a file it uses): check again. The workspace index reads the buffers
   * only when a workspace request needs it, so typing never re-parses a large buffer a second time
   * behind the check's back.
   */
  void scheduleCheck() {
    scheduler.request();
  }

  /** No check is running or waiting: every edit so far has been checked in full. */
  boolean checksIdle() {
    return scheduler.idle();
  }

  @Override
  public void cancelProgress(WorkDoneProgressCancelParams params) {
    onNotification(
        "window/workDoneProgress/cancel",
        () -> index.cancelProgress(IndexProgress.progressToken(params.getToken())));
  }

  /**
   * Runs a notification's recording step if the server is running; a failure is logged, never
   * thrown at LSP4J.
   */
  void onNotification(String method, Runnable body) {
    if (state.get() != State.RUNNING) {
      return; // before initialize and after shutdown, notifications are dropped
    }
    try {
      body.run();
    } catch (RuntimeException | StackOverflowError e) {
      log(MessageType.Error, "failed to handle " + method + ": " + describe(e));
      e.printStackTrace(System.err);
    }
  }

  private void checkFailed(Throwable error) {
    String message =
        "the language server failed while checking ("
            + describe(error)
            + "); please report this file";
    log(MessageType.Error, message);
    error.printStackTrace(System.err);
    cycle.publishFailure(message);
  }

  static String describe(Throwable e) {
    String m = e.getMessage();
    return m == null || m.isBlank()
        ? e.getClass().getSimpleName()
        : e.getClass().getSimpleName() + ": " + m.strip();
  }

  /** The check cycle, followed by one debug line: documents open, files read, diagnostics, time. */
  private boolean timedCheck(java.util.function.BooleanSupplier superseded) {
    long start = System.nanoTime();
    if (!cycle.run(superseded)) {
      debug("check: superseded by a newer edit after " + millisSince(start) + " ms");
      return false;
    }
    Snapshots.Snapshot done = snapshots.latest();
    Set<Path> read = new HashSet<>();
    done.results().forEach(r -> read.addAll(r.files().keySet()));
    int diagnostics = CheckCycle.byFile(done.results()).values().stream().mapToInt(Set::size).sum();
    debug(
        "check: "
            + done.versions().size()
            + " open, "
            + read.size()
            + " files read, "
            + diagnostics
            + " diagnostics, "
            + millisSince(start)
            + " ms");
    return true;
  }

  private void timedWarmUp() {
    long start = System.nanoTime();
    WarmUp.run();
    debug("warm-up: " + millisSince(start) + " ms");
  }

  static long millisSince(long startNanos) {
    return (System.nanoTime() - startNanos) / 1_000_000;
  }

  /**
   * A line for `--verbose` only: to standard error, never to the client (it would flood its log)
   * nor stdout.
   */
  void debug(String message) {
    PrintStream to = debug;
    if (to != null) {
      to.println("jonquil lsp: debug: " + message);
    }
  }

  /**
   * Logs to stderr and, when connected, to the client's log; never to stdout, which carries the
   * protocol.
   */
  void log(MessageType type, String message) {
    System.err.println("jonquil lsp: " + message);
    LanguageClient c = client;
    if (c != null) {
      try {
        c.logMessage(new MessageParams(type, message));
      } catch (RuntimeException e) {
        // the client is gone; stderr has it
      }
    }
  }
}
