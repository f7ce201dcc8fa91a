package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class ToolVersionTest {
  @Test
  void theReportedVersionIsTheMavenProjectVersion() throws IOException {
    Path pom = Path.of(System.getProperty("jonquil.repo", ".."), "pom.xml");
    Matcher m =
        Pattern.compile("<artifactId>jonquil-parent</artifactId>\\s*<version>([^<]+)</version>")
            .matcher(Files.readString(pom));
    assertTrue(m.find(), "no version in " + pom);
    assertEquals(m.group(1), ToolVersion.current());
  }
}
