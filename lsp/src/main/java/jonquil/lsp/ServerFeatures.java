package jonquil.lsp;

import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.CodeActionOptions;
import org.eclipse.lsp4j.CompletionOptions;
import org.eclipse.lsp4j.DiagnosticRegistrationOptions;
import org.eclipse.lsp4j.DidChangeWatchedFilesRegistrationOptions;
import org.eclipse.lsp4j.DocumentLinkOptions;
import org.eclipse.lsp4j.FileSystemWatcher;
import org.eclipse.lsp4j.InlayHintRegistrationOptions;
import org.eclipse.lsp4j.Registration;
import org.eclipse.lsp4j.RenameOptions;
import org.eclipse.lsp4j.SemanticTokensServerFull;
import org.eclipse.lsp4j.SemanticTokensWithRegistrationOptions;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.eclipse.lsp4j.TextDocumentSyncOptions;
import org.eclipse.lsp4j.WorkspaceFoldersOptions;
import org.eclipse.lsp4j.WorkspaceServerCapabilities;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/**
 * What the server announces: its capabilities at initialize, as fit the client's, and the file
 * watchers it registers.
 */
final class ServerFeatures {
  /** The files whose change on disk can change a check: specs, and the n,k tables they name. */
  static final List<String> WATCHED_GLOBS =
      List.of("**/*.jonq", "**/*.txt", "**/*.csv", "**/*.tsv");

  static final String WATCHERS_ID = "jonquil-watched-files";

  private ServerFeatures() {}

  /**
   * What the server offers a client with {@code caps}: positions in the negotiated {@code
   * encoding}, semantic tokens with {@code tokens}' legend.
   */
  static ServerCapabilities of(
      ClientSupport caps, Convert.Encoding encoding, SemanticTokenEncoding tokens) {
    ServerCapabilities out = new ServerCapabilities();
    out.setPositionEncoding(encoding.wire());
    TextDocumentSyncOptions sync = new TextDocumentSyncOptions();
    sync.setOpenClose(true);
    sync.setChange(TextDocumentSyncKind.Incremental);
    out.setTextDocumentSync(sync);
    out.setHoverProvider(true);
    out.setDefinitionProvider(true);
    out.setReferencesProvider(true);
    if (caps.prepareRename()) {
      out.setRenameProvider(new RenameOptions(true));
    } else {
      out.setRenameProvider(true);
    }
    out.setDocumentSymbolProvider(true);
    out.setWorkspaceSymbolProvider(true);
    // Sent whatever the client said: one without workspace folders never sends the notification.
    out.setWorkspace(workspaceFolders());
    out.setDocumentFormattingProvider(true);
    out.setDocumentRangeFormattingProvider(true);
    CompletionOptions completion = new CompletionOptions(true, List.of("."));
    out.setCompletionProvider(completion);
    out.setSemanticTokensProvider(
        new SemanticTokensWithRegistrationOptions(
            tokens.legend(), new SemanticTokensServerFull(true), false));
    // Advertised to every client: one without the capability simply never asks, and one that
    // cannot resolve tooltips gets them inline.
    out.setInlayHintProvider(inlayHintProvider());
    out.setFoldingRangeProvider(true);
    out.setDocumentLinkProvider(new DocumentLinkOptions(false));
    if (caps.pullDiagnostics()) {
      // A document's diagnostics depend on the files it uses; no workspace-wide pull.
      out.setDiagnosticProvider(diagnosticProvider());
    }
    if (caps.codeActionLiterals()) {
      out.setCodeActionProvider(new CodeActionOptions(List.of(CodeActionKind.QuickFix)));
    } else {
      // A client without literal code actions would need commands; it gets none, so it is told
      // nothing is offered.
      out.setCodeActionProvider(false);
    }
    return out;
  }

  /**
   * Pull diagnostics per document: they depend on the files a document uses; no workspace-wide
   * pull.
   */
  private static DiagnosticRegistrationOptions diagnosticProvider() {
    DiagnosticRegistrationOptions out = new DiagnosticRegistrationOptions(true, false);
    out.setIdentifier(Convert.SOURCE);
    return out;
  }

  /** The hint provider's options: tooltips can be resolved later, for the clients that say so. */
  private static InlayHintRegistrationOptions inlayHintProvider() {
    InlayHintRegistrationOptions out = new InlayHintRegistrationOptions();
    out.setResolveProvider(true);
    return out;
  }

  /**
   * The workspace part of the server capabilities: multi-root folders, with change notifications.
   */
  private static WorkspaceServerCapabilities workspaceFolders() {
    WorkspaceFoldersOptions folders = new WorkspaceFoldersOptions();
    folders.setSupported(true);
    folders.setChangeNotifications(true);
    return new WorkspaceServerCapabilities(folders);
  }

  /**
   * The registration options that ask the editor to report changes to files matching {@code globs}.
   */
  private static DidChangeWatchedFilesRegistrationOptions fileWatchers(List<String> globs) {
    List<FileSystemWatcher> watchers = new ArrayList<>();
    for (String glob : globs) {
      watchers.add(new FileSystemWatcher(Either.forLeft(glob)));
    }
    return new DidChangeWatchedFilesRegistrationOptions(watchers);
  }

  /** The registration that asks the editor to report changes to the watched files. */
  static Registration fileWatching() {
    return new Registration(
        WATCHERS_ID, "workspace/didChangeWatchedFiles", fileWatchers(WATCHED_GLOBS));
  }
}
