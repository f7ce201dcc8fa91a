package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import jonquil.testing.Repo;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Same input, same output, byte for byte, for every sample and every broken-spec corpus file: each
 * is checked twice in one JVM, in each report format, and the two outputs must be equal. This
 * catches what a repeat can show in one process (identity hashes, clocks, unseeded randomness,
 * iteration over unordered sets); SameInputSameBytesTest covers what only a second JVM shows. The
 * samples also run with '--seed' and '--builds', so a drawn yield is covered too.
 */
class EverySpecTwiceSameBytesTest {
  static Stream<Arguments> runs() throws Exception {
    List<Path> specs = Repo.specFiles();
    Stream.Builder<Arguments> out = Stream.builder();
    for (Path spec : specs) {
      Path dir = spec.getParent();
      String name = Repo.root().relativize(spec).toString();
      for (String format : List.of("text", "json", "sarif")) {
        out.add(
            Arguments.of(
                name + " " + format,
                dir,
                new String[] {
                  "check",
                  "--root",
                  dir.toString(),
                  "--format",
                  format,
                  spec.getFileName().toString()
                }));
      }
      if (spec.startsWith(Repo.samples())) {
        out.add(
            Arguments.of(
                name + " json --seed 42 --builds 150",
                dir,
                new String[] {
                  "check",
                  "--root",
                  Repo.samples().toString(),
                  "--format",
                  "json",
                  "--seed",
                  "42",
                  "--builds",
                  "150",
                  spec.getFileName().toString()
                }));
      }
    }
    return out.build();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("runs")
  void twoRunsPrintTheSameBytes(String name, Path cwd, String[] args) {
    CliRun first = CliRun.of(cwd, args);
    CliRun second = CliRun.of(cwd, args);
    assertEquals(first.exitCode(), second.exitCode(), name);
    assertEquals(first.out(), second.out(), name + ": stdout differs between two runs");
    assertEquals(first.err(), second.err(), name + ": stderr differs between two runs");
  }
}
