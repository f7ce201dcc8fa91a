package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

class ExitCodeTest {
  private static final Path FILE = Path.of("a.jonq").toAbsolutePath();

  private static Result with(DiagnosticCode... codes) {
    List<Diagnostic> diagnostics =
        java.util.Arrays.stream(codes)
            .map(c -> Diagnostic.of(c, FILE, TextRange.EMPTY, "finding"))
            .toList();
    return new Result(Map.of(), diagnostics, List.of());
  }

  private static final Result CLEAN = with();
  private static final Result ERROR = with(DiagnosticCode.UNKNOWN_UNIT);
  private static final Result WARNING = with(DiagnosticCode.EMPTY_TRAIN);
  private static final Result NOTE = with(DiagnosticCode.TOO_MANY_ERRORS);
  private static final Result FAILED_REQUIREMENT =
      new Result(
          Map.of(),
          List.of(),
          List.of(
              new RequirementOutcome(
                  FILE,
                  TextRange.EMPTY,
                  "power <= 1 mW",
                  RequirementStatus.FAIL,
                  OptionalDouble.of(0.002),
                  OptionalDouble.of(0.001),
                  OptionalDouble.of(-0.001),
                  "W",
                  "",
                  "W",
                  false,
                  Optional.empty())));

  @Test
  void aCleanCheckExitsZero() {
    assertEquals(ExitCode.CLEAN, ExitCode.of(CLEAN, false, false, false));
    assertEquals(0, ExitCode.CLEAN.code());
  }

  @Test
  void anErrorExitsOne() {
    assertEquals(ExitCode.FINDINGS, ExitCode.of(ERROR, false, false, false));
    assertEquals(1, ExitCode.FINDINGS.code());
  }

  @Test
  void aFailedRequirementExitsOneEvenWithoutADiagnostic() {
    assertEquals(ExitCode.FINDINGS, ExitCode.of(FAILED_REQUIREMENT, false, false, false));
  }

  @Test
  void warningsPassUnlessStrict() {
    assertEquals(ExitCode.CLEAN, ExitCode.of(WARNING, false, false, false));
    assertEquals(ExitCode.FINDINGS, ExitCode.of(WARNING, true, false, false));
  }

  @Test
  void notesNeverFail() {
    assertEquals(ExitCode.CLEAN, ExitCode.of(NOTE, true, false, false));
  }

  @Test
  void exitZeroHidesFindings() {
    assertEquals(ExitCode.CLEAN, ExitCode.of(ERROR, false, true, false));
    assertEquals(ExitCode.CLEAN, ExitCode.of(WARNING, true, true, false));
  }

  @Test
  void unreadableInputOutranksACleanResultButNotRealFindings() {
    assertEquals(ExitCode.TROUBLE, ExitCode.of(CLEAN, false, false, true));
    assertEquals(ExitCode.TROUBLE, ExitCode.of(WARNING, false, false, true));
    assertEquals(ExitCode.FINDINGS, ExitCode.of(ERROR, false, false, true));
    assertEquals(2, ExitCode.TROUBLE.code());
  }

  @Test
  void exitZeroDoesNotHideUnreadableInput() {
    assertEquals(ExitCode.TROUBLE, ExitCode.of(ERROR, false, true, true));
    assertEquals(ExitCode.TROUBLE, ExitCode.of(CLEAN, false, true, true));
  }
}
