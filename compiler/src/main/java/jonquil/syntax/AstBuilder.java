package jonquil.syntax;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.grammar.internal.JonquilParser;
import jonquil.grammar.internal.JonquilParser.*;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.tree.ParseTree;
import org.antlr.v4.runtime.tree.TerminalNode;

/**
 * The one visitor over ANTLR's parse tree: builds our immutable AST and drops pieces that error
 * recovery left incomplete (their errors are already reported). The grammar has no recursive rules,
 * so this walk is shallow whatever the input.
 */
record AstBuilder(SourceFile source, OffsetMap offsets, List<TextRange> comments) {

  SpecFile build(FileContext file) {
    List<Object> statements = new ArrayList<>();
    for (TopStatementContext top : file.topStatement()) {
      statement(top).ifPresent(statements::add);
    }
    return assemble(statements);
  }

  /**
   * One top-level statement: a UseDecl, TrainDecl, RequireDecl or Declaration; empty if recovery
   * left too little.
   */
  Optional<Object> statement(TopStatementContext top) {
    if (top.useDecl() != null) {
      return useDecl(top.useDecl()).map(u -> u);
    } else if (top.trainDecl() != null) {
      return Optional.of(train(top.trainDecl()));
    } else if (top.requireDecl() != null) {
      return Optional.of(require(top.requireDecl()));
    } else if (top.declaration() != null) {
      return declaration(top.declaration()).map(d -> d);
    }
    return Optional.empty();
  }

  /** The file from its statements in source order. */
  SpecFile assemble(List<Object> statements) {
    List<UseDecl> uses = new ArrayList<>();
    List<Declaration> declarations = new ArrayList<>();
    List<TrainDecl> trains = new ArrayList<>();
    List<RequireDecl> requires = new ArrayList<>();
    for (Object statement : statements) {
      if (statement instanceof UseDecl u) {
        uses.add(u);
      } else if (statement instanceof TrainDecl t) {
        trains.add(t);
      } else if (statement instanceof RequireDecl r) {
        requires.add(r);
      } else if (statement instanceof Declaration d) {
        declarations.add(d);
      }
    }
    return new SpecFile(source.path(), uses, declarations, trains, requires, comments, List.of());
  }

  private Optional<UseDecl> useDecl(UseDeclContext ctx) {
    if (!present(ctx.target)) {
      return Optional.empty();
    }
    return Optional.of(new UseDecl(unquote(ctx.target.getText()), range(ctx.target), range(ctx)));
  }

  private Optional<Declaration> declaration(DeclarationContext ctx) {
    if (!present(ctx.kind) || !present(ctx.name)) {
      return Optional.empty();
    }
    Optional<List<Arg>> shorthand =
        ctx.args() != null ? Optional.of(args(ctx.args())) : Optional.empty();
    List<Property> properties = new ArrayList<>();
    if (ctx.block() != null) {
      for (PropertyContext p : ctx.block().property()) {
        Name key = word(p.key);
        if (key != null) {
          properties.add(
              new Property(key, p.args() == null ? List.of() : args(p.args()), range(p)));
        }
      }
    }
    return Optional.of(
        new Declaration(name(ctx.kind), name(ctx.name), shorthand, properties, range(ctx)));
  }

  private List<Arg> args(ArgsContext ctx) {
    List<Arg> out = new ArrayList<>();
    for (ArgContext a : ctx.arg()) {
      if (a.COMMA() != null) {
        out.add(new Arg.CommaArg(range(a)));
        continue;
      }
      List<ValueContext> values = a.value();
      if (values.isEmpty()) {
        continue;
      }
      Arg low = value(values.get(0));
      if (low == null) {
        continue;
      }
      if (a.RANGE() != null && values.size() == 2) {
        Arg high = value(values.get(1));
        if (high != null) {
          out.add(new Arg.RangeArg(low, high, range(a)));
          continue;
        }
      }
      out.add(low);
    }
    return out;
  }

  private Arg value(ValueContext ctx) {
    if (ctx == null) {
      return null;
    }
    if (ctx.quantity() != null) {
      return quantity(ctx.quantity());
    }
    if (ctx.reference() != null) {
      return reference(ctx.reference());
    }
    if (present(ctx.STRING())) {
      return new Arg.StringArg(unquote(ctx.STRING().getText()), range(ctx));
    }
    return null;
  }

  private Arg.QuantityArg quantity(QuantityContext ctx) {
    Arg.NumberLit number = number(ctx.number());
    if (number == null) {
      return null;
    }
    if (present(ctx.OD())) {
      Arg.UnitLit od = new Arg.UnitLit("OD", range(ctx.OD().getSymbol()));
      return new Arg.QuantityArg(number, Optional.of(od), Optional.empty(), range(ctx));
    }
    Optional<Arg.UnitLit> unit = Optional.ofNullable(unit(ctx.unit()));
    Optional<Arg.Tolerance> tolerance = Optional.empty();
    if (ctx.tolerance() != null) {
      Arg.NumberLit tol = number(ctx.tolerance().number());
      if (tol != null) {
        tolerance =
            Optional.of(
                new Arg.Tolerance(
                    tol,
                    Optional.ofNullable(unit(ctx.tolerance().unit())),
                    range(ctx.tolerance())));
      }
    }
    return new Arg.QuantityArg(number, unit, tolerance, range(ctx));
  }

  private Arg.NumberLit number(NumberContext ctx) {
    if (ctx == null || !present(ctx.NUMBER())) {
      return null;
    }
    String digits = ctx.NUMBER().getText();
    double value;
    try {
      value = Double.parseDouble(digits);
    } catch (NumberFormatException e) {
      return null; // the lexer only produces well-formed numbers; this is unreachable in practice
    }
    boolean negative = ctx.sign != null && ctx.sign.getType() == JonquilParser.MINUS;
    String text = (ctx.sign != null ? (negative ? "-" : "+") : "") + digits;
    return new Arg.NumberLit(negative ? -value : value, text, range(ctx));
  }

  private Arg.UnitLit unit(UnitContext ctx) {
    if (ctx == null || ctx.unitFactor().isEmpty()) {
      return null;
    }
    StringBuilder text = new StringBuilder();
    for (int i = 0; i < ctx.getChildCount(); i++) {
      text.append(compact(ctx.getChild(i)));
    }
    return new Arg.UnitLit(text.toString(), range(ctx));
  }

  private static String compact(ParseTree node) {
    if (node instanceof TerminalNode t) {
      return t.getSymbol().getTokenIndex() < 0 ? "" : t.getText();
    }
    StringBuilder out = new StringBuilder();
    for (int i = 0; i < node.getChildCount(); i++) {
      out.append(compact(node.getChild(i)));
    }
    return out.toString();
  }

  private Arg.RefArg reference(ReferenceContext ctx) {
    List<WordContext> words = ctx.word();
    if (words.isEmpty()) {
      return null;
    }
    Name first = word(words.get(0));
    if (first == null) {
      return null;
    }
    Optional<Name> port =
        words.size() > 1 ? Optional.ofNullable(word(words.get(1))) : Optional.empty();
    return new Arg.RefArg(first, port, range(ctx));
  }

  private TrainDecl train(TrainDeclContext ctx) {
    List<TrainDecl.BeamPath> paths = new ArrayList<>();
    for (PathContext p : ctx.path()) {
      List<TrainDecl.Step> steps = new ArrayList<>();
      for (StepContext s : p.step()) {
        if (s.reference() != null) {
          Arg.RefArg ref = reference(s.reference());
          if (ref != null) {
            steps.add(new TrainDecl.Place(ref));
          }
        } else if (s.distance() != null) {
          Arg.QuantityArg length = quantity(s.distance().quantity());
          if (length != null) {
            Optional<Arg.RefArg> medium =
                s.distance().medium == null
                    ? Optional.empty()
                    : Optional.ofNullable(reference(s.distance().medium));
            steps.add(new TrainDecl.Distance(length, medium, range(s)));
          }
        }
      }
      if (!steps.isEmpty()) {
        paths.add(new TrainDecl.BeamPath(steps, range(p)));
      }
    }
    Optional<Name> name = present(ctx.name) ? Optional.of(name(ctx.name)) : Optional.empty();
    return new TrainDecl(name, paths, range(ctx));
  }

  private RequireDecl require(RequireDeclContext ctx) {
    List<Requirement> requirements = new ArrayList<>();
    for (RequirementContext r : ctx.requirement()) {
      Requirement req = requirement(r);
      if (req != null) {
        requirements.add(req);
      }
    }
    return new RequireDecl(requirements, range(ctx));
  }

  private Requirement requirement(RequirementContext ctx) {
    if (ctx.check() == null || ctx.check().measure() == null) {
      return null;
    }
    Optional<Requirement.Yield> yield = Optional.empty();
    if (present(ctx.YIELD()) && ctx.comparator != null && ctx.bound != null) {
      Arg bound = value(ctx.bound);
      Requirement.Comparator cmp = comparator(ctx.comparator);
      Optional<Requirement.Builds> builds = Optional.empty();
      Arg.NumberLit count = number(ctx.builds);
      // 'over builds' with the count left out: the parser has reported it; keep no half clause.
      if (present(ctx.OVER()) && count != null && present(ctx.buildsWord)) {
        Name word = name(ctx.buildsWord);
        builds =
            Optional.of(
                new Requirement.Builds(
                    count, word, TextRange.span(range(ctx.OVER().getSymbol()), word.range())));
      }
      if (bound != null && cmp != null) {
        TextRange end = builds.map(Requirement.Builds::range).orElse(bound.range());
        yield =
            Optional.of(
                new Requirement.Yield(
                    cmp, bound, builds, TextRange.span(range(ctx.YIELD().getSymbol()), end)));
      }
    }
    CheckContext c = ctx.check();
    Requirement.Measure measure = measure(c.measure());
    if (measure == null) {
      return null;
    }
    List<Requirement.Place> places = new ArrayList<>();
    for (PlaceContext p : c.place()) {
      Requirement.Place place = place(p);
      if (place != null) {
        places.add(place);
      }
    }
    Optional<Requirement.Condition> condition = Optional.ofNullable(condition(c.condition()));
    List<Requirement.Extra> extras = new ArrayList<>();
    for (ExtraContext e : c.extra()) {
      Requirement.Condition extra = condition(e.condition());
      if (extra != null) {
        Optional<Requirement.Measure> m =
            e.measure() == null ? Optional.empty() : Optional.ofNullable(measure(e.measure()));
        extras.add(new Requirement.Extra(m, extra, range(e)));
      }
    }
    Optional<Requirement.Band> band = Optional.empty();
    if (c.band() != null && present(c.band().IDENT())) {
      Arg low = value(c.band().low);
      Arg high = value(c.band().high);
      if (low != null && high != null) {
        band =
            Optional.of(
                new Requirement.Band(
                    name(c.band().IDENT().getSymbol()), low, high, range(c.band())));
      }
    }
    Requirement.Check check =
        new Requirement.Check(measure, places, condition, extras, band, range(c));
    return new Requirement(yield, check, source.slice(range(ctx)), range(ctx));
  }

  private Requirement.Measure measure(MeasureContext ctx) {
    List<Name> words = new ArrayList<>();
    for (TerminalNode t : ctx.IDENT()) {
      if (present(t)) {
        words.add(name(t.getSymbol()));
      }
    }
    return words.isEmpty() ? null : new Requirement.Measure(words, range(ctx));
  }

  private Requirement.Place place(PlaceContext ctx) {
    if (ctx instanceof EverywherePlaceContext e) {
      return new Requirement.Everywhere(range(e));
    }
    if (ctx instanceof AtPlaceContext at && at.target != null) {
      Arg.RefArg target = reference(at.target);
      return target == null ? null : new Requirement.At(target, range(at));
    }
    if (ctx instanceof BetweenPlaceContext b && b.from != null && b.to != null) {
      Arg.RefArg from = reference(b.from);
      Arg.RefArg to = reference(b.to);
      return from == null || to == null ? null : new Requirement.Between(from, to, range(b));
    }
    if (ctx instanceof LinePlaceContext l && present(l.lineWord) && l.line != null) {
      Arg wavelength = value(l.line);
      return wavelength == null
          ? null
          : new Requirement.ForLine(name(l.lineWord), wavelength, range(l));
    }
    return null;
  }

  private Requirement.Condition condition(ConditionContext ctx) {
    if (ctx instanceof CompareConditionContext c && c.cmp() != null) {
      Arg value = value(c.value());
      Requirement.Comparator cmp = comparator(c.cmp());
      return value == null || cmp == null
          ? null
          : new Requirement.Compare(
              cmp, value, java.util.Optional.ofNullable(c.hand).map(this::name), range(c));
    }
    if (ctx instanceof RangeConditionContext r) {
      Arg low = value(r.low);
      Arg high = value(r.high);
      return low == null || high == null ? null : new Requirement.Within(low, high, range(r));
    }
    if (ctx instanceof StateConditionContext s && s.state() != null) {
      List<Arg> state = new ArrayList<>();
      for (int i = 0; i < s.state().getChildCount(); i++) {
        ParseTree child = s.state().getChild(i);
        if (child instanceof StateWordContext w
            && w.getStart() != null
            && w.getStart().getTokenIndex() >= 0) {
          state.add(new Arg.RefArg(name(w.getStart()), Optional.empty(), range(w)));
        } else if (child instanceof QuantityContext q) {
          Arg.QuantityArg qa = quantity(q);
          if (qa != null) {
            state.add(qa);
          }
        }
      }
      return state.isEmpty() ? null : new Requirement.Is(state, range(s));
    }
    return null;
  }

  private static Requirement.Comparator comparator(CmpContext ctx) {
    if (ctx == null || ctx.getStart() == null) {
      return null;
    }
    return switch (ctx.getStart().getType()) {
      case JonquilParser.LE -> Requirement.Comparator.LE;
      case JonquilParser.GE -> Requirement.Comparator.GE;
      case JonquilParser.LT -> Requirement.Comparator.LT;
      case JonquilParser.GT -> Requirement.Comparator.GT;
      case JonquilParser.EQEQ -> Requirement.Comparator.EQ;
      default -> null;
    };
  }

  private Name word(WordContext ctx) {
    if (ctx == null || ctx.getStart() == null || ctx.getStart().getTokenIndex() < 0) {
      return null;
    }
    return name(ctx.getStart());
  }

  private Name name(Token t) {
    return new Name(t.getText(), range(t));
  }

  private static boolean present(Token t) {
    return t != null && t.getTokenIndex() >= 0 && t.getType() != Token.EOF;
  }

  private static boolean present(TerminalNode node) {
    return node != null && present(node.getSymbol());
  }

  private TextRange range(Token t) {
    return SpecParser.range(t, offsets);
  }

  /**
   * The span from the first to the last real token of a rule (recovery may leave stop before
   * start).
   */
  private TextRange range(ParserRuleContext ctx) {
    Token start = ctx.getStart();
    Token stop = ctx.getStop();
    if (start == null || start.getType() == Token.EOF) {
      int at = start == null ? 0 : offsets.toUtf16(start.getStartIndex());
      return new TextRange(at, at);
    }
    int from = offsets.toUtf16(start.getStartIndex());
    int to =
        stop == null || stop.getStopIndex() < start.getStartIndex()
            ? offsets.toUtf16(start.getStopIndex() + 1)
            : offsets.toUtf16(stop.getStopIndex() + 1);
    return new TextRange(from, Math.max(from, to));
  }

  private static String unquote(String quoted) {
    String body = quoted.length() >= 2 ? quoted.substring(1, quoted.length() - 1) : quoted;
    StringBuilder out = new StringBuilder(body.length());
    for (int i = 0; i < body.length(); i++) {
      char c = body.charAt(i);
      if (c == '\\' && i + 1 < body.length()) {
        char next = body.charAt(++i);
        out.append(
            switch (next) {
              case 'n' -> '\n';
              case 't' -> '\t';
              default -> next;
            });
      } else {
        out.append(c);
      }
    }
    return out.toString();
  }
}
