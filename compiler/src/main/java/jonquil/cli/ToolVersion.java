package jonquil.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The tool's version, read from one bundled resource so that --version, JSON and SARIF agree. */
public final class ToolVersion implements IVersionProvider {
  static final String NAME = "jonquil";
  private static final String RESOURCE = "version.properties";

  private static final String CURRENT = load();

  public static String current() {
    return CURRENT;
  }

  @Override
  public String[] getVersion() {
    return new String[] {NAME + " " + CURRENT};
  }

  private static String load() {
    try (InputStream in = ToolVersion.class.getResourceAsStream(RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("missing resource jonquil/cli/" + RESOURCE);
      }
      Properties props = new Properties();
      props.load(in);
      String version = props.getProperty("version", "").trim();
      if (version.isEmpty()) {
        throw new IllegalStateException("no version in jonquil/cli/" + RESOURCE);
      }
      return version;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
