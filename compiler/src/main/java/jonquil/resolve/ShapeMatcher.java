package jonquil.resolve;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import jonquil.syntax.Arg;
import jonquil.units.Dimension;

/**
 * Structural matching of an argument list against a {@link Shape}, with backtracking (argument
 * lists are a handful of items) and the furthest failure kept for the message.
 */
final class ShapeMatcher {

  /** One leaf of a shape bound to the argument that fills it; {@code item} numbers list items. */
  record Binding(Shape leaf, Arg arg, int item) {}

  /** A complete match, or the furthest point reached and what was expected there. */
  record Outcome(List<Binding> bindings, int failedAt, Set<String> expected, Arg failedArg) {
    boolean matched() {
      return bindings != null;
    }
  }

  private record Partial(int pos, List<Binding> bindings, int item) {
    Partial with(Binding b) {
      List<Binding> next = new ArrayList<>(bindings);
      next.add(b);
      return new Partial(pos + 1, next, item);
    }
  }

  private final List<Arg> args;
  private int furthest = -1;
  private final Set<String> expected = new LinkedHashSet<>();

  private ShapeMatcher(List<Arg> args) {
    this.args = args;
  }

  static Outcome match(Shape shape, List<Arg> args) {
    ShapeMatcher m = new ShapeMatcher(args);
    for (Partial p : m.match(shape, new Partial(0, List.of(), -1))) {
      if (p.pos == args.size()) {
        return new Outcome(p.bindings, -1, Set.of(), null);
      }
      m.fail(p.pos, "nothing more");
    }
    Arg at = m.furthest >= 0 && m.furthest < args.size() ? args.get(m.furthest) : null;
    return new Outcome(null, m.furthest, m.expected, at);
  }

  private void fail(int pos, String what) {
    if (pos > furthest) {
      furthest = pos;
      expected.clear();
    }
    if (pos == furthest) {
      expected.add(what);
    }
  }

  private List<Partial> match(Shape shape, Partial p) {
    if (shape instanceof Shape.Seq seq) {
      List<Partial> current = List.of(p);
      for (Shape part : seq.parts()) {
        List<Partial> next = new ArrayList<>();
        for (Partial c : current) {
          next.addAll(match(part, c));
        }
        current = next;
        if (current.isEmpty()) {
          break;
        }
      }
      return current;
    }
    if (shape instanceof Shape.Opt opt) {
      List<Partial> out = new ArrayList<>(match(opt.part(), p));
      out.add(p);
      return out;
    }
    if (shape instanceof Shape.OneOf one) {
      List<Partial> out = new ArrayList<>();
      int before = furthest;
      for (Shape alt : one.alternatives()) {
        out.addAll(match(alt, p));
      }
      if (out.isEmpty() && furthest == p.pos && before < p.pos) {
        expected.clear();
        expected.add(one.description());
      }
      return out;
    }
    if (shape instanceof Shape.ListOf list) {
      List<Partial> out = new ArrayList<>();
      List<Partial> frontier = match(list.item(), new Partial(p.pos, p.bindings, 0));
      int item = 0;
      while (!frontier.isEmpty()) {
        out.addAll(frontier);
        item++;
        List<Partial> next = new ArrayList<>();
        for (Partial f : frontier) {
          if (f.pos < args.size() && args.get(f.pos) instanceof Arg.CommaArg) {
            next.addAll(match(list.item(), new Partial(f.pos + 1, f.bindings, item)));
          }
        }
        frontier = next;
      }
      return out.stream().map(x -> new Partial(x.pos, x.bindings, -1)).toList();
    }
    if (shape instanceof Shape.Keyed keyed) {
      return matchKeyed(keyed, p, new boolean[keyed.clauses().size()]);
    }
    return leaf(shape, p);
  }

  private List<Partial> matchKeyed(Shape.Keyed keyed, Partial p, boolean[] used) {
    List<Partial> out = new ArrayList<>();
    for (int i = 0; i < keyed.clauses().size(); i++) {
      if (used[i]) {
        continue;
      }
      for (Partial after : match(keyed.clauses().get(i), p)) {
        out.add(after);
        if (after.pos < args.size() && args.get(after.pos) instanceof Arg.CommaArg) {
          boolean[] nowUsed = used.clone();
          nowUsed[i] = true;
          out.addAll(
              matchKeyed(keyed, new Partial(after.pos + 1, after.bindings, after.item), nowUsed));
        }
      }
    }
    return out;
  }

  private List<Partial> leaf(Shape shape, Partial p) {
    if (p.pos >= args.size()) {
      fail(p.pos, describe(shape));
      return List.of();
    }
    Arg arg = args.get(p.pos);
    boolean fits;
    if (shape instanceof Shape.Quantity
        || shape instanceof Shape.Ratio
        || shape instanceof Shape.PowerRatio
        || shape instanceof Shape.Count
        || shape instanceof Shape.Density) {
      fits = arg instanceof Arg.QuantityArg;
    } else if (shape instanceof Shape.Span) {
      fits =
          arg instanceof Arg.RangeArg r
              && r.low() instanceof Arg.QuantityArg
              && r.high() instanceof Arg.QuantityArg;
    } else if (shape instanceof Shape.Word w) {
      fits =
          arg instanceof Arg.RefArg ref
              && ref.port().isEmpty()
              && (w.choices().isEmpty() || w.choices().contains(ref.name().text()));
    } else if (shape instanceof Shape.Literal l) {
      fits =
          arg instanceof Arg.RefArg ref
              && ref.port().isEmpty()
              && ref.name().text().equals(l.word());
    } else if (shape instanceof Shape.Reference) {
      fits = arg instanceof Arg.RefArg ref && ref.port().isEmpty();
    } else if (shape instanceof Shape.Text) {
      fits = arg instanceof Arg.StringArg;
    } else if (shape instanceof Shape.Comma) {
      fits = arg instanceof Arg.CommaArg;
    } else {
      fits = false;
    }
    if (!fits) {
      fail(p.pos, describe(shape));
      return List.of();
    }
    return List.of(p.with(new Binding(shape, arg, p.item)));
  }

  /** What a leaf shape looks like, in words, for "expected ..." messages. */
  static String describe(Shape shape) {
    if (shape instanceof Shape.Quantity q) {
      return describeDimensions(q.dimensions()) + " such as '" + q.example() + "'";
    } else if (shape instanceof Shape.Ratio) {
      return "a fraction such as '95 %'";
    } else if (shape instanceof Shape.PowerRatio) {
      return "a ratio such as '1000' or '30 dB'";
    } else if (shape instanceof Shape.Count c) {
      return c.integer() ? "a whole number" : "a number";
    } else if (shape instanceof Shape.Density) {
      return "an optical density such as 'OD 3'";
    } else if (shape instanceof Shape.Span s) {
      return "a range such as '" + s.low().example() + " .. " + s.high().example() + "'";
    } else if (shape instanceof Shape.Word w) {
      return quoteList(w.choices());
    } else if (shape instanceof Shape.Literal l) {
      return "'" + l.word() + "'";
    } else if (shape instanceof Shape.Reference r) {
      return "the name of "
          + String.join(" or ", r.categories().stream().map(Category::phrase).toList());
    } else if (shape instanceof Shape.Text) {
      return "a quoted file name";
    } else if (shape instanceof Shape.Comma) {
      return "','";
    } else if (shape instanceof Shape.OneOf o) {
      return o.description();
    }
    return "a value";
  }

  /** Joins expectations into "a, b or c". */
  static String quoteFree(java.util.Collection<String> expected) {
    List<String> all = new ArrayList<>(expected);
    if (all.isEmpty()) {
      return "a value";
    }
    if (all.size() == 1) {
      return all.get(0);
    }
    return String.join(", ", all.subList(0, all.size() - 1)) + " or " + all.get(all.size() - 1);
  }

  static String describeDimensions(List<Dimension> dims) {
    List<String> names = dims.stream().map(d -> article(d.describe())).toList();
    return String.join(" or ", names);
  }

  static String article(String noun) {
    return (noun.matches("^[aeiou].*") ? "an " : "a ") + noun;
  }

  static String quoteList(List<String> words) {
    List<String> quoted = words.stream().map(w -> "'" + w + "'").toList();
    if (quoted.size() <= 1) {
      return quoted.isEmpty() ? "a word" : quoted.get(0);
    }
    return String.join(", ", quoted.subList(0, quoted.size() - 1))
        + " or "
        + quoted.get(quoted.size() - 1);
  }
}
