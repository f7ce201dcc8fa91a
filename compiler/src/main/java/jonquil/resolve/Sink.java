package jonquil.resolve;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Fix;
import jonquil.source.TextRange;

/** Collects the diagnostics and name references of one resolution pass over one file. */
final class Sink {
  final Path file;
  final List<Diagnostic> diagnostics = new ArrayList<>();
  final List<ResolvedRef> refs = new ArrayList<>();

  Sink(Path file) {
    this.file = file;
  }

  Diagnostic report(DiagnosticCode code, TextRange range, String message) {
    Diagnostic d = Diagnostic.of(code, file, range, message);
    diagnostics.add(d);
    return d;
  }

  void report(DiagnosticCode code, TextRange range, String message, Fix fix) {
    Diagnostic d = Diagnostic.of(code, file, range, message);
    diagnostics.add(fix == null ? d : d.withFix(fix));
  }

  void replace(Diagnostic old, Diagnostic updated) {
    diagnostics.set(diagnostics.indexOf(old), updated);
  }
}
