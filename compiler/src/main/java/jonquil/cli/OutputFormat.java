package jonquil.cli;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** The report formats of {@code jonquil check}, named by the lower-case word users type. */
public enum OutputFormat {
  TEXT,
  JSON,
  SARIF;

  public String word() {
    return name().toLowerCase(Locale.ROOT);
  }

  /** Gives a message that lists the valid words instead of picocli's enum constant names. */
  static final class Converter implements ITypeConverter<OutputFormat> {
    @Override
    public OutputFormat convert(String value) {
      for (OutputFormat f : values()) {
        if (f.word().equals(value)) {
          return f;
        }
      }
      String words =
          Arrays.stream(values()).map(OutputFormat::word).collect(Collectors.joining(", "));
      throw new TypeConversionException(
          "unknown format '" + value + "' (expected one of " + words + ")");
    }
  }
}
