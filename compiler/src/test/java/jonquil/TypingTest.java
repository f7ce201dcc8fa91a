package jonquil;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import jonquil.diag.DiagnosticCode;
import jonquil.testing.Repo;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A file being typed is broken most of the time: every prefix of every sample, every
 * single-character deletion and seeded random mutations must check without an internal failure (the
 * checker turns any exception into J901, which this test forbids).
 */
class TypingTest {
  static Stream<Path> samples() throws IOException {
    return SamplesTest.samples().stream();
  }

  private static void checkText(Path file, String text) {
    Result r =
        Checker.check(Workspace.withOverlay(Repo.samples(), Map.of(file, text)), List.of(file));
    assertTrue(
        r.diagnostics().stream().noneMatch(d -> d.code() == DiagnosticCode.INTERNAL_ERROR),
        () -> "internal failure on:\n" + text);
  }

  @ParameterizedTest
  @MethodSource("samples")
  void everyPrefixChecks(Path sample) throws IOException {
    String text = Files.readString(sample);
    for (int end = 0; end <= text.length(); end += 3) {
      checkText(sample, text.substring(0, end));
    }
  }

  @ParameterizedTest
  @MethodSource("samples")
  void everySingleCharacterDeletionChecks(Path sample) throws IOException {
    String text = Files.readString(sample);
    for (int i = 0; i < text.length(); i += 2) {
      checkText(sample, text.substring(0, i) + text.substring(i + 1));
    }
  }

  @ParameterizedTest
  @MethodSource("samples")
  void randomMutationsCheck(Path sample) throws IOException {
    String text = Files.readString(sample);
    SplittableRandom random = new SplittableRandom(sample.getFileName().toString().hashCode());
    String alphabet = "{}()->.,;=\"±%/*^ \n\r\tabz019µ😀";
    for (int round = 0; round < 300; round++) {
      StringBuilder mutated = new StringBuilder(text);
      for (int edits = 1 + random.nextInt(4); edits > 0; edits--) {
        int at = random.nextInt(mutated.length() + 1);
        switch (random.nextInt(3)) {
          case 0 -> mutated.insert(at, alphabet.charAt(random.nextInt(alphabet.length())));
          case 1 -> mutated.delete(at, Math.min(mutated.length(), at + random.nextInt(12)));
          default -> mutated.insert(at, text, random.nextInt(text.length()), text.length());
        }
      }
      checkText(sample, mutated.toString());
    }
  }
}
