package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fail closed in the editor too: a 'yield' requirement is drawn in the server's second pass, so the
 * editor ends with the gate's verdict: met, failed, or an error when it cannot be evaluated.
 */
class EditorYieldsFailClosedTest {
  private static final String BENCH =
      """
      source seed_laser {
        wavelength 780 nm
        power 40 mW ± 4 mW
        polarization linear 0 deg
        beam waist 0.5 mm
      }
      polarizer cleanup {
        axis 0 deg
      }
      probe pickoff
      train arm {
        seed_laser -> 50 mm -> cleanup -> 20 mm -> pickoff
      }
      require {
        yield >= 99 % for power at pickoff >= 45 mW
      }
      """;

  private static final String NO_TOLERANCE = BENCH.replace(" ± 4 mW", "");

  private static PublishDiagnosticsParams openAndAwait(Path dir, String text, String code)
      throws Exception {
    Path spec = dir.resolve("bench.jonq");
    Files.writeString(spec, text);
    try (LspHarness h = new LspHarness(EditorFeatures.standard(), Duration.ofMillis(10))) {
      h.initialize(List.of(dir), new ClientCapabilities());
      String uri = spec.toUri().toString();
      h.open(uri, 1, text);
      return h.client.await(
          uri,
          p ->
              Integer.valueOf(1).equals(p.getVersion())
                  && p.getDiagnostics().stream().anyMatch(d -> is(d, code)));
    }
  }

  private static boolean is(Diagnostic d, String code) {
    return d.getCode().getLeft().equals(code) && d.getSeverity() == DiagnosticSeverity.Error;
  }

  @Test
  void aYieldThatFailsIsAnErrorInTheEditor(@TempDir Path dir) throws Exception {
    // 40 mW ± 4 mW never reaches 45 mW: no build passes, so the yield is not met (J609).
    PublishDiagnosticsParams p = openAndAwait(dir, BENCH, "J609");
    assertTrue(
        p.getDiagnostics().stream().anyMatch(d -> d.getMessage().contains("0 of 400")),
        p.getDiagnostics().toString());
  }

  @Test
  void aYieldThatCannotBeEvaluatedIsAnErrorInTheEditor(@TempDir Path dir) throws Exception {
    // Without a tolerance every build is the same: the yield is not evaluated, so not met (J613).
    PublishDiagnosticsParams p = openAndAwait(dir, NO_TOLERANCE, "J613");
    assertTrue(
        p.getDiagnostics().stream().anyMatch(d -> d.getMessage().contains("no tolerances")),
        p.getDiagnostics().toString());
  }
}
