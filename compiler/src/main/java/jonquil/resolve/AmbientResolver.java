package jonquil.resolve;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
import jonquil.optics.material.CiddorAir;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.units.Dimension;

/**
 * Reads the main spec's {@code ambient air { … }} or {@code ambient vacuum} line into an {@link
 * Ambient}, one condition per line, refusing conditions outside Ciddor's validity (J411).
 */
final class AmbientResolver {
  /** The word that opens an ambient statement; it is not an element kind. */
  static final String WORD = "ambient";

  private static final String TEMPERATURE = "temperature";
  private static final String PRESSURE = "pressure";
  private static final String HUMIDITY = "humidity";
  private static final String CO2 = "co2";
  private static final List<String> CONDITIONS = List.of(TEMPERATURE, PRESSURE, HUMIDITY, CO2);

  private AmbientResolver() {}

  static boolean isAmbient(Declaration d) {
    return d.kind().text().equals(WORD);
  }

  /** The ambient of the root file; its {@code ambient} lines are checked here. */
  static Ambient resolve(List<Declaration> declarations, Sink sink, Scope scope) {
    return BenchLines.once(declarations, sink, WORD, "the ambient is stated", "first stated here")
        .map(d -> one(d, sink, scope))
        .orElse(Ambient.DEFAULT);
  }

  /** An 'ambient' in a used file would set another bench's medium, so it is refused there. */
  static void refuseInLibrary(List<Declaration> declarations, Sink sink, String usedBy) {
    BenchLines.refuseInLibrary(
        declarations, sink, usedBy, WORD, "state the ambient in the main spec");
  }

  private static Ambient one(Declaration d, Sink sink, Scope scope) {
    TextRange at = d.range();
    if (d.shorthand().isPresent()) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          d.name().range(),
          "write 'ambient air', 'ambient air { temperature 22 degC }' or 'ambient vacuum', without"
              + " '='");
      return Ambient.DEFAULT;
    }
    return switch (d.name().text()) {
      case "vacuum" -> {
        for (Property p : d.properties()) {
          sink.report(
              DiagnosticCode.UNKNOWN_PARAMETER,
              p.key().range(),
              "vacuum has no '" + p.key().text() + "'; conditions belong to 'ambient air'");
        }
        yield Ambient.vacuum(at);
      }
      case "air" -> air(d, sink, scope);
      default -> {
        Optional<String> close = Suggest.closest(d.name().text(), List.of("air", "vacuum"));
        sink.report(
            DiagnosticCode.BAD_ARGUMENT,
            d.name().range(),
            "the ambient is 'air' or 'vacuum', not '"
                + d.name().text()
                + "'"
                + Suggest.hintOr(close, ""),
            Resolver.replacement(sink.file, d.name().range(), d.name().text(), close));
        yield Ambient.DEFAULT;
      }
    };
  }

  private static Ambient air(Declaration d, Sink sink, Scope scope) {
    ValueChecker values = new ValueChecker(sink, scope);
    Ambient base = Ambient.DEFAULT;
    Map<String, Double> given = new LinkedHashMap<>();
    Map<String, Property> seen = new LinkedHashMap<>();
    for (Property p : d.properties()) {
      String key = p.key().text();
      if (!CONDITIONS.contains(key)) {
        KeyReports.unknown(sink, p.key(), "a condition of the ambient air", CONDITIONS);
        continue;
      }
      Property earlier = seen.putIfAbsent(key, p);
      if (earlier != null) {
        KeyReports.givenTwice(sink, p.key(), earlier.key(), "the ambient");
        continue;
      }
      if (p.args().stream()
          .anyMatch(a -> a instanceof Arg.QuantityArg q && q.tolerance().isPresent())) {
        sink.report(
            DiagnosticCode.BAD_ARGUMENT,
            p.range(),
            "an ambient condition is one value; a '±' on '" + key + "' would not be used");
        continue;
      }
      values
          .check(shape(key), p.args(), key, p.range())
          .flatMap(g -> slotNumber(g, key))
          .ifPresent(
              v -> {
                if (inRange(key, v, p, sink)) {
                  given.put(key, v);
                }
              });
    }
    return new Ambient(
        Ambient.Fill.AIR,
        given.getOrDefault(TEMPERATURE, base.temperatureKelvin()),
        given.getOrDefault(PRESSURE, base.pressurePascal()),
        given.getOrDefault(HUMIDITY, base.relativeHumidity()),
        given.getOrDefault(CO2, base.co2Fraction()),
        Optional.of(d.range()));
  }

  private static Shape shape(String key) {
    return switch (key) {
      case TEMPERATURE -> Shape.q(key, Dimension.TEMPERATURE, Bounds.ANY, "22 degC");
      case PRESSURE -> Shape.q(key, Dimension.PRESSURE, Bounds.ANY, "101.325 kPa");
      default -> new Shape.Ratio(key, Bounds.ANY);
    };
  }

  private static Optional<Double> slotNumber(Value.Group g, String key) {
    var n = g.number(key);
    return n.isPresent() ? Optional.of(n.getAsDouble()) : Optional.empty();
  }

  /** Ciddor's stated validity (Appl. Opt. 35, 1566 (1996), abstract); J411 outside it. */
  private static boolean inRange(String key, double si, Property p, Sink sink) {
    String problem =
        switch (key) {
          case TEMPERATURE -> {
            double c = si - 273.15;
            yield c >= CiddorAir.MIN_CELSIUS && c <= CiddorAir.MAX_CELSIUS
                ? null
                : "a temperature of " + plain(c) + " °C";
          }
          case PRESSURE ->
              si >= CiddorAir.MIN_PRESSURE && si <= CiddorAir.MAX_PRESSURE
                  ? null
                  : "a pressure of " + plain(si / 1000) + " kPa";
          case HUMIDITY ->
              si >= 0 && si <= 1 ? null : "a relative humidity of " + plain(si * 100) + " %";
          default ->
              si >= 0 && si * 1e6 <= CiddorAir.MAX_CO2_PPM
                  ? null
                  : "a CO₂ content of " + plain(si * 1e6) + " ppm";
        };
    if (problem == null) {
      return true;
    }
    sink.report(
        DiagnosticCode.AMBIENT_OUT_OF_RANGE,
        p.range(),
        problem
            + " is outside the range of Ciddor's air equations (-40 °C to 100 °C, 80 kPa to"
            + " 120 kPa, 0 % to 100 % humidity, 0 to 2000 ppm CO₂); choose a value inside it or"
            + " 'ambient vacuum'");
    return false;
  }

  private static String plain(double v) {
    return new java.math.BigDecimal(v)
        .round(new java.math.MathContext(6))
        .stripTrailingZeros()
        .toPlainString();
  }
}
