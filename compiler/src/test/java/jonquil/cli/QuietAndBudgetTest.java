package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check --quiet} shows what fails the check; {@code --budget} adds each path's budget. */
class QuietAndBudgetTest {
  @TempDir Path dir;

  /** 10 mW through a polarizer at 60° to the light: cos² 60° = ¼ passes (Malus's law). */
  private static final String SPEC =
      """
      source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg }
      polarizer p { axis 60 deg }
      mirror m { reflectance 50 % }
      probe end
      train t { s -> 10 mm -> p -> 10 mm -> m -> 10 mm -> end }
      require {
        power at end >= 2 mW
        power at p >= 1 mW
      }
      """;

  @BeforeEach
  void write() throws IOException {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Files.writeString(dir.resolve("b.jonq"), SPEC);
  }

  private List<String> lines(String... args) {
    return CliRun.of(dir, args).out().lines().toList();
  }

  @Test
  void quietShowsTheFailedRequirementAndTheSummaryOnly() {
    List<String> all = lines("check", "b.jonq");
    List<String> quiet = lines("check", "--quiet", "b.jonq");
    assertTrue(all.stream().anyMatch(l -> l.contains("[J611]")), all.toString());
    assertEquals(2, quiet.size(), quiet.toString());
    assertTrue(quiet.get(0).startsWith("b.jonq:7:3: error: requirement not met"), quiet.get(0));
    // The summary still counts the whole check: quiet hides lines, not findings.
    assertEquals(all.get(all.size() - 1), quiet.get(1));
    assertEquals(1, CliRun.of(dir, "check", "--quiet", "b.jonq").exitCode());
  }

  @Test
  void budgetListsEachElementInTheOrderLightMeetsIt() {
    List<String> out = lines("check", "--budget", "b.jonq");
    int header =
        out.indexOf("power budget, b.jonq, train 't', path from 's' (sources emit 10 mW):");
    assertTrue(header >= 0, String.join("\n", out));
    List<List<String>> rows =
        out.subList(header + 1, header + 6).stream()
            .map(l -> List.of(l.strip().split("\\s{2,}")))
            .toList();
    assertEquals(
        List.of("element", "power in", "power out", "loss", "share of source"), rows.get(0));
    assertEquals(List.of("s", "—", "10 mW", "—", "100.00 %"), rows.get(1));
    // Malus's law, cos² 60° = ¼ (Hecht, Optics, 5th ed. 2017, eq. 8.24, from memory):
    // 10 mW in, 2.5 mW out, 10·log₁₀ 4 = 6.021 dB (definition of the decibel).
    assertEquals(List.of("p", "10 mW", "2.5 mW", "6.021 dB", "25.00 %"), rows.get(2));
    // Half of that reflected (the stated 50 %): 3.010 dB, 12.5 % of the source (definition).
    assertEquals(List.of("m", "2.5 mW", "1.25 mW", "3.010 dB", "12.50 %"), rows.get(3));
    assertEquals(List.of("end", "1.25 mW", "—", "—", "12.50 %"), rows.get(4));
    assertTrue(out.get(out.size() - 1).startsWith("checked 1 file:"), "the summary stays last");
  }

  @Test
  void withoutTheOptionsTheReportIsAsBefore() {
    assertTrue(lines("check", "b.jonq").stream().noneMatch(l -> l.startsWith("power budget")));
  }

  @Test
  void jsonAndSarifRefuseTheTextOptions() {
    for (String format : List.of("json", "sarif")) {
      for (String option : List.of("--quiet", "--budget")) {
        CliRun run = CliRun.of(dir, "check", "--format", format, option, "b.jonq");
        assertEquals(2, run.exitCode(), format + " " + option);
        assertTrue(run.err().contains(option + " shapes the text report"), run.err());
      }
    }
  }
}
