package jonquil.lsp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import jonquil.diag.Edit;
import jonquil.diag.Related;
import jonquil.diag.Severity;
import jonquil.format.FormatOptions;
import jonquil.source.LineIndex;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticRelatedInformation;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.RelatedFullDocumentDiagnosticReport;
import org.eclipse.lsp4j.RelatedUnchangedDocumentDiagnosticReport;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentEdit;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceEdit;
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

  private final Encoding encoding;
  private final Function<Path, String> openUri;

  /** {@code openUri} gives the client's own spelling of an open file's URI, or null. */
  Convert(Encoding encoding, Function<Path, String> openUri) {
    this.encoding = encoding;
    this.openUri = openUri;
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
}
