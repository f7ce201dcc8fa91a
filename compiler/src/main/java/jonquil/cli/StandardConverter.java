package jonquil.cli;

import jonquil.resolve.SafetyStandard;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code --standard}: a standard's name, or the names there are and the closest. */
final class StandardConverter implements ITypeConverter<SafetyStandard> {
  @Override
  public SafetyStandard convert(String value) {
    return SafetyStandard.byWord(value)
        .orElseThrow(() -> new TypeConversionException(SafetyStandard.unknown(value)));
  }
}
