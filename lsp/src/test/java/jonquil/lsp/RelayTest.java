package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.ide.EditorFeatures;
import jonquil.ide.FoundSymbol;
import jonquil.ide.RenameResult;
import jonquil.ide.SymbolInfo;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Definition, rename, prepareRename and symbols are relayed from the editor answers and converted,
 * never computed here.
 */
class RelayTest {
  static final String LIB = "mirror m1 { reflectance 99 % }\n";
  static final String MAIN = "use \"lib.jonq\"\n// é😀\nprobe p\n";

  @TempDir Path dir;

  @Test
  void answersCrossFilesAndConvertRanges() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Path lib = dir.resolve("lib.jonq").toAbsolutePath().normalize();
    Path main = dir.resolve("main.jonq").toAbsolutePath().normalize();
    Files.writeString(lib, LIB);
    Files.writeString(main, MAIN);
    String uri = main.toUri().toString();
    int probe = MAIN.indexOf("p\n", MAIN.indexOf("probe"));
    EditorFeatures answers =
        new StandIn() {
          @Override
          public List<jonquil.ide.Location> definition(Result result, Path file, int offset) {
            return List.of(new jonquil.ide.Location(lib, TextRange.of(7, 9)));
          }

          @Override
          public Optional<TextRange> prepareRename(Result result, Path file, int offset) {
            return offset == probe ? Optional.of(TextRange.of(probe, probe + 1)) : Optional.empty();
          }

          @Override
          public RenameResult rename(Result result, Path file, int offset, String newName) {
            if (newName.equals("use")) {
              return new RenameResult(Map.of(), "'use' is a reserved word");
            }
            return new RenameResult(
                Map.of(
                    file,
                    List.of(new Edit(file, TextRange.of(probe, probe + 1), newName)),
                    lib,
                    List.of(new Edit(lib, TextRange.of(7, 9), newName))),
                null);
          }

          @Override
          public List<SymbolInfo> documentSymbols(Result result, Path file) {
            SymbolInfo child =
                new SymbolInfo(
                    "p",
                    SymbolInfo.Kind.ELEMENT,
                    "probe",
                    TextRange.of(probe - 6, probe + 1),
                    TextRange.of(probe, probe + 1),
                    List.of());
            return List.of(
                new SymbolInfo(
                    "main",
                    SymbolInfo.Kind.TRAIN,
                    "train",
                    TextRange.of(0, MAIN.length()),
                    null,
                    List.of(child)));
          }

          @Override
          public List<FoundSymbol> workspaceSymbols(Result result, String query) {
            return List.of(
                new FoundSymbol(
                    lib,
                    new SymbolInfo(
                        "m1",
                        SymbolInfo.Kind.ELEMENT,
                        "mirror",
                        TextRange.of(0, 30),
                        TextRange.of(7, 9),
                        List.of())));
          }
        };
    try (LspHarness h = new LspHarness(answers)) {
      h.initialize(dir);
      h.open(uri, 1, MAIN);
      var service = h.remote.getTextDocumentService();
      TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
      Position atProbe = new Position(2, 6);

      List<? extends Location> defs =
          service
              .definition(new DefinitionParams(doc, atProbe))
              .get(10, TimeUnit.SECONDS)
              .getLeft();
      assertEquals(
          List.of(
              new Location(
                  lib.toUri().toString(), new Range(new Position(0, 7), new Position(0, 9)))),
          defs);

      var prepared =
          service.prepareRename(new PrepareRenameParams(doc, atProbe)).get(10, TimeUnit.SECONDS);
      assertEquals(new Range(atProbe, new Position(2, 7)), prepared.getFirst());
      assertEquals(
          null,
          service
              .prepareRename(new PrepareRenameParams(doc, new Position(0, 1)))
              .get(10, TimeUnit.SECONDS));

      var edit = service.rename(new RenameParams(doc, atProbe, "trap")).get(10, TimeUnit.SECONDS);
      assertEquals(2, edit.getChanges().size());
      assertEquals("trap", edit.getChanges().get(uri).get(0).getNewText());
      ExecutionException refused =
          assertThrows(
              ExecutionException.class,
              () ->
                  service.rename(new RenameParams(doc, atProbe, "use")).get(10, TimeUnit.SECONDS));
      ResponseErrorException error =
          assertInstanceOf(ResponseErrorException.class, refused.getCause());
      assertEquals(ResponseErrorCode.RequestFailed.getValue(), error.getResponseError().getCode());

      var symbols = service.documentSymbol(new DocumentSymbolParams(doc)).get(10, TimeUnit.SECONDS);
      // The harness client does not announce hierarchical symbols: it gets the flat form.
      assertEquals(List.of("main", "p"), symbols.stream().map(s -> s.getLeft().getName()).toList());
      assertEquals(SymbolKind.Namespace, symbols.get(0).getLeft().getKind());

      var found =
          h.remote
              .getWorkspaceService()
              .symbol(new WorkspaceSymbolParams("m"))
              .get(10, TimeUnit.SECONDS);
      assertEquals("m1", found.getRight().get(0).getName());
      assertEquals(
          lib.toUri().toString(), found.getRight().get(0).getLocation().getLeft().getUri());
    }
  }
}
