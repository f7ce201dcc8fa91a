package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import jonquil.source.SourceFile;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * The parser tries fast SLL prediction first and falls back to full LL only at a syntax error. That
 * is only sound if the fast path never changes what the user sees: for every sample, every corpus
 * file, every prefix of each sample and seeded mutations, the tree (with its ranges) and the
 * diagnostics equal those of a full-LL-only parse.
 */
class TwoStageParseTest {
  private static void sameBothWays(Path file, String text) {
    SourceFile source = new SourceFile(file, text);
    ParseResult twoStage = SpecParser.parse(source, true);
    ParseResult fullLl = SpecParser.parse(source, false);
    assertEquals(
        fullLl.diagnostics(), twoStage.diagnostics(), () -> "diagnostics differ on:\n" + text);
    assertEquals(fullLl.ast(), twoStage.ast(), () -> "trees differ on:\n" + text);
  }

  @Test
  void everySampleAndCorpusFileParsesToOneTreeEitherWay() throws IOException {
    List<Path> specs = Repo.specFiles();
    assertTrue(specs.size() > 50, "the corpus is missing: " + specs.size() + " files");
    for (Path spec : specs) {
      sameBothWays(spec, Files.readString(spec));
    }
  }

  @Test
  void prefixesAndMutationsOfTheSamplesParseToOneTreeEitherWay() throws IOException {
    for (Path sample : Repo.sampleFiles()) {
      String text = Files.readString(sample);
      for (int end = 0; end <= text.length(); end += 7) {
        sameBothWays(sample, text.substring(0, end));
      }
      SplittableRandom random =
          new SplittableRandom(41 + sample.getFileName().toString().hashCode());
      String alphabet = "{}->.,=\" %/*^\nabz019µ";
      for (int round = 0; round < 200; round++) {
        StringBuilder mutated = new StringBuilder(text);
        int at = random.nextInt(mutated.length() + 1);
        if (random.nextBoolean()) {
          mutated.insert(at, alphabet.charAt(random.nextInt(alphabet.length())));
        } else {
          mutated.delete(at, Math.min(mutated.length(), at + 1 + random.nextInt(8)));
        }
        sameBothWays(sample, mutated.toString());
      }
    }
  }
}
