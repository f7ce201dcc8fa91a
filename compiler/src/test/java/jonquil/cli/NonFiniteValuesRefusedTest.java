package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A value that is finite as written but infinite in SI ('1e308 kW/cm2' is 1e315 W/m²) is refused
 * where units are applied, so no infinite damage threshold or index reaches the physics (an
 * infinite threshold would make every damage margin pass).
 */
class NonFiniteValuesRefusedTest {
  @TempDir Path dir;

  @BeforeEach
  void projectRoot() throws IOException {
    Files.createFile(dir.resolve(".jonquil-root"));
  }

  private CliRun check(String spec) throws IOException {
    Files.writeString(dir.resolve("main.jonq"), spec);
    return CliRun.of(dir, "check", "main.jonq");
  }

  @Test
  void aDamageThresholdThatOverflowsInSiIsOutOfRange() throws IOException {
    CliRun run = check("mirror m {\n  reflectance 99 %\n  damage 1e308 kW/cm2\n}\n");
    assertEquals(1, run.exitCode(), run.out());
    assertTrue(
        run.out()
            .contains(
                "main.jonq:3:10: error: 'damage' of '1e308 kW/cm2' is too large to compute with"
                    + " [J405]"),
        run.out());
  }

  @Test
  void aToleranceThatOverflowsInSiIsOutOfRange() throws IOException {
    CliRun run = check("lens l {\n  focal 100 mm ± 1e308 km\n}\n");
    assertEquals(1, run.exitCode(), run.out());
    assertTrue(
        run.out()
            .contains(
                "main.jonq:2:16: error: the tolerance of 'focal' is too large to compute with"
                    + " [J405]"),
        run.out());
  }

  @Test
  void anInfiniteIndexInATableIsABadRow() throws IOException {
    Files.writeString(dir.resolve("nk.txt"), "500 nm 1.5 0\n600 nm 1e400 0\n");
    CliRun run = check("material glass { table \"nk.txt\" }\n");
    assertEquals(1, run.exitCode(), run.out());
    assertTrue(
        run.out().contains("nk.txt:2:1: error: n and k must be finite numbers [J214]"), run.out());
  }
}
