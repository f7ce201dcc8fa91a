package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import jonquil.analysis.RequirementOutcome;
import jonquil.diag.Severity;
import jonquil.source.SourceFile;
import jonquil.testing.DiagnosticText;
import jonquil.testing.Golden;
import jonquil.testing.Repo;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The bundled samples are part of the test suite: each must check without errors or warnings, and
 * its findings and requirement verdicts must match its golden file in
 * compiler/src/test/resources/samples/.
 */
class SamplesTest {
  static List<Path> samples() throws IOException {
    return Repo.sampleFiles();
  }

  static Result check(Path sample) {
    return Checker.check(Workspace.onDisk(Repo.samples()), List.of(sample));
  }

  @TestFactory
  Stream<DynamicTest> everySampleChecksCleanAndMatchesItsGolden() throws IOException {
    return samples().stream()
        .map(
            sample ->
                DynamicTest.dynamicTest(
                    Repo.samples().relativize(sample).toString(),
                    () -> {
                      Result result = check(sample);
                      assertEquals(
                          0,
                          result.count(Severity.ERROR) + result.count(Severity.WARNING),
                          () -> DiagnosticText.render(result, Repo.samples()));
                      String name =
                          sample.getFileName().toString().replaceFirst("\\.jonq$", ".expected");
                      Golden.check(
                          Repo.testResources().resolve("samples").resolve(name), render(result));
                    }));
  }

  @Test
  void thereAreAtLeastThreeBenchesAndTheyShareAPartLibrary() throws IOException {
    List<Path> benches =
        samples().stream().filter(p -> p.getParent().equals(Repo.samples())).toList();
    assertTrue(benches.size() >= 3, "benches: " + benches);
    for (Path bench : benches) {
      assertTrue(
          Files.readString(bench).contains("use \"parts/bench_parts.jonq\""),
          bench + " does not use the part library");
    }
  }

  @TestFactory
  Stream<DynamicTest> everySampleIsInTheCanonicalLayout() throws IOException {
    return samples().stream()
        .map(
            sample ->
                DynamicTest.dynamicTest(
                    Repo.samples().relativize(sample).toString(),
                    () -> {
                      jonquil.source.SourceFile file =
                          new jonquil.source.SourceFile(sample, Files.readString(sample));
                      assertEquals(
                          file.text(),
                          jonquil.format.Formatter.format(
                                  file, jonquil.format.FormatOptions.DEFAULT)
                              .orElseThrow(),
                          "run 'jonquil fmt samples'");
                    }));
  }

  /** Findings, then one line per requirement verdict with its place. */
  static String render(Result result) {
    StringBuilder out = new StringBuilder(DiagnosticText.render(result, Repo.samples()));
    for (RequirementOutcome r : result.requirements()) {
      SourceFile source = result.files().get(r.file());
      out.append(Repo.samples().relativize(r.file()).toString().replace('\\', '/'))
          .append(':')
          .append(source.humanLine(r.range().start()))
          .append(": ")
          .append(r.status().word())
          .append(": ")
          .append(r.text());
      // A hazard class is a label ("3R"), never a number.
      r.value()
          .ifPresent(
              v ->
                  out.append(" = ")
                      .append(
                          r.siUnit().equals("class")
                              ? "Class "
                                  + jonquil.safety.HazardClass.ofRank(v).orElseThrow().label()
                              : v + " " + r.siUnit()));
      r.margin().ifPresent(m -> out.append(", margin ").append(m));
      out.append(" [").append(r.reason()).append("]\n");
    }
    return out.toString();
  }
}
