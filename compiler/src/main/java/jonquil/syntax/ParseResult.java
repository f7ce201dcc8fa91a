package jonquil.syntax;

import java.util.List;
import jonquil.diag.Diagnostic;
import jonquil.source.SourceFile;

/** What parsing one file gives: always a tree (possibly partial) and the syntax diagnostics. */
public record ParseResult(SourceFile source, SpecFile ast, List<Diagnostic> diagnostics) {
  public ParseResult {
    diagnostics = List.copyOf(diagnostics);
  }
}
