package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import jonquil.source.SourceFile;
import jonquil.syntax.SpecParser;
import org.junit.jupiter.api.Test;

/**
 * A result carries the syntax tree the check built for every spec file it read, so editor answers
 * never parse again: each tree is the one a fresh parse gives, and data files have none.
 */
class ResultTreesTest {
  @Test
  void everySpecFileReadHasTheTreeAFreshParseGives() throws IOException {
    for (Path sample : SamplesTest.samples()) {
      Result r = SamplesTest.check(sample);
      assertFalse(r.trees().isEmpty(), sample.toString());
      for (var e : r.files().entrySet()) {
        Path file = e.getKey();
        SourceFile source = e.getValue();
        if (file.getFileName().toString().endsWith(".jonq")) {
          assertEquals(SpecParser.parse(source).ast(), r.trees().get(file), file.toString());
        } else {
          assertFalse(r.trees().containsKey(file), "a data file is not a spec: " + file);
        }
      }
      assertTrue(r.files().keySet().containsAll(r.trees().keySet()), sample.toString());
    }
  }
}
