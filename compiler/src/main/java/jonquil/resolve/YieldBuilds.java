package jonquil.resolve;

import java.util.Optional;
import java.util.OptionalInt;
import jonquil.diag.DiagnosticCode;
import jonquil.syntax.Requirement;

/**
 * Checks what a yield line says beyond its bound: 'over N builds' (a whole number of builds, 1 to
 * 100 000) and a one-sided comparison, since no finite number of builds can show a yield equal to a
 * value.
 */
public final class YieldBuilds {
  /** The most builds a line may ask for; the command line's '--builds' has the same limit. */
  public static final int MAX = 100_000;

  private YieldBuilds() {}

  static OptionalInt resolve(Optional<Requirement.Yield> yield, Sink sink) {
    if (yield.isEmpty()) {
      return OptionalInt.empty();
    }
    Requirement.Yield y = yield.get();
    if (y.comparator() == Requirement.Comparator.EQ) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          y.range(),
          "a yield is bounded from one side ('>=', '>', '<=' or '<'): no number of builds can"
              + " show that it equals a value");
    }
    if (y.builds().isEmpty()) {
      return OptionalInt.empty();
    }
    Requirement.Builds b = y.builds().get();
    if (!b.word().text().equals("builds")) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          b.word().range(),
          "after 'over', a yield names its number of builds: 'over "
              + b.count().text()
              + " builds'; got '"
              + b.word().text()
              + "'");
      return OptionalInt.empty();
    }
    double n = b.count().value();
    if (n != Math.rint(n) || n < 1 || n > MAX) {
      sink.report(
          DiagnosticCode.OUT_OF_RANGE,
          b.count().range(),
          "the number of builds must be a whole number from 1 to "
              + MAX
              + "; got '"
              + b.count().text()
              + "'");
      return OptionalInt.empty();
    }
    return OptionalInt.of((int) n);
  }
}
