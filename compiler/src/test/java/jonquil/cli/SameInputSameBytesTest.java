package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.testing.Repo;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Same input, same output, byte for byte: two separate JVMs check the same spec and must print the
 * same JSON. Each run needs its own JVM, because the iteration order of the JDK's immutable maps is
 * salted per JVM start, which an in-process repeat would never show.
 */
class SameInputSameBytesTest {
  @ParameterizedTest
  @ValueSource(strings = {"optical_trap.jonq", "marking_head.jonq", "polarimetry_arm.jonq"})
  void twoRunsOfOneSamplePrintTheSameJson(String sample) throws Exception {
    Path root = Repo.samples();
    List<String> jvm = List.of();
    CliProcess first = CliProcess.run(root, Map.of(), jvm, "check", "--format", "json", sample);
    CliProcess second = CliProcess.run(root, Map.of(), jvm, "check", "--format", "json", sample);
    assertArrayEquals(first.out(), second.out(), "the JSON of two runs differs: " + sample);
  }

  @ParameterizedTest
  @ValueSource(strings = {"", "7"})
  void aDrawnYieldIsTheSameInTwoJvms(String seed) throws Exception {
    Path root = Repo.samples();
    List<String> args =
        seed.isEmpty()
            ? List.of("check", "--format", "json", "optical_trap.jonq")
            : List.of("check", "--format", "json", "--seed", seed, "optical_trap.jonq");
    CliProcess first = CliProcess.run(root, Map.of(), List.of(), args.toArray(String[]::new));
    CliProcess second = CliProcess.run(root, Map.of(), List.of(), args.toArray(String[]::new));
    assertArrayEquals(first.out(), second.out(), "the yield of two runs differs: " + args);
  }
}
