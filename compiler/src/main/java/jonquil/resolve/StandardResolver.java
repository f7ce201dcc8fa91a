package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
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
    return BenchLines.once(
            declarations, sink, WORD, "the safety standard is chosen", "first chosen here")
        .flatMap(d -> one(d, sink))
        .orElse(SafetyStandard.DEFAULT);
  }

  /** The standard one line names; empty (reported) when the line is malformed or unknown. */
  private static Optional<SafetyStandard> one(Declaration d, Sink sink) {
    if (d.shorthand().isPresent() || !d.properties().isEmpty()) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          d.range(),
          "write the standard's name alone, e.g. 'standard directive'; the standards are "
              + String.join(", ", SafetyStandard.words()));
      return Optional.empty();
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
    }
    return chosen;
  }

  /** A 'standard' in a used file would choose for another bench, so it is refused there. */
  static void refuseInLibrary(List<Declaration> declarations, Sink sink, String usedBy) {
    BenchLines.refuseInLibrary(
        declarations, sink, usedBy, WORD, "choose the safety standard in the main spec");
  }
}
