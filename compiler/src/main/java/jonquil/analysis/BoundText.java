package jonquil.analysis;

import jonquil.resolve.Measure;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Requirement;

/**
 * How a requirement's bound was written: the unit its verdict is shown in (a bound in dB gives a
 * value in dB) and the words of one condition, so a compound requirement can say which failed.
 */
final class BoundText {
  private BoundText() {}

  /**
   * The unit a criterion's value is shown in: 'dB', '%' or 'ppm' as its bound was written, '%' of
   * the MPE for an exposure, otherwise the SI unit.
   */
  static String shownUnit(ResolvedRequirement r, Criterion c, String siUnit) {
    if (c.measure() == Measure.EXPOSURE) {
      return "%";
    }
    if (!siUnit.isEmpty()) {
      return siUnit;
    }
    return written(r, c)
        .filter(u -> u.equals("dB") || u.equals("%") || u.equals("ppm"))
        .orElse(siUnit);
  }

  /** The condition as written: "dop <= 0.5" for a further condition, "is linear 0 deg" else. */
  static String condition(ResolvedRequirement r, Criterion c) {
    Requirement.Check check = r.syntax().check();
    TextRange range = c.range();
    for (Requirement.Extra e : check.extras()) {
      if (e.condition().range().equals(c.range())) {
        range = e.range();
      }
    }
    String text = r.syntax().text();
    int from = range.start() - r.syntax().range().start();
    int to = range.end() - r.syntax().range().start();
    return from >= 0 && to <= text.length() && from <= to
        ? text.substring(from, to).strip()
        : c.measure().word();
  }

  private static java.util.Optional<String> written(ResolvedRequirement r, Criterion c) {
    Requirement.Check check = r.syntax().check();
    java.util.List<Requirement.Condition> all = new java.util.ArrayList<>();
    check.condition().ifPresent(all::add);
    check.extras().forEach(e -> all.add(e.condition()));
    for (Requirement.Condition cond : all) {
      if (!cond.range().equals(c.range())) {
        continue;
      }
      // A state ('is ...') has no unit of its own; both ends of a range share theirs.
      Arg arg =
          cond instanceof Requirement.Compare cmp
              ? cmp.value()
              : cond instanceof Requirement.Within w ? w.low() : null;
      if (arg instanceof Arg.QuantityArg q && q.unit().isPresent()) {
        return java.util.Optional.of(q.unit().get().text());
      }
    }
    return java.util.Optional.empty();
  }
}
