package jonquil.resolve;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import jonquil.diag.DiagnosticCode;
import jonquil.safety.HazardClass;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Name;
import jonquil.syntax.Requirement;
import jonquil.units.Dimension;

/**
 * Checks each requirement line: a known measure, the places it needs, and bounds of the right kind.
 */
final class RequirementResolver {
  private final Sink sink;
  private final Scope scope;
  private final ElementRefs refs;
  private final ValueChecker values;
  private final Set<Symbol> placed;

  private final jonquil.syntax.SpecFile file;
  private final java.util.Map<Symbol, ResolvedElement> elements;

  RequirementResolver(
      Sink sink,
      Scope scope,
      Set<Symbol> placed,
      jonquil.syntax.SpecFile file,
      java.util.Map<Symbol, ResolvedElement> elements) {
    this.elements = elements;
    this.refs = new ElementRefs(sink, scope);
    this.sink = sink;
    this.scope = scope;
    this.values = new ValueChecker(sink, scope);
    this.placed = placed;
    this.file = file;
  }

  ResolvedRequirement resolve(Requirement req) {
    int errorsBefore = errorCount();
    Requirement.Check check = req.check();
    Optional<Measure> measure = measure(check.measure());
    Optional<ResolvedRequirement.Target> at = Optional.empty();
    Optional<ResolvedRequirement.Target> from = Optional.empty();
    Optional<ResolvedRequirement.Target> to = Optional.empty();
    boolean everywhere = false;
    List<Requirement.ForLine> lines = new ArrayList<>();
    List<Requirement.ForLine> viewingPlaces = new ArrayList<>();
    for (Requirement.Place place : check.places()) {
      if (place instanceof Requirement.At a) {
        at = target(a.target());
      } else if (place instanceof Requirement.Between b) {
        from = target(b.from());
        to = target(b.to());
      } else if (place instanceof Requirement.ForLine l) {
        (ViewingTermsResolver.WORDS.contains(l.word().text()) ? viewingPlaces : lines).add(l);
      } else {
        everywhere = true;
      }
    }
    java.util.OptionalDouble line = line(lines, at, check);
    ViewingTerms viewing = new ViewingTermsResolver(sink, values).resolve(viewingPlaces, measure);
    boolean damaged = file.damaged(req.range());
    if (!damaged) {
      measure.ifPresent(m -> checkPlaces(m, check));
    }
    List<ResolvedRequirement.Criterion> criteria = new ArrayList<>();
    if (check.condition().isEmpty() && !damaged) {
      sink.report(
          DiagnosticCode.MISSING_CONDITION,
          check.measure().range(),
          "this requirement has no bound: add one such as "
              + measure.map(Measure::example).orElse("'>= 400 mW'"));
    }
    if (measure.isPresent() && check.condition().isPresent()) {
      criterion(measure.get(), check.condition().get()).ifPresent(criteria::add);
    }
    for (Requirement.Extra extra : check.extras()) {
      Optional<Measure> m = extra.measure().isPresent() ? measure(extra.measure().get()) : measure;
      if (m.isPresent()
          && measure.isPresent()
          && extra.measure().isPresent()
          && measure.get() == Measure.POLARIZATION
          && !m.get().polarizationDetail()) {
        sink.report(
            DiagnosticCode.UNKNOWN_MEASURE,
            extra.measure().get().range(),
            "after a polarization requirement, a comma adds one of 'azimuth', 'ellipticity',"
                + " 'handedness', 'extinction' or 'dop'");
        continue;
      }
      m.flatMap(x -> criterion(x, extra.condition())).ifPresent(criteria::add);
    }
    Optional<ResolvedRequirement.Band> band = check.band().flatMap(this::band);
    Optional<ResolvedRequirement.Criterion> yield = req.yield().flatMap(this::yield);
    java.util.OptionalInt builds = YieldBuilds.resolve(req.yield(), sink);
    boolean valid = errorCount() == errorsBefore;
    return new ResolvedRequirement(
        sink.file,
        req,
        measure,
        at,
        from,
        to,
        everywhere,
        criteria,
        band,
        yield,
        valid,
        builds,
        line,
        viewing);
  }

  /**
   * 'for line 532 nm': the vacuum wavelength of a line of the source named by 'at', or else of a
   * placed source; a line no such source has is J619 with the lines there are.
   */
  private java.util.OptionalDouble line(
      List<Requirement.ForLine> written,
      Optional<ResolvedRequirement.Target> at,
      Requirement.Check check) {
    if (written.isEmpty()) {
      return java.util.OptionalDouble.empty();
    }
    for (Requirement.ForLine extra : written.subList(1, written.size())) {
      sink.report(
          DiagnosticCode.UNEXPECTED_PLACE,
          extra.range(),
          "a requirement judges one line or all of them; split it into one line per laser line");
    }
    Requirement.ForLine l = written.get(0);
    if (!l.word().text().equals("line")) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          l.word().range(),
          "after 'for' a requirement names a laser line, like 'for line 532 nm', or how the"
              + " light is viewed: "
              + ViewingTermsResolver.EXAMPLES
              + "; '"
              + l.word().text()
              + "' is not understood"
              + Suggest.closest(
                      l.word().text(),
                      java.util.stream.Stream.concat(
                              java.util.stream.Stream.of("line"),
                              ViewingTermsResolver.WORDS.stream())
                          .toList())
                  .map(c -> "; did you mean 'for " + c + "'?")
                  .orElse(""));
      return java.util.OptionalDouble.empty();
    }
    if (check.band().isPresent()) {
      sink.report(
          DiagnosticCode.CONFLICTING_PARAMETERS,
          l.range(),
          "a requirement names one line or a band of them ('over wavelength'), not both");
      return java.util.OptionalDouble.empty();
    }
    if (!(l.wavelength() instanceof Arg.QuantityArg q)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT, l.wavelength().range(), "a line is named by its wavelength");
      return java.util.OptionalDouble.empty();
    }
    Optional<Value.Num> wl =
        values.quantity(
            q, List.of(Dimension.LENGTH), KindTables.WAVELENGTH, "532 nm", "wavelength");
    if (wl.isEmpty()) {
      return java.util.OptionalDouble.empty();
    }
    List<ResolvedElement> sources =
        elements.values().stream()
            .filter(e -> e.kind() == ElementKind.SOURCE)
            .filter(
                e ->
                    at.isPresent() && at.get().symbol().category() == Category.SOURCE
                        ? e.symbol().equals(at.get().symbol())
                        : placed.contains(e.symbol()))
            .toList();
    List<Double> known = new ArrayList<>();
    for (ResolvedElement source : sources) {
      for (double w : source.lineWavelengths()) {
        if (!known.contains(w)) {
          known.add(w);
        }
      }
    }
    double wanted = wl.get().si();
    for (double w : known) {
      if (ResolvedElement.sameLine(w, wanted)) {
        return java.util.OptionalDouble.of(w);
      }
    }
    known.sort(Double::compare);
    String listed =
        String.join(
            ", ",
            known.stream()
                .map(w -> jonquil.units.QuantityFormat.format(w, Dimension.LENGTH))
                .toList());
    Optional<Double> nearest =
        known.stream().min(java.util.Comparator.comparingDouble(w -> Math.abs(w - wanted)));
    sink.report(
        DiagnosticCode.UNKNOWN_LINE,
        l.range(),
        (sources.size() == 1
                ? "'" + sources.get(0).symbol().name() + "' has no line at "
                : "no source in the trains has a line at ")
            + jonquil.units.QuantityFormat.format(wanted, Dimension.LENGTH)
            + (known.isEmpty()
                ? "; no source is placed in a train"
                : (sources.size() == 1 ? "; its lines are " : "; their lines are ")
                    + listed
                    + nearest
                        .map(
                            n ->
                                "; did you mean 'for line "
                                    + jonquil.units.QuantityFormat.format(n, Dimension.LENGTH)
                                    + "'?")
                        .orElse("")));
    return java.util.OptionalDouble.empty();
  }

  private int errorCount() {
    return (int)
        sink.diagnostics.stream().filter(d -> d.severity() == jonquil.diag.Severity.ERROR).count();
  }

  private Optional<Measure> measure(Requirement.Measure written) {
    Optional<Measure> m = Measure.bySpelling(written.text());
    if (m.isEmpty()) {
      Optional<String> close = Suggest.closest(written.text(), Measure.spellings());
      sink.report(
          DiagnosticCode.UNKNOWN_MEASURE,
          written.range(),
          "'"
              + written.text()
              + "' is not a quantity a requirement can bound"
              + Suggest.hintOr(
                  close,
                  "; the measures are "
                      + String.join(
                          ", ",
                          java.util.Arrays.stream(Measure.values()).map(Measure::word).toList())),
          Resolver.replacement(sink.file, written.range(), written.text(), close));
    }
    return m;
  }

  private void checkPlaces(Measure m, Requirement.Check check) {
    boolean hasAt = check.places().stream().anyMatch(p -> p instanceof Requirement.At);
    boolean hasEverywhere =
        check.places().stream().anyMatch(p -> p instanceof Requirement.Everywhere);
    boolean hasBetween = check.places().stream().anyMatch(p -> p instanceof Requirement.Between);
    TextRange where = check.measure().range();
    String missingPlace = // what to add, or null when the places given suffice
        switch (m.where()) {
          case AT -> hasAt ? null : "is measured at a place: add 'at' and a name";
          case AT_OR_EVERYWHERE ->
              hasAt || hasEverywhere ? null : "needs a place: add 'at' and a name, or 'everywhere'";
          case BETWEEN ->
              hasBetween ? null : "is measured between two places: add 'from' a name 'to' a name";
          case NONE, OPTIONAL_AT -> null;
        };
    if (missingPlace != null) {
      sink.report(DiagnosticCode.MISSING_PLACE, where, "'" + m.word() + "' " + missingPlace);
    }
    boolean foreignPlace =
        switch (m.where()) {
          case AT, OPTIONAL_AT -> hasEverywhere || hasBetween;
          case AT_OR_EVERYWHERE -> hasBetween;
          case BETWEEN -> hasEverywhere || hasAt;
          case NONE -> hasAt || hasBetween;
        };
    if (foreignPlace) {
      unexpected(check, m);
    }
    if (check.places().stream().filter(p -> p instanceof Requirement.At).count() > 1) {
      sink.report(
          DiagnosticCode.UNEXPECTED_PLACE,
          where,
          "a requirement is measured at one place; split it into one line per place");
    }
  }

  private void unexpected(Requirement.Check check, Measure m) {
    for (Requirement.Place p : check.places()) {
      boolean bad =
          !(p instanceof Requirement.ForLine)
              && switch (m.where()) {
                case AT, OPTIONAL_AT -> !(p instanceof Requirement.At);
                case AT_OR_EVERYWHERE -> p instanceof Requirement.Between;
                case BETWEEN -> !(p instanceof Requirement.Between);
                case NONE -> !(p instanceof Requirement.Everywhere);
              };
      if (bad) {
        sink.report(
            DiagnosticCode.UNEXPECTED_PLACE,
            p.range(),
            "'" + m.word() + "' does not take this place");
      }
    }
  }

  private Optional<ResolvedRequirement.Target> target(Arg.RefArg ref) {
    Optional<Symbol> found =
        refs.placeable(
            ref,
            DiagnosticCode.WRONG_KIND,
            "; a requirement is measured at a source, element, probe or beam stop");
    if (found.isEmpty()) {
      return Optional.empty();
    }
    Symbol s = found.get();
    String name = ref.name().text();
    Optional<String> port = refs.port(ref, s.kind().get());
    if (ref.port().isPresent() && port.isEmpty()) {
      return Optional.empty();
    }
    if (!placed.contains(s)) {
      sink.report(
          DiagnosticCode.TARGET_NOT_PLACED,
          ref.name().range(),
          "no beam path reaches '" + name + "', so this requirement cannot be evaluated");
    }
    return Optional.of(new ResolvedRequirement.Target(s, port, ref.range()));
  }

  private Optional<ResolvedRequirement.Criterion> criterion(
      Measure m, Requirement.Condition condition) {
    if (condition instanceof Requirement.Is is) {
      return state(m, is);
    }
    if (m.bound() == Measure.Bound.STATE || m.bound() == Measure.Bound.HANDEDNESS) {
      sink.report(
          DiagnosticCode.BAD_POLARIZATION_STATE,
          condition.range(),
          "'" + m.word() + "' is stated with 'is', e.g. " + m.example());
      return Optional.empty();
    }
    if (condition instanceof Requirement.Compare c) {
      Optional<Value.Group> hand = handedness(m, c);
      if (c.handedness().isPresent() && hand.isEmpty()) {
        return Optional.empty();
      }
      Optional<Bound> b = bound(m, c.value());
      return b.map(
          v ->
              new ResolvedRequirement.Criterion(
                  m, relation(c.comparator()), v.value, v.value, v.relative, hand, c.range()));
    }
    Requirement.Within w = (Requirement.Within) condition;
    Optional<Bound> low = bound(m, w.low());
    Optional<Bound> high = bound(m, w.high());
    if (low.isEmpty() || high.isEmpty()) {
      return Optional.empty();
    }
    if (low.get().relative != high.get().relative) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          w.range(),
          "both ends of the range must be absolute, or both in dB");
      return Optional.empty();
    }
    if (low.get().value > high.get().value) {
      sink.report(
          DiagnosticCode.INVERTED_RANGE,
          w.range(),
          "the range runs backwards: its low end is above its high end");
      return Optional.empty();
    }
    return Optional.of(
        new ResolvedRequirement.Criterion(
            m,
            ResolvedRequirement.Relation.WITHIN,
            low.get().value,
            high.get().value,
            low.get().relative,
            Optional.empty(),
            w.range()));
  }

  /**
   * The handedness after an ellipticity bound ({@code >= 40 deg right}), carried as the group a
   * {@code handedness is right} state gives, so both read it the same way.
   */
  private Optional<Value.Group> handedness(Measure m, Requirement.Compare c) {
    if (c.handedness().isEmpty()) {
      return Optional.empty();
    }
    Name hand = c.handedness().get();
    if (m != Measure.ELLIPTICITY) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          hand.range(),
          "only an 'ellipticity' bound takes a handedness; remove '"
              + hand.text()
              + "', or bound it with 'handedness is "
              + hand.text()
              + "' after a comma");
      return Optional.empty();
    }
    return Optional.of(
        new Value.Group(
            java.util.Map.of("handedness", new Value.Word(hand.text(), hand.range())),
            List.of(),
            hand.range()));
  }

  private Optional<ResolvedRequirement.Criterion> state(Measure m, Requirement.Is is) {
    Shape shape;
    if (m == Measure.POLARIZATION) {
      shape = KindTables.STATE;
    } else if (m == Measure.HANDEDNESS) {
      shape = Shape.word("handedness", "right", "left");
    } else {
      sink.report(
          DiagnosticCode.BAD_POLARIZATION_STATE,
          is.range(),
          "'is' states a polarization; bound '"
              + m.word()
              + "' with a comparison such as "
              + m.example());
      return Optional.empty();
    }
    int before = sink.diagnostics.size();
    Optional<Value.Group> g = values.check(shape, is.state(), m.word(), is.range());
    if (g.isEmpty() && sink.diagnostics.size() > before) {
      var last = sink.diagnostics.get(sink.diagnostics.size() - 1);
      if (last.code() == DiagnosticCode.BAD_ARGUMENT
          || last.code() == DiagnosticCode.MISSING_ARGUMENT) {
        sink.replace(
            last,
            new jonquil.diag.Diagnostic(
                DiagnosticCode.BAD_POLARIZATION_STATE,
                last.severity(),
                last.file(),
                last.range(),
                last.message(),
                last.fixes(),
                last.related()));
      }
    }
    return g.map(
        state ->
            new ResolvedRequirement.Criterion(
                m, ResolvedRequirement.Relation.IS, 0, 0, false, Optional.of(state), is.range()));
  }

  private record Bound(double value, boolean relative) {}

  private Optional<Bound> bound(Measure m, Arg arg) {
    if (!(arg instanceof Arg.QuantityArg q)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          arg.range(),
          "expected a number for '"
              + m.word()
              + "', found "
              + ValueChecker.describeArg(arg)
              + "; e.g. "
              + m.example());
      return Optional.empty();
    }
    String what = m.word();
    if (toleranceRefused(q, BOUND)) {
      return Optional.empty();
    }
    return switch (m.bound()) {
      case POWER, IRRADIANCE, FLUENCE, FIELD, ENERGY, LENGTH ->
          si(q, m.bound(), Bounds.NON_NEGATIVE, what);
      case ANGLE -> si(q, m.bound(), Bounds.ANY, what);
      case POWER_OR_RELATIVE, RATIO_OR_DB -> {
        if (q.unit().isPresent() && q.unit().get().text().equals("dB")) {
          yield values.powerRatio(q, Bounds.POSITIVE, what).map(v -> new Bound(v.si(), true));
        }
        if (m.bound() == Measure.Bound.POWER_OR_RELATIVE) {
          yield si(q, m.bound(), Bounds.NON_NEGATIVE, what);
        }
        yield (m == Measure.EXTINCTION
                ? values.powerRatio(q, Bounds.atLeast(1), what)
                : values.ratio(q, Bounds.closed(0, 1), what))
            .map(v -> new Bound(v.si(), false));
      }
      case RATIO ->
          values
              .ratio(q, m == Measure.EXPOSURE ? Bounds.NON_NEGATIVE : Bounds.closed(0, 1), what)
              .map(v -> new Bound(v.si(), false));
      case PLAIN -> {
        if (q.unit().isPresent()) {
          sink.report(
              DiagnosticCode.UNEXPECTED_UNIT,
              q.unit().get().range(),
              "'" + what + "' is a plain number; remove the unit '" + q.unit().get().text() + "'");
          yield Optional.empty();
        }
        yield Optional.of(new Bound(q.number().value(), false));
      }
      case DENSITY -> {
        if (q.unit().isPresent() && !q.unit().get().text().equals("OD")) {
          sink.report(
              DiagnosticCode.WRONG_DIMENSION,
              q.unit().get().range(),
              "'" + what + "' is an optical density, written 'OD 4' or '4'");
          yield Optional.empty();
        }
        yield Optional.of(new Bound(q.number().value(), false));
      }
      case HAZARD_CLASS -> hazardClass(q);
      // criterion() sends every 'is' to state() and reports these forms written otherwise.
      case STATE, HANDEDNESS ->
          throw new IllegalStateException("'" + what + "' is bounded with 'is', not a number");
    };
  }

  private Optional<Bound> hazardClass(Arg.QuantityArg q) {
    String label = q.number().text() + q.unit().map(u -> u.text()).orElse("");
    Optional<HazardClass> c = HazardClass.parse(label);
    if (c.isEmpty()) {
      sink.report(
          DiagnosticCode.UNKNOWN_HAZARD_CLASS,
          q.range(),
          "'"
              + ValueChecker.written(q)
              + "' is not a laser hazard class; the classes are "
              + String.join(", ", HazardClass.labels()));
      return Optional.empty();
    }
    return Optional.of(new Bound(c.get().rank(), false));
  }

  /** A physical quantity of the bound form's dimension, its example value in messages. */
  private Optional<Bound> si(Arg.QuantityArg q, Measure.Bound form, Bounds range, String what) {
    return values
        .quantity(q, List.of(form.dimension().orElseThrow()), range, form.value(), what)
        .map(v -> new Bound(v.si(), false));
  }

  private Optional<ResolvedRequirement.Band> band(Requirement.Band band) {
    if (!band.quantity().text().equals("wavelength")) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          band.quantity().range(),
          "a requirement can hold over a 'wavelength' band; '"
              + band.quantity().text()
              + "' is not supported");
      return Optional.empty();
    }
    if (!(band.low() instanceof Arg.QuantityArg lo)
        || !(band.high() instanceof Arg.QuantityArg hi)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          band.range(),
          "a band is written like 'wavelength 1060 nm .. 1070 nm'");
      return Optional.empty();
    }
    if (toleranceRefused(lo, "a band's end") | toleranceRefused(hi, "a band's end")) {
      return Optional.empty();
    }
    Optional<Value.Num> low =
        values.quantity(
            lo, List.of(Dimension.LENGTH), KindTables.WAVELENGTH, "1060 nm", "wavelength");
    Optional<Value.Num> high =
        values.quantity(
            hi, List.of(Dimension.LENGTH), KindTables.WAVELENGTH, "1070 nm", "wavelength");
    if (low.isEmpty() || high.isEmpty()) {
      return Optional.empty();
    }
    if (low.get().si() > high.get().si()) {
      sink.report(
          DiagnosticCode.INVERTED_RANGE,
          band.range(),
          "the wavelength band runs backwards: its low end is above its high end");
      return Optional.empty();
    }
    return Optional.of(new ResolvedRequirement.Band(low.get().si(), high.get().si(), band.range()));
  }

  private Optional<ResolvedRequirement.Criterion> yield(Requirement.Yield y) {
    if (!(y.bound() instanceof Arg.QuantityArg q)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT, y.bound().range(), "a yield is a fraction such as '99 %'");
      return Optional.empty();
    }
    if (toleranceRefused(q, "a yield's bound")) {
      return Optional.empty();
    }
    return values
        .ratio(q, Bounds.closed(0, 1), "yield")
        .map(
            v ->
                new ResolvedRequirement.Criterion(
                    null,
                    relation(y.comparator()),
                    v.si(),
                    v.si(),
                    false,
                    Optional.empty(),
                    y.range()));
  }

  /**
   * A tolerance belongs to a part, where builds draw it; on a bound it would be accepted and
   * ignored, so it is refused, and the message says how to ask what was probably meant.
   */
  private static final String BOUND = "a requirement's bound";

  private boolean toleranceRefused(Arg.QuantityArg q, String where) {
    if (q.tolerance().isEmpty()) {
      return false;
    }
    Arg.Tolerance tolerance = q.tolerance().get();
    sink.report(
        DiagnosticCode.BAD_ARGUMENT,
        tolerance.range(),
        "a tolerance has no meaning on "
            + where
            + ", which is exact: remove '± "
            + tolerance.number().text()
            + tolerance.unit().map(u -> " " + u.text()).orElse("")
            + "'"
            + (where.equals(BOUND)
                ? "; to ask how often toleranced builds meet a bound, put the ± on the part and"
                    + " write 'yield >= 95 % for ...'"
                : ""));
    return true;
  }

  private static ResolvedRequirement.Relation relation(Requirement.Comparator c) {
    return switch (c) {
      case LE -> ResolvedRequirement.Relation.AT_MOST;
      case LT -> ResolvedRequirement.Relation.BELOW;
      case GE -> ResolvedRequirement.Relation.AT_LEAST;
      case GT -> ResolvedRequirement.Relation.ABOVE;
      case EQ -> ResolvedRequirement.Relation.EQUAL;
    };
  }
}
