package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import jonquil.testing.Repo;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README is tested: its examples are read from README.md itself, so editing the README re-runs
 * them.
 *
 * <p>A fenced block tagged {@code jonq} is a spec file; its first line, {@code // <path>}, names it
 * relative to the example directory. Every such file is written, exactly as printed, into one
 * directory holding nothing else. A block tagged {@code console} is a recorded run: a line {@code $
 * java -jar lsp/target/jonquil.jar ARGS} is run in that directory and must print exactly the lines
 * that follow it; {@code $ echo $?} is followed by the exit status the run must give. A spec
 * example must be checked by a recorded run, directly or through a {@code use}, and a block that
 * looks like a spec must be tagged {@code jonq}, so no example escapes.
 */
class ReadmeExamplesTest {
  private static final String RUN = "$ java -jar lsp/target/jonquil.jar ";
  private static final Pattern FENCE =
      Pattern.compile("^( *)```(\\w*)\\n(.*?)^\\1```$", Pattern.MULTILINE | Pattern.DOTALL);
  private static final Pattern FILE_LINE = Pattern.compile("^// ([\\w/.-]+\\.jonq)\\b.*");
  private static final Pattern USE = Pattern.compile("(?m)^use \"([^\"]+)\"");
  private static final Pattern SPEC_LIKE =
      Pattern.compile("(?m)^(use \"|source \\w|train \\w|require \\{|material \\w)");

  record Block(String tag, String text) {}

  static List<Block> blocks(String markdown) {
    List<Block> out = new ArrayList<>();
    Matcher m = FENCE.matcher(markdown);
    while (m.find()) {
      String indent = m.group(1);
      String text = m.group(3).replaceAll("(?m)^" + indent, "");
      out.add(new Block(m.group(2), text));
    }
    return out;
  }

  static List<Block> readmeBlocks() throws IOException {
    return blocks(Files.readString(Repo.root().resolve("README.md")));
  }

  /** The spec files the README prints, by the path their first line names, in README order. */
  static Map<String, String> specFiles(List<Block> blocks) {
    Map<String, String> files = new LinkedHashMap<>();
    for (Block b : blocks) {
      if (!b.tag().equals("jonq")) {
        continue;
      }
      Matcher name = FILE_LINE.matcher(b.text().lines().findFirst().orElse(""));
      assertTrue(name.matches(), "a jonq block must start with '// <path>.jonq': " + b.text());
      assertFalse(files.containsKey(name.group(1)), "two README blocks are " + name.group(1));
      files.put(name.group(1), b.text());
    }
    return files;
  }

  @Test
  void everyBlockThatLooksLikeASpecIsTaggedSoItIsChecked() throws IOException {
    for (Block b : readmeBlocks()) {
      if (!b.tag().equals("jonq")) {
        assertFalse(
            SPEC_LIKE.matcher(b.text()).find(),
            "an untagged spec example would not be checked; tag it ```jonq:\n" + b.text());
      }
    }
  }

  @Test
  void everySpecExampleIsCheckedByARecordedRunOrUsedByOne() throws IOException {
    List<Block> blocks = readmeBlocks();
    Map<String, String> files = specFiles(blocks);
    assertTrue(files.size() >= 3, "the tour, its part library and the typo example: " + files);
    List<String> checked = new ArrayList<>();
    for (Block b : blocks) {
      if (b.tag().equals("console")) {
        b.text()
            .lines()
            .filter(l -> l.startsWith(RUN))
            .forEach(l -> checked.addAll(List.of(l.substring(RUN.length()).split(" "))));
      }
    }
    for (String f : List.copyOf(checked)) {
      String text = files.get(f);
      if (text != null) {
        Matcher use = USE.matcher(text);
        while (use.find()) {
          checked.add(Path.of(f).resolveSibling(use.group(1)).normalize().toString());
        }
      }
    }
    for (String f : files.keySet()) {
      assertTrue(checked.contains(f), f + " is printed in the README but never checked");
    }
  }

  @TestFactory
  Stream<DynamicTest> everyRecordedRunPrintsExactlyWhatTheReadmeShows(@TempDir Path dir)
      throws IOException {
    List<Block> blocks = readmeBlocks();
    for (Map.Entry<String, String> f : specFiles(blocks).entrySet()) {
      Path file = dir.resolve(f.getKey());
      Files.createDirectories(file.getParent());
      Files.writeString(file, f.getValue());
    }
    List<DynamicTest> tests = new ArrayList<>();
    for (Block b : blocks) {
      if (b.tag().equals("console") && b.text().startsWith(RUN)) {
        tests.add(recordedRun(dir, b.text()));
      }
    }
    assertTrue(tests.size() >= 2, "the tour's run and the typo example's run");
    return tests.stream();
  }

  private static DynamicTest recordedRun(Path dir, String text) {
    List<String> lines = text.lines().toList();
    String command = lines.get(0).substring(RUN.length());
    int echo = lines.indexOf("$ echo $?");
    assertTrue(echo > 0 && echo == lines.size() - 2, "a recorded run ends with its exit status");
    String printed = String.join("\n", lines.subList(1, echo)) + "\n";
    int status = Integer.parseInt(lines.get(echo + 1));
    return DynamicTest.dynamicTest(
        command,
        () -> {
          CliRun run = CliRun.of(dir, command.split(" "));
          assertEquals(printed, run.out(), "stdout of '" + command + "'");
          assertEquals("", run.err(), "stderr of '" + command + "'");
          assertEquals(status, run.exitCode(), "exit status of '" + command + "'");
        });
  }

  @Test
  void theFenceReaderFindsIndentedBlocksAndTags() {
    List<Block> found =
        blocks("a\n```jonq\n// x.jonq\n```\n  ```lua\n  x = 1\n  ```\n```\nplain\n```\n");
    assertEquals(
        List.of(
            new Block("jonq", "// x.jonq\n"),
            new Block("lua", "x = 1\n"),
            new Block("", "plain\n")),
        found);
  }
}
