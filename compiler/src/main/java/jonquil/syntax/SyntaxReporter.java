package jonquil.syntax;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.source.TextRange;

/**
 * Collects syntax diagnostics for one file, keeping one per line and none at tokens that the
 * lexical pre-scan already explained (so a stray '}' is reported once, not thrice).
 */
final class SyntaxReporter {
  static final int MAX_DIAGNOSTICS = 100;

  private final Path file;
  private final jonquil.source.LineIndex lines;
  private final List<Diagnostic> diagnostics = new ArrayList<>();
  private final Set<Integer> explainedOffsets = new HashSet<>();
  private final Set<Integer> linesWithParseError = new HashSet<>();
  private boolean dropped;

  SyntaxReporter(Path file, jonquil.source.LineIndex lines) {
    this.file = file;
    this.lines = lines;
  }

  /** Reported by the lexical pre-scan; parser errors at this token are then redundant. */
  void lexical(DiagnosticCode code, TextRange range, String message, Related related) {
    explainedOffsets.add(range.start());
    Diagnostic d = Diagnostic.of(code, file, range, message);
    add(related == null ? d : d.withRelated(related));
  }

  void parse(DiagnosticCode code, TextRange range, String message, boolean atEndOfFile) {
    // An error at the very end after earlier ones is their cascade (a '{' recovery conjured needs
    // its '}').
    if (explainedOffsets.contains(range.start()) || (atEndOfFile && !diagnostics.isEmpty())) {
      return;
    }
    if (!linesWithParseError.add(lines.line(range.start()))) {
      return;
    }
    add(Diagnostic.of(code, file, range, message));
  }

  private void add(Diagnostic d) {
    if (diagnostics.size() < MAX_DIAGNOSTICS) {
      diagnostics.add(d);
    } else if (!dropped) {
      dropped = true;
      diagnostics.add(
          Diagnostic.of(
              DiagnosticCode.TOO_MANY_ERRORS,
              file,
              d.range(),
              "stopped reporting syntax errors in this file after "
                  + MAX_DIAGNOSTICS
                  + "; fix the first ones and check again"));
    }
  }

  /** Parsing gave up early: say so once, even if the cap was not reached. */
  void stopped() {
    if (!dropped) {
      dropped = true;
      TextRange at =
          diagnostics.isEmpty() ? TextRange.EMPTY : diagnostics.get(diagnostics.size() - 1).range();
      diagnostics.add(
          Diagnostic.of(
              DiagnosticCode.TOO_MANY_ERRORS,
              file,
              at,
              "stopped reading this file after too many syntax errors; fix the first ones and check"
                  + " again"));
    }
  }

  boolean full() {
    return dropped || diagnostics.size() >= MAX_DIAGNOSTICS;
  }

  List<Diagnostic> diagnostics() {
    return diagnostics;
  }
}
