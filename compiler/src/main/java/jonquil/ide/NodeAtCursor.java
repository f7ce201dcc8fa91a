package jonquil.ide;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.syntax.Arg;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.syntax.RequireDecl;
import jonquil.syntax.Requirement;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;
import jonquil.syntax.UseDecl;

/** Finds the syntax node under a cursor, for the questions the name side table cannot answer. */
final class NodeAtCursor {
  private NodeAtCursor() {}

  static Optional<UseDecl> use(SpecFile f, int offset) {
    return f.uses().stream().filter(u -> u.targetRange().contains(offset)).findFirst();
  }

  /** The declaration whose kind word is under the cursor. */
  static Optional<Declaration> kindWord(SpecFile f, int offset) {
    return f.declarations().stream().filter(d -> d.kind().range().contains(offset)).findFirst();
  }

  static Optional<Requirement> requirement(SpecFile f, int offset) {
    for (RequireDecl block : f.requires()) {
      for (Requirement r : block.requirements()) {
        if (r.range().contains(offset)) {
          return Optional.of(r);
        }
      }
    }
    return Optional.empty();
  }

  /** The element and port of a path step whose port name is under the cursor. */
  static Optional<Arg.RefArg> port(SpecFile f, int offset) {
    for (TrainDecl t : f.trains()) {
      for (TrainDecl.BeamPath path : t.paths()) {
        for (TrainDecl.Step step : path.steps()) {
          if (step instanceof TrainDecl.Place p
              && p.ref().port().isPresent()
              && p.ref().port().get().range().contains(offset)) {
            return Optional.of(p.ref());
          }
        }
      }
    }
    return Optional.empty();
  }

  static Optional<Arg.QuantityArg> quantity(SpecFile f, int offset) {
    return quantities(f).stream().filter(q -> q.range().contains(offset)).findFirst();
  }

  /** Every quantity literal of the file, wherever it is written. */
  static List<Arg.QuantityArg> quantities(SpecFile f) {
    List<Arg> args = new ArrayList<>();
    for (Declaration d : f.declarations()) {
      d.shorthand().ifPresent(args::addAll);
      for (Property p : d.properties()) {
        args.addAll(p.args());
      }
    }
    for (TrainDecl t : f.trains()) {
      for (TrainDecl.BeamPath path : t.paths()) {
        for (TrainDecl.Step step : path.steps()) {
          if (step instanceof TrainDecl.Distance d) {
            args.add(d.length());
          }
        }
      }
    }
    for (RequireDecl block : f.requires()) {
      for (Requirement r : block.requirements()) {
        r.yield().ifPresent(y -> args.add(y.bound()));
        r.check().condition().ifPresent(c -> addCondition(args, c));
        r.check().extras().forEach(e -> addCondition(args, e.condition()));
        r.check()
            .band()
            .ifPresent(
                b -> {
                  args.add(b.low());
                  args.add(b.high());
                });
      }
    }
    List<Arg.QuantityArg> out = new ArrayList<>();
    args.forEach(a -> collect(a, out));
    return out;
  }

  private static void addCondition(List<Arg> args, Requirement.Condition c) {
    if (c instanceof Requirement.Compare cmp) {
      args.add(cmp.value());
    } else if (c instanceof Requirement.Within w) {
      args.add(w.low());
      args.add(w.high());
    } else if (c instanceof Requirement.Is is) {
      args.addAll(is.state());
    }
  }

  private static void collect(Arg a, List<Arg.QuantityArg> out) {
    if (a instanceof Arg.QuantityArg q) {
      out.add(q);
    } else if (a instanceof Arg.RangeArg r) {
      collect(r.low(), out);
      collect(r.high(), out);
    }
  }
}
