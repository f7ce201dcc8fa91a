package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.source.TextRange;

/**
 * The quick fixes for the diagnostics under a range: the checker's own {@link Fix}es, and those
 * that need a view of the whole file, such as a dump for a port nobody follows.
 */
final class CodeActions {
  private CodeActions() {}

  static List<CodeActionInfo> of(Result r, Path file, TextRange range) {
    List<CodeActionInfo> out = new ArrayList<>();
    for (Diagnostic d : r.diagnostics()) {
      if (!d.file().equals(file)
          || d.range().start() > range.end()
          || d.range().end() < range.start()) {
        continue;
      }
      List<Fix> fixes = new ArrayList<>(d.fixes());
      if (d.code() == DiagnosticCode.PORT_NOT_FOLLOWED) {
        StrayDumpFix.of(r, d).ifPresent(fixes::add);
      }
      for (int i = 0; i < fixes.size(); i++) {
        out.add(
            new CodeActionInfo(
                fixes.get(i).title(), "quickfix", i == 0, d, byFile(fixes.get(i).edits())));
      }
    }
    return out;
  }

  private static Map<Path, List<Edit>> byFile(List<Edit> edits) {
    Map<Path, List<Edit>> out = new LinkedHashMap<>();
    for (Edit e : edits) {
      out.computeIfAbsent(e.file(), k -> new ArrayList<>()).add(e);
    }
    out.values().forEach(list -> list.sort(java.util.Comparator.comparing(Edit::range)));
    return out;
  }
}
