package jonquil.syntax;

import java.util.List;
import java.util.Optional;
import jonquil.source.TextRange;

/** {@code train main { ... }}: the beam paths of a bench, one path per line. */
public record TrainDecl(Optional<Name> name, List<BeamPath> paths, TextRange range) {
  public TrainDecl {
    paths = List.copyOf(paths);
  }

  /** One chain of steps joined by arrows: {@code laser -> 150 mm -> hwp1 -> pbs1.through}. */
  public record BeamPath(List<Step> steps, TextRange range) {
    public BeamPath {
      steps = List.copyOf(steps);
    }
  }

  /** A step of a path: an element (optionally leaving by a named port) or a distance. */
  public sealed interface Step {
    TextRange range();
  }

  /** An element or {@code element.port} placed in the beam. */
  public record Place(Arg.RefArg ref) implements Step {
    @Override
    public TextRange range() {
      return ref.range();
    }
  }

  /** {@code 150 mm} or {@code 2.8 mm in saline}. */
  public record Distance(Arg.QuantityArg length, Optional<Arg.RefArg> medium, TextRange range)
      implements Step {}
}
