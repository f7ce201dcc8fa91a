package jonquil.syntax;

import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import jonquil.source.TextRange;

/**
 * Moves a top-level statement's syntax tree by a number of UTF-16 units: a statement an edit did
 * not touch keeps its tree, only further along the text. Every range of every node moves; {@code
 * IncrementalParseTest} compares shifted trees with fresh parses, so a node kind added without a
 * case here fails that test.
 */
final class AstShift {
  private final int delta;

  private AstShift(int delta) {
    this.delta = delta;
  }

  /** The statement (a UseDecl, TrainDecl, RequireDecl or Declaration) moved by {@code delta}. */
  static Object statement(Object statement, int delta) {
    if (delta == 0) {
      return statement;
    }
    AstShift s = new AstShift(delta);
    if (statement instanceof UseDecl u) {
      return new UseDecl(u.target(), s.range(u.targetRange()), s.range(u.range()));
    }
    if (statement instanceof Declaration d) {
      return new Declaration(
          s.name(d.kind()),
          s.name(d.name()),
          d.shorthand().map(s::args),
          s.list(
              d.properties(),
              p -> new Property(s.name(p.key()), s.args(p.args()), s.range(p.range()))),
          s.range(d.range()));
    }
    if (statement instanceof TrainDecl t) {
      return new TrainDecl(
          t.name().map(s::name),
          s.list(
              t.paths(),
              p -> new TrainDecl.BeamPath(s.list(p.steps(), s::step), s.range(p.range()))),
          s.range(t.range()));
    }
    if (statement instanceof RequireDecl r) {
      return new RequireDecl(s.list(r.requirements(), s::requirement), s.range(r.range()));
    }
    throw new IllegalArgumentException(
        "not a top-level statement: " + statement.getClass().getSimpleName());
  }

  private TextRange range(TextRange r) {
    return new TextRange(r.start() + delta, r.end() + delta);
  }

  private Name name(Name n) {
    return new Name(n.text(), range(n.range()));
  }

  private <T> List<T> list(List<T> items, UnaryOperator<T> each) {
    return items.stream().map(each).toList();
  }

  private List<Arg> args(List<Arg> args) {
    return list(args, this::arg);
  }

  private Arg arg(Arg a) {
    if (a instanceof Arg.QuantityArg q) {
      return quantity(q);
    }
    if (a instanceof Arg.RefArg r) {
      return ref(r);
    }
    if (a instanceof Arg.StringArg str) {
      return new Arg.StringArg(str.value(), range(str.range()));
    }
    if (a instanceof Arg.CommaArg c) {
      return new Arg.CommaArg(range(c.range()));
    }
    if (a instanceof Arg.RangeArg r) {
      return new Arg.RangeArg(arg(r.low()), arg(r.high()), range(r.range()));
    }
    throw new IllegalArgumentException("unknown argument: " + a.getClass().getSimpleName());
  }

  private Arg.QuantityArg quantity(Arg.QuantityArg q) {
    return new Arg.QuantityArg(
        number(q.number()),
        q.unit().map(this::unit),
        q.tolerance()
            .map(
                t ->
                    new Arg.Tolerance(
                        number(t.number()), t.unit().map(this::unit), range(t.range()))),
        range(q.range()));
  }

  private Arg.NumberLit number(Arg.NumberLit n) {
    return new Arg.NumberLit(n.value(), n.text(), range(n.range()));
  }

  private Arg.UnitLit unit(Arg.UnitLit u) {
    return new Arg.UnitLit(u.text(), range(u.range()));
  }

  private Arg.RefArg ref(Arg.RefArg r) {
    return new Arg.RefArg(name(r.name()), r.port().map(this::name), range(r.range()));
  }

  private TrainDecl.Step step(TrainDecl.Step step) {
    if (step instanceof TrainDecl.Place p) {
      return new TrainDecl.Place(ref(p.ref()));
    }
    if (step instanceof TrainDecl.Distance d) {
      return new TrainDecl.Distance(
          quantity(d.length()), d.medium().map(this::ref), range(d.range()));
    }
    throw new IllegalArgumentException("unknown step: " + step.getClass().getSimpleName());
  }

  private Requirement requirement(Requirement r) {
    Requirement.Check c = r.check();
    Requirement.Check check =
        new Requirement.Check(
            measure(c.measure()),
            list(c.places(), this::place),
            c.condition().map(this::condition),
            list(
                c.extras(),
                e ->
                    new Requirement.Extra(
                        e.measure().map(this::measure),
                        condition(e.condition()),
                        range(e.range()))),
            c.band()
                .map(
                    b ->
                        new Requirement.Band(
                            name(b.quantity()), arg(b.low()), arg(b.high()), range(b.range()))),
            range(c.range()));
    Optional<Requirement.Yield> yield =
        r.yield()
            .map(
                y ->
                    new Requirement.Yield(
                        y.comparator(),
                        arg(y.bound()),
                        y.builds()
                            .map(
                                b ->
                                    new Requirement.Builds(
                                        new Arg.NumberLit(
                                            b.count().value(),
                                            b.count().text(),
                                            range(b.count().range())),
                                        name(b.word()),
                                        range(b.range()))),
                        range(y.range())));
    return new Requirement(yield, check, r.text(), range(r.range()));
  }

  private Requirement.Measure measure(Requirement.Measure m) {
    return new Requirement.Measure(list(m.words(), this::name), range(m.range()));
  }

  private Requirement.Place place(Requirement.Place p) {
    if (p instanceof Requirement.At at) {
      return new Requirement.At(ref(at.target()), range(at.range()));
    }
    if (p instanceof Requirement.Everywhere e) {
      return new Requirement.Everywhere(range(e.range()));
    }
    if (p instanceof Requirement.Between b) {
      return new Requirement.Between(ref(b.from()), ref(b.to()), range(b.range()));
    }
    if (p instanceof Requirement.ForLine l) {
      return new Requirement.ForLine(name(l.word()), arg(l.wavelength()), range(l.range()));
    }
    throw new IllegalArgumentException("unknown place: " + p.getClass().getSimpleName());
  }

  private Requirement.Condition condition(Requirement.Condition c) {
    if (c instanceof Requirement.Compare cmp) {
      return new Requirement.Compare(
          cmp.comparator(), arg(cmp.value()), cmp.handedness().map(this::name), range(cmp.range()));
    }
    if (c instanceof Requirement.Within w) {
      return new Requirement.Within(arg(w.low()), arg(w.high()), range(w.range()));
    }
    if (c instanceof Requirement.Is is) {
      return new Requirement.Is(args(is.state()), range(is.range()));
    }
    throw new IllegalArgumentException("unknown condition: " + c.getClass().getSimpleName());
  }
}
