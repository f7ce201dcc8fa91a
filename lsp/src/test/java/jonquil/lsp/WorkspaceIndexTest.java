package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import jonquil.Result;
import jonquil.ide.EditorFeatures;
import jonquil.ide.FileIndex;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidChangeWatchedFilesCapabilities;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.DidChangeWorkspaceFoldersParams;
import org.eclipse.lsp4j.FileChangeType;
import org.eclipse.lsp4j.FileEvent;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.ProgressParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.TextDocumentEdit;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WindowClientCapabilities;
import org.eclipse.lsp4j.WorkDoneProgressBegin;
import org.eclipse.lsp4j.WorkDoneProgressCancelParams;
import org.eclipse.lsp4j.WorkDoneProgressEnd;
import org.eclipse.lsp4j.WorkDoneProgressKind;
import org.eclipse.lsp4j.WorkDoneProgressNotification;
import org.eclipse.lsp4j.WorkspaceClientCapabilities;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.WorkspaceEditCapabilities;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.WorkspaceFoldersChangeEvent;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The workspace index: every spec under the workspace folders is known from the start, so
 * workspace/symbol, references and rename reach files that were never opened and that no open file
 * uses; it follows the disk (through the editor's watcher, or a re-scan when there is none),
 * reports its first pass as work-done progress only to a client that takes it, and keeps each
 * folder's names to that folder.
 */
class WorkspaceIndexTest {
  static final String MIRROR = " { metal silver; aoi 45 deg }\n";
  static final String LIB = "mirror fold" + MIRROR + "mirror spare" + MIRROR;

  /**
   * A bench that uses {@code fold} from the library at {@code path}, on line 4 (after the 'use'
   * line).
   */
  static String bench(String path, String source) {
    return """
    use "%s"
    source %s { wavelength 1064 nm; power 2 W }
    probe spot
    train main {
      %s -> 100 mm -> fold -> 20 mm -> spot
    }
    """
        .formatted(path, source, source);
  }

  @TempDir Path dir;

  private static Path write(Path p, String text) throws Exception {
    Files.createDirectories(p.getParent());
    Files.writeString(p, text);
    return p;
  }

  private static String uri(Path p) {
    return p.toAbsolutePath().normalize().toUri().toString();
  }

  /** The range of the first {@code word} on a line of {@code text}, in UTF-16 (all ASCII here). */
  private static Location at(Path file, String text, String word) {
    String[] lines = text.split("\n", -1);
    for (int i = 0; i < lines.length; i++) {
      int col = lines[i].indexOf(word);
      if (col >= 0) {
        return new Location(
            uri(file), new Range(new Position(i, col), new Position(i, col + word.length())));
      }
    }
    throw new AssertionError(word + " not in " + file);
  }

  private static List<WorkspaceSymbol> symbols(LspHarness h, String query) throws Exception {
    return new ArrayList<>(
        h.remote
            .getWorkspaceService()
            .symbol(new WorkspaceSymbolParams(query))
            .get(20, TimeUnit.SECONDS)
            .getRight());
  }

  private static List<String> names(LspHarness h, String query) throws Exception {
    return symbols(h, query).stream().map(WorkspaceSymbol::getName).sorted().toList();
  }

  private static List<Location> references(LspHarness h, Location from) throws Exception {
    return references(h, from, true);
  }

  private static List<Location> references(LspHarness h, Location from, boolean includeDeclaration)
      throws Exception {
    List<Location> out =
        new ArrayList<>(
            h.remote
                .getTextDocumentService()
                .references(
                    new ReferenceParams(
                        new TextDocumentIdentifier(from.getUri()),
                        from.getRange().getStart(),
                        new ReferenceContext(includeDeclaration)))
                .get(20, TimeUnit.SECONDS));
    out.sort(
        Comparator.comparing(Location::getUri)
            .thenComparing(l -> l.getRange().getStart().getLine()));
    return out;
  }

  private static ClientCapabilities client(
      boolean progress, boolean watchers, boolean documentChanges) {
    ClientCapabilities caps = new ClientCapabilities();
    WorkspaceClientCapabilities workspace = new WorkspaceClientCapabilities();
    if (watchers) {
      workspace.setDidChangeWatchedFiles(new DidChangeWatchedFilesCapabilities(true));
    }
    WorkspaceEditCapabilities edit = new WorkspaceEditCapabilities();
    edit.setDocumentChanges(documentChanges);
    workspace.setWorkspaceEdit(edit);
    caps.setWorkspace(workspace);
    if (progress) {
      WindowClientCapabilities window = new WindowClientCapabilities();
      window.setWorkDoneProgress(true);
      caps.setWindow(window);
    }
    return caps;
  }

  @Test
  void workspaceSymbolFindsANameDeclaredOnlyInAFileNeverOpenedNorUsed() throws Exception {
    Path main = write(dir.resolve("main.jonq"), bench("lib.jonq", "seed"));
    write(dir.resolve("lib.jonq"), LIB);
    Path stray = write(dir.resolve("deep/er/stray.jonq"), "mirror lonely_fold" + MIRROR);
    // Left out by design: hidden folders, build output, and files over the size cap.
    write(dir.resolve(".cache/hidden.jonq"), "mirror lonely_hidden" + MIRROR);
    write(dir.resolve("target/classes/built.jonq"), "mirror lonely_built" + MIRROR);
    write(
        dir.resolve("huge.jonq"),
        "mirror lonely_huge"
            + MIRROR
            + "// padding\n".repeat((int) (SpecFolderWalk.MAX_FILE_BYTES / 10) + 1));
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, new ClientCapabilities());
      h.open(uri(main), 1, bench("lib.jonq", "seed"));
      List<WorkspaceSymbol> found = symbols(h, "lonely");
      assertEquals(List.of("lonely_fold"), found.stream().map(WorkspaceSymbol::getName).toList());
      assertEquals(
          at(stray, "mirror lonely_fold" + MIRROR, "lonely_fold"),
          found.get(0).getLocation().getLeft());
      assertEquals(
          List.of("fold", "lonely_fold"),
          names(h, "fold"),
          "the used library's 'fold' once, from its check");
    }
  }

  @Test
  void referencesAndRenameFromALibraryElementReachUnopenedUsersAnywhereInTheFolder()
      throws Exception {
    Path lib = write(dir.resolve("parts/lib.jonq"), LIB);
    String openText = bench("parts/lib.jonq", "seed");
    Path open = write(dir.resolve("open.jonq"), openText);
    String aText = bench("../parts/lib.jonq", "lamp");
    String bText = bench("../../parts/lib.jonq", "diode");
    Path a = write(dir.resolve("benches/a.jonq"), aText);
    Path b = write(dir.resolve("benches/old/b.jonq"), bText);
    Path unrelated = write(dir.resolve("benches/c.jonq"), "mirror fold" + MIRROR); // its own 'fold'
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, client(false, false, true));
      h.open(uri(lib), 3, LIB);
      h.open(uri(open), 5, openText);
      h.client.await(uri(lib), p -> Integer.valueOf(3).equals(p.getVersion()));

      Location declaration = at(lib, LIB, "fold");
      List<Location> expected =
          new ArrayList<>(
              List.of(
                  at(a, aText, "fold"),
                  at(b, bText, "fold"),
                  declaration,
                  at(open, openText, "fold")));
      expected.sort(Comparator.comparing(Location::getUri));
      assertEquals(
          expected,
          references(h, declaration),
          "a and b were never opened, and no open file uses them");
      assertFalse(
          references(h, declaration).stream().anyMatch(l -> l.getUri().equals(uri(unrelated))));
      assertEquals(
          references(h, declaration),
          references(h, at(open, openText, "fold")),
          "the same from a use");
      List<Location> usesOnly = new ArrayList<>(expected);
      usesOnly.remove(declaration);
      assertEquals(
          usesOnly, references(h, declaration, false), "without includeDeclaration, the uses only");

      WorkspaceEdit edit =
          h.remote
              .getTextDocumentService()
              .rename(
                  new RenameParams(
                      new TextDocumentIdentifier(uri(lib)),
                      declaration.getRange().getStart(),
                      "steer"))
              .get(20, TimeUnit.SECONDS);
      Map<String, Integer> versions = new HashMap<>();
      List<Location> touched = new ArrayList<>();
      for (Either<TextDocumentEdit, ?> change : edit.getDocumentChanges()) {
        TextDocumentEdit e = change.getLeft();
        versions.put(e.getTextDocument().getUri(), e.getTextDocument().getVersion());
        for (TextEdit t : e.getEdits()) {
          assertEquals("steer", t.getNewText());
          touched.add(new Location(e.getTextDocument().getUri(), t.getRange()));
        }
      }
      Map<String, Integer> expectedVersions = new HashMap<>();
      expectedVersions.put(uri(lib), 3);
      expectedVersions.put(uri(open), 5);
      expectedVersions.put(uri(a), null); // never opened: no version
      expectedVersions.put(uri(b), null);
      assertEquals(expectedVersions, versions);
      touched.sort(Comparator.comparing(Location::getUri));
      assertEquals(expected, touched, "the rename touches every reference");
    }
  }

  @Test
  void openBufferTextOverridesTheDiskForEveryIndexedFile() throws Exception {
    Path lib = write(dir.resolve("lib.jonq"), LIB);
    String userText =
        bench("lib.jonq", "lamp").replace("fold", "novel"); // 'novel' is not declared on disk
    Path user = write(dir.resolve("user.jonq"), userText);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, new ClientCapabilities());
      String buffer = LIB + "mirror novel" + MIRROR;
      h.open(uri(lib), 1, buffer);
      h.client.await(uri(lib), p -> Integer.valueOf(1).equals(p.getVersion()));
      Location novel = at(lib, buffer, "novel");
      assertEquals(
          List.of(novel, at(user, userText, "novel")),
          references(h, novel),
          "the unopened user resolves 'novel' against the library's unsaved buffer");

      String renamed = LIB + "mirror novel2" + MIRROR;
      h.changeAll(uri(lib), 2, renamed);
      h.client.await(uri(lib), p -> Integer.valueOf(2).equals(p.getVersion()));
      Location novel2 = at(lib, renamed, "novel2");
      assertEquals(
          List.of(novel2),
          references(h, novel2),
          "edited in the buffer: the user's 'novel' no longer is it");
    }
  }

  @Test
  void aWatchedFileEventIsIndexed() throws Exception {
    write(dir.resolve("main.jonq"), bench("lib.jonq", "seed"));
    write(dir.resolve("lib.jonq"), LIB);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, client(false, true, false));
      assertEquals(List.of(), names(h, "abc"));
      Path created = write(dir.resolve("new/abc.jonq"), "mirror abc_new" + MIRROR);
      assertEquals(
          List.of(), names(h, "abc"), "a watching client reports changes; nothing is re-scanned");
      h.remote
          .getWorkspaceService()
          .didChangeWatchedFiles(
              new DidChangeWatchedFilesParams(
                  List.of(new FileEvent(uri(created), FileChangeType.Created))));
      assertEquals(List.of("abc_new"), names(h, "abc"));

      Files.writeString(created, "mirror abc_renamed" + MIRROR);
      h.remote
          .getWorkspaceService()
          .didChangeWatchedFiles(
              new DidChangeWatchedFilesParams(
                  List.of(new FileEvent(uri(created), FileChangeType.Changed))));
      assertEquals(List.of("abc_renamed"), names(h, "abc"));

      Files.delete(created);
      h.remote
          .getWorkspaceService()
          .didChangeWatchedFiles(
              new DidChangeWatchedFilesParams(
                  List.of(new FileEvent(uri(created), FileChangeType.Deleted))));
      assertEquals(List.of(), names(h, "abc"));
    }
  }

  @Test
  void withoutWatchersARequestFindsWhatChangedOnDisk() throws Exception {
    Path lib = write(dir.resolve("lib.jonq"), LIB);
    String mainText = bench("lib.jonq", "seed");
    write(dir.resolve("main.jonq"), mainText);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir); // no capabilities at all, as Neovim 0.7 sends
      h.open(uri(lib), 1, LIB);
      h.client.await(uri(lib), p -> Integer.valueOf(1).equals(p.getVersion()));
      Location declaration = at(lib, LIB, "fold");
      assertEquals(2, references(h, declaration).size(), "the declaration and main's use");

      String userText = bench("lib.jonq", "lamp");
      Path user = write(dir.resolve("later/user.jonq"), bench("../lib.jonq", "lamp"));
      assertEquals(List.of("lamp"), names(h, "lamp"), "a new file (e.g. a git checkout)");
      assertTrue(
          references(h, declaration).contains(at(user, userText, "fold")),
          "and its use of the library");

      Files.writeString(user, bench("../lib.jonq", "laser"));
      assertEquals(List.of(), names(h, "lamp"), "a changed file");
      assertEquals(List.of("laser"), names(h, "laser"));

      Files.delete(user);
      assertEquals(List.of(), names(h, "laser"), "a deleted file");
      assertEquals(2, references(h, declaration).size());
    }
  }

  private static WorkDoneProgressNotification value(ProgressParams p) {
    return p.getValue().getLeft();
  }

  @Test
  void theFirstPassReportsBeginReportEndOnlyToAClientThatTakesProgress() throws Exception {
    for (int i = 0; i < 5; i++) {
      write(dir.resolve("specs/s" + i + ".jonq"), "mirror m" + i + MIRROR);
    }
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, client(true, false, false));
      h.client.awaitProgress(p -> value(p).getKind() == WorkDoneProgressKind.end);
      List<ProgressParams> sent;
      List<String> created;
      synchronized (h.client) {
        sent = List.copyOf(h.client.progress);
        created = List.copyOf(h.client.progressTokens);
      }
      assertEquals(1, created.size(), "one token, created before use");
      assertTrue(
          sent.stream()
              .allMatch(p -> created.get(0).equals(IndexProgress.progressToken(p.getToken()))));
      List<WorkDoneProgressKind> kinds = sent.stream().map(p -> value(p).getKind()).toList();
      assertEquals(WorkDoneProgressKind.begin, kinds.get(0));
      assertEquals(WorkDoneProgressKind.end, kinds.get(kinds.size() - 1));
      assertTrue(
          kinds.subList(1, kinds.size() - 1).stream()
                  .allMatch(k -> k == WorkDoneProgressKind.report)
              && kinds.size() >= 3,
          "reports between begin and end: " + kinds);
      WorkDoneProgressBegin begin = (WorkDoneProgressBegin) value(sent.get(0));
      assertEquals(Boolean.TRUE, begin.getCancellable());
      assertEquals(
          "indexed 5 files", ((WorkDoneProgressEnd) value(sent.get(sent.size() - 1))).getMessage());
      assertEquals(5, names(h, "m").size());
    }
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(dir, client(false, false, false));
      assertEquals(5, names(h, "m").size(), "indexed all the same");
      synchronized (h.client) {
        assertEquals(List.of(), h.client.progressTokens);
        assertEquals(List.of(), h.client.progress);
      }
    }
  }

  @Test
  void cancellingTheProgressStopsIndexingAndTheServerGoesOn() throws Exception {
    int files = 40;
    for (int i = 0; i < files; i++) {
      write(
          dir.resolve("specs/s" + String.format("%02d", i) + ".jonq"), "mirror part_" + i + MIRROR);
    }
    CountDownLatch cancelSent = new CountDownLatch(1);
    EditorFeatures answers =
        new StandIn(EditorFeatures.standard()) {
          @Override
          public Optional<FileIndex> index(Result result, Path file) {
            try {
              // The first file waits until the editor has cancelled: indexing is under way when it
              // does.
              if (!cancelSent.await(20, TimeUnit.SECONDS)) {
                throw new AssertionError("the test never cancelled");
              }
            } catch (InterruptedException e) {
              Thread.currentThread().interrupt();
            }
            return super.index(result, file);
          }
        };
    try (LspHarness h = new LspHarness(answers)) {
      h.initialize(dir, client(true, false, false));
      ProgressParams begin =
          h.client.awaitProgress(p -> value(p).getKind() == WorkDoneProgressKind.begin);
      h.remote.cancelProgress(new WorkDoneProgressCancelParams(begin.getToken()));
      // A request answered after the cancel: the server has read the notification before it.
      assertNull(
          h.remote
              .getTextDocumentService()
              .hover(
                  new HoverParams(
                      new TextDocumentIdentifier(uri(dir.resolve("none.jonq"))),
                      new Position(0, 0)))
              .get(20, TimeUnit.SECONDS));
      cancelSent.countDown();

      ProgressParams end =
          h.client.awaitProgress(p -> value(p).getKind() == WorkDoneProgressKind.end);
      assertTrue(
          ((WorkDoneProgressEnd) value(end)).getMessage().startsWith("stopped after "),
          end.toString());
      List<String> indexed = names(h, "part_");
      assertTrue(
          indexed.contains("part_0"), "what was indexed before the cancel stays: " + indexed);
      assertFalse(indexed.contains("part_" + (files - 1)), "the rest is not indexed: " + indexed);
      assertTrue(indexed.size() < files);

      String opened = uri(dir.resolve("specs/s39.jonq"));
      h.open(opened, 1, "mirror part_39" + MIRROR);
      h.client.await(opened, p -> Integer.valueOf(1).equals(p.getVersion()));
      assertTrue(names(h, "part_").contains("part_39"), "an opened file is still answered for");
    }
  }

  @Test
  void twoFoldersKeepSeparateIndexesAndFollowFolderChanges() throws Exception {
    Path a = dir.resolve("a");
    Path b = dir.resolve("b");
    Path aLib = write(a.resolve("lib.jonq"), LIB);
    Path bLib = write(b.resolve("lib.jonq"), LIB);
    String userText = bench("lib.jonq", "seed");
    Path aUser = write(a.resolve("user.jonq"), userText);
    Path bUser = write(b.resolve("user.jonq"), userText);
    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      h.initialize(List.of(a, b), new ClientCapabilities());
      h.open(uri(aLib), 1, LIB);
      h.open(uri(bLib), 1, LIB);
      h.client.await(uri(bLib), p -> Integer.valueOf(1).equals(p.getVersion()));
      Location aFold = at(aLib, LIB, "fold");
      Location bFold = at(bLib, LIB, "fold");
      assertEquals(
          List.of(aFold, at(aUser, userText, "fold")), references(h, aFold), "nothing of b's");
      assertEquals(
          List.of(bFold, at(bUser, userText, "fold")), references(h, bFold), "nothing of a's");
      assertEquals(List.of("seed", "seed"), names(h, "seed"), "each folder's user, once");

      h.close(uri(bLib));
      h.remote
          .getWorkspaceService()
          .didChangeWorkspaceFolders(
              new DidChangeWorkspaceFoldersParams(
                  new WorkspaceFoldersChangeEvent(
                      List.of(), List.of(new WorkspaceFolder(uri(b), "b")))));
      assertEquals(
          List.of(aFold.getUri()),
          symbols(h, "fold").stream().map(s -> s.getLocation().getLeft().getUri()).toList(),
          "b's index is dropped with its folder");
      h.remote
          .getWorkspaceService()
          .didChangeWorkspaceFolders(
              new DidChangeWorkspaceFoldersParams(
                  new WorkspaceFoldersChangeEvent(
                      List.of(new WorkspaceFolder(uri(b), "b")), List.of())));
      assertEquals(
          List.of(aFold.getUri(), bFold.getUri()),
          symbols(h, "fold").stream()
              .map(s -> s.getLocation().getLeft().getUri())
              .sorted()
              .toList(),
          "and built again when it comes back");
    }
  }
}
