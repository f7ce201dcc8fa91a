package jonquil.lsp;

import jonquil.ide.SymbolInfo;

import jonquil.ide.RenameResult;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import jonquil.format.Formatter;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentRangeFormattingParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.PrepareRenameDefaultBehavior;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.PrepareRenameResult;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.Either3;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.services.TextDocumentService;

/** The textDocument/* methods: records edits for the check worker and relays questions to the editor answers. */
final class JonquilTextDocumentService implements TextDocumentService {
  private final JonquilLanguageServer server;

  JonquilTextDocumentService(JonquilLanguageServer server) {
    this.server = server;
  }

  // ---- synchronisation: record and schedule, nothing more ----

  @Override
  public void didOpen(DidOpenTextDocumentParams params) {
    server.onNotification("textDocument/didOpen", () -> {
      var doc = params.getTextDocument();
      server.documents.open(doc.getUri(), doc.getVersion(), doc.getText() == null ? "" : doc.getText());
      server.scheduleCheck();
    });
  }

  @Override
  public void didChange(DidChangeTextDocumentParams params) {
    server.onNotification("textDocument/didChange", () -> {
      var id = params.getTextDocument();
      Convert convert = server.convert();
      List<TextDocumentContentChangeEvent> changes = params.getContentChanges();
      server.documents.change(id.getUri(), id.getVersion(), text -> {
        String now = text;
        for (TextDocumentContentChangeEvent change : changes) {
          now = convert.applyChange(now, change);
        }
        return now;
      });
      server.scheduleCheck();
    });
  }

  @Override
  public void didClose(DidCloseTextDocumentParams params) {
    server.onNotification("textDocument/didClose", () -> {
      server.documents.close(params.getTextDocument().getUri());
      server.scheduleCheck();
    });
  }

  @Override
  public void didSave(DidSaveTextDocumentParams params) {
    // The open buffer is already what the checker reads; saving changes nothing for it.
  }

  // ---- questions, answered from the latest check ----

  @Override
  public CompletableFuture<Hover> hover(HoverParams params) {
    boolean markdown = JonquilLanguageServer.ClientSupport.markdownHover(server.clientCapabilities());
    return server.atPosition("textDocument/hover", params.getTextDocument().getUri(), params.getPosition(), null,
        at -> server.answers.hover(at.result(), at.path(), at.offset())
            .map(info -> at.convert().hover(info, at.source(), markdown))
            .orElse(null));
  }

  @Override
  public CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>> definition(
      DefinitionParams params) {
    return server.atPosition("textDocument/definition", params.getTextDocument().getUri(), params.getPosition(),
        Either.forLeft(List.of()), at -> {
          List<Location> out = new ArrayList<>();
          for (jonquil.ide.Location l : server.answers.definition(at.result(), at.path(), at.offset())) {
            out.add(at.convert().location(l, at.result().files()::get));
          }
          return Either.forLeft(out);
        });
  }

  @Override
  public CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
    boolean withDeclaration = params.getContext() != null && params.getContext().isIncludeDeclaration();
    return server.atPosition("textDocument/references", params.getTextDocument().getUri(), params.getPosition(),
        List.of(), at -> {
          List<Location> out = new ArrayList<>();
          for (jonquil.ide.Location l
              : server.answers.references(at.result(), at.path(), at.offset(), withDeclaration)) {
            out.add(at.convert().location(l, at.result().files()::get));
          }
          return out;
        });
  }

  @Override
  public CompletableFuture<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>> prepareRename(
      PrepareRenameParams params) {
    return server.atPosition("textDocument/prepareRename", params.getTextDocument().getUri(), params.getPosition(),
        null, at -> {
          Optional<TextRange> range = server.answers.prepareRename(at.result(), at.path(), at.offset());
          return range.<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>>map(
              r -> Either3.forFirst(at.convert().range(at.source(), r))).orElse(null);
        });
  }

  @Override
  public CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
    boolean documentChanges = JonquilLanguageServer.ClientSupport.documentChanges(server.clientCapabilities());
    return server.atPosition("textDocument/rename", params.getTextDocument().getUri(), params.getPosition(), null,
        at -> {
          RenameResult result =
              server.answers.rename(at.result(), at.path(), at.offset(), params.getNewName());
          if (result.error() != null) {
            throw new ResponseErrorException(new ResponseError(ResponseErrorCode.RequestFailed, result.error(), null));
          }
          Map<Path, List<jonquil.diag.Edit>> edits = result.edits() == null ? Map.of() : new LinkedHashMap<>(result.edits());
          return at.convert().workspaceEdit(edits, at.result().files()::get,
              file -> server.documents.get(file).map(Documents.Doc::version).orElse(null), documentChanges);
        });
  }

  @Override
  public CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(
      DocumentSymbolParams params) {
    boolean hierarchical = JonquilLanguageServer.ClientSupport.hierarchicalSymbols(server.clientCapabilities());
    return server.atPosition("textDocument/documentSymbol", params.getTextDocument().getUri(), null, List.of(),
        at -> {
          SourceFile source = at.source();
          List<Either<SymbolInformation, DocumentSymbol>> out = new ArrayList<>();
          for (SymbolInfo s : server.answers.documentSymbols(at.result(), at.path())) {
            if (hierarchical) {
              out.add(Either.forRight(at.convert().documentSymbol(s, source)));
            } else {
              List<SymbolInformation> flat = new ArrayList<>();
              at.convert().flatten(s, source, null, flat);
              flat.forEach(f -> out.add(Either.forLeft(f)));
            }
          }
          return out;
        });
  }

  // ---- formatting: from the buffer as the request found it, never waiting for a check ----

  @Override
  public CompletableFuture<List<? extends TextEdit>> formatting(DocumentFormattingParams params) {
    Optional<Documents.Doc> doc = server.documents.get(params.getTextDocument().getUri());
    FormattingOptions options = params.getOptions();
    return server.answer("textDocument/formatting", null, (snapshot, none) -> {
      if (doc.isEmpty()) {
        return List.of();
      }
      SourceFile source = new SourceFile(doc.get().path(), doc.get().text());
      return server.convert().textEdits(source, Formatter.edits(source, Convert.formatOptions(options)));
    });
  }

  @Override
  public CompletableFuture<List<? extends TextEdit>> rangeFormatting(DocumentRangeFormattingParams params) {
    Optional<Documents.Doc> doc = server.documents.get(params.getTextDocument().getUri());
    FormattingOptions options = params.getOptions();
    int[] lines = Convert.lines(params.getRange());
    return server.answer("textDocument/rangeFormatting", null, (snapshot, none) -> {
      if (doc.isEmpty()) {
        return List.of();
      }
      SourceFile source = new SourceFile(doc.get().path(), doc.get().text());
      Optional<String> formatted = Formatter.format(source, Convert.formatOptions(options));
      if (formatted.isEmpty() || formatted.get().equals(source.text())) {
        return List.of();
      }
      return server.convert().textEdits(source,
          FormatHunks.within(source.path(), source.text(), formatted.get(), lines[0], lines[1]));
    });
  }
}
