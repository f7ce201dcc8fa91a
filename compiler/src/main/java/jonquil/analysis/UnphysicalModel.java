package jonquil.analysis;

import java.nio.file.Path;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.TextRange;

/**
 * A spec that passed resolution but turns out unphysical once the physics evaluates it (a
 * dispersion formula with n² < 0 at the wavelength used): the analysis stops and reports it on the
 * line that states it, rather than computing on or failing as an internal error.
 */
final class UnphysicalModel extends RuntimeException {
  private final transient Diagnostic diagnostic;

  UnphysicalModel(DiagnosticCode code, Path file, TextRange range, String message) {
    super(message, null, false, false);
    this.diagnostic = Diagnostic.of(code, file, range, message);
  }

  Diagnostic diagnostic() {
    return diagnostic;
  }
}
