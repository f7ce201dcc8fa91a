package jonquil.lsp;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.Pipe;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializedParams;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/**
 * Measures what an editor user feels on a large spec (about 10 000 lines): the time from a
 * one-character didChange to the publishDiagnostics of that version, and hover latency. The
 * real server runs in-process behind pipes that carry the real JSON-RPC. Not a unit test:
 * run it with {@code mvn -q -o -P bench -pl lsp compile exec:exec} (after an install), and
 * pass {@code -Dbench.args="--debounce-ms 0 --reps 50"} to change the defaults.
 */
public final class LatencyBench {
  private LatencyBench() {}

  /** The client side: hands each publish to whoever waits for its version. */
  static final class Client implements LanguageClient {
    final ConcurrentHashMap<Integer, CompletableFuture<PublishDiagnosticsParams>> byVersion = new ConcurrentHashMap<>();

    CompletableFuture<PublishDiagnosticsParams> publishOf(int version) {
      return byVersion.computeIfAbsent(version, v -> new CompletableFuture<>());
    }

    @Override
    public void publishDiagnostics(PublishDiagnosticsParams p) {
      long at = System.nanoTime();
      if (p.getVersion() != null) {
        arrivals.putIfAbsent(p.getVersion(), at); // before completing: the waiter reads it at once
        publishOf(p.getVersion()).complete(p);
      }
    }

    final ConcurrentHashMap<Integer, Long> arrivals = new ConcurrentHashMap<>();

    @Override
    public void telemetryEvent(Object object) {}

    @Override
    public void showMessage(MessageParams messageParams) {}

    @Override
    public CompletableFuture<MessageActionItem> showMessageRequest(ShowMessageRequestParams requestParams) {
      return CompletableFuture.completedFuture(null);
    }

    @Override
    public void logMessage(MessageParams message) {}
  }

  /** A valid spec of {@code trains} trains, each a source, {@code windows} windows and a probe, with a power requirement per probe. */
  static String spec(int trains, int windows) {
    StringBuilder s = new StringBuilder("// Generated for the language server benchmark.\n\nmaterial glass = index 1.5\n\n");
    for (int t = 0; t < trains; t++) {
      s.append("source laser_").append(t).append(" {\n  wavelength    1064 nm\n  power         1 W\n")
          .append("  polarization  linear 0 deg\n  beam          waist 1.0 mm, m2 1.1\n}\n\n");
      for (int w = 0; w < windows; w++) {
        s.append("window w_").append(t).append('_').append(w)
            .append(" {\n  material   glass\n  thickness  1 mm\n  coating    ar 0.2 %\n}\n\n");
      }
      s.append("probe p_").append(t).append("\n\n");
    }
    for (int t = 0; t < trains; t++) {
      s.append("train t_").append(t).append(" {\n  laser_").append(t);
      for (int w = 0; w < windows; w++) {
        s.append("\n    -> 10 mm -> w_").append(t).append('_').append(w);
      }
      s.append("\n    -> 10 mm -> p_").append(t).append("\n}\n\n");
    }
    s.append("require {\n");
    for (int t = 0; t < trains; t++) {
      s.append("  power at p_").append(t).append(" > 1 mW\n");
    }
    return s.append("}\n").toString();
  }

  public static void main(String[] args) throws Exception {
    long debounceMs = JonquilLanguageServer.DEBOUNCE.toMillis();
    int reps = 50;
    for (int i = 0; i + 1 < args.length; i += 2) {
      if (args[i].equals("--debounce-ms")) {
        debounceMs = Long.parseLong(args[i + 1]);
      } else if (args[i].equals("--reps")) {
        reps = Integer.parseInt(args[i + 1]);
      }
    }
    String text = spec(40, 36);
    String[] lines = text.split("\n", -1);
    Path dir = Files.createTempDirectory("jonquil-bench");
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path file = dir.resolve("big.jonq");
    Files.writeString(file, text);
    String uri = file.toUri().toString();

    Pipe toServer = Pipe.open();
    Pipe toClient = Pipe.open();
    ExecutorService threads = Executors.newCachedThreadPool(r -> {
      Thread t = new Thread(r, "bench-io");
      t.setDaemon(true);
      return t;
    });
    JonquilLanguageServer server = new JonquilLanguageServer(new IdeAnswers(), Duration.ofMillis(debounceMs));
    InputStream serverIn = Channels.newInputStream(toServer.source());
    OutputStream serverOut = Channels.newOutputStream(toClient.sink());
    Launcher<LanguageClient> serverSide = LSPLauncher.createServerLauncher(server, serverIn, serverOut, threads, null);
    server.connect(serverSide.getRemoteProxy());
    serverSide.startListening();
    Client client = new Client();
    Launcher<LanguageServer> clientSide = LSPLauncher.createClientLauncher(client,
        Channels.newInputStream(toClient.source()), Channels.newOutputStream(toServer.sink()), threads, null);
    clientSide.startListening();
    LanguageServer remote = clientSide.getRemoteProxy();

    InitializeParams init = new InitializeParams();
    init.setRootUri(dir.toUri().toString());
    init.setCapabilities(new ClientCapabilities());
    remote.initialize(init).get(30, TimeUnit.SECONDS);
    remote.initialized(new InitializedParams());
    long opened = System.nanoTime();
    remote.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(uri, "jonquil", 1, text)));
    PublishDiagnosticsParams first = client.publishOf(1).get(120, TimeUnit.SECONDS);
    long errors = first.getDiagnostics().stream().filter(d -> d.getSeverity() == DiagnosticSeverity.Error).count();
    long warnings = first.getDiagnostics().stream().filter(d -> d.getSeverity() == DiagnosticSeverity.Warning).count();
    System.out.printf(Locale.ROOT, "spec: %d lines, %d characters; first check %.0f ms, %d diagnostics (%d errors, "
        + "%d warnings, the rest notes)%n", lines.length - 1, text.length(), (System.nanoTime() - opened) / 1e6,
        first.getDiagnostics().size(), errors, warnings);
    if (errors > 0) {
      System.out.println("the generated spec has errors: " + first.getDiagnostics().get(0).getMessage());
    }

    // (a) one-character edits: "1 mm" <-> "2 mm" in a window in the middle, one at a time.
    int line = Arrays.asList(lines).indexOf("window w_20_18 {") + 2;
    int column = lines[line].indexOf("1 mm");
    int version = 1;
    int warmup = 10;
    List<Double> change = new ArrayList<>();
    for (int i = 0; i < warmup + reps; i++) {
      version++;
      String digit = i % 2 == 0 ? "2" : "1";
      CompletableFuture<PublishDiagnosticsParams> published = client.publishOf(version);
      long sent = System.nanoTime();
      remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
          new VersionedTextDocumentIdentifier(uri, version), List.of(new TextDocumentContentChangeEvent(
              new Range(new Position(line, column), new Position(line, column + 1)), digit))));
      published.get(60, TimeUnit.SECONDS);
      long arrived = client.arrivals.get(version);
      if (i >= warmup) {
        change.add((arrived - sent) / 1e6);
      }
      Thread.sleep(20);
    }

    // (b) hover on window names in the trains and on elements' declarations, on a settled document.
    List<Position> targets = new ArrayList<>();
    for (int i = 0; i < lines.length; i++) {
      if (lines[i].startsWith("    -> 10 mm -> w_") || lines[i].startsWith("window w_")) {
        int at = lines[i].indexOf("w_");
        targets.add(new Position(i, at + 2));
      }
    }
    List<Double> hover = new ArrayList<>();
    int misses = 0;
    for (int i = 0; i < warmup + reps; i++) {
      Position p = targets.get((i * 7919) % targets.size());
      long sent = System.nanoTime();
      Hover h = remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri), p))
          .get(30, TimeUnit.SECONDS);
      double ms = (System.nanoTime() - sent) / 1e6;
      if (h == null) {
        misses++;
      }
      if (i >= warmup) {
        hover.add(ms);
      }
    }

    System.out.printf(Locale.ROOT, "debounce %d ms, %d repetitions after %d warm-up%n", debounceMs, reps, warmup);
    report("didChange (1 char) -> publishDiagnostics", change);
    report("hover", hover);
    if (misses > 0) {
      System.out.println("hover answered null " + misses + " times");
    }
    remote.shutdown().get(10, TimeUnit.SECONDS);
    remote.exit();
    server.close();
    System.exit(0);
  }

  private static void report(String what, List<Double> millis) {
    double[] sorted = millis.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    double median = sorted[(sorted.length - 1) / 2];
    double p95 = sorted[(int) Math.ceil(0.95 * sorted.length) - 1];
    System.out.printf(Locale.ROOT, "%-42s median %7.1f ms   p95 %7.1f ms   max %7.1f ms%n", what, median, p95,
        sorted[sorted.length - 1]);
  }
}
