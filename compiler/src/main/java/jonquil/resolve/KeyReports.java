package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.syntax.Name;
import jonquil.syntax.Property;

/**
 * What every block of keys (an element's parameters, the ambient's conditions) reports about a key:
 * one it does not take (J401, with the closest spelling as a fix, else what it takes), one given
 * twice (J402, the first as related), one it refuses (J410, with the reason).
 */
final class KeyReports {
  private KeyReports() {}

  /** J401: "'key' is not {notWhat}", then "did you mean" or the keys the block takes. */
  static void unknown(Sink sink, Name key, String notWhat, List<String> takes) {
    Optional<String> close = Suggest.closest(key.text(), takes);
    sink.report(
        DiagnosticCode.UNKNOWN_PARAMETER,
        key.range(),
        "'"
            + key.text()
            + "' is not "
            + notWhat
            + Suggest.hintOr(close, "; it takes " + ShapeMatcher.quoteList(takes)),
        Resolver.replacement(sink.file, key.range(), key.text(), close));
  }

  /** J402: the key is given again for {@code owner}; the first is related. */
  static void givenTwice(Sink sink, Name key, Name first, String owner) {
    var d =
        sink.report(
            DiagnosticCode.DUPLICATE_PARAMETER,
            key.range(),
            "'" + key.text() + "' is given twice for " + owner + "; keep one");
    sink.replace(d, d.withRelated(new Related(sink.file, first.range(), "first given here")));
  }

  /** J410: a parameter of {@code owner} whose effect Jonquil does not model, and why. */
  static void notModelled(Sink sink, Property p, String owner, String why) {
    sink.report(
        DiagnosticCode.PARAMETER_NOT_MODELLED,
        p.range(),
        "'" + p.key().text() + "' in " + owner + " is not modelled: " + why);
  }
}
