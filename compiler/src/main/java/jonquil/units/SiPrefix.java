package jonquil.units;

import java.util.List;

/**
 * The decimal SI prefixes (SI Brochure 9th ed., Table 7, plus ronna/quetta/ronto/quecto of the 27th
 * CGPM, 2022), with the spellings people type for micro.
 */
enum SiPrefix {
  QUETTA(1e30, "Q"),
  RONNA(1e27, "R"),
  YOTTA(1e24, "Y"),
  ZETTA(1e21, "Z"),
  EXA(1e18, "E"),
  PETA(1e15, "P"),
  TERA(1e12, "T"),
  GIGA(1e9, "G"),
  MEGA(1e6, "M"),
  KILO(1e3, "k"),
  HECTO(1e2, "h"),
  DECA(1e1, "da"),
  DECI(1e-1, "d"),
  CENTI(1e-2, "c"),
  MILLI(1e-3, "m"),
  // µ (U+00B5) is what keyboards produce; μ (U+03BC) is the Greek letter; "u" is the ASCII
  // stand-in.
  MICRO(1e-6, "µ", "μ", "u"),
  NANO(1e-9, "n"),
  PICO(1e-12, "p"),
  FEMTO(1e-15, "f"),
  ATTO(1e-18, "a"),
  ZEPTO(1e-21, "z"),
  YOCTO(1e-24, "y"),
  RONTO(1e-27, "r"),
  QUECTO(1e-30, "q");

  private final double factor;
  private final List<String> spellings;

  SiPrefix(double factor, String... spellings) {
    this.factor = factor;
    this.spellings = List.of(spellings);
  }

  double factor() {
    return factor;
  }

  /** The symbol used when printing. */
  String symbol() {
    return spellings.get(0);
  }

  List<String> spellings() {
    return spellings;
  }
}
