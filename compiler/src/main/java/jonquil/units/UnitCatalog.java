package jonquil.units;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The unit symbols Jonquil knows, one place for the parser, the "did you mean" hints and the tests
 * to agree on. Values: SI Brochure 9th ed. (2019) Tables 4 and 8; NIST SP 811 (2008) for °F.
 */
final class UnitCatalog {
  /** How a symbol may be used inside a compound unit. */
  enum Use {
    /** Takes SI prefixes and combines freely ("mW", "W/cm2"). */
    PREFIXABLE,
    /** Combines freely but takes no prefix ("min", "deg"). */
    PLAIN,
    /**
     * Must stand alone: a logarithmic, offset or percentage scale has no meaning inside a product.
     */
    ALONE
  }

  /** A known symbol before any prefix or exponent is applied. */
  record Atom(Unit unit, Use use) {}

  private static final double DEGREE = Math.PI / 180;
  private static final Map<String, Atom> EXACT = new LinkedHashMap<>();

  static {
    // SI base and special-name units that take prefixes (SI Brochure 9th ed., Tables 2 and 4).
    prefixable("m", 1, Dimension.LENGTH);
    prefixable("g", 1e-3, Dimension.MASS);
    prefixable("s", 1, Dimension.TIME);
    prefixable("A", 1, Dimension.CURRENT);
    prefixable("K", 1, Dimension.TEMPERATURE);
    prefixable("W", 1, Dimension.POWER);
    prefixable("J", 1, Dimension.ENERGY);
    prefixable("V", 1, Dimension.VOLTAGE);
    prefixable("Hz", 1, Dimension.FREQUENCY);
    prefixable("Pa", 1, Dimension.PRESSURE);
    prefixable("rad", 1, Dimension.ANGLE);
    // Exact since the 2019 redefinition fixed the elementary charge (SI Brochure 9th ed., Table 8).
    prefixable("eV", 1.602176634e-19, Dimension.ENERGY);

    // Non-SI units accepted for use with the SI (SI Brochure 9th ed., Table 8); no prefixes on
    // these.
    plain("min", 60, Dimension.TIME);
    plain("h", 3600, Dimension.TIME);
    plain("d", 86400, Dimension.TIME);
    plain("deg", DEGREE, Dimension.ANGLE);
    plain("°", DEGREE, Dimension.ANGLE);
    plain("arcmin", DEGREE / 60, Dimension.ANGLE);
    plain("arcsec", DEGREE / 3600, Dimension.ANGLE);
    // Retardance: one wave is one full cycle of phase, 2π rad.
    plain("wave", 2 * Math.PI, Dimension.ANGLE);
    plain("waves", 2 * Math.PI, Dimension.ANGLE);

    alone(Unit.linear("%", 1e-2, Dimension.DIMENSIONLESS));
    alone(Unit.linear("ppm", 1e-6, Dimension.DIMENSIONLESS));
    alone(new Unit("dB", 1, 0, Dimension.DIMENSIONLESS, Scale.DECIBEL));
    alone(new Unit("dBm", 1e-3, 0, Dimension.POWER, Scale.DECIBEL));
    alone(new Unit("OD", 1, 0, Dimension.DIMENSIONLESS, Scale.OPTICAL_DENSITY));
    Unit celsius = new Unit("°C", 1, 273.15, Dimension.TEMPERATURE, Scale.LINEAR);
    alone(celsius);
    alone(new Unit("degC", 1, celsius.offset(), Dimension.TEMPERATURE, Scale.LINEAR));
    // t/°C = (t/°F − 32)/1.8, so T/K = (5/9)·t/°F + 273.15 − 32·5/9.
    Unit fahrenheit =
        new Unit("°F", 5.0 / 9, 273.15 - 32.0 * 5 / 9, Dimension.TEMPERATURE, Scale.LINEAR);
    alone(fahrenheit);
    alone(
        new Unit(
            "degF", fahrenheit.factor(), fahrenheit.offset(), Dimension.TEMPERATURE, Scale.LINEAR));
  }

  /**
   * Hint candidates, commonest first so that ties in edit distance favour what people usually mean.
   */
  private static final List<String> SUGGESTIONS = buildSuggestions();

  private UnitCatalog() {}

  private static void prefixable(String symbol, double factor, Dimension dim) {
    EXACT.put(symbol, new Atom(Unit.linear(symbol, factor, dim), Use.PREFIXABLE));
  }

  private static void plain(String symbol, double factor, Dimension dim) {
    EXACT.put(symbol, new Atom(Unit.linear(symbol, factor, dim), Use.PLAIN));
  }

  private static void alone(Unit unit) {
    EXACT.put(unit.symbol(), new Atom(unit, Use.ALONE));
  }

  /**
   * The atom a symbol names. Exact symbols win over prefix + symbol, so "m" is the metre, "min" the
   * minute and "cd" nothing (the day takes no prefix).
   */
  static Optional<Atom> lookup(String text) {
    Atom exact = EXACT.get(text);
    if (exact != null) {
      return Optional.of(exact);
    }
    for (SiPrefix prefix : SiPrefix.values()) {
      for (String spelling : prefix.spellings()) {
        if (!text.startsWith(spelling)) {
          continue;
        }
        Atom base = EXACT.get(text.substring(spelling.length()));
        if (base != null && base.use() == Use.PREFIXABLE) {
          Unit u = base.unit();
          return Optional.of(
              new Atom(
                  Unit.linear(text, prefix.factor() * u.factor(), u.dimension()), Use.PREFIXABLE));
        }
      }
    }
    return Optional.empty();
  }

  /** The closest known symbol, if one is close enough to be a plausible slip. */
  static Optional<String> suggest(String unknown) {
    int limit =
        unknown.length() <= 1
            ? 1
            : unknown.length() <= 3 ? EditDistance.EDIT : 2 * EditDistance.EDIT;
    String best = null;
    int bestDistance = Integer.MAX_VALUE;
    for (String candidate : SUGGESTIONS) {
      int d = EditDistance.between(unknown, candidate);
      if (d < bestDistance) {
        best = candidate;
        bestDistance = d;
      }
    }
    return bestDistance <= limit ? Optional.ofNullable(best) : Optional.empty();
  }

  /** Every exact symbol (without prefixed forms). */
  static List<String> exactSymbols() {
    return List.copyOf(EXACT.keySet());
  }

  /** Every symbol that takes SI prefixes. */
  static List<String> prefixableSymbols() {
    return EXACT.entrySet().stream()
        .filter(e -> e.getValue().use() == Use.PREFIXABLE)
        .map(Map.Entry::getKey)
        .toList();
  }

  private static List<String> buildSuggestions() {
    List<String> out =
        new ArrayList<>(
            List.of(
                "nm", "µm", "um", "mm", "cm", "m", "km", "W", "mW", "kW", "MW", "J", "mJ", "µJ",
                "uJ", "s", "ns", "ps", "fs", "ms", "Hz", "kHz", "MHz", "GHz", "THz", "rad", "mrad",
                "µrad", "urad", "deg", "K", "dB", "dBm", "OD", "%", "ppm", "wave", "waves", "min",
                "h", "A", "mA", "V", "kV", "g", "kg", "eV"));
    for (String symbol : EXACT.keySet()) {
      if (!out.contains(symbol)) {
        out.add(symbol);
      }
    }
    for (SiPrefix prefix : SiPrefix.values()) {
      for (String base : prefixableSymbols()) {
        for (String spelling : prefix.spellings()) {
          String s = spelling + base;
          if (!out.contains(s)) {
            out.add(s);
          }
        }
      }
    }
    return List.copyOf(out);
  }
}
