package jonquil.diag;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import jonquil.source.TextRange;

/**
 * One finding at one place of one file. The message is written for a non-expert and never contains
 * parser internals; the code is stable across releases.
 */
public record Diagnostic(
    DiagnosticCode code,
    Severity severity,
    Path file,
    TextRange range,
    String message,
    List<Fix> fixes,
    List<Related> related) {

  public static final Comparator<Diagnostic> ORDER =
      Comparator.comparing((Diagnostic d) -> d.file().toString())
          .thenComparing(Diagnostic::range)
          .thenComparing(d -> d.code().id())
          .thenComparing(Diagnostic::message);

  public Diagnostic {
    fixes = List.copyOf(fixes);
    related = List.copyOf(related);
  }

  public static Diagnostic of(DiagnosticCode code, Path file, TextRange range, String message) {
    return new Diagnostic(code, code.severity(), file, range, message, List.of(), List.of());
  }

  public Diagnostic withFix(Fix fix) {
    var all = new java.util.ArrayList<>(fixes);
    all.add(fix);
    return new Diagnostic(code, severity, file, range, message, all, related);
  }

  public Diagnostic withRelated(Related r) {
    var all = new java.util.ArrayList<>(related);
    all.add(r);
    return new Diagnostic(code, severity, file, range, message, fixes, all);
  }
}
