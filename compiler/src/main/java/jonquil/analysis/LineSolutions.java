package jonquil.analysis;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;
import jonquil.resolve.ResolvedModel;

/**
 * The trains solved for each laser line alone, for the figures that hold per line (its power, its
 * beam, its polarization, its eye-safety figures) where the full solution adds the lines up. The
 * same solve a requirement 'for line' judges (the analyzer's cache), done once per check so that
 * the editor reads them from the {@code Result} and computes no physics of its own.
 */
final class LineSolutions {
  private LineSolutions() {}

  /**
   * Each distinct line of the sources that start a path, shortest first, with the trains solved for
   * that line alone; empty when the model has one line or none (the full solution is that line's).
   * A line whose solve the physics refuses is left out: the full check reports why.
   */
  static Map<Double, TrainSolution> of(
      ResolvedModel model, Function<OptionalDouble, TrainSolution> solve) {
    java.util.List<Double> lines = SourceBeams.lines(model);
    if (lines.size() < 2) {
      return Map.of();
    }
    Map<Double, TrainSolution> out = new LinkedHashMap<>();
    for (double wl : lines) {
      try {
        out.put(wl, solve.apply(OptionalDouble.of(wl)));
      } catch (UnphysicalModel refused) {
        // Not this line's figures; the check that solved all lines carries the finding.
      }
    }
    return Collections.unmodifiableMap(out);
  }
}
