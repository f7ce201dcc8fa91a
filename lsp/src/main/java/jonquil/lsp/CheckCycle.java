package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.BooleanSupplier;
import java.util.function.Supplier;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.source.ProjectRoot;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.services.LanguageClient;

/**
 * One check of all open documents, publishing each affected file's diagnostics for the version they
 * saw and dropping stale ones.
 */
final class CheckCycle implements CheckScheduler.Task {
  /** Marks a project root where there is no version control, as the command line does. */
  private record Published(String uri, Integer version, List<Diagnostic> diagnostics) {}

  private final Documents documents;
  private final Snapshots snapshots;
  private final Supplier<JonquilLanguageServer.Folders> folders;
  private final Supplier<Convert> convert;
  private final Supplier<LanguageClient> client;

  /** True when the client pulls the diagnostics of open documents: they are then never pushed. */
  private final BooleanSupplier pull;

  /**
   * Earlier parses, so an edit re-parses only the statements it touched; used by the worker thread
   * only.
   */
  private final jonquil.syntax.ParseMemo memo = new jonquil.syntax.ParseMemo();

  /** What the editor shows now, per file; touched by the worker thread only. */
  private final Map<Path, Published> published = new HashMap<>();

  CheckCycle(
      Documents documents,
      Snapshots snapshots,
      Supplier<JonquilLanguageServer.Folders> folders,
      Supplier<Convert> convert,
      Supplier<LanguageClient> client,
      BooleanSupplier pull) {
    this.documents = documents;
    this.snapshots = snapshots;
    this.folders = folders;
    this.convert = convert;
    this.client = client;
    this.pull = pull;
  }

  @Override
  public boolean run(BooleanSupplier superseded) {
    Map<Path, Documents.Doc> open = documents.snapshot();
    Map<Path, String> buffers = new HashMap<>();
    Map<Path, Integer> versions = new HashMap<>();
    Map<Path, List<Path>> byRoot = new LinkedHashMap<>();
    JonquilLanguageServer.Folders now = folders.get();
    List<Path> roots = now.paths();
    open.values().stream()
        .sorted((a, b) -> a.path().compareTo(b.path()))
        .forEach(
            doc -> {
              buffers.put(doc.path(), doc.text());
              versions.put(doc.path(), doc.version());
              byRoot
                  .computeIfAbsent(ProjectRoot.owning(doc.path(), roots), k -> new ArrayList<>())
                  .add(doc.path());
            });
    Optional<List<Result>> quick =
        checkAll(byRoot, buffers, jonquil.CheckOptions.EDITOR, superseded);
    if (quick.isEmpty()) {
      return false; // a newer edit is waiting; its check publishes instead
    }
    List<Result> results = quick.get();
    memo.retainOnly(sources(results).keySet());
    snapshots.publish(new Snapshots.Snapshot(results, versions, now.generation()));
    publish(open, results);
    if (!drawsYields(results)) {
      return true;
    }
    // Second pass: the yields, so the editor ends with the gate's verdicts (fail closed there too).
    // The parse memo makes everything but the draws cheap. Any edit stops the draws, even one the
    // scheduler's max delay would let the first pass finish.
    BooleanSupplier edited = () -> superseded.getAsBoolean() || edited(versions);
    Optional<List<Result>> full = checkAll(byRoot, buffers, jonquil.CheckOptions.FULL, edited);
    if (full.isEmpty()) {
      return false;
    }
    snapshots.publish(new Snapshots.Snapshot(full.get(), versions, now.generation()));
    publish(open, full.get());
    return true;
  }

  /** Each root's open files checked with {@code options}; empty once a newer edit supersedes. */
  private Optional<List<Result>> checkAll(
      Map<Path, List<Path>> byRoot,
      Map<Path, String> buffers,
      jonquil.CheckOptions options,
      BooleanSupplier superseded) {
    List<Result> out = new ArrayList<>();
    for (Map.Entry<Path, List<Path>> root : byRoot.entrySet()) {
      Optional<Result> result =
          Checker.check(
              Workspace.withOverlay(root.getKey(), buffers).withMemo(memo),
              root.getValue(),
              options,
              superseded);
      if (result.isEmpty()) {
        return Optional.empty();
      }
      out.add(result.get());
    }
    return Optional.of(out);
  }

  /** True when an open document is no longer at the version this run checked. */
  private boolean edited(Map<Path, Integer> versions) {
    for (Map.Entry<Path, Integer> v : versions.entrySet()) {
      Optional<Documents.Doc> now = documents.get(v.getKey());
      if (now.isEmpty() || now.get().version() != v.getValue()) {
        return true;
      }
    }
    return false;
  }

  /** True when some checked spec has a 'yield' requirement, which the first pass left undrawn. */
  private static boolean drawsYields(List<Result> results) {
    return results.stream().anyMatch(Result::hasYields);
  }

  /** After a failed run: every open document shows that checking failed, at its current version. */
  void publishFailure(String message) {
    LanguageClient to = client.get();
    if (to == null) {
      return;
    }
    for (Documents.Doc doc : documents.snapshot().values()) {
      if (pull.getAsBoolean()) {
        continue; // the client pulls: the failed check's snapshot answers it
      }
      List<Diagnostic> diagnostics = List.of(Convert.internalError(message));
      published.put(doc.path(), new Published(doc.uri(), doc.version(), diagnostics));
      to.publishDiagnostics(new PublishDiagnosticsParams(doc.uri(), diagnostics, doc.version()));
    }
    snapshots.releaseAll();
  }

  private void publish(Map<Path, Documents.Doc> open, List<Result> results) {
    LanguageClient to = client.get();
    if (to == null) {
      return;
    }
    Convert conv = convert.get();
    Map<Path, SourceFile> sources = sources(results);
    Map<Path, Set<jonquil.diag.Diagnostic>> byFile = byFile(results);
    boolean pulled = pull.getAsBoolean();
    Set<Path> targets = new LinkedHashSet<>(open.keySet());
    targets.addAll(byFile.keySet());
    targets.addAll(published.keySet());
    for (Path path : targets) {
      Documents.Doc doc = open.get(path);
      if (doc != null) {
        Optional<Documents.Doc> now = documents.get(path);
        if (now.isEmpty() || now.get().version() != doc.version()) {
          continue; // stale: the editor has moved on, and a newer run is already requested
        }
      } else if (documents.get(path).isPresent()) {
        continue; // opened during this run: the next run covers it with its version
      }
      if (pulled && doc != null) {
        Published before = published.remove(path);
        if (before != null && !before.diagnostics().isEmpty()) {
          // Pushed while it was closed (as a used file); now the client pulls it, so the push is
          // taken back.
          to.publishDiagnostics(new PublishDiagnosticsParams(before.uri(), List.of(), null));
        }
        continue;
      }
      List<Diagnostic> diagnostics = new ArrayList<>();
      for (jonquil.diag.Diagnostic d : byFile.getOrDefault(path, Set.of())) {
        diagnostics.add(conv.diagnostic(d, sources::get));
      }
      Published before = published.get(path);
      if (doc == null && diagnostics.isEmpty() && before == null) {
        continue; // a clean file the editor never showed
      }
      String uri = doc != null ? doc.uri() : before != null ? before.uri() : conv.uri(path);
      Published next =
          new Published(uri, doc != null ? doc.version() : null, List.copyOf(diagnostics));
      if (next.equals(before)) {
        continue;
      }
      to.publishDiagnostics(new PublishDiagnosticsParams(uri, diagnostics, next.version()));
      if (doc == null && diagnostics.isEmpty()) {
        published.remove(path);
      } else {
        published.put(path, next);
      }
    }
  }

  /** Every file the results read, the first result's copy winning. */
  static Map<Path, SourceFile> sources(List<Result> results) {
    Map<Path, SourceFile> out = new HashMap<>();
    for (Result r : results) {
      r.files().forEach(out::putIfAbsent);
    }
    return out;
  }

  /**
   * The results' diagnostics by file, in the results' order, each once (a file used by two roots is
   * checked twice).
   */
  static Map<Path, Set<jonquil.diag.Diagnostic>> byFile(List<Result> results) {
    Map<Path, Set<jonquil.diag.Diagnostic>> out = new LinkedHashMap<>();
    for (Result r : results) {
      for (jonquil.diag.Diagnostic d : r.diagnostics()) {
        out.computeIfAbsent(d.file(), k -> new LinkedHashSet<>()).add(d);
      }
    }
    return out;
  }
}
