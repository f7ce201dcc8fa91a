package jonquil.lsp;

import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import jonquil.cli.HelpOption;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.services.LanguageClient;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The `jonquil lsp` subcommand: runs the language server on stdin/stdout until exit or until stdin
 * closes.
 */
@Command(
    name = "lsp",
    description = "Run the Jonquil language server over standard input and output.")
public final class LspCommand implements java.util.concurrent.Callable<Integer> {
  @Mixin HelpOption help;

  @Option(
      names = "--verbose",
      description =
          "Also write debug lines to standard error: one per check (open documents, files read,"
              + " diagnostics, milliseconds) and one per request (method, outcome, milliseconds).")
  boolean verbose;

  private final InputStream in;
  private final OutputStream out;
  private final PrintStream err;
  private final EditorFeatures answers;

  /** The server on the process's own stdin and stdout. */
  public LspCommand() {
    this(null, null, EditorFeatures.standard());
  }

  /** The server on the given streams (null: the process's own), answering with {@code answers}. */
  public LspCommand(InputStream in, OutputStream out, EditorFeatures answers) {
    this(in, out, null, answers);
  }

  /**
   * As above, with {@code --verbose} writing its debug lines to {@code err} (null: the process's
   * stderr).
   */
  public LspCommand(InputStream in, OutputStream out, PrintStream err, EditorFeatures answers) {
    this.in = in;
    this.out = out;
    this.err = err;
    this.answers = answers;
  }

  @Override
  public Integer call() throws Exception {
    InputStream input = in != null ? in : System.in;
    OutputStream output = out;
    if (output == null) {
      // stdout carries the protocol: anything else printed there would corrupt it.
      PrintStream protocol = System.out;
      System.setOut(System.err);
      output = protocol;
    }
    PrintStream debug = verbose ? (err != null ? err : System.err) : null;
    JonquilLanguageServer server = new JonquilLanguageServer(answers, debug);
    AtomicInteger n = new AtomicInteger();
    ExecutorService io =
        Executors.newCachedThreadPool(
            r -> {
              Thread t = new Thread(r, "jonquil-lsp-io-" + n.incrementAndGet());
              t.setDaemon(true);
              return t;
            });
    try {
      Launcher<LanguageClient> launcher =
          MessageReader.serverLauncher(
              server, input, output, io, m -> server.log(MessageType.Warning, m));
      server.connect(launcher.getRemoteProxy());
      Future<Void> listening = launcher.startListening();
      CompletableFuture<Integer> inputClosed =
          CompletableFuture.supplyAsync(
              () -> {
                try {
                  listening.get();
                } catch (Exception e) {
                  // the stream failed: the same as closing it
                }
                return -1;
              },
              io);
      int code = (Integer) CompletableFuture.anyOf(server.exitCode(), inputClosed).join();
      if (code < 0) {
        // stdin closed without 'exit': the editor is gone, so must we be (no orphan servers).
        code = server.exitCode().getNow(server.shutdownRequested() ? 0 : 1);
      }
      listening.cancel(true);
      return code;
    } finally {
      server.close();
      io.shutdownNow();
    }
  }
}
