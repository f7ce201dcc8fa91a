package jonquil.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.Result;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.RequirementStatus;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.diag.Related;
import jonquil.diag.Severity;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;

/**
 * A hand-made check result covering what report formats must handle: all severities, fixes, related
 * places, a second file, non-ASCII text and requirements of every status, built without the checker
 * so the reports can be specified on their own.
 */
final class SampleRun {
  static final Path ROOT = Path.of("/projects/bench").toAbsolutePath();
  static final Path MAIN = ROOT.resolve("specs/main.jonq");
  static final Path PARTS = ROOT.resolve("specs/parts lib/Lïnsen.jonq");

  /** The emoji is outside the BMP: two UTF-16 units, one code point, one column. */
  static final String MAIN_TEXT =
      "source \"🔦 Grün\" laser {\n  power 5 mW\n}\nsource \"🔦 Grün\" laser {}\n";

  static final String PARTS_TEXT = "part lens1 lens { focal 50 mm }\n";

  private SampleRun() {}

  static CheckRun run() {
    return new CheckRun(result(), ROOT, ROOT, List.of());
  }

  static Result result() {
    int dup = MAIN_TEXT.lastIndexOf("laser");
    int first = MAIN_TEXT.indexOf("laser");
    int mw = MAIN_TEXT.indexOf("mW");
    Diagnostic duplicate =
        Diagnostic.of(
                DiagnosticCode.DUPLICATE_NAME,
                MAIN,
                TextRange.of(dup, dup + 5),
                "the name 'laser' is already declared — pick another \"name\" <here>")
            .withRelated(new Related(MAIN, TextRange.of(first, first + 5), "first declared here"))
            .withFix(
                new Fix(
                    "rename to 'laser2'",
                    List.of(new Edit(MAIN, TextRange.of(dup, dup + 5), "laser2"))));
    Diagnostic warning =
        Diagnostic.of(
            DiagnosticCode.EMPTY_TRAIN,
            MAIN,
            TextRange.of(mw, mw + 2),
            "this train has no beam paths");
    Diagnostic note =
        new Diagnostic(
            DiagnosticCode.TOO_MANY_ERRORS,
            Severity.NOTE,
            PARTS,
            TextRange.of(0, 4),
            "checking stopped after 1 error",
            List.of(),
            List.of());
    Diagnostic twoFileFix =
        Diagnostic.of(
                DiagnosticCode.UNDEFINED_NAME,
                PARTS,
                TextRange.of(5, 10),
                "'lens1' is never declared")
            .withFix(
                new Fix(
                    "declare it in both files",
                    List.of(
                        new Edit(PARTS, TextRange.of(0, 0), "part lens0 lens {}\n"),
                        new Edit(MAIN, TextRange.of(0, 0), "use \"parts lib/Lïnsen.jonq\"\n"))));
    List<RequirementOutcome> requirements =
        List.of(
            new RequirementOutcome(
                MAIN,
                TextRange.of(0, 6),
                "power at lens1 <= 10 mW",
                RequirementStatus.PASS,
                OptionalDouble.of(0.005),
                OptionalDouble.of(0.01),
                OptionalDouble.of(0.005),
                "W",
                "",
                "W",
                false,
                Optional.empty()),
            new RequirementOutcome(
                MAIN,
                TextRange.of(0, 6),
                "power at lens1 <= 1 mW",
                RequirementStatus.FAIL,
                OptionalDouble.of(0.005),
                OptionalDouble.of(0.001),
                OptionalDouble.of(-0.004),
                "W",
                "",
                "W",
                false,
                Optional.empty()),
            RequirementOutcome.notEvaluated(
                PARTS,
                TextRange.of(0, 4),
                "beam waist at lens1 < 1 mm",
                "beam waists are not computed yet"));
    return new Result(
        Map.of(MAIN, new SourceFile(MAIN, MAIN_TEXT), PARTS, new SourceFile(PARTS, PARTS_TEXT)),
        List.of(duplicate, warning, note, twoFileFix),
        requirements);
  }
}
