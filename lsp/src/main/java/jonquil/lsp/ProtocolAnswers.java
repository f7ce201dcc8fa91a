package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import jonquil.ide.CodeActionInfo;
import jonquil.ide.CompletionItemInfo;
import jonquil.ide.DocumentLinkInfo;
import jonquil.ide.FoldingRangeInfo;
import jonquil.ide.FoundSymbol;
import jonquil.ide.HoverInfo;
import jonquil.ide.SymbolInfo;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.DocumentLink;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeKind;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InsertTextFormat;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/**
 * The editor features' answers (jonquil.ide records) as LSP4J answers: hover, symbols, completion
 * items, inlay hints, folding ranges, links and code actions, positions through a {@link Convert}.
 */
final class ProtocolAnswers {
  private ProtocolAnswers() {}

  static Hover hover(Convert convert, HoverInfo info, SourceFile source, boolean markdown) {
    Hover hover =
        new Hover(
            markdown
                ? new MarkupContent(MarkupKind.MARKDOWN, info.markdown())
                : new MarkupContent(MarkupKind.PLAINTEXT, PlainMarkdown.strip(info.markdown())));
    if (info.range() != null) {
      hover.setRange(convert.range(source, info.range()));
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

  static DocumentSymbol documentSymbol(Convert convert, SymbolInfo symbol, SourceFile source) {
    Range whole = convert.range(source, symbol.range());
    Range name =
        convert.range(
            source, symbol.selectionRange() != null ? symbol.selectionRange() : symbol.range());
    DocumentSymbol out =
        new DocumentSymbol(symbol.name(), symbolKind(symbol.kind()), whole, name, symbol.detail());
    List<DocumentSymbol> children = new ArrayList<>();
    for (SymbolInfo child : symbol.children() == null ? List.<SymbolInfo>of() : symbol.children()) {
      children.add(documentSymbol(convert, child, source));
    }
    out.setChildren(children);
    return out;
  }

  /** The flat form, for clients without hierarchical document symbols. */
  @SuppressWarnings("deprecation")
  static void flatten(
      Convert convert,
      SymbolInfo symbol,
      SourceFile source,
      String container,
      List<SymbolInformation> out) {
    SymbolInformation info =
        new SymbolInformation(
            symbol.name(),
            symbolKind(symbol.kind()),
            new Location(convert.uri(source.path()), convert.range(source, symbol.range())),
            container);
    out.add(info);
    for (SymbolInfo child : symbol.children() == null ? List.<SymbolInfo>of() : symbol.children()) {
      flatten(convert, child, source, symbol.name(), out);
    }
  }

  static WorkspaceSymbol workspaceSymbol(
      Convert convert, FoundSymbol found, Function<Path, SourceFile> sources) {
    SourceFile source = Convert.orEmpty(found.file(), sources.apply(found.file()));
    SymbolInfo s = found.symbol();
    TextRange at = s.selectionRange() != null ? s.selectionRange() : s.range();
    return new WorkspaceSymbol(
        s.name(),
        symbolKind(s.kind()),
        Either.forLeft(new Location(convert.uri(found.file()), convert.range(source, at))));
  }

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
   * One completion item, inserted as plain text (never a snippet). Its documentation comes now, or,
   * when {@code key} is given, from completionItem/resolve.
   */
  static CompletionItem completionItem(CompletionItemInfo info, ResolveKeys.CompletionKey key) {
    CompletionItem out = new CompletionItem(info.label());
    out.setKind(completionKind(info.kind()));
    if (info.detail() != null && !info.detail().isBlank()) {
      out.setDetail(info.detail());
    }
    out.setInsertText(info.label());
    out.setInsertTextFormat(InsertTextFormat.PlainText);
    if (key != null) {
      out.setData(ResolveKeys.data(key));
    } else {
      withDocumentation(out, info.documentation());
    }
    return out;
  }

  /** The item with its documentation (plain text), if there is any. */
  static CompletionItem withDocumentation(CompletionItem item, String documentation) {
    if (documentation != null && !documentation.isBlank()) {
      item.setDocumentation(Either.forLeft(documentation));
    }
    return item;
  }

  /**
   * A hint after a train step. Its tooltip is plain text (which every client that asks for hints
   * takes) and comes now, or, when {@code key} is given, from inlayHint/resolve.
   */
  static InlayHint inlayHint(
      Convert convert, SourceFile source, jonquil.ide.InlayHint hint, ResolveKeys.HintKey key) {
    InlayHint out =
        new InlayHint(convert.position(source, hint.offset()), Either.forLeft(hint.label()));
    if (key != null) {
      out.setData(ResolveKeys.data(key));
    } else {
      withTooltip(out, hint.tooltip());
    }
    return out;
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
  static FoldingRange foldingRange(
      Convert convert, SourceFile source, FoldingRangeInfo info, boolean lineFoldingOnly) {
    Position start = convert.position(source, info.startOffset());
    Position end = convert.position(source, info.endOffset());
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

  static DocumentLink documentLink(Convert convert, SourceFile source, DocumentLinkInfo link) {
    return new DocumentLink(convert.range(source, link.range()), convert.uri(link.target()));
  }

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
  static CodeAction codeAction(
      Convert convert,
      CodeActionInfo info,
      Function<Path, SourceFile> sources,
      Function<Path, Integer> versions,
      boolean documentChanges,
      boolean preferredSupport) {
    CodeAction out = new CodeAction(info.title());
    out.setKind(info.kind());
    out.setDiagnostics(List.of(convert.diagnostic(info.diagnostic(), sources)));
    out.setEdit(convert.workspaceEdit(info.edits(), sources, versions, documentChanges));
    if (preferredSupport && info.preferred()) {
      out.setIsPreferred(true);
    }
    return out;
  }
}
