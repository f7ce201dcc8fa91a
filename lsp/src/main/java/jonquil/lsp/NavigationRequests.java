package jonquil.lsp;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import jonquil.ide.SymbolInfo;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DocumentLink;
import org.eclipse.lsp4j.DocumentLinkParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Navigation requests: definition, references, document symbols and document links. */
final class NavigationRequests {
  private final JonquilLanguageServer server;

  NavigationRequests(JonquilLanguageServer server) {
    this.server = server;
  }

  /** Definition, as LocationLinks for a client with {@code linkSupport}, else as Locations. */
  CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>> definition(
      DefinitionParams params) {
    boolean links = server.clientSupport().definitionLinks();
    return server.requests.atPosition(
        "textDocument/definition",
        params,
        Either.forLeft(List.of()),
        at -> {
          List<jonquil.ide.Location> targets =
              server.answers.definition(at.result(), at.path(), at.offset());
          if (links) {
            TextRange origin = nameUnderCursor(at);
            return Either.forRight(
                targets.stream()
                    .map(l -> at.convert().locationLink(l, at::checked, at.source(), origin))
                    .toList());
          }
          return Either.forLeft(
              targets.stream().map(l -> at.convert().location(l, at::checked)).toList());
        });
  }

  /**
   * The occurrence of a name that holds the cursor, as the editor answers list it among the name's
   * references; null when the cursor is on no name (e.g. inside a 'use' path).
   */
  private TextRange nameUnderCursor(RequestPipeline.At at) {
    for (jonquil.ide.Location l :
        server.answers.references(at.result(), at.path(), at.offset(), true)) {
      if (l.file().equals(at.path())
          && l.range().start() <= at.offset()
          && at.offset() <= l.range().end()) {
        return l.range();
      }
    }
    return null;
  }

  /** References across the open documents' checks and the workspace index. */
  CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
    boolean withDeclaration =
        params.getContext() != null && params.getContext().isIncludeDeclaration();
    return server.requests.withIndex(
        "textDocument/references",
        params,
        List.of(),
        (at, index) -> {
          return server
              .answers
              .references(at.result(), at.path(), at.offset(), withDeclaration, index.files())
              .stream()
              .map(l -> at.convert().location(l, file -> at.sourceOf(file, index)))
              .toList();
        });
  }

  /** Document symbols: a tree for a hierarchical client, else flat SymbolInformation. */
  CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(
      DocumentSymbolParams params) {
    boolean hierarchical = server.clientSupport().hierarchicalSymbols();
    return server.requests.wholeDocument(
        "textDocument/documentSymbol",
        params.getTextDocument().getUri(),
        at -> {
          List<Either<SymbolInformation, DocumentSymbol>> out = new ArrayList<>();
          for (SymbolInfo s : server.answers.documentSymbols(at.result(), at.path())) {
            if (hierarchical) {
              out.add(
                  Either.forRight(ProtocolAnswers.documentSymbol(at.convert(), s, at.source())));
            } else {
              List<SymbolInformation> flat = new ArrayList<>();
              ProtocolAnswers.flatten(at.convert(), s, at.source(), null, flat);
              flat.forEach(f -> out.add(Either.forLeft(f)));
            }
          }
          return out;
        });
  }

  /** Links from each {@code use} path to the file it names. */
  CompletableFuture<List<DocumentLink>> documentLink(DocumentLinkParams params) {
    return server.requests.wholeDocument(
        "textDocument/documentLink",
        params.getTextDocument().getUri(),
        at ->
            server.answers.documentLinks(at.result(), at.path()).stream()
                .map(link -> ProtocolAnswers.documentLink(at.convert(), at.source(), link))
                .toList());
  }
}
