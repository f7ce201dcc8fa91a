package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import jonquil.testing.Golden;
import jonquil.testing.Repo;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code format/<case>.jonq} formats to exactly {@code format/<case>.formatted}. The case named
 * {@code crlf} is read with CRLF line endings (the repository stores LF) and must come out with
 * CRLF only; the golden holds the same text with LF.
 */
class GoldenFormatTest {
  static Stream<String> cases() throws IOException {
    try (Stream<Path> files = Files.list(dir())) {
      return files
          .map(p -> p.getFileName().toString())
          .filter(n -> n.endsWith(".jonq"))
          .map(n -> n.substring(0, n.length() - ".jonq".length()))
          .sorted()
          .toList()
          .stream();
    }
  }

  private static Path dir() {
    return Repo.testResources().resolve("format");
  }

  @ParameterizedTest
  @MethodSource("cases")
  void formatsToItsGolden(String name) throws IOException {
    String text = Files.readString(dir().resolve(name + ".jonq")).replace("\r\n", "\n");
    boolean crlf = name.equals("crlf");
    if (crlf) {
      text = text.replace("\n", "\r\n");
    }
    String formatted = FormatAssertions.formatsFaithfully(text, name);
    if (crlf) {
      assertTrue(formatted.endsWith("\r\n"), "CRLF input must give CRLF output");
      assertFalse(
          formatted.replace("\r\n", "").contains("\n")
              || formatted.replace("\r\n", "").contains("\r"),
          "every line ending must stay CRLF");
      formatted = formatted.replace("\r\n", "\n");
    }
    Golden.check(dir().resolve(name + ".formatted"), formatted);
  }
}
