package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.analysis.PortValue;
import jonquil.analysis.TrainSolution;
import jonquil.optics.Coherency;
import jonquil.optics.Handedness;
import jonquil.resolve.ResolvedModel;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;
import jonquil.units.Dimension;

/**
 * Puts the solved power after each element of a train path, so the budget reads along the beam as
 * it is typed.
 */
final class InlayHints {
  private InlayHints() {}

  static List<InlayHint> of(Result r, Path file, int start, int end) {
    Optional<SpecFile> tree = OwningModels.tree(r, file);
    Optional<TrainSolution> solution = solution(r, file);
    if (tree.isEmpty() || solution.isEmpty()) {
      return List.of();
    }
    List<InlayHint> out = new ArrayList<>();
    for (TrainDecl train : tree.get().trains()) {
      for (TrainDecl.BeamPath path : train.paths()) {
        for (TrainDecl.Step step : path.steps()) {
          int at = step.range().end();
          if (step instanceof TrainDecl.Place place && at >= start && at <= end) {
            Optional<InlayHint> entry = entry(solution.get(), place, at);
            if (entry.isPresent()) {
              out.add(entry.get());
              continue;
            }
            leaving(solution.get(), place)
                .ifPresent(
                    v ->
                        out.add(
                            new InlayHint(
                                at, " " + MarkdownText.q(v.power(), Dimension.POWER), tooltip(v))));
          }
        }
      }
    }
    return out;
  }

  /** The solution of the first root that reads this file and was analysed. */
  private static Optional<TrainSolution> solution(Result r, Path file) {
    for (ResolvedModel m : OwningModels.reading(r, file)) {
      Optional<TrainSolution> s = OwningModels.solution(r, m);
      if (s.isPresent()) {
        return s;
      }
    }
    return Optional.empty();
  }

  /**
   * The light at the port the path leaves by: the named one, else the element's own key (its exit
   * port).
   */
  private static Optional<PortValue> leaving(TrainSolution s, TrainDecl.Place place) {
    String name = place.ref().name().text();
    Optional<PortValue> v = s.port(place.ref().text());
    return v.isPresent() || place.ref().port().isPresent() ? v : s.port(name + ".out");
  }

  /**
   * A step that enters an element again by a face: the light that left by all its passes through
   * that face, summed, with each pass in the tooltip.
   */
  private static Optional<InlayHint> entry(TrainSolution s, TrainDecl.Place place, int at) {
    if (place.ref().port().isEmpty()) {
      return Optional.empty();
    }
    String face = place.ref().port().get().text();
    List<jonquil.analysis.ElementPass> passes =
        s.passesOf(place.ref().name().text()).stream().filter(p -> p.face().equals(face)).toList();
    if (passes.isEmpty() || s.port(place.ref().text()).isPresent()) {
      return Optional.empty();
    }
    double out = passes.stream().mapToDouble(jonquil.analysis.ElementPass::powerOut).sum();
    StringBuilder tip = new StringBuilder();
    for (jonquil.analysis.ElementPass p : passes) {
      tip.append(tip.length() == 0 ? "" : "; ")
          .append("in by '")
          .append(p.face())
          .append("' ")
          .append(MarkdownText.q(p.powerIn(), Dimension.POWER))
          .append(", out ")
          .append(MarkdownText.q(p.powerOut(), Dimension.POWER))
          .append(": ")
          .append(polarization(p.out()));
    }
    return Optional.of(
        new InlayHint(at, " " + MarkdownText.q(out, Dimension.POWER), tip.toString()));
  }

  /** Light recorded without a port is light a beam stop receives. */
  static String tooltip(PortValue v) {
    String where =
        v.port().isEmpty() ? "arriving at '" + v.element() + "'" : "leaving '" + v.key() + "'";
    return MarkdownText.q(v.power(), Dimension.POWER)
        + " "
        + where
        + ": "
        + polarization(v.light())
        + (v.vertical() ? " (carried frame: the beam runs vertically)" : "");
  }

  /**
   * A one-line polarization summary, with handedness as seen by the receiver looking back towards
   * the source.
   */
  static String polarization(Coherency c) {
    if (c.power() <= 0) {
      return "no light";
    }
    double dop = c.dop();
    if (dop < 1e-9) {
      return "unpolarized";
    }
    double ellipticity = Math.toDegrees(c.ellipticityAngle());
    String state;
    if (Math.abs(ellipticity) < 0.05) {
      state = "linear " + MarkdownText.deg(c.azimuth());
    } else if (Math.abs(Math.abs(ellipticity) - 45) < 0.05) {
      state = "circular " + hand(c.handedness());
    } else {
      state =
          "elliptical "
              + MarkdownText.deg(c.azimuth())
              + ", ellipticity "
              + MarkdownText.deg(c.ellipticityAngle())
              + ", "
              + hand(c.handedness());
    }
    if (c.handedness() != Handedness.NONE && Math.abs(ellipticity) >= 0.05) {
      state += " (as seen by the receiver, looking back towards the source)";
    }
    return state + (dop < 0.9995 ? ", DOP " + MarkdownText.num(dop) : "");
  }

  private static String hand(Handedness h) {
    return h == Handedness.RIGHT ? "right" : h == Handedness.LEFT ? "left" : "none";
  }
}
