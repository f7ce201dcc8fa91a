package jonquil;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;

/** The façade: checks spec files in a workspace and returns one immutable {@link Result}. */
public final class Checker {
  private Checker() {}

  public static Result check(Workspace workspace, List<Path> files) {
    Map<Path, SourceFile> read = new LinkedHashMap<>();
    List<Diagnostic> diagnostics = new ArrayList<>();
    for (Path file : files) {
      Path abs = file.toAbsolutePath().normalize();
      try {
        read.put(abs, new SourceFile(abs, workspace.reader().read(abs)));
      } catch (IOException e) {
        diagnostics.add(Diagnostic.of(DiagnosticCode.UNREADABLE_FILE, abs, TextRange.EMPTY,
            "cannot read '" + abs.getFileName() + "'"));
      }
    }
    return new Result(read, diagnostics, List.of());
  }
}
