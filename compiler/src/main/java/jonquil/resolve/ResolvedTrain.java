package jonquil.resolve;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.source.TextRange;

/** A train with names resolved: each path starts at a source or at a port of a placed element. */
public record ResolvedTrain(
    Path file, Optional<String> name, List<BeamPath> paths, TextRange range) {
  public ResolvedTrain {
    paths = List.copyOf(paths);
  }

  /** One path; {@code branchFrom} is set when it continues from another element's output port. */
  public record BeamPath(Optional<PortRef> branchFrom, List<Step> steps, TextRange range) {
    public BeamPath {
      steps = List.copyOf(steps);
    }
  }

  /**
   * An element's output port: one of {@link ElementKind#exits()} (a returning beam's {@code front}
   * or {@code side} included).
   */
  public record PortRef(Symbol element, String port, TextRange range) {}

  /** A step along a path. */
  public sealed interface Step {
    TextRange range();
  }

  /** The beam passes an element and leaves it by {@code exitPort}. */
  public record Element(Symbol symbol, String exitPort, TextRange range) implements Step {}

  /**
   * Light enters an element placed elsewhere by {@code face} (one of {@link
   * ElementKind#entryFaces()}): the same element, its parameters and tolerance draw, met again. The
   * path goes on with the light that leaves by {@code exitPort}, the one that crosses the element.
   */
  public record Entry(Symbol symbol, String face, String exitPort, TextRange range)
      implements Step {}

  /**
   * Free propagation over a length, in a medium (empty: the surrounding medium, air by default).
   */
  public record Gap(
      double length, OptionalDouble tolerance, Optional<Symbol> medium, TextRange range)
      implements Step {}
}
