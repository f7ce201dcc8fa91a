package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every sample and every well-formed corpus spec formats without losing a token, a comment or
 * meaning, and stays put.
 */
class FormatterCorpusTest {
  static Stream<Path> specs() {
    return FormatCorpus.wellFormedSpecs().stream();
  }

  @Test
  void theCorpusIsLargeAndHoldsEverySample() throws Exception {
    List<Path> specs = FormatCorpus.wellFormedSpecs();
    assertTrue(specs.containsAll(Repo.sampleFiles()), "a sample has syntax errors");
    assertTrue(specs.size() >= 60, "only " + specs.size() + " well-formed specs");
  }

  @ParameterizedTest
  @MethodSource("specs")
  void formatsFaithfullyAndIdempotently(Path file) {
    FormatAssertions.formatsFaithfully(
        FormatCorpus.source(file).text(), Repo.root().relativize(file).toString());
  }

  @ParameterizedTest
  @MethodSource("specs")
  void theFormattersLexerFindsTheSameCommentsAsTheParser(Path file) {
    String text = FormatCorpus.source(file).text();
    List<String> lexed =
        WrittenToken.of(text).stream()
            .filter(WrittenToken::isComment)
            .map(WrittenToken::text)
            .toList();
    assertEquals(FormatCorpus.comments(text), lexed);
  }
}
