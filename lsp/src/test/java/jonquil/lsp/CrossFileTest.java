package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolCapabilities;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentEdit;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceClientCapabilities;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.WorkspaceEditCapabilities;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * References, rename, document and workspace symbols through the real editor answers ({@link
 * EditorFeatures}), across an open file and the unopened library it uses.
 */
class CrossFileTest {
  static final String LIB =
      """
      mirror m1 { metal silver; aoi 45 deg }
      mirror abc_fold { metal silver; aoi 45 deg }
      """;
  static final String MAIN =
      """
      use "lib.jonq"
      source seed { wavelength 1064 nm; power 2 W }
      probe spot
      train main {
        seed -> 100 mm -> m1 -> 20 mm -> spot
      }
      """;

  /** 'm1' in MAIN (line 4, columns 20-22) and its declaration in LIB (line 0, columns 7-9). */
  static final Range USE = new Range(new Position(4, 20), new Position(4, 22));

  static final Range DECLARATION = new Range(new Position(0, 7), new Position(0, 9));
  static final Position ON_M1 = new Position(4, 21);

  @TempDir Path dir;

  private String libUri;
  private String mainUri;

  private void write(String lib) throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path libPath = dir.resolve("lib.jonq").toAbsolutePath().normalize();
    Path mainPath = dir.resolve("main.jonq").toAbsolutePath().normalize();
    Files.writeString(libPath, lib);
    Files.writeString(mainPath, MAIN);
    libUri = libPath.toUri().toString();
    mainUri = mainPath.toUri().toString();
  }

  private LspHarness openMain(ClientCapabilities caps, int version) throws Exception {
    LspHarness h = new LspHarness(EditorFeatures.standard());
    h.initialize(dir, caps);
    h.open(mainUri, version, MAIN);
    h.client.await(mainUri, p -> Integer.valueOf(version).equals(p.getVersion()));
    return h;
  }

  private List<? extends Location> references(LspHarness h, boolean includeDeclaration)
      throws Exception {
    ReferenceParams params =
        new ReferenceParams(
            new TextDocumentIdentifier(mainUri), ON_M1, new ReferenceContext(includeDeclaration));
    List<Location> out =
        new ArrayList<>(
            h.remote.getTextDocumentService().references(params).get(20, TimeUnit.SECONDS));
    out.sort(Comparator.comparing(Location::getUri));
    return out;
  }

  @Test
  void referencesReachTheUnopenedLibraryOnlyWithTheDeclaration() throws Exception {
    write(LIB);
    try (LspHarness h = openMain(new ClientCapabilities(), 1)) {
      assertEquals(
          List.of(new Location(libUri, DECLARATION), new Location(mainUri, USE)),
          references(h, true));
      assertEquals(List.of(new Location(mainUri, USE)), references(h, false));
    }
  }

  private static ClientCapabilities renamingClient(boolean documentChanges) {
    ClientCapabilities caps = new ClientCapabilities();
    WorkspaceClientCapabilities workspace = new WorkspaceClientCapabilities();
    WorkspaceEditCapabilities edit = new WorkspaceEditCapabilities();
    edit.setDocumentChanges(documentChanges);
    workspace.setWorkspaceEdit(edit);
    caps.setWorkspace(workspace);
    return caps;
  }

  private WorkspaceEdit rename(LspHarness h, String newName) throws Exception {
    return h.remote
        .getTextDocumentService()
        .rename(new RenameParams(new TextDocumentIdentifier(mainUri), ON_M1, newName))
        .get(20, TimeUnit.SECONDS);
  }

  @Test
  void renameGivesVersionedDocumentChangesOnEveryReferenceAndIdentityIsANoOp() throws Exception {
    write(LIB);
    try (LspHarness h = openMain(renamingClient(true), 7)) {
      var service = h.remote.getTextDocumentService();
      TextDocumentIdentifier doc = new TextDocumentIdentifier(mainUri);
      // Keywords are not names: 'use', 'train', 'source' cannot be renamed.
      for (Position keyword : List.of(new Position(0, 1), new Position(3, 2), new Position(1, 3))) {
        assertNull(
            service.prepareRename(new PrepareRenameParams(doc, keyword)).get(20, TimeUnit.SECONDS),
            "prepareRename on a keyword at " + keyword);
      }
      assertEquals(
          USE,
          service
              .prepareRename(new PrepareRenameParams(doc, ON_M1))
              .get(20, TimeUnit.SECONDS)
              .getFirst());

      WorkspaceEdit edit = rename(h, "m9");
      // (LSP4J's client fills an absent 'changes' with an empty map, so absent and empty look alike
      // here)
      assertTrue(
          edit.getChanges() == null || edit.getChanges().isEmpty(),
          "documentChanges only: " + edit);
      Map<String, Integer> versions = new java.util.HashMap<>();
      List<Location> touched = new ArrayList<>();
      for (Either<TextDocumentEdit, ?> change : edit.getDocumentChanges()) {
        assertTrue(change.isLeft(), "text edits, no resource operations: " + change);
        TextDocumentEdit e = change.getLeft();
        versions.put(e.getTextDocument().getUri(), e.getTextDocument().getVersion());
        for (TextEdit t : e.getEdits()) {
          assertEquals("m9", t.getNewText());
          touched.add(new Location(e.getTextDocument().getUri(), t.getRange()));
        }
      }
      Map<String, Integer> expectedVersions = new java.util.HashMap<>();
      expectedVersions.put(mainUri, 7); // the open document carries its version
      expectedVersions.put(libUri, null); // the unopened file has none
      assertEquals(expectedVersions, versions);
      touched.sort(Comparator.comparing(Location::getUri));
      assertEquals(
          references(h, true), touched, "the rename touches every reference, declaration included");

      WorkspaceEdit identity = rename(h, "m1");
      assertTrue(
          identity.getChanges() == null || identity.getChanges().isEmpty(),
          "identity: " + identity);
      assertTrue(
          identity.getDocumentChanges() == null || identity.getDocumentChanges().isEmpty(),
          "identity: " + identity);
    }
  }

  @Test
  void aClientWithoutDocumentChangesGetsPlainChangesInBothFiles() throws Exception {
    write(LIB);
    for (ClientCapabilities caps : List.of(new ClientCapabilities(), renamingClient(false))) {
      try (LspHarness h = openMain(caps, 1)) {
        WorkspaceEdit edit = rename(h, "m9");
        assertNull(edit.getDocumentChanges());
        assertEquals(
            Map.of(
                mainUri,
                List.of(new TextEdit(USE, "m9")),
                libUri,
                List.of(new TextEdit(DECLARATION, "m9"))),
            edit.getChanges());
      }
    }
  }

  private List<Either<SymbolInformation, DocumentSymbol>> documentSymbols(LspHarness h)
      throws Exception {
    return h.remote
        .getTextDocumentService()
        .documentSymbol(new DocumentSymbolParams(new TextDocumentIdentifier(mainUri)))
        .get(20, TimeUnit.SECONDS);
  }

  private static boolean within(Range inner, Range outer) {
    return !before(inner.getStart(), outer.getStart()) && !before(outer.getEnd(), inner.getEnd());
  }

  private static boolean before(Position a, Position b) {
    return a.getLine() < b.getLine()
        || (a.getLine() == b.getLine() && a.getCharacter() < b.getCharacter());
  }

  /** Checks every node below {@code s} and returns how many there are, s included. */
  private static int checkTree(DocumentSymbol s, Range parent) {
    assertTrue(within(s.getSelectionRange(), s.getRange()), "selectionRange within range: " + s);
    if (parent != null) {
      assertTrue(within(s.getRange(), parent), "a child lies within its parent: " + s);
    }
    int count = 1;
    for (DocumentSymbol child :
        s.getChildren() == null ? List.<DocumentSymbol>of() : s.getChildren()) {
      count += checkTree(child, s.getRange());
    }
    return count;
  }

  @Test
  void documentSymbolsAreATreeForAHierarchicalClientAndFlatOtherwise() throws Exception {
    write(LIB);
    ClientCapabilities hierarchical = new ClientCapabilities();
    TextDocumentClientCapabilities text = new TextDocumentClientCapabilities();
    DocumentSymbolCapabilities symbols = new DocumentSymbolCapabilities();
    symbols.setHierarchicalDocumentSymbolSupport(true);
    text.setDocumentSymbol(symbols);
    hierarchical.setTextDocument(text);
    int nodes = 0;
    boolean nested = false;
    List<String> treeNames = new ArrayList<>();
    try (LspHarness h = openMain(hierarchical, 1)) {
      for (Either<SymbolInformation, DocumentSymbol> s : documentSymbols(h)) {
        assertTrue(s.isRight(), "DocumentSymbol for a hierarchical client: " + s);
        nodes += checkTree(s.getRight(), null);
        nested |= s.getRight().getChildren() != null && !s.getRight().getChildren().isEmpty();
        treeNames.add(s.getRight().getName());
      }
    }
    assertTrue(
        treeNames.containsAll(List.of("seed", "spot", "main")), "top-level symbols: " + treeNames);
    assertTrue(nested, "some symbol has children");
    try (LspHarness h = openMain(new ClientCapabilities(), 1)) {
      var flat = documentSymbols(h);
      assertTrue(
          flat.stream().allMatch(Either::isLeft),
          "SymbolInformation without the capability: " + flat);
      assertEquals(nodes, flat.size(), "the flat form lists every node of the tree");
      assertTrue(flat.stream().allMatch(s -> mainUri.equals(s.getLeft().getLocation().getUri())));
    }
  }

  private List<WorkspaceSymbol> workspaceSymbols(LspHarness h, String query) throws Exception {
    var found =
        h.remote
            .getWorkspaceService()
            .symbol(new WorkspaceSymbolParams(query))
            .get(20, TimeUnit.SECONDS);
    assertTrue(found.isRight(), "WorkspaceSymbol answers: " + found);
    return new ArrayList<>(found.getRight());
  }

  @Test
  void workspaceSymbolFindsAPrefixInTheUnopenedLibrary() throws Exception {
    write(LIB);
    try (LspHarness h = openMain(new ClientCapabilities(), 1)) {
      List<WorkspaceSymbol> found = workspaceSymbols(h, "ab");
      assertEquals(List.of("abc_fold"), found.stream().map(WorkspaceSymbol::getName).toList());
      assertEquals(
          new Location(libUri, new Range(new Position(1, 7), new Position(1, 15))),
          found.get(0).getLocation().getLeft());
    }
  }

  @Test
  void workspaceSymbolAnswersAreCapped() throws Exception {
    int declared = JonquilWorkspaceService.MAX_SYMBOLS + 50;
    StringBuilder lib = new StringBuilder(LIB);
    for (int i = 0; i < declared; i++) {
      lib.append("material ab_").append(i).append(" = index 1.5\n");
    }
    write(lib.toString());
    try (LspHarness h = openMain(new ClientCapabilities(), 1)) {
      List<WorkspaceSymbol> found = workspaceSymbols(h, "ab_");
      assertEquals(JonquilWorkspaceService.MAX_SYMBOLS, found.size());
      assertTrue(
          found.stream()
              .allMatch(
                  s ->
                      s.getName().startsWith("ab_")
                          && libUri.equals(s.getLocation().getLeft().getUri())));
      assertEquals(
          1, workspaceSymbols(h, "ab_" + (declared - 1)).size(), "every declaration is searchable");
    }
  }
}
