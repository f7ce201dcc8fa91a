package jonquil.resolve;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import jonquil.diag.DiagnosticCode;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/** Consistency rules of single kinds that a parameter table cannot express. */
final class KindChecks {
  private KindChecks() {}

  /**
   * Relative mismatch tolerated between average power and pulse energy × repetition rate (rounding
   * in datasheets).
   */
  static final double PULSE_CONSISTENCY = 0.01;

  static void check(
      Sink sink,
      Symbol symbol,
      ElementKind kind,
      Declaration decl,
      Map<String, List<Value.Group>> params,
      Map<String, Property> given) {
    String who = kind.word() + " '" + symbol.name() + "'";
    switch (kind) {
      case SOURCE -> pulses(sink, who, decl, params, given);
      case MATERIAL -> {
        needs(sink, who, decl, given, "k", "index");
        needs(sink, who, decl, given, "ordinary", "extraordinary");
        needs(sink, who, decl, given, "extraordinary", "ordinary");
      }
      case SPLITTER -> {
        if (!given.containsKey("polarizing")) {
          needs(sink, who, decl, given, "reflect_s", "reflect_p");
          needs(sink, who, decl, given, "reflect_p", "reflect_s");
        }
      }
      default -> {}
    }
  }

  private static void needs(
      Sink sink,
      String who,
      Declaration decl,
      Map<String, Property> given,
      String has,
      String needs) {
    if (given.containsKey(has) && !given.containsKey(needs)) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          given.get(has).key().range(),
          "'" + has + "' in " + who + " needs '" + needs + "' as well");
    }
  }

  private static void pulses(
      Sink sink,
      String who,
      Declaration decl,
      Map<String, List<Value.Group>> params,
      Map<String, Property> given) {
    boolean pulsed =
        given.containsKey("pulse_energy")
            || given.containsKey("pulse_duration")
            || given.containsKey("repetition_rate");
    if (!pulsed) {
      return;
    }
    if (!given.containsKey("pulse_duration")) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          decl.name().range(),
          "pulsed " + who + " needs 'pulse_duration'");
    }
    if (given.containsKey("power")
        && !given.containsKey("pulse_energy")
        && !given.containsKey("repetition_rate")) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          given.get("power").key().range(),
          "pulsed "
              + who
              + " gives an average 'power'; add 'repetition_rate' (or 'pulse_energy') to know the"
              + " pulses");
    }
    OptionalDouble p = number(params, "power", "power");
    OptionalDouble e = number(params, "pulse_energy", "energy");
    OptionalDouble f = number(params, "repetition_rate", "rate");
    if (p.isPresent() && e.isPresent() && f.isPresent()) {
      double product = e.getAsDouble() * f.getAsDouble();
      if (Math.abs(product - p.getAsDouble()) > PULSE_CONSISTENCY * p.getAsDouble()) {
        sink.report(
            DiagnosticCode.CONFLICTING_PARAMETERS,
            given.get("power").range(),
            "'power' "
                + QuantityFormat.format(p.getAsDouble(), Dimension.POWER)
                + " disagrees with pulse_energy × repetition_rate = "
                + QuantityFormat.format(product, Dimension.POWER)
                + "; give two of the three, or make them agree");
      }
    }
  }

  private static OptionalDouble number(
      Map<String, List<Value.Group>> params, String param, String slot) {
    List<Value.Group> v = params.get(param);
    return v == null || v.isEmpty() ? OptionalDouble.empty() : v.get(0).number(slot);
  }
}
