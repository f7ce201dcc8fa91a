package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * No input file, however malformed, makes the CLI print a stack trace or exit with anything but 0,
 * 1 or 2. Pathological inputs are listed explicitly because random fuzzing alone is known to miss
 * them (deep nesting, huge tokens, control bytes).
 */
class HostileInputTest {
  @TempDir Path dir;

  static Stream<Arguments> inputs() {
    SplittableRandom random = new SplittableRandom(20261201);
    byte[] garbage = new byte[64 * 1024];
    random.nextBytes(garbage);
    return Stream.of(
        Arguments.of("empty", new byte[0]),
        Arguments.of("binary garbage", garbage),
        Arguments.of("NUL bytes", new byte[4096]),
        Arguments.of(
            "10 MB of one token", "a".repeat(10_000_000).getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "3 MB of one identifier",
            ("x" + "a".repeat(3_000_000)).getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "3 MB of opening braces", "{".repeat(3_000_000).getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "10 000 nested braces",
            ("source s " + "{".repeat(10_000) + "}".repeat(10_000))
                .getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "10 000 nested parentheses",
            ("x " + "(".repeat(10_000)).getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "one 1 MiB line",
            ("lens l { focal " + "1".repeat(1 << 20) + " mm }")
                .getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "100 000 arrows",
            ("train t { s" + " -> 1 mm".repeat(100_000) + " }")
                .getBytes(StandardCharsets.US_ASCII)),
        Arguments.of(
            "unterminated block comment",
            "/* never closed\nsource s {".getBytes(StandardCharsets.UTF_8)),
        Arguments.of(
            "unterminated string", "use \"parts.jonq\nsource".getBytes(StandardCharsets.UTF_8)),
        Arguments.of(
            "odd unicode",
            "source 😀 { wavelength 5\u0301 nm\u200b }\ufeff\u202e"
                .getBytes(StandardCharsets.UTF_8)),
        Arguments.of(
            "invalid UTF-8",
            new byte[] {(byte) 0xC3, (byte) 0x28, (byte) 0xFF, 'a', (byte) 0xE2, (byte) 0x82}),
        Arguments.of("use of itself", "use \"input.jonq\"\n".getBytes(StandardCharsets.UTF_8)),
        Arguments.of("use of a directory", "use \".\"\n".getBytes(StandardCharsets.UTF_8)));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("inputs")
  void exitsZeroOneOrTwoWithoutAStackTrace(String name, byte[] content) throws IOException {
    Path file = dir.resolve("input.jonq");
    Files.write(file, content);
    for (String format : new String[] {"text", "json", "sarif"}) {
      CliRun run =
          CliRun.of(dir, "check", "--root", dir.toString(), "--format", format, "input.jonq");
      assertTrue(run.exitCode() >= 0 && run.exitCode() <= 2, name + ": exit " + run.exitCode());
      assertFalse(
          run.err().contains("Exception") || run.err().contains("\tat "), name + ": " + run.err());
      assertFalse(
          run.out().contains("Exception") || run.out().contains("\tat "),
          name + " printed a trace");
      assertFalse(
          run.out().contains("[J901]")
              || run.out().contains("\"ruleId\": \"J901\"")
              || run.out().contains("\"code\": \"J901\"")
              || run.err().contains("internal error"),
          name + ": internal failure\n" + run.out());
    }
  }
}
