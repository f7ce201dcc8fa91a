package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import jonquil.source.ProjectRoot;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DidChangeWorkspaceFoldersParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.WorkspaceFoldersChangeEvent;
import org.eclipse.lsp4j.WorkspaceFoldersOptions;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Two workspace folders that each declare {@code fold1}, then one folder removed and a third added:
 * each file is checked under its innermost folder, and a change of folders re-roots the open
 * documents.
 */
class MultiRootTest {
  static final String MIRROR = " { metal silver; aoi 45 deg }\n";

  /** A train through {@code fold1} (line 4, columns 20-25), after the given 'use' lines. */
  static String main(String uses, String extra) {
    return uses
        + """
        source seed { wavelength 1064 nm; power 2 W }
        probe spot
        train main {
          seed -> 100 mm -> fold1 -> 20 mm ->%s spot
        }
        """
            .formatted(extra);
  }

  @TempDir Path base;

  private static String uri(Path p) {
    return p.toAbsolutePath().normalize().toUri().toString();
  }

  private static Path write(Path p, String text) throws Exception {
    Files.createDirectories(p.getParent());
    Files.writeString(p, text);
    return p;
  }

  private static List<Location> definition(LspHarness h, String uri, Position at) throws Exception {
    Either<List<? extends Location>, List<? extends LocationLink>> found =
        h.remote
            .getTextDocumentService()
            .definition(new DefinitionParams(new TextDocumentIdentifier(uri), at))
            .get(20, TimeUnit.SECONDS);
    return found == null || found.getLeft() == null ? List.of() : new ArrayList<>(found.getLeft());
  }

  private static List<Location> references(LspHarness h, String uri, Position at) throws Exception {
    List<Location> out =
        new ArrayList<>(
            h.remote
                .getTextDocumentService()
                .references(
                    new ReferenceParams(
                        new TextDocumentIdentifier(uri), at, new ReferenceContext(true)))
                .get(20, TimeUnit.SECONDS));
    out.sort(Comparator.comparing(Location::getUri));
    return out;
  }

  private static List<Location> workspaceSymbols(LspHarness h, String query) throws Exception {
    List<Location> out = new ArrayList<>();
    for (WorkspaceSymbol s :
        h.remote
            .getWorkspaceService()
            .symbol(new WorkspaceSymbolParams(query))
            .get(20, TimeUnit.SECONDS)
            .getRight()) {
      assertEquals(query, s.getName());
      out.add(s.getLocation().getLeft());
    }
    out.sort(Comparator.comparing(Location::getUri));
    return out;
  }

  private static List<String> messages(PublishDiagnosticsParams p) {
    return p.getDiagnostics().stream().map(d -> d.getMessage()).toList();
  }

  private static WorkspaceFolder folder(Path p) {
    return new WorkspaceFolder(uri(p), p.getFileName().toString());
  }

  @Test
  void sameNamedSymbolsInTwoFoldersStaySeparateAndFolderChangesReRoot() throws Exception {
    Files.writeString(base.resolve(ProjectRoot.MARKER), "");
    write(base.resolve("shared.jonq"), "mirror wide" + MIRROR);
    Path a = base.resolve("a");
    Path b = base.resolve("b");
    Path c = a.resolve("sub");
    String aLib = uri(write(a.resolve("lib.jonq"), "mirror fold1" + MIRROR));
    String bLib =
        uri(write(b.resolve("lib.jonq"), "mirror pad" + MIRROR + "mirror fold1" + MIRROR));
    String aMainText = main("use \"lib.jonq\"\n", "");
    // B's main also reaches above its folder, which a workspace folder forbids.
    String bMainText = main("use \"lib.jonq\"\nuse \"../shared.jonq\"\n", " wide -> 5 mm ->");
    String innerText = main("use \"../lib.jonq\"\n", "");
    String aMain = uri(write(a.resolve("main.jonq"), aMainText));
    String bMain = uri(write(b.resolve("main.jonq"), bMainText));
    String inner = uri(write(c.resolve("inner.jonq"), innerText));
    Position onFold1 = new Position(4, 22);

    try (LspHarness h = new LspHarness(EditorFeatures.standard())) {
      InitializeResult init = h.initialize(List.of(a, b), new ClientCapabilities());
      WorkspaceFoldersOptions advertised =
          init.getCapabilities().getWorkspace().getWorkspaceFolders();
      assertEquals(Boolean.TRUE, advertised.getSupported());
      assertEquals(Either.forRight(true), advertised.getChangeNotifications());

      h.open(aMain, 1, aMainText);
      h.open(bMain, 1, bMainText);
      h.open(inner, 1, innerText);
      PublishDiagnosticsParams aDiags =
          h.client.await(aMain, p -> Integer.valueOf(1).equals(p.getVersion()));
      PublishDiagnosticsParams bDiags =
          h.client.await(bMain, p -> Integer.valueOf(1).equals(p.getVersion()));
      PublishDiagnosticsParams innerDiags =
          h.client.await(inner, p -> Integer.valueOf(1).equals(p.getVersion()));
      assertEquals(List.of(), aDiags.getDiagnostics(), "A is clean whatever B says");
      assertTrue(
          messages(bDiags)
              .contains(
                  "'../shared.jonq' leads outside the project root 'b'; keep used files inside"
                      + " the project"),
          "B's 'use' above its folder is an error in B only: " + messages(bDiags));
      assertEquals(
          List.of(),
          innerDiags.getDiagnostics(),
          "a/sub is under folder a, so '../lib.jonq' is allowed");

      Location aDecl = new Location(aLib, new Range(new Position(0, 7), new Position(0, 12)));
      Location bDecl = new Location(bLib, new Range(new Position(1, 7), new Position(1, 12)));
      Range use = new Range(new Position(4, 20), new Position(4, 25));
      assertEquals(List.of(aDecl), definition(h, aMain, onFold1));
      assertEquals(List.of(bDecl), definition(h, bMain, new Position(5, 22)));
      assertEquals(List.of(aDecl), definition(h, inner, onFold1));
      List<Location> aRefs = references(h, aMain, onFold1);
      assertTrue(
          aRefs.contains(aDecl) && aRefs.contains(new Location(aMain, use)),
          "A's references: " + aRefs);
      assertTrue(
          aRefs.stream().allMatch(l -> l.getUri().startsWith(uri(a))), "nothing of B's: " + aRefs);
      List<Location> bRefs = references(h, bMain, new Position(5, 22));
      assertTrue(
          bRefs.stream().allMatch(l -> l.getUri().startsWith(uri(b))), "nothing of A's: " + bRefs);
      assertEquals(
          List.of(aDecl, bDecl),
          workspaceSymbols(h, "fold1"),
          "one fold1 per folder, each in its own file");
      assertTrue(h.client.publishedFor(aMain).stream().allMatch(p -> p.getDiagnostics().isEmpty()));

      // Folder b goes, a/sub comes: b/main falls back to the root marker in base, a/sub/inner is
      // checked under a/sub.
      h.remote
          .getWorkspaceService()
          .didChangeWorkspaceFolders(
              new DidChangeWorkspaceFoldersParams(
                  new WorkspaceFoldersChangeEvent(List.of(folder(c)), List.of(folder(b)))));
      // Asked at once: the answer waits for the check under the new folders, not the one before.
      assertEquals(
          List.of(), definition(h, inner, onFold1), "'../lib.jonq' now leaves inner's folder");
      h.client.await(bMain, p -> p.getDiagnostics().isEmpty());
      PublishDiagnosticsParams innerNow = h.client.await(inner, p -> !p.getDiagnostics().isEmpty());
      assertTrue(
          messages(innerNow)
              .contains(
                  "'../lib.jonq' leads outside the project root 'sub'; keep used files inside"
                      + " the project"),
          "inner is checked under the added folder: " + messages(innerNow));
      assertEquals(List.of(bDecl), definition(h, bMain, new Position(5, 22)));
      assertEquals(List.of(aDecl), definition(h, aMain, onFold1));
      assertEquals(List.of(aDecl, bDecl), workspaceSymbols(h, "fold1"));
      assertTrue(h.client.publishedFor(aMain).stream().allMatch(p -> p.getDiagnostics().isEmpty()));
      assertEquals(List.of(a, c), h.server.folders());
    }
  }
}
