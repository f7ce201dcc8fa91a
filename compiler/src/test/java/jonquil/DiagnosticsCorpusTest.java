package jonquil;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.testing.DiagnosticText;
import jonquil.testing.Golden;
import jonquil.testing.Repo;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The corpus of deliberately broken specs: each case is {@code <area>/<case>.jonq}, or a folder
 * {@code <area>/<case>/} whose {@code main.jonq} is checked (for cases with several files), and
 * {@code <case>.diag} beside it holds the exact diagnostics expected.
 */
class DiagnosticsCorpusTest {
  static final Path CORPUS = Repo.testResources().resolve("diagnostics");

  /** Codes that no spec can trigger on purpose (environment or internal failures, later issues). */
  static final Set<DiagnosticCode> NOT_IN_CORPUS =
      EnumSet.of(
          DiagnosticCode.INTERNAL_ERROR,
          DiagnosticCode.CONSERVATION_BROKEN,
          DiagnosticCode.UNREADABLE_FILE,
          DiagnosticCode.USE_UNREADABLE,
          DiagnosticCode.REQUIREMENT_FAILED,
          DiagnosticCode.FILE_TOO_LARGE,
          DiagnosticCode.TOO_MANY_ERRORS);

  record Case(String name, Path root, Path main, Path golden) {}

  static List<Case> cases() throws IOException {
    try (Stream<Path> areas = Files.list(CORPUS)) {
      return areas
          .filter(Files::isDirectory)
          .sorted()
          .flatMap(
              area -> {
                try (Stream<Path> entries = Files.list(area)) {
                  return entries
                      .sorted()
                      .flatMap(
                          entry -> {
                            String file = entry.getFileName().toString();
                            String name =
                                area.getFileName() + "/" + file.replaceFirst("\\.jonq$", "");
                            if (Files.isDirectory(entry)) {
                              return Stream.of(
                                  new Case(
                                      name,
                                      entry,
                                      entry.resolve("main.jonq"),
                                      area.resolve(file + ".diag")));
                            }
                            if (file.endsWith(".jonq")) {
                              return Stream.of(
                                  new Case(
                                      name,
                                      area,
                                      entry,
                                      area.resolve(file.replaceFirst("\\.jonq$", ".diag"))));
                            }
                            return Stream.empty();
                          })
                      .toList()
                      .stream();
                } catch (IOException e) {
                  throw new java.io.UncheckedIOException(e);
                }
              })
          .toList();
    }
  }

  static Result check(Case c) {
    return Checker.check(Workspace.onDisk(c.root()), List.of(c.main()));
  }

  @TestFactory
  Stream<DynamicTest> everyBrokenSpecGivesExactlyItsGoldenDiagnostics() throws IOException {
    return cases().stream()
        .map(
            c ->
                DynamicTest.dynamicTest(
                    c.name(),
                    () -> {
                      Result result = check(c);
                      assertFalse(
                          result.diagnostics().isEmpty(),
                          c.name() + " is in the broken corpus but checks clean");
                      Golden.check(c.golden(), DiagnosticText.render(result, c.root()));
                    }));
  }

  @Test
  void theCorpusHasAtLeastFortyCases() throws IOException {
    assertTrue(cases().size() >= 40, "only " + cases().size() + " cases");
  }

  @Test
  void everyDiagnosticCodeAUserCanTriggerIsInTheCorpus() throws IOException {
    Set<DiagnosticCode> seen = EnumSet.noneOf(DiagnosticCode.class);
    for (Case c : cases()) {
      check(c).diagnostics().stream().map(Diagnostic::code).forEach(seen::add);
    }
    Set<DiagnosticCode> missing = EnumSet.allOf(DiagnosticCode.class);
    missing.removeAll(seen);
    missing.removeAll(NOT_IN_CORPUS);
    assertTrue(missing.isEmpty(), "no corpus case triggers " + missing);
  }
}
