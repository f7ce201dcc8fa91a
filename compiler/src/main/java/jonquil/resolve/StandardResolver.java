package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.syntax.Declaration;

/**
 * Reads the main spec's {@code standard directive} line: which laser-safety standard gates the
 * safety requirements (J417 for a name that is none).
 */
final class StandardResolver {
  /** The word that opens the statement; it is not an element kind. */
  static final String WORD = "standard";

  private StandardResolver() {}

  static boolean isStandard(Declaration d) {
    return d.kind().text().equals(WORD);
  }

  /** The standard the root file chooses, or the default; its lines are checked here. */
  static SafetyStandard resolve(List<Declaration> declarations, Sink sink) {
    SafetyStandard result = SafetyStandard.DEFAULT;
    Declaration first = null;
    for (Declaration d : declarations) {
      if (!isStandard(d)) {
        continue;
      }
      if (first != null) {
        var diag =
            sink.report(
                DiagnosticCode.DUPLICATE_PARAMETER,
                d.kind().range(),
                "the safety standard is chosen twice; keep one 'standard' line");
        sink.replace(
            diag, diag.withRelated(new Related(sink.file, first.range(), "first chosen here")));
        continue;
      }
      first = d;
      if (d.shorthand().isPresent() || !d.properties().isEmpty()) {
        sink.report(
            DiagnosticCode.BAD_ARGUMENT,
            d.range(),
            "write the standard's name alone, e.g. 'standard directive'; the standards are "
                + String.join(", ", SafetyStandard.words()));
        continue;
      }
      String name = d.name().text();
      Optional<SafetyStandard> chosen = SafetyStandard.byWord(name);
      if (chosen.isEmpty()) {
        sink.report(
            DiagnosticCode.UNKNOWN_STANDARD,
            d.name().range(),
            SafetyStandard.unknown(name),
            Resolver.replacement(
                sink.file, d.name().range(), name, Suggest.closest(name, SafetyStandard.words())));
        continue;
      }
      result = chosen.get();
    }
    return result;
  }

  /** A 'standard' in a used file would choose for another bench, so it is refused there. */
  static void refuseInLibrary(List<Declaration> declarations, Sink sink, String usedBy) {
    for (Declaration d : declarations) {
      if (isStandard(d)) {
        sink.report(
            DiagnosticCode.USED_FILE_HAS_TRAIN,
            d.range(),
            "this file is used as a part library by '"
                + usedBy
                + "', so it may only declare parts; choose the safety standard in the main spec");
      }
    }
  }
}
