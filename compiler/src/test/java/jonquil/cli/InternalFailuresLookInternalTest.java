package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.TextRange;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Values that pass validation but cannot be computed with are refused on the line that states them
 * (never an internal error), in every output format alike; and what remains an internal failure
 * exits 2 whatever the flags, with its stack trace under '--debug' only.
 */
class InternalFailuresLookInternalTest {
  @TempDir Path dir;

  @BeforeEach
  void projectRoot() throws IOException {
    Files.createFile(dir.resolve(".jonquil-root"));
  }

  private static String bench(String beam, String material, String aoi) {
    return "source laser {\n  wavelength 1064 nm\n  power 1 W\n  beam "
        + beam
        + "\n}\nmaterial g { "
        + material
        + " }\nwindow w { material g; thickness 3 mm; aoi "
        + aoi
        + " }\ndump d1\ndump d2\ntrain t {\n  laser -> 10 mm -> w.through -> 10 mm -> d1\n"
        + "  w.reflected -> 10 mm -> d2\n}\nrequire { power at d1 < 2 W }\n";
  }

  private CliRun check(String spec, String... flags) throws IOException {
    Files.writeString(dir.resolve("main.jonq"), spec);
    List<String> args = new ArrayList<>(List.of("check"));
    args.addAll(List.of(flags));
    args.add("main.jonq");
    return CliRun.of(dir, args.toArray(String[]::new));
  }

  @ParameterizedTest
  @ValueSource(
      strings = {
        "index 1e308",
        "index 1e-300",
        "sellmeier -2 0.01 um2", // n² = 1 − 2 λ²/(λ² − C) < 0 at 1064 nm (definition)
        "sellmeier 1 1.132096 um2", // C = λ² at 1064 nm: the pole itself (definition)
        "cauchy 1e-300, -1 um2"
      })
  void anUnphysicalIndexIsRefusedOnTheMaterialsLine(String material) throws IOException {
    CliRun run = check(bench("waist 1 mm", material, "0 deg"));
    assertEquals(1, run.exitCode(), run.out() + run.err());
    assertTrue(
        run.out()
            .contains("main.jonq:6:1: error: material 'g' gives no physical index at" + " 1064 nm"),
        run.out());
    assertTrue(run.out().contains("[J405]"), run.out());
    assertFalse(run.out().contains("J901"), run.out());
    assertTrue(run.out().contains("requirements: 0 pass, 0 fail, 1 not evaluated"), run.out());
  }

  @Test
  void grazingIncidenceOnAWindowIsComputedNotCrashed() throws IOException {
    CliRun run = check(bench("waist 1 mm", "index 1.5", "89.9999999 deg"));
    assertEquals(0, run.exitCode(), run.out() + run.err());
    assertTrue(run.out().contains("requirements: 1 pass"), run.out());
  }

  @ParameterizedTest
  @ValueSource(strings = {"text", "json", "sarif"})
  void aWaistTooSmallToBeABeamIsRefusedInEveryFormat(String format) throws IOException {
    CliRun run = check(bench("waist 1e-300 mm", "index 1.5", "0 deg"), "--format", format);
    assertEquals(1, run.exitCode(), run.out() + run.err());
    assertEquals("", run.err());
    assertTrue(run.out().contains("J405"), run.out());
  }

  @Test
  void anInternalErrorExitsTwoEvenWithExitZero() {
    Path file = dir.resolve("main.jonq");
    Result broken =
        new Result(
            Map.of(),
            List.of(
                Diagnostic.of(
                    DiagnosticCode.INTERNAL_ERROR, file, TextRange.EMPTY, "the checker failed")),
            List.of());
    assertEquals(ExitCode.TROUBLE, ExitCode.of(broken, false, true, false));
    assertEquals(ExitCode.TROUBLE, ExitCode.of(broken, true, false, false));
  }

  @ParameterizedTest
  @ValueSource(strings = {"Infinity", "NaN", "0x1p1", "1.5d"})
  void aTableNumberThatIsNoPlainDecimalIsABadRow(String n) throws IOException {
    Files.writeString(dir.resolve("nk.txt"), "500 nm 1.5 0\n600 nm " + n + " 0\n");
    CliRun run = check("material glass { table \"nk.txt\" }\n");
    assertEquals(1, run.exitCode(), run.out());
    assertTrue(
        run.out()
            .contains(
                "nk.txt:2:1: error: numbers must be plain decimals such as '1.5195' or '1.2e-3'"
                    + " [J214]"),
        run.out());
  }
}
