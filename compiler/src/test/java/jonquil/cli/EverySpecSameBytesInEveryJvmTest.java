package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * Same input, same output, byte for byte, across JVM starts: child JVMs each check every sample and
 * every broken-spec corpus file, as text and as JSON, and must print the same bytes for each. The
 * JDK's immutable maps and sets are salted per JVM start, so iterating one (to list ports, or to
 * add up the powers leaving them) can change an output's order or its last bits from one run to the
 * next; a repeat inside one JVM (EverySpecTwiceSameBytesTest) never shows that. One child checks
 * all files, so the test costs a few JVM starts, not one per file.
 */
class EverySpecSameBytesInEveryJvmTest {
  private static final String HEADER = "\u0000=== ";

  /** The child: every spec in both formats, each run framed by a header naming it. */
  public static void main(String[] args) throws Exception {
    PrintStream out = new PrintStream(System.out, false, StandardCharsets.UTF_8);
    for (Path spec : Repo.specFiles()) {
      Path dir = spec.getParent();
      for (String format : List.of("text", "json")) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        String[] check = {
          "check", "--root", dir.toString(), "--format", format, spec.getFileName().toString()
        };
        int code =
            Commands.run(
                check,
                new PrintStream(o, true, StandardCharsets.UTF_8),
                new PrintStream(e, true, StandardCharsets.UTF_8),
                dir);
        out.print(HEADER + Repo.root().relativize(spec) + " " + format + " exit " + code + "\n");
        out.print(o.toString(StandardCharsets.UTF_8));
        out.print(e.toString(StandardCharsets.UTF_8));
      }
    }
    out.flush();
  }

  /**
   * A salted order comes out one of two ways in a two-entry map, so two JVMs agree by chance half
   * the time; each further JVM halves the chance that an unordered iteration goes unnoticed.
   */
  private static final int JVMS = 3;

  @Test
  void everyJvmPrintsTheSameBytesForEverySpec() throws Exception {
    Map<String, String> first = sections(child());
    assertEquals(2 * Repo.specFiles().size(), first.size(), "one section per spec and format");
    for (int n = 2; n <= JVMS; n++) {
      Map<String, String> other = sections(child());
      List<String> differing = new ArrayList<>();
      first.forEach(
          (name, text) -> {
            if (!text.equals(other.get(name))) {
              differing.add(name);
            }
          });
      assertEquals(List.of(), differing, "JVM " + n + " printed other bytes than JVM 1 for these");
      assertEquals(first.keySet().stream().toList(), other.keySet().stream().toList());
    }
  }

  private static String child() throws Exception {
    List<String> command =
        List.of(
            CliProcess.java(),
            "-Djonquil.repo=" + Repo.root(),
            "-cp",
            System.getProperty("java.class.path"),
            EverySpecSameBytesInEveryJvmTest.class.getName());
    // A shared machine may be slow: the child checks ~150 files, a few with drawn yields.
    CliProcess run = CliProcess.run(Repo.root(), Map.of(), command, 300);
    assertEquals(0, run.exitCode(), "the child failed: " + run.errText());
    return run.outText();
  }

  /** The child's output split at its headers: run name to what that run printed. */
  private static Map<String, String> sections(String all) {
    Map<String, String> out = new LinkedHashMap<>();
    for (String part : all.split(HEADER, -1)) {
      if (part.isEmpty()) {
        continue;
      }
      int eol = part.indexOf('\n');
      out.put(part.substring(0, eol), part.substring(eol + 1));
    }
    return out;
  }
}
