package jonquil.syntax;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.grammar.internal.JonquilLexer;
import jonquil.grammar.internal.JonquilParser;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.antlr.v4.runtime.BailErrorStrategy;
import org.antlr.v4.runtime.CommonToken;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.ListTokenSource;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.atn.PredictionMode;
import org.antlr.v4.runtime.misc.Pair;
import org.antlr.v4.runtime.misc.ParseCancellationException;

/**
 * Text to syntax tree. Never throws on user input: every problem becomes a diagnostic, and the tree
 * holds whatever could still be read.
 */
public final class SpecParser {
  /**
   * Specs are hand-written; a larger file is almost surely not a spec (precedent: editor caps of 1
   * MiB).
   */
  public static final int MAX_CHARS = 4 * 1024 * 1024;

  static final int MAX_NUMBER_CHARS = 100;

  private SpecParser() {}

  public static ParseResult parse(SourceFile source) {
    return parse(source, true);
  }

  /**
   * As above, taking what {@code memo} kept from earlier parses: an unchanged file is not parsed
   * again, and in a changed one that has no syntax error only the top-level statements whose text
   * changed are. The result is the one {@link #parse(SourceFile)} gives ({@code
   * IncrementalParseTest}).
   */
  public static ParseResult parse(SourceFile source, ParseMemo memo) {
    if (memo == null) {
      return parse(source);
    }
    ParseResult same = memo.unchanged(source);
    return same != null ? same : parse(source, true, memo);
  }

  /**
   * As above; {@code twoStage} false always takes the full-LL parse, for the test that compares the
   * two.
   */
  static ParseResult parse(SourceFile source, boolean twoStage) {
    return parse(source, twoStage, null);
  }

  private static ParseResult parse(SourceFile source, boolean twoStage, ParseMemo memo) {
    SyntaxReporter reporter = new SyntaxReporter(source.path(), source.lines());
    if (source.text().length() > MAX_CHARS) {
      reporter.lexical(
          DiagnosticCode.FILE_TOO_LARGE,
          TextRange.EMPTY,
          "file is larger than "
              + (MAX_CHARS / (1024 * 1024))
              + " MiB; a spec this size is not supported",
          null);
      return new ParseResult(source, SpecFile.empty(source.path()), reporter.diagnostics());
    }
    OffsetMap offsets = new OffsetMap(source.text());
    CommonTokenStream lexed =
        new CommonTokenStream(Tokens.lexer(source.text(), source.path().toString()));
    lexed.fill();
    List<TextRange> comments = new ArrayList<>();
    List<Token> repaired = scanTokens(source, lexed.getTokens(), offsets, reporter, comments);

    if (memo != null && reporter.diagnostics().isEmpty()) {
      ParseResult byStatement = byStatement(source, repaired, offsets, comments, memo);
      if (byStatement != null) {
        return byStatement;
      }
    }
    JonquilParser.FileContext tree = twoStage ? fastParse(repaired) : null;
    if (tree == null) {
      JonquilParser parser =
          new JonquilParser(new CommonTokenStream(new ListTokenSource(repaired)));
      parser.removeErrorListeners();
      parser.setErrorHandler(new SyntaxErrorStrategy(reporter, offsets));
      try {
        tree = parser.file();
      } catch (ParseCancellationException stop) {
        reporter.stopped();
      }
    }
    SpecFile ast =
        tree == null
            ? SpecFile.empty(source.path())
            : new AstBuilder(source, offsets, comments).build(tree);
    // A syntax error damages its whole line: recovery may have cut a construct short anywhere on
    // it.
    List<TextRange> damage =
        reporter.diagnostics().stream()
            .filter(d -> d.severity() == jonquil.diag.Severity.ERROR)
            .map(
                d -> {
                  int line = source.lines().line(d.range().start());
                  return new TextRange(
                      source.lines().lineStart(line), source.lines().lineContentEnd(line));
                })
            .toList();
    ParseResult result = new ParseResult(source, ast.withDamage(damage), reporter.diagnostics());
    if (memo != null) {
      // Broken text keeps the statements of the last clean parse: once fixed, they are reused.
      memo.remember(result, memo.statementsOf(source.path()), 0, 0);
    }
    return result;
  }

  /**
   * The parse of lexically clean tokens statement by statement, each unchanged statement's tree
   * taken from the memo; null at the first statement with a syntax error, for the whole-file parse
   * to report. Top-level statements are exactly the token runs between separators outside braces
   * (the grammar's 'file' rule), so parsing them one by one accepts the same files and gives the
   * same trees.
   */
  private static ParseResult byStatement(
      SourceFile source,
      List<Token> tokens,
      OffsetMap offsets,
      List<TextRange> comments,
      ParseMemo memo) {
    java.util.Map<String, ParseMemo.Kept> before = memo.statementsOf(source.path());
    java.util.Map<String, ParseMemo.Kept> now = new java.util.HashMap<>();
    AstBuilder builder = new AstBuilder(source, offsets, comments);
    List<Object> statements = new ArrayList<>();
    int reused = 0;
    int parsed = 0;
    int depth = 0;
    int first = -1;
    for (int i = 0; i < tokens.size(); i++) {
      Token t = tokens.get(i);
      int type = t.getType();
      boolean separator =
          depth == 0 && (type == JonquilLexer.NL || type == JonquilLexer.SEMI || type == Token.EOF);
      if (!separator) {
        if (first < 0) {
          first = i;
        }
        depth += type == JonquilLexer.LBRACE ? 1 : type == JonquilLexer.RBRACE ? -1 : 0;
        continue;
      }
      if (first < 0) {
        continue;
      }
      List<Token> chunk = tokens.subList(first, i);
      first = -1;
      int start = offsets.toUtf16(chunk.get(0).getStartIndex());
      int end = offsets.toUtf16(chunk.get(chunk.size() - 1).getStopIndex() + 1);
      String text = source.text().substring(start, end);
      ParseMemo.Kept kept = before.get(text);
      Object statement;
      if (kept != null) {
        statement = AstShift.statement(kept.statement(), start - kept.start());
        reused++;
      } else {
        JonquilParser parser =
            new JonquilParser(new CommonTokenStream(new ListTokenSource(new ArrayList<>(chunk))));
        parser.removeErrorListeners();
        parser.getInterpreter().setPredictionMode(PredictionMode.SLL);
        parser.setErrorHandler(new BailErrorStrategy());
        java.util.Optional<Object> built;
        try {
          built = builder.statement(parser.statementOnly().topStatement());
        } catch (ParseCancellationException syntaxError) {
          return null;
        }
        if (built.isEmpty()) {
          return null;
        }
        statement = built.get();
        parsed++;
      }
      now.put(text, new ParseMemo.Kept(start, statement));
      statements.add(statement);
    }
    ParseResult result = new ParseResult(source, builder.assemble(statements), List.of());
    memo.remember(result, now, reused, parsed);
    return result;
  }

  /**
   * The tree of a syntactically valid token list, or null at the first syntax error. SLL prediction
   * is about three times faster than full LL on a large spec, so valid input (what an editor
   * re-checks most) takes the fast path, and the full-LL parse with error recovery runs only when
   * SLL stops at an error. This is ANTLR's two-stage strategy (Parr, Harwell and Fisher, "Adaptive
   * LL(*) Parsing: The Power of Dynamic Analysis", OOPSLA 2014); {@code TwoStageParseTest} checks
   * both stages give one tree.
   */
  private static JonquilParser.FileContext fastParse(List<Token> tokens) {
    JonquilParser parser = new JonquilParser(new CommonTokenStream(new ListTokenSource(tokens)));
    parser.removeErrorListeners();
    parser.getInterpreter().setPredictionMode(PredictionMode.SLL);
    parser.setErrorHandler(new BailErrorStrategy());
    try {
      return parser.file();
    } catch (ParseCancellationException syntaxError) {
      return null;
    }
  }

  /**
   * Reports lexical problems and brace balance before parsing, so messages can be exact, and
   * returns the tokens repaired for the parser: a block left open gets its '}' just before the line
   * where the next block starts, and a stray '}' is dropped. The errors are reported here; the
   * parser then reads the rest of the file as the writer meant it.
   */
  private static List<Token> scanTokens(
      SourceFile source,
      List<Token> tokens,
      OffsetMap offsets,
      SyntaxReporter reporter,
      List<TextRange> comments) {
    List<Token> repaired = new ArrayList<>(tokens.size() + 4);
    int lineStartIndex = 0; // index in 'repaired' of the first token of the current line
    Deque<Token> open = new ArrayDeque<>();
    int openParens = 0;
    Token errorRunStart = null;
    Token errorRunEnd = null;
    for (Token t : tokens) {
      TextRange range = range(t, offsets);
      if (t.getType() == JonquilLexer.ERROR_CHAR) {
        if (errorRunEnd != null && errorRunEnd.getStopIndex() + 1 == t.getStartIndex()) {
          errorRunEnd = t;
          continue;
        }
        flushErrorRun(source, errorRunStart, errorRunEnd, offsets, reporter);
        errorRunStart = t;
        errorRunEnd = t;
        continue;
      }
      boolean keep = true;
      switch (t.getType()) {
        case JonquilLexer.LINE_COMMENT, JonquilLexer.BLOCK_COMMENT -> comments.add(range);
        case JonquilLexer.UNTERMINATED_STRING ->
            reporter.lexical(
                DiagnosticCode.UNTERMINATED_STRING,
                range,
                "string is not closed: add '\"' before the end of the line",
                null);
        case JonquilLexer.UNTERMINATED_COMMENT ->
            reporter.lexical(
                DiagnosticCode.UNTERMINATED_COMMENT,
                new TextRange(range.start(), Math.min(range.end(), range.start() + 2)),
                "comment is never closed: add '*/' where it should end",
                null);
        case JonquilLexer.NUMBER -> checkNumber(t, range, reporter);
        case JonquilLexer.LBRACE -> {
          if (!open.isEmpty()) {
            Token outer = open.pop();
            reporter.lexical(
                DiagnosticCode.UNCLOSED_BRACE,
                range(outer, offsets),
                "unclosed '{' opened at "
                    + where(source, offsets, outer)
                    + ": a new block starts at "
                    + where(source, offsets, t)
                    + " before this one ends with '}'",
                new Related(source.path(), range, "the next block starts here"));
            int at = repaired.size();
            // Past the diagnostic cap the input is hostile, not hand-written: append, never shift
            // the list.
            if (!reporter.full()
                && lineStartIndex < at
                && repaired.get(lineStartIndex).getStartIndex() > outer.getStartIndex()) {
              at = lineStartIndex - 1; // before the newline that ends the previous line
            }
            repaired.add(at, closingBrace(at < repaired.size() ? repaired.get(at) : t));
          }
          open.push(t);
        }
        case JonquilLexer.RBRACE -> {
          if (open.isEmpty()) {
            reporter.lexical(
                DiagnosticCode.UNMATCHED_CLOSE, range, "'}' without a matching '{'", null);
            keep = false;
          } else {
            open.pop();
          }
        }
        case JonquilLexer.LPAREN, JonquilLexer.RPAREN -> {
          if (t.getType() == JonquilLexer.LPAREN || openParens == 0) {
            reporter.lexical(
                DiagnosticCode.SYNTAX_UNEXPECTED,
                range,
                "parentheses are not used in Jonquil; write values one after another, separated by"
                    + " commas",
                null);
          }
          openParens = Math.max(0, openParens + (t.getType() == JonquilLexer.LPAREN ? 1 : -1));
          keep = false; // read what is inside as if the parentheses were not there
        }
        default -> {}
      }
      if (t.getType() == Token.EOF) {
        flushErrorRun(source, errorRunStart, errorRunEnd, offsets, reporter);
        errorRunStart = null;
        errorRunEnd = null;
        int end = source.text().length();
        for (Token unclosed : open) {
          int at = outdentedLineAfter(repaired, unclosed);
          TextRange endsAt = at < 0 ? new TextRange(end, end) : range(repaired.get(at), offsets);
          reporter.lexical(
              DiagnosticCode.UNCLOSED_BRACE,
              range(unclosed, offsets),
              "unclosed '{' opened at "
                  + where(source, offsets, unclosed)
                  + ": add '}' to end the block",
              new Related(
                  source.path(),
                  endsAt,
                  at < 0 ? "the file ends here" : "the block seems to end before this line"));
          if (at < 0) {
            repaired.add(closingBrace(t));
          } else {
            repaired.add(at - 1, closingBrace(repaired.get(at)));
          }
        }
        open.clear();
      }
      if (keep && t.getChannel() == Token.DEFAULT_CHANNEL) {
        repaired.add(t);
        if (t.getType() == JonquilLexer.NL) {
          lineStartIndex = repaired.size();
        }
      }
    }
    return repaired;
  }

  /**
   * Index of the first line after an unclosed '{' that is indented no deeper than the line that
   * opened it: where the writer most likely meant the block to end. -1 if none.
   */
  private static int outdentedLineAfter(List<Token> tokens, Token brace) {
    int openerColumn = -1;
    int braceIndex = -1;
    for (int i = 0; i < tokens.size(); i++) {
      Token t = tokens.get(i);
      if (t == brace) {
        braceIndex = i;
        break;
      }
      if (i == 0 || tokens.get(i - 1).getType() == JonquilLexer.NL) {
        openerColumn = t.getCharPositionInLine();
      }
    }
    for (int i = braceIndex + 1; i < tokens.size(); i++) {
      Token t = tokens.get(i);
      boolean lineStart = tokens.get(i - 1).getType() == JonquilLexer.NL;
      if (lineStart
          && t.getType() != JonquilLexer.NL
          && t.getType() != JonquilLexer.RBRACE
          && t.getType() != Token.EOF
          && t.getCharPositionInLine() <= openerColumn) {
        return i;
      }
    }
    return -1;
  }

  /** A zero-width '}' placed before {@code next}, standing in for one the writer forgot. */
  private static Token closingBrace(Token next) {
    // Keep the lexer as the token's source: ANTLR's recovery asks every token for its input stream.
    CommonToken brace =
        new CommonToken(
            new Pair<>(next.getTokenSource(), next.getInputStream()),
            JonquilLexer.RBRACE,
            Token.DEFAULT_CHANNEL,
            next.getStartIndex(),
            next.getStartIndex() - 1);
    brace.setText("}");
    brace.setLine(next.getLine());
    brace.setCharPositionInLine(next.getCharPositionInLine());
    return brace;
  }

  private static void flushErrorRun(
      SourceFile source, Token start, Token end, OffsetMap offsets, SyntaxReporter reporter) {
    if (start == null) {
      return;
    }
    TextRange range =
        new TextRange(
            offsets.toUtf16(start.getStartIndex()), offsets.toUtf16(end.getStopIndex() + 1));
    String text = source.slice(range);
    String shown =
        text.codePoints().limit(8).mapToObj(SpecParser::visible).reduce("", String::concat);
    String more = text.codePointCount(0, text.length()) > 8 ? "..." : "";
    reporter.lexical(
        DiagnosticCode.BAD_CHARACTER,
        range,
        (range.length() == 1 ? "unexpected character '" : "unexpected characters '")
            + shown
            + more
            + "': not part of the Jonquil language",
        null);
  }

  private static String visible(int cp) {
    if (Character.isISOControl(cp)
        || Character.getType(cp) == Character.FORMAT
        || !Character.isDefined(cp)) {
      return String.format("U+%04X", cp);
    }
    return new String(Character.toChars(cp));
  }

  private static void checkNumber(Token t, TextRange range, SyntaxReporter reporter) {
    String text = t.getText();
    if (text.length() > MAX_NUMBER_CHARS) {
      reporter.lexical(
          DiagnosticCode.BAD_NUMBER,
          range,
          "number has more than " + MAX_NUMBER_CHARS + " characters",
          null);
    } else if (Double.isInfinite(Double.parseDouble(text))) {
      reporter.lexical(
          DiagnosticCode.BAD_NUMBER,
          range,
          "number '" + TokenText.shorten(text) + "' is too large",
          null);
    }
  }

  static TextRange range(Token t, OffsetMap offsets) {
    if (t.getType() == Token.EOF) {
      int at = offsets.toUtf16(t.getStartIndex());
      return new TextRange(at, at);
    }
    return new TextRange(offsets.toUtf16(t.getStartIndex()), offsets.toUtf16(t.getStopIndex() + 1));
  }

  private static String where(SourceFile source, OffsetMap offsets, Token t) {
    int offset = offsets.toUtf16(t.getStartIndex());
    return source.humanLine(offset) + ":" + source.humanColumn(offset);
  }
}
