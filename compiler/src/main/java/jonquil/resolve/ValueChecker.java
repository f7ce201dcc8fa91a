package jonquil.resolve;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Predicate;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;
import jonquil.units.Scale;
import jonquil.units.Unit;
import jonquil.units.UnitParse;
import jonquil.units.UnitParser;

/**
 * Turns matched arguments into checked SI values: units parsed and dimension-checked, physical
 * ranges enforced, names resolved. Every problem becomes a diagnostic at the literal that caused
 * it; the value is then left out and checking goes on.
 */
final class ValueChecker {
  private final Sink sink;
  private final Scope scope;

  ValueChecker(Sink sink, Scope scope) {
    this.sink = sink;
    this.scope = scope;
  }

  /**
   * Match {@code args} against {@code shape} and check every bound value; empty if the form is
   * wrong.
   */
  Optional<Value.Group> check(Shape shape, List<Arg> args, String what, TextRange whole) {
    ShapeMatcher.Outcome outcome = ShapeMatcher.match(shape, args);
    if (!outcome.matched()) {
      reportMismatch(outcome, args, what, whole);
      return Optional.empty();
    }
    // Slots in the order they are written: a model's maps iterate in source order.
    Map<String, Value> slots = new LinkedHashMap<>();
    Map<Integer, Map<String, Value>> items = new java.util.TreeMap<>();
    String clause = null;
    for (ShapeMatcher.Binding b : outcome.bindings()) {
      if (b.leaf() instanceof Shape.Literal l) {
        clause = l.word();
      }
      String slotName = slotOf(b.leaf());
      // Inside a keyed clause ('beam waist 1 mm, m2 1.1') name the clause: "'m2' in 'beam'".
      String label = clause != null && clause.equals(slotName) ? slotName + "' in '" + what : what;
      Optional<Value> v = value(b.leaf(), b.arg(), label);
      if (v.isEmpty()) {
        continue;
      }
      String slot = slotOf(b.leaf());
      if (slot == null) {
        continue;
      }
      if (b.item() >= 0) {
        items.computeIfAbsent(b.item(), k -> new LinkedHashMap<>()).put(slot, v.get());
      } else {
        slots.put(slot, v.get());
      }
    }
    List<Value.Group> itemGroups =
        items.values().stream().map(m -> new Value.Group(m, List.of(), whole)).toList();
    return Optional.of(new Value.Group(slots, itemGroups, whole));
  }

  private void reportMismatch(
      ShapeMatcher.Outcome outcome, List<Arg> args, String what, TextRange whole) {
    String expected = ShapeMatcher.quoteFree(outcome.expected());
    if (outcome.failedArg() == null) {
      if (args.isEmpty()) {
        sink.report(DiagnosticCode.MISSING_ARGUMENT, whole, "'" + what + "' needs " + expected);
      } else {
        Arg last = args.get(args.size() - 1);
        sink.report(
            DiagnosticCode.MISSING_ARGUMENT,
            last.range(),
            "'" + what + "' is incomplete: expected " + expected + " after " + describeArg(last));
      }
      return;
    }
    Arg bad = outcome.failedArg();
    String hint = "";
    if (bad instanceof Arg.RefArg ref) {
      List<String> words =
          outcome.expected().stream()
              .flatMap(
                  e -> java.util.Arrays.stream(e.split("'")).filter(x -> x.matches("[a-z_0-9]+")))
              .toList();
      hint = Suggest.hint(ref.name().text(), words);
    }
    String found = describeArg(bad);
    if (expected.equals("nothing more")) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          TextRange.span(bad.range(), args.get(args.size() - 1).range()),
          "unexpected " + found + ": '" + what + "' takes no more values here");
    } else {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          bad.range(),
          "expected " + expected + " in '" + what + "', found " + found + hint);
    }
  }

  static String describeArg(Arg a) {
    if (a instanceof Arg.RefArg r) {
      return "'" + r.text() + "'";
    }
    if (a instanceof Arg.QuantityArg q) {
      return "'" + written(q) + "'";
    }
    if (a instanceof Arg.StringArg) {
      return "a quoted string";
    }
    if (a instanceof Arg.CommaArg) {
      return "','";
    }
    return "a range";
  }

  /** The slot a leaf fills in its value group; null for words and commas that fill none. */
  static String slotOf(Shape leaf) {
    if (leaf instanceof Shape.Quantity q) {
      return q.slot();
    } else if (leaf instanceof Shape.Ratio r) {
      return r.slot();
    } else if (leaf instanceof Shape.PowerRatio r) {
      return r.slot();
    } else if (leaf instanceof Shape.Count c) {
      return c.slot();
    } else if (leaf instanceof Shape.Density d) {
      return d.slot();
    } else if (leaf instanceof Shape.Span s) {
      return s.low().slot() + ".." + s.high().slot();
    } else if (leaf instanceof Shape.Word w) {
      return w.slot();
    } else if (leaf instanceof Shape.Reference r) {
      return r.slot();
    } else if (leaf instanceof Shape.Text t) {
      return t.slot();
    }
    return null;
  }

  private Optional<Value> value(Shape leaf, Arg arg, String what) {
    if (leaf instanceof Shape.Quantity q) {
      return quantity((Arg.QuantityArg) arg, q, what).map(v -> v);
    } else if (leaf instanceof Shape.Ratio r) {
      return ratio((Arg.QuantityArg) arg, r.bounds(), what).map(v -> v);
    } else if (leaf instanceof Shape.PowerRatio r) {
      return powerRatio((Arg.QuantityArg) arg, r.bounds(), what).map(v -> v);
    } else if (leaf instanceof Shape.Count c) {
      return count((Arg.QuantityArg) arg, c, what).map(v -> v);
    } else if (leaf instanceof Shape.Density) {
      return density((Arg.QuantityArg) arg, what).map(v -> v);
    } else if (leaf instanceof Shape.Span s) {
      return span((Arg.RangeArg) arg, s, what);
    } else if (leaf instanceof Shape.Word) {
      Arg.RefArg ref = (Arg.RefArg) arg;
      return Optional.of(new Value.Word(ref.name().text(), ref.range()));
    } else if (leaf instanceof Shape.Reference r) {
      return reference((Arg.RefArg) arg, r.categories(), what).map(v -> v);
    } else if (leaf instanceof Shape.Text) {
      Arg.StringArg s = (Arg.StringArg) arg;
      return Optional.of(new Value.Text(s.value(), s.range()));
    }
    return Optional.empty();
  }

  private Optional<Value> span(Arg.RangeArg arg, Shape.Span s, String what) {
    Optional<Value.Num> low = quantity((Arg.QuantityArg) arg.low(), s.low(), what);
    Optional<Value.Num> high = quantity((Arg.QuantityArg) arg.high(), s.high(), what);
    if (low.isEmpty() || high.isEmpty()) {
      return Optional.empty();
    }
    if (low.get().si() > high.get().si()) {
      sink.report(
          DiagnosticCode.INVERTED_RANGE,
          arg.range(),
          "the range in '" + what + "' runs backwards: its low end is above its high end");
      return Optional.empty();
    }
    // A build draws each end within its '±': they must not be able to cross.
    if (low.get().si() + low.get().tolerance().orElse(0)
        > high.get().si() - high.get().tolerance().orElse(0)) {
      sink.report(
          DiagnosticCode.INVERTED_RANGE,
          arg.range(),
          "within their tolerances the ends of the range in '"
              + what
              + "' can cross; narrow the tolerances");
      return Optional.empty();
    }
    // Not Map.of: its order is salted per JVM start, and the model's maps iterate as written.
    Map<String, Value> ends = new LinkedHashMap<>();
    ends.put("low", low.get());
    ends.put("high", high.get());
    return Optional.of(new Value.Group(ends, List.of(), arg.range()));
  }

  private Optional<Value.Num> quantity(Arg.QuantityArg a, Shape.Quantity q, String what) {
    return quantity(a, q.dimensions(), q.bounds(), q.example(), what);
  }

  /** A dimensioned quantity, converted to SI and checked against its bounds. */
  Optional<Value.Num> quantity(
      Arg.QuantityArg a, List<Dimension> dims, Bounds bounds, String example, String what) {
    Optional<Unit> unit = unitOf(a);
    if (unit == null) {
      return Optional.empty();
    }
    double si;
    Dimension dim;
    if (unit.isEmpty()) {
      if (!dims.contains(Dimension.DIMENSIONLESS)) {
        sink.report(
            DiagnosticCode.MISSING_UNIT,
            a.range(),
            "'"
                + a.number().text()
                + "' needs a unit: '"
                + what
                + "' is "
                + ShapeMatcher.describeDimensions(dims)
                + ", e.g. '"
                + example
                + "'",
            exampleUnitFix(a, example));
        return Optional.empty();
      }
      si = a.number().value();
      dim = Dimension.DIMENSIONLESS;
    } else {
      Unit u = unit.get();
      if (!dims.contains(u.dimension())) {
        sink.report(
            DiagnosticCode.WRONG_DIMENSION,
            a.unit().get().range(),
            "'"
                + a.unit().get().text()
                + "' is a unit of "
                + u.dimension().describe()
                + ", but '"
                + what
                + "' is "
                + ShapeMatcher.describeDimensions(dims)
                + ", e.g. '"
                + example
                + "'");
        return Optional.empty();
      }
      si = u.toSi(a.number().value());
      dim = u.dimension();
    }
    if (!Double.isFinite(si)) {
      // Finite as written but not in SI ('1e308 kW'); bounds open to infinity would let it pass.
      return outOfRange(a, "'" + what + "' of '" + written(a) + "' is too large to compute with");
    }
    if (!bounds.contains(si)) {
      if (bounds.equals(KindTables.WAVELENGTH)) {
        sink.report(
            DiagnosticCode.UNSUPPORTED_WAVELENGTH,
            a.range(),
            "Jonquil models wavelengths from "
                + QuantityFormat.format(bounds.min(), dim)
                + " to "
                + QuantityFormat.format(bounds.max(), dim)
                + "; '"
                + written(a)
                + "' is outside that range");
      } else {
        sink.report(
            DiagnosticCode.OUT_OF_RANGE,
            a.range(),
            "'" + what + "' must be " + describe(bounds, dim) + "; got '" + written(a) + "'");
      }
      return Optional.empty();
    }
    OptionalDouble tolerance =
        inRange(
            a,
            tolerance(a, unit.orElse(null), si, dim, !dim.isDimensionless(), what),
            si,
            bounds,
            x -> QuantityFormat.format(x, dim),
            describe(bounds, dim),
            what);
    return Optional.of(new Value.Num(si, dim, tolerance, a.range()));
  }

  /**
   * The ± half-width in SI. A '%' tolerance is a share of the value when {@code percentOfValue}
   * ('100 mm ± 1 %', 'index 1.5 ± 0.1 %'); on a fraction written in percent it is percentage points
   * ('99 % ± 1 %').
   */
  private OptionalDouble tolerance(
      Arg.QuantityArg a,
      Unit valueUnit,
      double si,
      Dimension dim,
      boolean percentOfValue,
      String what) {
    if (a.tolerance().isEmpty()) {
      return OptionalDouble.empty();
    }
    Arg.Tolerance t = a.tolerance().get();
    double halfWidth;
    if (t.unit().isEmpty()) {
      halfWidth = Math.abs(t.number().value()) * (valueUnit == null ? 1 : valueUnit.factor());
    } else {
      UnitParse parsed = UnitParser.parse(t.unit().get().text());
      if (parsed instanceof UnitParse.Failure f) {
        sink.report(DiagnosticCode.UNKNOWN_UNIT, t.unit().get().range(), f.message());
        return OptionalDouble.empty();
      }
      Unit u = ((UnitParse.Ok) parsed).unit();
      if (u.symbol().equals("%") && percentOfValue) {
        halfWidth = Math.abs(si) * t.number().value() / 100;
      } else if (!u.dimension().equals(dim) || u.scale() != Scale.LINEAR) {
        sink.report(
            DiagnosticCode.TOLERANCE_MISMATCH,
            t.unit().get().range(),
            "the tolerance of '"
                + what
                + "' is in '"
                + t.unit().get().text()
                + "', which does not fit a value of "
                + dim.describe()
                + "; use the value's unit or '%'");
        return OptionalDouble.empty();
      } else {
        halfWidth = Math.abs(t.number().value()) * u.factor();
      }
    }
    if (t.number().value() < 0) {
      sink.report(
          DiagnosticCode.OUT_OF_RANGE,
          t.range(),
          "a tolerance is a ± half-width and cannot be negative");
      return OptionalDouble.empty();
    }
    if (!Double.isFinite(halfWidth)) {
      sink.report(
          DiagnosticCode.OUT_OF_RANGE,
          t.range(),
          "the tolerance of '" + what + "' is too large to compute with");
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(halfWidth);
  }

  /**
   * Keeps a tolerance only when every build it allows is physically possible: a Monte Carlo build
   * draws anywhere within '±', so a tolerance that crosses the value's range is refused at its line
   * rather than clipped (clipping would pile builds up on the edge without saying so).
   */
  private OptionalDouble inRange(
      Arg.QuantityArg a,
      OptionalDouble half,
      double si,
      Bounds bounds,
      java.util.function.DoubleFunction<String> shown,
      String allowed,
      String what) {
    if (half.isEmpty()) {
      return half;
    }
    double low = si - half.getAsDouble();
    double high = si + half.getAsDouble();
    boolean throughZero = bounds.nonZero() && low <= 0 && high >= 0;
    if (bounds.contains(low) && bounds.contains(high) && !throughZero) {
      return half;
    }
    double reached = throughZero ? 0 : bounds.contains(low) ? high : low;
    sink.report(
        DiagnosticCode.OUT_OF_RANGE,
        a.tolerance().get().range(),
        "'"
            + what
            + "' reaches "
            + shown.apply(reached)
            + " within its tolerance, but must be "
            + allowed
            + "; every build a tolerance allows must be possible, so narrow the tolerance or"
            + " move the value");
    return OptionalDouble.empty();
  }

  /** A fraction: '95 %', '200 ppm' or a plain number from 0 to 1. */
  Optional<Value.Num> ratio(Arg.QuantityArg a, Bounds bounds, String what) {
    OptionalDouble plain =
        plainSi(
            a,
            u -> u.dimension().isDimensionless() && u.scale() == Scale.LINEAR,
            what,
            "a fraction, written like '95 %'");
    if (plain.isEmpty()) {
      return Optional.empty();
    }
    double si = plain.getAsDouble();
    if (a.unit().isEmpty() && !bounds.contains(si) && bounds.contains(si / 100)) {
      TextRange at = new TextRange(a.number().range().end(), a.number().range().end());
      sink.report(
          DiagnosticCode.OUT_OF_RANGE,
          a.range(),
          "'" + what + "' is a fraction from 0 to 1; did you mean '" + a.number().text() + " %'?",
          new Fix("write '" + a.number().text() + " %'", List.of(new Edit(sink.file, at, " %"))));
      return Optional.empty();
    }
    String allowed =
        Double.isFinite(bounds.max())
            ? "between " + percent(bounds.min()) + " and " + percent(bounds.max())
            : "zero or more";
    if (!bounds.contains(si)) {
      return outOfRange(a, "'" + what + "' must be " + allowed + "; got '" + written(a) + "'");
    }
    // Known here: an unknown unit was reported by plainSi, which then gave no value.
    Optional<Unit> unit = a.unit().isEmpty() ? Optional.empty() : unitOf(a);
    OptionalDouble tolerance =
        tolerance(a, unit.orElse(null), si, Dimension.DIMENSIONLESS, false, what);
    tolerance = inRange(a, tolerance, si, bounds, ValueChecker::percent, allowed, what);
    return Optional.of(new Value.Num(si, Dimension.DIMENSIONLESS, tolerance, a.range()));
  }

  /**
   * The number of {@code a} in SI: as written without a unit, converted with a unit that {@code
   * fits}; empty (reported) when its unit is unknown or does not fit the form {@code what} takes.
   */
  private OptionalDouble plainSi(
      Arg.QuantityArg a, Predicate<Unit> fits, String what, String form) {
    Optional<Unit> unit = unitOf(a);
    if (unit == null) {
      return OptionalDouble.empty();
    }
    if (unit.isEmpty()) {
      return OptionalDouble.of(a.number().value());
    }
    if (!fits.test(unit.get())) {
      sink.report(
          DiagnosticCode.WRONG_DIMENSION,
          a.unit().get().range(),
          "'" + what + "' is " + form + "; '" + a.unit().get().text() + "' does not fit");
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(unit.get().toSi(a.number().value()));
  }

  /** A power ratio: plain (1000) or in dB (30 dB). */
  Optional<Value.Num> powerRatio(Arg.QuantityArg a, Bounds bounds, String what) {
    OptionalDouble si =
        plainSi(
            a,
            u -> u.scale() == Scale.DECIBEL,
            what,
            "a ratio, written as a plain number ('1000') or in decibels ('30 dB')");
    return si.isEmpty() ? Optional.empty() : plainNumberWithin(a, si.getAsDouble(), bounds, what);
  }

  /**
   * The tolerance of a plain number (a count, an index, M², a ratio, a density), within its range.
   * In decibels a '±' would not be symmetric about the ratio it bounds, so it is refused.
   */
  private OptionalDouble plainTolerance(Arg.QuantityArg a, double si, Bounds bounds, String what) {
    if (a.tolerance().isEmpty()) {
      return OptionalDouble.empty();
    }
    if (a.unit().isPresent()) {
      sink.report(
          DiagnosticCode.TOLERANCE_MISMATCH,
          a.tolerance().get().range(),
          "a tolerance on '"
              + what
              + "' in '"
              + a.unit().get().text()
              + "' is not symmetric about its ratio; write the ratio as a plain number"
              + " ('1000 ± 100')");
      return OptionalDouble.empty();
    }
    return inRange(
        a,
        tolerance(a, null, si, Dimension.DIMENSIONLESS, true, what),
        si,
        bounds,
        x -> QuantityFormat.format(x, Dimension.DIMENSIONLESS),
        describe(bounds, Dimension.DIMENSIONLESS),
        what);
  }

  private Optional<Value.Num> count(Arg.QuantityArg a, Shape.Count c, String what) {
    if (a.unit().isPresent()) {
      sink.report(
          DiagnosticCode.UNEXPECTED_UNIT,
          a.unit().get().range(),
          "'" + what + "' is a plain number; remove the unit '" + a.unit().get().text() + "'");
      return Optional.empty();
    }
    double v = a.number().value();
    if (c.integer() && v != Math.rint(v)) {
      return outOfRange(a, "'" + what + "' must be a whole number; got '" + written(a) + "'");
    }
    if (c.integer() && a.tolerance().isPresent()) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          a.tolerance().get().range(),
          "'" + what + "' is a whole number and takes no tolerance");
      return Optional.empty();
    }
    return plainNumberWithin(a, v, c.bounds(), what);
  }

  private Optional<Value.Num> density(Arg.QuantityArg a, String what) {
    if (a.unit().isPresent() && !a.unit().get().text().equals("OD")) {
      sink.report(
          DiagnosticCode.WRONG_DIMENSION,
          a.unit().get().range(),
          "'"
              + what
              + "' is an optical density, written 'OD 3' or '3'; '"
              + a.unit().get().text()
              + "' does not fit");
      return Optional.empty();
    }
    if (a.number().value() < 0) {
      return outOfRange(a, "an optical density cannot be negative; got '" + written(a) + "'");
    }
    return plainNumber(a, a.number().value(), Bounds.NON_NEGATIVE, what);
  }

  /** A plain number checked against its bounds. */
  private Optional<Value.Num> plainNumberWithin(
      Arg.QuantityArg a, double v, Bounds bounds, String what) {
    if (!bounds.contains(v)) {
      return outOfRange(
          a,
          "'"
              + what
              + "' must be "
              + describe(bounds, Dimension.DIMENSIONLESS)
              + "; got '"
              + written(a)
              + "'");
    }
    return plainNumber(a, v, bounds, what);
  }

  /** A plain number already within its bounds, with its tolerance. */
  private Optional<Value.Num> plainNumber(Arg.QuantityArg a, double v, Bounds bounds, String what) {
    return Optional.of(
        new Value.Num(v, Dimension.DIMENSIONLESS, plainTolerance(a, v, bounds, what), a.range()));
  }

  /** Reports {@code a} as out of range; there is no value. */
  private <T> Optional<T> outOfRange(Arg.QuantityArg a, String message) {
    sink.report(DiagnosticCode.OUT_OF_RANGE, a.range(), message);
    return Optional.empty();
  }

  /** Resolves a name to a declaration or catalog entry of an allowed category. */
  Optional<Value.Ref> reference(Arg.RefArg ref, List<Category> categories, String what) {
    String name = ref.name().text();
    Optional<Symbol> found = scope.lookup(name);
    if (found.isEmpty() && categories.contains(Category.MATERIAL)) {
      found = CatalogSpellings.lookup(name).map(e -> Symbol.catalog(e.name()));
    }
    if (found.isEmpty() && categories.contains(Category.MATERIAL)) {
      List<String> catalog =
          CatalogSpellings.entries().stream()
              .filter(
                  e ->
                      !what.equals("metal")
                          || e.materialClass() == CatalogSpellings.MaterialClass.METAL)
              .map(CatalogSpellings.Entry::name)
              .toList();
      Optional<String> close = Suggest.closest(name, scope.namesOf(categories));
      sink.report(
          DiagnosticCode.UNKNOWN_CATALOG_MATERIAL,
          ref.range(),
          "'"
              + name
              + "' is neither a declared material nor in the material catalog"
              + Suggest.hintOr(close, "; the catalog has " + String.join(", ", catalog)),
          Resolver.replacement(sink.file, ref.name().range(), name, close));
      return Optional.empty();
    }
    if (found.isEmpty()) {
      sink.report(
          DiagnosticCode.UNDEFINED_NAME,
          ref.range(),
          "unknown name '"
              + name
              + "' in '"
              + what
              + "'"
              + Suggest.hint(name, scope.namesOf(categories)),
          Resolver.replacement(
              sink.file,
              ref.name().range(),
              name,
              Suggest.closest(name, scope.namesOf(categories))));
      return Optional.empty();
    }
    Symbol s = found.get();
    if (!categories.contains(s.category())) {
      sink.report(
          DiagnosticCode.WRONG_KIND,
          ref.range(),
          "'"
              + name
              + "' is "
              + s.describe()
              + ", but '"
              + what
              + "' needs the name of "
              + String.join(" or ", categories.stream().map(Category::phrase).toList()));
      return Optional.empty();
    }
    if (what.equals("metal")
        && s.isCatalog()
        && CatalogSpellings.lookup(s.name())
            .map(e -> e.materialClass() != CatalogSpellings.MaterialClass.METAL)
            .orElse(false)) {
      sink.report(
          DiagnosticCode.WRONG_KIND,
          ref.range(),
          "'"
              + name
              + "' is not a metal; the catalog metals are "
              + String.join(
                  ", ",
                  CatalogSpellings.entries().stream()
                      .filter(e -> e.materialClass() == CatalogSpellings.MaterialClass.METAL)
                      .map(CatalogSpellings.Entry::name)
                      .toList()));
      return Optional.empty();
    }
    sink.refs.add(new ResolvedRef(sink.file, ref.name().range(), s));
    return Optional.of(new Value.Ref(s, ref.range()));
  }

  /**
   * The literal's unit: empty when none was written, null when it is unknown (already reported).
   */
  private Optional<Unit> unitOf(Arg.QuantityArg a) {
    if (a.unit().isEmpty()) {
      return Optional.empty();
    }
    UnitParse parsed = UnitParser.parse(a.unit().get().text());
    if (parsed instanceof UnitParse.Failure f) {
      sink.report(DiagnosticCode.UNKNOWN_UNIT, a.unit().get().range(), f.message());
      return null;
    }
    return Optional.of(((UnitParse.Ok) parsed).unit());
  }

  /**
   * For a bare number where a unit is needed: write it in the unit of the slot's example ('100' for
   * a focal length becomes '100 mm'), the unit such values are usually given in. Null when the
   * example has no unit to offer.
   */
  private Fix exampleUnitFix(Arg.QuantityArg a, String example) {
    String unit = example.replaceFirst("^[-+]?[0-9.]+([eE][-+]?[0-9]+)?\\s*", "");
    if (unit.isEmpty()
        || unit.equals(example)
        || !(UnitParser.parse(unit) instanceof UnitParse.Ok)) {
      return null;
    }
    TextRange at = new TextRange(a.number().range().end(), a.number().range().end());
    return new Fix(
        "write '" + a.number().text() + " " + unit + "'",
        List.of(new Edit(sink.file, at, " " + unit)));
  }

  /** The literal as written: '3 mm' keeps its space, '3R' stays without one. */
  static String written(Arg.QuantityArg a) {
    return a.number().text()
        + a.unit()
            .map(u -> (u.range().start() > a.number().range().end() ? " " : "") + u.text())
            .orElse("");
  }

  private static String percent(double fraction) {
    return QuantityFormat.format(fraction * 100, Dimension.DIMENSIONLESS) + " %";
  }

  static String describe(Bounds b, Dimension dim) {
    String max = QuantityFormat.format(b.max(), dim);
    // Zero prints in the unit of the other end: "from 0° up to 90°", not "from 0 rad".
    String min =
        b.min() == 0 && Double.isFinite(b.max())
            ? "0" + max.replaceFirst("^[-+0-9.eE]+", "")
            : QuantityFormat.format(b.min(), dim);
    boolean finiteMin = Double.isFinite(b.min());
    boolean finiteMax = Double.isFinite(b.max());
    if (b.nonZero() && !finiteMin && !finiteMax) {
      return "non-zero";
    }
    if (finiteMin && !finiteMax) {
      if (b.min() == 0) {
        return b.minInclusive() ? "zero or more" : "positive";
      }
      return (b.minInclusive() ? "at least " : "more than ") + min;
    }
    if (!finiteMin && finiteMax) {
      return (b.maxInclusive() ? "at most " : "less than ") + max;
    }
    if (finiteMin && finiteMax) {
      return b.maxInclusive()
          ? "between " + min + " and " + max
          : "from " + min + " up to (not including) " + max;
    }
    return "a number";
  }
}
