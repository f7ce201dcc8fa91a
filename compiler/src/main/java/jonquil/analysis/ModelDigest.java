package jonquil.analysis;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.TreeMap;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.resolve.Value;

/**
 * The seed of a spec's Monte Carlo builds: SHA-256 over a canonical text of its resolved elements
 * and trains (names, kinds, SI values with their tolerances, steps in path order; elements,
 * parameters and slots in name order, since the order a map was filled in may differ from one JVM
 * start to the next). Positions, comments, layout and the folder the files sit in are left out, so
 * reformatting or moving a spec draws the same builds, while any change to a value draws new ones.
 * A seed given on the command line is hashed in after the model.
 */
final class ModelDigest {
  private ModelDigest() {}

  static long seed(ResolvedModel model, OptionalLong userSeed) {
    StringBuilder text = new StringBuilder();
    for (ResolvedElement e : Tolerances.canonical(model)) {
      text.append("element ").append(e.symbol().name()).append(' ').append(e.kind().word());
      for (Map.Entry<String, List<Value.Group>> p : new TreeMap<>(e.params()).entrySet()) {
        text.append("\n ").append(p.getKey());
        p.getValue().forEach(g -> value(g, text));
      }
      text.append('\n');
    }
    for (ResolvedTrain t : model.trains()) {
      text.append("train ").append(t.name().orElse("")).append('\n');
      for (ResolvedTrain.BeamPath p : t.paths()) {
        text.append(" path");
        p.branchFrom()
            .ifPresent(
                b -> text.append(" from ").append(b.element().name()).append('.').append(b.port()));
        for (ResolvedTrain.Step s : p.steps()) {
          if (s instanceof ResolvedTrain.Element el) {
            text.append(" -> ").append(el.symbol().name()).append('.').append(el.exitPort());
          } else if (s instanceof ResolvedTrain.Entry en) {
            text.append(" -> into ").append(en.symbol().name()).append('.').append(en.face());
          } else if (s instanceof ResolvedTrain.Gap gap) {
            text.append(" -> ").append(hex(gap.length()));
            gap.tolerance().ifPresent(h -> text.append('±').append(hex(h)));
            gap.medium().ifPresent(m -> text.append(" in ").append(m.name()));
          }
        }
        text.append('\n');
      }
    }
    try {
      MessageDigest sha = MessageDigest.getInstance("SHA-256");
      sha.update(text.toString().getBytes(StandardCharsets.UTF_8));
      if (userSeed.isPresent()) {
        sha.update(ByteBuffer.allocate(Long.BYTES).putLong(userSeed.getAsLong()).array());
      }
      return ByteBuffer.wrap(sha.digest()).getLong();
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform has SHA-256", e);
    }
  }

  private static void value(Value v, StringBuilder text) {
    if (v instanceof Value.Num n) {
      text.append(' ').append(hex(n.si())).append(' ').append(n.dimension());
      n.tolerance().ifPresent(h -> text.append('±').append(hex(h)));
    } else if (v instanceof Value.Word w) {
      text.append(" word ").append(w.text());
    } else if (v instanceof Value.Ref r) {
      text.append(" ref ").append(r.symbol().name());
    } else if (v instanceof Value.Text t) {
      text.append(" text ").append(t.text().length()).append(':').append(t.text());
    } else if (v instanceof Value.Table t) {
      text.append(" table ").append(t.rows().size());
      for (double[] row : t.rows()) {
        for (double x : row) {
          text.append(' ').append(hex(x));
        }
      }
    } else if (v instanceof Value.Flag) {
      text.append(" flag");
    } else if (v instanceof Value.Group g) {
      text.append(" {");
      new TreeMap<>(g.slots())
          .forEach(
              (k, inner) -> {
                text.append(' ').append(k).append('=');
                value(inner, text);
              });
      g.items().forEach(i -> value(i, text));
      text.append(" }");
    }
  }

  /** Exact and the same on every platform, unlike a decimal rendering. */
  private static String hex(double x) {
    return Double.toHexString(x);
  }
}
