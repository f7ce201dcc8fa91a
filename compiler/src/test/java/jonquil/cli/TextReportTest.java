package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

class TextReportTest {
  private static final Pattern FINDING =
      Pattern.compile("^[^:]+:\\d+:\\d+: (error|warning|note): .+ \\[J\\d{3}\\]$");

  /** Requirement verdicts stand where findings have a severity, so quickfix parsers skip them. */
  static final Pattern VERDICT =
      Pattern.compile("^[^:]+:\\d+:\\d+: requirement (pass|fail|not-evaluated): .+$");

  private static List<String> lines(CheckRun run) {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    TextReport.write(run, new PrintStream(bytes, true, StandardCharsets.UTF_8));
    return bytes.toString(StandardCharsets.UTF_8).lines().toList();
  }

  @Test
  void everyLineButTheVerdictsAndTheSummaryIsACompilerStyleFinding() {
    List<String> lines = lines(SampleRun.run());
    for (String line : lines.subList(0, lines.size() - 1)) {
      assertTrue(FINDING.matcher(line).matches() || VERDICT.matcher(line).matches(), line);
    }
  }

  @Test
  void requirementsNotEvaluatedFollowTheFindingsOnePerLine() {
    // Evaluated verdicts are findings (J609, J611); only the unevaluated get a line of their own.
    List<String> lines = lines(SampleRun.run());
    long verdicts = lines.stream().filter(l -> VERDICT.matcher(l).matches()).count();
    long unevaluated =
        SampleRun.run().result().requirements().stream()
            .filter(r -> r.status() == jonquil.analysis.RequirementStatus.NOT_EVALUATED)
            .count();
    assertTrue(verdicts == unevaluated, "verdict lines: " + verdicts);
    int firstVerdict =
        lines.indexOf(
            lines.stream().filter(l -> VERDICT.matcher(l).matches()).findFirst().orElseThrow());
    assertTrue(
        lines.subList(firstVerdict, lines.size() - 1).stream()
            .allMatch(l -> VERDICT.matcher(l).matches()));
  }

  @Test
  void findingsComeInFileAndPositionOrder() {
    List<String> lines = lines(SampleRun.run());
    assertTrue(lines.get(0).startsWith("specs/main.jonq:2:"), lines.get(0));
    assertTrue(lines.get(1).startsWith("specs/main.jonq:4:"), lines.get(1));
    assertTrue(lines.get(3).startsWith("specs/parts lib/Lïnsen.jonq:1:"), lines.get(3));
  }

  @Test
  void aFindingShowsPathLineCodePointColumnSeverityMessageAndCode() {
    assertEquals(
        "specs/main.jonq:4:17: error: the name 'laser' is already declared — pick another"
            + " \"name\" <here> [J201]",
        lines(SampleRun.run()).get(1));
  }

  @Test
  void aRelatedPlaceFollowsItsFindingAsANote() {
    assertEquals(
        "specs/main.jonq:1:17: note: first declared here [J201]", lines(SampleRun.run()).get(2));
  }

  @Test
  void pathsAreRelativeToTheWorkingDirectoryNotTheRoot() {
    CheckRun fromSpecs =
        new CheckRun(
            SampleRun.result(), SampleRun.ROOT, SampleRun.ROOT.resolve("specs"), List.of());
    assertTrue(lines(fromSpecs).get(1).startsWith("main.jonq:4:17: "), lines(fromSpecs).get(1));
    CheckRun fromElsewhere =
        new CheckRun(SampleRun.result(), SampleRun.ROOT, SampleRun.ROOT.resolve("docs"), List.of());
    assertTrue(
        lines(fromElsewhere).get(1).startsWith("../specs/main.jonq:4:17: "),
        lines(fromElsewhere).get(1));
  }

  @Test
  void aMessageWithALineBreakStaysOnOneLine() {
    Diagnostic split =
        Diagnostic.of(
            DiagnosticCode.BAD_NUMBER, SampleRun.MAIN, TextRange.of(0, 1), "first\nsecond");
    Result one = new Result(Map.of(), List.of(split), List.of());
    List<String> lines = lines(new CheckRun(one, SampleRun.ROOT, SampleRun.ROOT, List.of()));
    assertEquals("specs/main.jonq:1:1: error: first second [J110]", lines.get(0));
  }

  @Test
  void theLastLineSummarisesFilesFindingsAndRequirements() {
    List<String> lines = lines(SampleRun.run());
    assertEquals(
        "checked 2 files: 2 errors, 1 warning, 1 note; requirements: 1 pass, 1 fail, 1 not"
            + " evaluated",
        lines.get(lines.size() - 1));
  }
}
