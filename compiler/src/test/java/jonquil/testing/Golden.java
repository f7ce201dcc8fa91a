package jonquil.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Compares produced text with a golden file. A missing golden is written and the test fails ("new
 * golden created"); {@code -Dgolden.update=true} rewrites all of them, to be reviewed in git diff
 * like code.
 */
public final class Golden {
  private Golden() {}

  public static void check(Path golden, String actual) {
    try {
      boolean update = Boolean.getBoolean("golden.update");
      if (update || !Files.exists(golden)) {
        Files.writeString(golden, actual, StandardCharsets.UTF_8);
        if (!update) {
          fail("new golden created: " + golden + " (review it, then run again)");
        }
        return;
      }
      String expected = Files.readString(golden, StandardCharsets.UTF_8).replace("\r\n", "\n");
      assertEquals(
          expected,
          actual,
          "output differs from " + golden + " (rerun with -Dgolden.update=true to accept)");
    } catch (IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
  }
}
