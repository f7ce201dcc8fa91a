package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import org.junit.jupiter.api.Test;

/** A material given as an n,k table is interpolated linearly between its rows. */
class TabulatedMaterialTest {
  @Test
  void aWindowOfTabulatedGlassUsesTheInterpolatedIndex() {
    Path root = Path.of("/virtual/tables").toAbsolutePath();
    Path spec = root.resolve("bench.jonq");
    Path table = root.resolve("glass_nk.txt");
    String specText =
        """
        source s { wavelength 650 nm; power 1 W }
        material glass { table "glass_nk.txt" }
        window w { material glass; thickness 1 mm }
        probe p
        train t { s -> 10 mm -> w -> 10 mm -> p }
        """;
    String tableText = "600 nm 1.50 0\n700 nm 1.60 0\n";
    Result r =
        Checker.check(
            Workspace.withOverlay(root, Map.of(spec, specText, table, tableText)), List.of(spec));
    TrainSolution s = r.solutions().get(spec);
    double air =
        jonquil.optics.material.MaterialCatalog.lookup("air")
            .orElseThrow()
            .absoluteIndex(650e-9)
            .getReal();
    double n = 1.55; // halfway between the rows
    double reflectance =
        Math.pow(
            (n - air) / (n + air),
            2); // Born & Wolf, 7th ed. 1999, §1.5.3, normal incidence (section number from memory)
    assertEquals((1 - reflectance) / (1 + reflectance), s.port("p").orElseThrow().power(), 1e-12);
  }
}
