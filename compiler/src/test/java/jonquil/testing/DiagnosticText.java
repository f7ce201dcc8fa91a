package jonquil.testing;

import java.nio.file.Path;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.Related;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;

/**
 * The golden-file form of a result's diagnostics: one line each with its full range, {@code
 * path:line:col-line:col: severity J123: message}, related places indented below.
 */
public final class DiagnosticText {
  private DiagnosticText() {}

  public static String render(Result result, Path base) {
    StringBuilder out = new StringBuilder();
    for (Diagnostic d : result.diagnostics()) {
      out.append(where(result, base, d.file(), d.range()))
          .append(": ")
          .append(d.severity().word())
          .append(' ')
          .append(d.code().id())
          .append(": ")
          .append(d.message())
          .append('\n');
      for (Related r : d.related()) {
        out.append("    related ")
            .append(where(result, base, r.file(), r.range()))
            .append(": ")
            .append(r.message())
            .append('\n');
      }
    }
    return out.toString();
  }

  private static String where(Result result, Path base, Path file, TextRange range) {
    String path = base.relativize(file).toString().replace('\\', '/');
    SourceFile source = result.files().get(file);
    if (source == null) {
      return path;
    }
    return path
        + ":"
        + source.humanLine(range.start())
        + ":"
        + source.humanColumn(range.start())
        + "-"
        + source.humanLine(range.end())
        + ":"
        + source.humanColumn(range.end());
  }
}
