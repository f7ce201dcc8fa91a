package jonquil.lsp;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import jonquil.diag.Edit;
import jonquil.diag.Related;
import jonquil.diag.Severity;
import jonquil.format.FormatOptions;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.FoldingRangeInfo;
import jonquil.ide.FoundSymbol;
import jonquil.ide.HoverInfo;
import jonquil.ide.SemanticToken;
import jonquil.ide.SemanticTokenDelta;
import jonquil.ide.SymbolInfo;
import jonquil.source.LineIndex;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticRegistrationOptions;
import org.eclipse.lsp4j.DiagnosticRelatedInformation;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.DidChangeWatchedFilesRegistrationOptions;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.DocumentLink;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.FileSystemWatcher;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeKind;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintRegistrationOptions;
import org.eclipse.lsp4j.InsertTextFormat;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.RelatedFullDocumentDiagnosticReport;
import org.eclipse.lsp4j.RelatedUnchangedDocumentDiagnosticReport;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensDelta;
import org.eclipse.lsp4j.SemanticTokensEdit;
import org.eclipse.lsp4j.SemanticTokensLegend;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentEdit;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.WorkspaceFoldersOptions;
import org.eclipse.lsp4j.WorkspaceServerCapabilities;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/**
 * The one place where compiler values and LSP4J values convert: positions in the negotiated
 * encoding, ranges, URIs, severities.
 */
final class Convert {

  /** How the {@code character} of a position counts: the three encodings LSP 3.17 names. */
  enum Encoding {
    UTF_8("utf-8"),
    UTF_16("utf-16"),
    UTF_32("utf-32");

    private final String wire;

    Encoding(String wire) {
      this.wire = wire;
    }

    String wire() {
      return wire;
    }

    /**
     * The client's most preferred encoding that we support; UTF-16 (mandatory) when it offers none.
     */
    static Encoding negotiate(ClientCapabilities capabilities) {
      if (capabilities == null
          || capabilities.getGeneral() == null
          || capabilities.getGeneral().getPositionEncodings() == null) {
        return UTF_16;
      }
      for (String offered : capabilities.getGeneral().getPositionEncodings()) {
        for (Encoding e : values()) {
          if (e.wire.equalsIgnoreCase(offered)) {
            return e;
          }
        }
      }
      return UTF_16;
    }
  }

  static final String SOURCE = "jonquil";
  private static final Path BUFFER = Path.of("buffer.jonq");

  /**
   * The semantic token types every client gets, in legend order; jonquil.ide's "unit" joins them
   * only on request.
   */
  static final List<String> TOKEN_TYPES =
      List.of("keyword", "type", "variable", "property", "number", "string", "comment", "operator");

  static final String UNIT_TOKEN = "unit";

  /** The one modifier: bit 0 of a token's modifier set. */
  static final List<String> TOKEN_MODIFIERS = List.of("declaration");

  private final Encoding encoding;
  private final Function<Path, String> openUri;
  private final List<String> tokenTypes;

  /** {@code openUri} gives the client's own spelling of an open file's URI, or null. */
  Convert(Encoding encoding, Function<Path, String> openUri) {
    this(encoding, openUri, false);
  }

  /**
   * {@code unitTokens}: the client named a "unit" token type among those it knows, so units get a
   * type of their own in the legend; otherwise they are shown as "type", a standard one.
   */
  Convert(Encoding encoding, Function<Path, String> openUri, boolean unitTokens) {
    this.encoding = encoding;
    this.openUri = openUri;
    List<String> types = new ArrayList<>(TOKEN_TYPES);
    if (unitTokens) {
      types.add(UNIT_TOKEN);
    }
    this.tokenTypes = List.copyOf(types);
  }

  Encoding encoding() {
    return encoding;
  }

  // ---- positions ----

  Position position(SourceFile source, int offset) {
    LineIndex lines = source.lines();
    int clamped = Math.max(0, Math.min(offset, source.text().length()));
    int line = lines.line(clamped);
    int column;
    switch (encoding) {
      case UTF_8:
        column = lines.utf8Column(clamped);
        break;
      case UTF_32:
        column = lines.codePointColumn(clamped);
        break;
      default:
        column = lines.utf16Column(clamped);
        break;
    }
    return new Position(line, column);
  }

  Range range(SourceFile source, TextRange range) {
    return new Range(position(source, range.start()), position(source, range.end()));
  }

  /** The UTF-16 offset of a client position; lines and columns out of range clamp to the text. */
  int offset(SourceFile source, Position position) {
    LineIndex lines = source.lines();
    String text = source.text();
    int line = position.getLine();
    int column = Math.max(0, position.getCharacter());
    if (line < 0) {
      return 0;
    }
    if (line >= lines.lineCount()) {
      return text.length();
    }
    switch (encoding) {
      case UTF_8:
        {
          int offset = lines.lineStart(line);
          int end = lines.lineContentEnd(line);
          int bytes = 0;
          while (offset < end) {
            int cp = text.codePointAt(offset);
            int size = cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
            if (bytes + size > column) {
              break;
            }
            bytes += size;
            offset += Character.charCount(cp);
          }
          return offset;
        }
      case UTF_32:
        return lines.offsetOfCodePoint(line, column);
      default:
        return lines.offsetOfUtf16(line, column);
    }
  }

  /** The text after one change event: a whole new text, or a replaced range. */
  String applyChange(String text, TextDocumentContentChangeEvent change) {
    String newText = change.getText() == null ? "" : change.getText();
    if (change.getRange() == null) {
      return newText;
    }
    SourceFile source = new SourceFile(BUFFER, text);
    int start = offset(source, change.getRange().getStart());
    int end = offset(source, change.getRange().getEnd());
    if (end < start) {
      int t = start;
      start = end;
      end = t;
    }
    return text.substring(0, start) + newText + text.substring(end);
  }

  // ---- URIs ----

  /** The URI the client knows a file by: its own spelling when open, else the JDK's. */
  String uri(Path path) {
    String open = openUri.apply(path);
    return open != null ? open : path.toUri().toString();
  }

  static SourceFile orEmpty(Path path, SourceFile source) {
    return source != null ? source : new SourceFile(path, "");
  }

  // ---- diagnostics ----

  static DiagnosticSeverity severity(Severity severity) {
    switch (severity) {
      case ERROR:
        return DiagnosticSeverity.Error;
      case WARNING:
        return DiagnosticSeverity.Warning;
      default:
        return DiagnosticSeverity.Information;
    }
  }

  Diagnostic diagnostic(jonquil.diag.Diagnostic d, Function<Path, SourceFile> sources) {
    SourceFile source = orEmpty(d.file(), sources.apply(d.file()));
    Diagnostic out =
        new Diagnostic(
            range(source, d.range()), d.message(), severity(d.severity()), SOURCE, d.code().id());
    if (!d.related().isEmpty()) {
      List<DiagnosticRelatedInformation> related = new ArrayList<>();
      for (Related r : d.related()) {
        SourceFile at = orEmpty(r.file(), sources.apply(r.file()));
        related.add(
            new DiagnosticRelatedInformation(
                new Location(uri(r.file()), range(at, r.range())), r.message()));
      }
      out.setRelatedInformation(related);
    }
    return out;
  }

  /**
   * Pull diagnostics per document: they depend on the files a document uses; no workspace-wide
   * pull.
   */
  static DiagnosticRegistrationOptions diagnosticProvider() {
    DiagnosticRegistrationOptions out = new DiagnosticRegistrationOptions(true, false);
    out.setIdentifier(SOURCE);
    return out;
  }

  /**
   * A pull answer: "unchanged" when the client already holds {@code resultId}, else the full list.
   */
  static DocumentDiagnosticReport diagnosticReport(
      String resultId, String previousResultId, List<Diagnostic> items) {
    if (resultId.equals(previousResultId)) {
      return new DocumentDiagnosticReport(new RelatedUnchangedDocumentDiagnosticReport(resultId));
    }
    RelatedFullDocumentDiagnosticReport full = new RelatedFullDocumentDiagnosticReport(items);
    full.setResultId(resultId);
    return new DocumentDiagnosticReport(full);
  }

  /** The diagnostic shown when checking itself failed: at the start of the file, never silent. */
  static Diagnostic internalError(String message) {
    Range start = new Range(new Position(0, 0), new Position(0, 0));
    return new Diagnostic(start, message, DiagnosticSeverity.Error, SOURCE, "J901");
  }

  // ---- registrations ----

  /**
   * The registration options that ask the editor to report changes to files matching {@code globs}.
   */
  static DidChangeWatchedFilesRegistrationOptions fileWatchers(List<String> globs) {
    List<FileSystemWatcher> watchers = new ArrayList<>();
    for (String glob : globs) {
      watchers.add(new FileSystemWatcher(Either.forLeft(glob)));
    }
    return new DidChangeWatchedFilesRegistrationOptions(watchers);
  }

  // ---- work-done progress (the workspace index's first pass) ----

  static org.eclipse.lsp4j.WorkDoneProgressCreateParams progressCreate(String token) {
    return new org.eclipse.lsp4j.WorkDoneProgressCreateParams(Either.forLeft(token));
  }

  static org.eclipse.lsp4j.ProgressParams progressBegin(
      String token, String title, String message) {
    org.eclipse.lsp4j.WorkDoneProgressBegin begin = new org.eclipse.lsp4j.WorkDoneProgressBegin();
    begin.setTitle(title);
    begin.setMessage(message);
    begin.setCancellable(true);
    begin.setPercentage(0);
    return new org.eclipse.lsp4j.ProgressParams(Either.forLeft(token), Either.forLeft(begin));
  }

  static org.eclipse.lsp4j.ProgressParams progressReport(
      String token, String message, int percentage) {
    org.eclipse.lsp4j.WorkDoneProgressReport report =
        new org.eclipse.lsp4j.WorkDoneProgressReport();
    report.setMessage(message);
    report.setPercentage(Math.max(0, Math.min(100, percentage)));
    return new org.eclipse.lsp4j.ProgressParams(Either.forLeft(token), Either.forLeft(report));
  }

  static org.eclipse.lsp4j.ProgressParams progressEnd(String token, String message) {
    org.eclipse.lsp4j.WorkDoneProgressEnd end = new org.eclipse.lsp4j.WorkDoneProgressEnd();
    end.setMessage(message);
    return new org.eclipse.lsp4j.ProgressParams(Either.forLeft(token), Either.forLeft(end));
  }

  /** A progress token as one string, whichever of the two forms the client sent. */
  static String progressToken(Either<String, Integer> token) {
    if (token == null) {
      return null;
    }
    return token.isLeft() ? token.getLeft() : String.valueOf(token.getRight());
  }

  /**
   * The workspace part of the server capabilities: multi-root folders, with change notifications.
   */
  static WorkspaceServerCapabilities workspaceFolders() {
    WorkspaceFoldersOptions folders = new WorkspaceFoldersOptions();
    folders.setSupported(true);
    folders.setChangeNotifications(true);
    return new WorkspaceServerCapabilities(folders);
  }

  // ---- formatting ----

  /**
   * The formatter's options from the editor's: its tab size (clamped to what the formatter takes)
   * and tab choice.
   */
  static FormatOptions formatOptions(FormattingOptions options) {
    int tab = options == null ? FormatOptions.DEFAULT.indent() : options.getTabSize();
    boolean spaces = options == null || options.isInsertSpaces();
    return new FormatOptions(Math.max(0, Math.min(16, tab)), spaces);
  }

  /**
   * The lines of a range, as the formatter's hunks are chosen by: from the start line to the end
   * line (inclusive).
   */
  static int[] lines(Range range) {
    int first = Math.max(0, range.getStart().getLine());
    int last = Math.max(first, range.getEnd().getLine());
    if (last > first && range.getEnd().getCharacter() == 0) {
      last--; // a selection that ends at a line start does not take in that line
    }
    return new int[] {first, last};
  }

  List<TextEdit> textEdits(SourceFile source, List<Edit> edits) {
    List<TextEdit> out = new ArrayList<>();
    for (Edit e : edits) {
      out.add(new TextEdit(range(source, e.range()), e.newText()));
    }
    return out;
  }

  // ---- answers ----

  Location location(jonquil.ide.Location at, Function<Path, SourceFile> sources) {
    SourceFile source = orEmpty(at.file(), sources.apply(at.file()));
    return new Location(uri(at.file()), range(source, at.range()));
  }

  /**
   * A definition as a link: the target's range serves as both its whole and its selected range (the
   * editor answers give the declared name); {@code origin} is the name under the cursor in {@code
   * from}, or null when there is none.
   */
  LocationLink locationLink(
      jonquil.ide.Location target,
      Function<Path, SourceFile> sources,
      SourceFile from,
      TextRange origin) {
    SourceFile source = orEmpty(target.file(), sources.apply(target.file()));
    Range at = range(source, target.range());
    LocationLink out = new LocationLink(uri(target.file()), at, at);
    if (origin != null) {
      out.setOriginSelectionRange(range(from, origin));
    }
    return out;
  }

  Hover hover(HoverInfo info, SourceFile source, boolean markdown) {
    Hover hover =
        new Hover(
            markdown
                ? new MarkupContent(MarkupKind.MARKDOWN, info.markdown())
                : new MarkupContent(MarkupKind.PLAINTEXT, PlainMarkdown.strip(info.markdown())));
    if (info.range() != null) {
      hover.setRange(range(source, info.range()));
    }
    return hover;
  }

  static SymbolKind symbolKind(SymbolInfo.Kind kind) {
    return switch (kind) {
      case TRAIN -> SymbolKind.Namespace;
      case PATH -> SymbolKind.Array;
      case REQUIRE, REQUIREMENT -> SymbolKind.Property;
      case MATERIAL -> SymbolKind.Constant;
      case SOURCE -> SymbolKind.Event;
      case USE, ELEMENT, PARAMETER -> SymbolKind.Object;
    };
  }

  DocumentSymbol documentSymbol(SymbolInfo symbol, SourceFile source) {
    Range whole = range(source, symbol.range());
    Range name =
        range(source, symbol.selectionRange() != null ? symbol.selectionRange() : symbol.range());
    DocumentSymbol out =
        new DocumentSymbol(symbol.name(), symbolKind(symbol.kind()), whole, name, symbol.detail());
    List<DocumentSymbol> children = new ArrayList<>();
    for (SymbolInfo child : symbol.children() == null ? List.<SymbolInfo>of() : symbol.children()) {
      children.add(documentSymbol(child, source));
    }
    out.setChildren(children);
    return out;
  }

  /** The flat form, for clients without hierarchical document symbols. */
  @SuppressWarnings("deprecation")
  void flatten(
      SymbolInfo symbol, SourceFile source, String container, List<SymbolInformation> out) {
    SymbolInformation info =
        new SymbolInformation(
            symbol.name(),
            symbolKind(symbol.kind()),
            new Location(uri(source.path()), range(source, symbol.range())),
            container);
    out.add(info);
    for (SymbolInfo child : symbol.children() == null ? List.<SymbolInfo>of() : symbol.children()) {
      flatten(child, source, symbol.name(), out);
    }
  }

  WorkspaceSymbol workspaceSymbol(FoundSymbol found, Function<Path, SourceFile> sources) {
    SourceFile source = orEmpty(found.file(), sources.apply(found.file()));
    SymbolInfo s = found.symbol();
    TextRange at = s.selectionRange() != null ? s.selectionRange() : s.range();
    return new WorkspaceSymbol(
        s.name(),
        symbolKind(s.kind()),
        Either.forLeft(new Location(uri(found.file()), range(source, at))));
  }

  /**
   * A rename's edits; versioned document changes when the client takes them ({@code versions} gives
   * an open file's version, or null).
   */
  WorkspaceEdit workspaceEdit(
      Map<Path, List<Edit>> edits,
      Function<Path, SourceFile> sources,
      Function<Path, Integer> versions,
      boolean documentChanges) {
    WorkspaceEdit out = new WorkspaceEdit();
    List<Either<TextDocumentEdit, org.eclipse.lsp4j.ResourceOperation>> changes = new ArrayList<>();
    Map<String, List<TextEdit>> plain = new java.util.LinkedHashMap<>();
    edits.forEach(
        (file, list) -> {
          SourceFile source = orEmpty(file, sources.apply(file));
          List<TextEdit> textEdits = new ArrayList<>();
          for (Edit e : list) {
            textEdits.add(new TextEdit(range(source, e.range()), e.newText()));
          }
          if (documentChanges) {
            changes.add(
                Either.forLeft(
                    new TextDocumentEdit(
                        new VersionedTextDocumentIdentifier(uri(file), versions.apply(file)),
                        textEdits)));
          } else {
            plain.put(uri(file), textEdits);
          }
        });
    if (documentChanges) {
      out.setChanges(null); // LSP4J starts every edit with an empty 'changes'; send only one form
      out.setDocumentChanges(changes);
    } else {
      out.setChanges(plain);
    }
    return out;
  }

  // ---- completion ----

  /**
   * The compiler's completion kinds as LSP kinds; all are in the range every client knows (1-18).
   */
  static CompletionItemKind completionKind(CompletionItemInfo.Kind kind) {
    return switch (kind) {
      case KEYWORD -> CompletionItemKind.Keyword;
      case KIND -> CompletionItemKind.Class;
      case PARAMETER -> CompletionItemKind.Property;
      case ELEMENT -> CompletionItemKind.Variable;
      case PORT -> CompletionItemKind.Field;
      case MATERIAL -> CompletionItemKind.Value;
      case UNIT -> CompletionItemKind.Unit;
      case MEASURE -> CompletionItemKind.Function;
    };
  }

  /**
   * Names a completion item for a later completionItem/resolve: the answer it came in, and its
   * place there.
   */
  record CompletionKey(long answer, int index) {}

  /**
   * One completion item, inserted as plain text (never a snippet). Its documentation comes now, or,
   * when {@code key} is given, from completionItem/resolve.
   */
  static CompletionItem completionItem(CompletionItemInfo info, CompletionKey key) {
    CompletionItem out = new CompletionItem(info.label());
    out.setKind(completionKind(info.kind()));
    if (info.detail() != null && !info.detail().isBlank()) {
      out.setDetail(info.detail());
    }
    out.setInsertText(info.label());
    out.setInsertTextFormat(InsertTextFormat.PlainText);
    if (key != null) {
      JsonObject data = new JsonObject();
      data.addProperty("answer", key.answer());
      data.addProperty("index", key.index());
      out.setData(data);
    } else {
      withDocumentation(out, info.documentation());
    }
    return out;
  }

  /** The key a resolve request carries back, if it is one of ours. */
  static Optional<CompletionKey> completionKey(CompletionItem item) {
    Object data = item == null ? null : item.getData();
    if (!(data instanceof JsonObject)) {
      return Optional.empty();
    }
    JsonObject o = (JsonObject) data;
    JsonElement answer = o.get("answer");
    JsonElement index = o.get("index");
    try {
      if (answer == null
          || index == null
          || !answer.isJsonPrimitive()
          || !index.isJsonPrimitive()) {
        return Optional.empty();
      }
      return Optional.of(new CompletionKey(answer.getAsLong(), index.getAsInt()));
    } catch (RuntimeException e) {
      return Optional.empty(); // not a number: someone else's data
    }
  }

  /** The item with its documentation (plain text), if there is any. */
  static CompletionItem withDocumentation(CompletionItem item, String documentation) {
    if (documentation != null && !documentation.isBlank()) {
      item.setDocumentation(Either.forLeft(documentation));
    }
    return item;
  }

  // ---- semantic tokens ----

  SemanticTokensLegend semanticTokensLegend() {
    return new SemanticTokensLegend(tokenTypes, TOKEN_MODIFIERS);
  }

  /**
   * The tokens in the protocol's relative encoding (line delta, start delta, length, type,
   * modifiers), columns in the negotiated encoding. A token that crosses a line break is cut into
   * one token per line, since clients need not take multi-line tokens.
   */
  List<Integer> semanticTokenData(SourceFile source, List<SemanticToken> tokens) {
    List<Integer> data = new ArrayList<>(tokens.size() * 5);
    LineIndex lines = source.lines();
    int textEnd = source.text().length();
    int lastLine = 0;
    int lastColumn = 0;
    for (SemanticToken t : tokens) {
      int type = tokenTypes.indexOf(tokenType(t.type()));
      if (type < 0 && t.type() == SemanticToken.Type.UNIT) {
        type = tokenTypes.indexOf("type");
      }
      if (type < 0) {
        continue;
      }
      int modifiers = t.declaration() ? 1 : 0;
      int start = Math.max(0, Math.min(t.start(), textEnd));
      int end = Math.max(start, Math.min(t.start() + t.length(), textEnd));
      while (start < end) {
        int line = lines.line(start);
        int pieceEnd = Math.min(end, lines.lineContentEnd(line));
        if (pieceEnd > start) {
          Position a = position(source, start);
          Position b = position(source, pieceEnd);
          data.add(a.getLine() - lastLine);
          data.add(a.getLine() == lastLine ? a.getCharacter() - lastColumn : a.getCharacter());
          data.add(b.getCharacter() - a.getCharacter());
          data.add(type);
          data.add(modifiers);
          lastLine = a.getLine();
          lastColumn = a.getCharacter();
        }
        if (line + 1 >= lines.lineCount()) {
          break;
        }
        start = Math.max(pieceEnd, lines.lineStart(line + 1));
      }
    }
    return data;
  }

  /** The legend's name of a token type. */
  static String tokenType(SemanticToken.Type type) {
    return switch (type) {
      case KEYWORD -> "keyword";
      case TYPE -> "type";
      case VARIABLE -> "variable";
      case PROPERTY -> "property";
      case NUMBER -> "number";
      case UNIT -> UNIT_TOKEN;
      case STRING -> "string";
      case COMMENT -> "comment";
      case OPERATOR -> "operator";
    };
  }

  static SemanticTokens semanticTokens(String resultId, List<Integer> data) {
    return new SemanticTokens(resultId, data);
  }

  /**
   * The change from one token array to the next as one edit over the part that differs (none when
   * equal).
   */
  static SemanticTokensDelta semanticTokensDelta(
      String resultId, List<Integer> before, List<Integer> after) {
    List<SemanticTokensEdit> edits = new ArrayList<>();
    SemanticTokenDelta.between(before, after)
        .ifPresent(
            d ->
                edits.add(
                    new SemanticTokensEdit(d.start(), d.deleteCount(), new ArrayList<>(d.data()))));
    return new SemanticTokensDelta(edits, resultId);
  }

  // ---- inlay hints, folding, links ----

  /**
   * Names a hint for a later inlayHint/resolve: its document (as the client spells the URI), the
   * state of it the hint was computed from (its version, null for a file the editor has not open,
   * and a hash of the text) and the offset of the step it follows.
   */
  record HintKey(String uri, Integer version, int textHash, int offset) {}

  /** The hint provider's options: tooltips can be resolved later, for the clients that say so. */
  static InlayHintRegistrationOptions inlayHintProvider() {
    InlayHintRegistrationOptions out = new InlayHintRegistrationOptions();
    out.setResolveProvider(true);
    return out;
  }

  /**
   * A hint after a train step. Its tooltip is plain text (which every client that asks for hints
   * takes) and comes now, or, when {@code key} is given, from inlayHint/resolve.
   */
  InlayHint inlayHint(SourceFile source, jonquil.ide.InlayHint hint, HintKey key) {
    InlayHint out = new InlayHint(position(source, hint.offset()), Either.forLeft(hint.label()));
    if (key != null) {
      JsonObject data = new JsonObject();
      data.addProperty("uri", key.uri());
      if (key.version() != null) {
        data.addProperty("version", key.version());
      }
      data.addProperty("text", key.textHash());
      data.addProperty("offset", key.offset());
      out.setData(data);
    } else {
      withTooltip(out, hint.tooltip());
    }
    return out;
  }

  /** The key a resolve request carries back, if it is one of ours. */
  static Optional<HintKey> hintKey(InlayHint hint) {
    Object data = hint == null ? null : hint.getData();
    if (!(data instanceof JsonObject)) {
      return Optional.empty();
    }
    JsonObject o = (JsonObject) data;
    JsonElement uri = o.get("uri");
    JsonElement version = o.get("version");
    JsonElement text = o.get("text");
    JsonElement offset = o.get("offset");
    try {
      if (uri == null
          || text == null
          || offset == null
          || !uri.isJsonPrimitive()
          || !text.isJsonPrimitive()
          || !offset.isJsonPrimitive()
          || (version != null && !version.isJsonPrimitive())) {
        return Optional.empty();
      }
      return Optional.of(
          new HintKey(
              uri.getAsString(),
              version == null ? null : version.getAsInt(),
              text.getAsInt(),
              offset.getAsInt()));
    } catch (RuntimeException e) {
      return Optional.empty(); // not numbers: someone else's data
    }
  }

  /** The hint's label as plain text, or null when it is made of parts (ours never are). */
  static String hintLabel(InlayHint hint) {
    return hint == null || hint.getLabel() == null || !hint.getLabel().isLeft()
        ? null
        : hint.getLabel().getLeft();
  }

  /** The hint with its tooltip (plain text), if there is one. */
  static InlayHint withTooltip(InlayHint hint, String tooltip) {
    if (tooltip != null && !tooltip.isBlank()) {
      hint.setTooltip(Either.forLeft(tooltip));
    }
    return hint;
  }

  /**
   * A folding range, or null when it folds nothing. For a client that folds whole lines only, a
   * block's closing line stays visible when it holds nothing but the closing brace.
   */
  FoldingRange foldingRange(SourceFile source, FoldingRangeInfo info, boolean lineFoldingOnly) {
    Position start = position(source, info.startOffset());
    Position end = position(source, info.endOffset());
    int endLine = end.getLine();
    if (lineFoldingOnly) {
      int endLineStart = source.lines().lineStart(endLine);
      int endOffset = Math.max(endLineStart, Math.min(info.endOffset(), source.text().length()));
      if (source.text().substring(endLineStart, endOffset).strip().equals("}")) {
        endLine--;
      }
    }
    if (endLine <= start.getLine()) {
      return null;
    }
    FoldingRange out = new FoldingRange(start.getLine(), endLine);
    if (!lineFoldingOnly) {
      out.setStartCharacter(start.getCharacter());
      out.setEndCharacter(end.getCharacter());
    }
    if ("comment".equals(info.kind())) {
      out.setKind(FoldingRangeKind.Comment);
    } else if ("region".equals(info.kind())) {
      out.setKind(FoldingRangeKind.Region);
    }
    return out;
  }

  DocumentLink documentLink(SourceFile source, DocumentLinkInfo link) {
    return new DocumentLink(range(source, link.range()), uri(link.target()));
  }

  // ---- code actions ----

  /**
   * Whether a context's {@code only} filter admits a kind: the kind itself or one of its parents
   * ("" is every kind).
   */
  static boolean kindRequested(String kind, List<String> only) {
    if (only == null || only.isEmpty()) {
      return true;
    }
    for (String o : only) {
      if (o != null && (o.isEmpty() || kind.equals(o) || kind.startsWith(o + "."))) {
        return true;
      }
    }
    return false;
  }

  /** A quick fix as a literal code action, with the diagnostic it fixes as it was published. */
  CodeAction codeAction(
      CodeActionInfo info,
      Function<Path, SourceFile> sources,
      Function<Path, Integer> versions,
      boolean documentChanges,
      boolean preferredSupport) {
    CodeAction out = new CodeAction(info.title());
    out.setKind(info.kind());
    out.setDiagnostics(List.of(diagnostic(info.diagnostic(), sources)));
    out.setEdit(workspaceEdit(info.edits(), sources, versions, documentChanges));
    if (preferredSupport && info.preferred()) {
      out.setIsPreferred(true);
    }
    return out;
  }
}
