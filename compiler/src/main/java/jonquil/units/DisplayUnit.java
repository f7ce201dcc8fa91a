package jonquil.units;

/**
 * A unit QuantityFormat may print, and from what SI magnitude on it is preferred; kept apart from
 * the parser's catalog so that printing and reading check each other in tests.
 *
 * @param from smallest |SI value| for which this unit is chosen from a ladder
 * @param spaced whether a space separates number and symbol ("500 mW" but "22.5°")
 */
record DisplayUnit(String symbol, double factor, double offset, double from, boolean spaced) {
  static DisplayUnit of(String symbol, double factor) {
    return new DisplayUnit(symbol, factor, 0, factor, true);
  }

  static DisplayUnit prefixed(SiPrefix prefix, String symbol, double factor) {
    return of(prefix.symbol() + symbol, prefix.factor() * factor);
  }

  DisplayUnit from(double newFrom) {
    return new DisplayUnit(symbol, factor, offset, newFrom, spaced);
  }

  String render(double si) {
    String number = NumberText.format((si - offset) / factor);
    if (symbol.isEmpty()) {
      return number;
    }
    return number + (spaced ? " " : "") + symbol;
  }
}
