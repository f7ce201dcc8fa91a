package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.syntax.Declaration;

/**
 * The lines that state a fact of the whole bench ('ambient', 'standard'): written once, in the main
 * spec. A second line is reported against the first; a part library may not hold one, since it
 * would decide for every bench that uses it.
 */
final class BenchLines {
  private BenchLines() {}

  /**
   * The first line of kind {@code word}, each later one reported as stated twice.
   *
   * @param what the fact in words ("the ambient is stated", "the safety standard is chosen")
   * @param first how the first line is pointed at ("first stated here")
   */
  static Optional<Declaration> once(
      List<Declaration> declarations, Sink sink, String word, String what, String first) {
    Declaration found = null;
    for (Declaration d : declarations) {
      if (!d.kind().text().equals(word)) {
        continue;
      }
      if (found != null) {
        var diag =
            sink.report(
                DiagnosticCode.DUPLICATE_PARAMETER,
                d.kind().range(),
                what + " twice; keep one '" + word + "' line");
        sink.replace(diag, diag.withRelated(new Related(sink.file, found.range(), first)));
        continue;
      }
      found = d;
    }
    return Optional.ofNullable(found);
  }

  /** Every line of kind {@code word} in a used file is refused, saying where it belongs. */
  static void refuseInLibrary(
      List<Declaration> declarations, Sink sink, String usedBy, String word, String instead) {
    for (Declaration d : declarations) {
      if (d.kind().text().equals(word)) {
        sink.report(
            DiagnosticCode.USED_FILE_HAS_TRAIN,
            d.range(),
            "this file is used as a part library by '"
                + usedBy
                + "', so it may only declare parts; "
                + instead);
      }
    }
  }
}
