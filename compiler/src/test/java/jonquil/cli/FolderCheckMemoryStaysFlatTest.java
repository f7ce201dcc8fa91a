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
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Checking a folder keeps no file's model or solution once its part of the report is put aside, so
 * the memory a check needs does not grow with the number of files. A child JVM with a 32 MB heap
 * checks {@value #FILES} generated specs of sixteen mirrors each: holding every file's model and
 * solved train until the end, as the check once did, needs about 60 kB a file and runs out of heap
 * well before the last one.
 */
class FolderCheckMemoryStaysFlatTest {
  private static final int FILES = 600;
  private static final int MIRRORS = 16;
  private static final List<String> SMALL_HEAP = List.of("-Xmx32m", "-XX:+UseSerialGC");

  @TempDir static Path folder;

  @BeforeAll
  static void manySpecs() throws IOException {
    Files.createFile(folder.resolve(".jonquil-root"));
    Path specs = Files.createDirectory(folder.resolve("specs"));
    for (int i = 0; i < FILES; i++) {
      Files.writeString(specs.resolve(String.format("bench_%04d.jonq", i)), spec(i));
    }
  }

  /** A source steered by many mirrors onto a probe: a large model and solution per file. */
  private static String spec(int i) {
    List<String> lines = new ArrayList<>();
    lines.add("// Generated bench " + i + " (invented).");
    lines.add("source laser {");
    lines.add("  wavelength 1064 nm");
    lines.add("  power 2 W");
    lines.add("  polarization linear 0 deg");
    lines.add("  beam waist 1 mm, m2 1.1");
    lines.add("}");
    List<String> chain = new ArrayList<>();
    for (int k = 0; k < MIRRORS; k++) {
      lines.add("mirror m" + k + " {");
      lines.add("  reflectance 99 %");
      lines.add("  aoi 45 deg");
      lines.add("}");
      chain.add("m" + k);
    }
    lines.add("probe spot");
    lines.add("train bench {");
    lines.add("  laser -> 50 mm -> " + String.join(" -> 20 mm -> ", chain) + " -> 30 mm -> spot");
    lines.add("}");
    lines.add("require {");
    lines.add("  power at spot >= 1 W");
    lines.add("}");
    return String.join("\n", lines) + "\n";
  }

  private static CliProcess check(String... options) throws IOException, InterruptedException {
    List<String> args = new ArrayList<>(List.of("check"));
    args.addAll(List.of(options));
    args.add("specs");
    return CliProcess.run(folder, Map.of(), SMALL_HEAP, args.toArray(String[]::new));
  }

  private static void assertCheckedEveryFile(CliProcess run) {
    assertFalse(run.errText().contains("OutOfMemoryError"), run.errText());
    assertEquals(0, run.exitCode(), run.errText());
  }

  @Test
  void jsonOfManyFilesFitsASmallHeap() throws IOException, InterruptedException {
    CliProcess run = check("--format", "json");
    assertCheckedEveryFile(run);
    String out = run.outText();
    assertTrue(out.contains("\"files\": " + FILES + ","), "the summary counts every file");
    assertTrue(out.contains("specs/bench_" + String.format("%04d", FILES - 1) + ".jonq\""));
  }

  @Test
  void textWithBudgetsOfManyFilesFitsASmallHeap() throws IOException, InterruptedException {
    CliProcess run = check("--budget");
    assertCheckedEveryFile(run);
    String out = run.outText();
    assertTrue(
        out.endsWith(
            "checked "
                + FILES
                + " files: 0 errors, 0 warnings, "
                + FILES
                + " notes; requirements: "
                + FILES
                + " pass, 0 fail, 0 not evaluated\n"),
        out.substring(Math.max(0, out.length() - 300)));
    assertEquals(FILES, out.split("power budget, ", -1).length - 1, "one table per file");
  }
}
