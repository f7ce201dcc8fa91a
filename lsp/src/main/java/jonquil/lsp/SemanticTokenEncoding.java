package jonquil.lsp;

import java.util.ArrayList;
import java.util.List;
import jonquil.ide.SemanticToken;
import jonquil.ide.SemanticTokenDelta;
import jonquil.source.LineIndex;
import jonquil.source.SourceFile;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensDelta;
import org.eclipse.lsp4j.SemanticTokensEdit;
import org.eclipse.lsp4j.SemanticTokensLegend;

/**
 * Semantic tokens on the wire: the legend a client is offered, the protocol's relative integer
 * encoding, and full and delta answers.
 */
final class SemanticTokenEncoding {
  /**
   * The semantic token types every client gets, in legend order; jonquil.ide's "unit" joins them
   * only on request.
   */
  static final List<String> TOKEN_TYPES =
      List.of("keyword", "type", "variable", "property", "number", "string", "comment", "operator");

  static final String UNIT_TOKEN = "unit";

  /** The one modifier: bit 0 of a token's modifier set. */
  static final List<String> TOKEN_MODIFIERS = List.of("declaration");

  private final List<String> tokenTypes;

  /**
   * {@code unitTokens}: the client named a "unit" token type among those it knows, so units get a
   * type of their own in the legend; otherwise they are shown as "type", a standard one.
   */
  SemanticTokenEncoding(boolean unitTokens) {
    List<String> types = new ArrayList<>(TOKEN_TYPES);
    if (unitTokens) {
      types.add(UNIT_TOKEN);
    }
    this.tokenTypes = List.copyOf(types);
  }

  SemanticTokensLegend legend() {
    return new SemanticTokensLegend(tokenTypes, TOKEN_MODIFIERS);
  }

  /**
   * The tokens in the protocol's relative encoding (line delta, start delta, length, type,
   * modifiers), columns in {@code convert}'s encoding. A token that crosses a line break is cut
   * into one token per line, since clients need not take multi-line tokens.
   */
  List<Integer> data(Convert convert, SourceFile source, List<SemanticToken> tokens) {
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
      int modifiers = t.declaration() ? 1 : 0;
      int start = Math.max(0, Math.min(t.start(), textEnd));
      int end = Math.max(start, Math.min(t.start() + t.length(), textEnd));
      while (start < end) {
        int line = lines.line(start);
        int pieceEnd = Math.min(end, lines.lineContentEnd(line));
        if (pieceEnd > start) {
          Position a = convert.position(source, start);
          Position b = convert.position(source, pieceEnd);
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

  static SemanticTokens full(String resultId, List<Integer> data) {
    return new SemanticTokens(resultId, data);
  }

  /**
   * The change from one token array to the next as one edit over the part that differs (none when
   * equal).
   */
  static SemanticTokensDelta delta(String resultId, List<Integer> before, List<Integer> after) {
    List<SemanticTokensEdit> edits = new ArrayList<>();
    SemanticTokenDelta.between(before, after)
        .ifPresent(
            d ->
                edits.add(
                    new SemanticTokensEdit(d.start(), d.deleteCount(), new ArrayList<>(d.data()))));
    return new SemanticTokensDelta(edits, resultId);
  }
}
