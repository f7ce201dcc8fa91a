package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.source.TextRange;
import jonquil.syntax.Property;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * The stated limits of the parts that stop the beam: a dump's power rating and the damage
 * thresholds of a dump or detector. A limit that the arriving light exceeds is an error on the line
 * that states it, whether or not a requirement asks about it: a rating is a promise of the part.
 */
final class TerminalLimits {
  private TerminalLimits() {}

  static List<Diagnostic> check(ResolvedModel model, TrainSolution solution) {
    List<Diagnostic> out = new ArrayList<>();
    for (ResolvedElement e : model.elements().values()) {
      if (e.kind() != ElementKind.DUMP && e.kind() != ElementKind.DETECTOR) {
        continue;
      }
      Optional<PortValue> in =
          solution
              .incidentAt(e.symbol().name())
              .map(v -> PortInterference.brightest(model, solution, v));
      if (in.isEmpty()) {
        continue;
      }
      String who = e.kind().word() + " '" + e.symbol().name() + "'";
      OptionalDouble rating = e.number(Param.RATING, "power");
      if (rating.isPresent() && in.get().power() > rating.getAsDouble()) {
        out.add(
            at(
                e,
                Param.RATING,
                who
                    + " takes "
                    + QuantityFormat.format(in.get().power(), Dimension.POWER)
                    + ", above its rating of "
                    + QuantityFormat.format(rating.getAsDouble(), Dimension.POWER)));
      }
      OptionalDouble damage = DamageModel.margin(e, in.get(), in.get().wavelength());
      if (damage.isPresent() && damage.getAsDouble() < 1) {
        out.add(
            at(
                e,
                Param.DAMAGE,
                who
                    + " is exposed above its damage threshold (threshold over exposure "
                    + QuantityFormat.format(damage.getAsDouble(), Dimension.DIMENSIONLESS)
                    + ", below 1)"));
      }
    }
    return out;
  }

  /** On the first line stating the limit; on the element's name when none can be found. */
  private static Diagnostic at(ResolvedElement e, Param limit, String message) {
    TextRange range =
        e.symbol().declaration().stream()
            .flatMap(d -> d.properties().stream())
            .filter(p -> p.key().text().equals(limit.word()))
            .map(Property::range)
            .findFirst()
            .orElseGet(() -> e.symbol().nameNode().orElseThrow().range());
    return Diagnostic.of(DiagnosticCode.RATING_EXCEEDED, e.symbol().file(), range, message);
  }
}
