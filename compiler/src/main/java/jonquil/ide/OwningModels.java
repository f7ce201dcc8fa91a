package jonquil.ide;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.analysis.TrainSolution;
import jonquil.resolve.ResolvedModel;
import jonquil.syntax.SpecFile;

/**
 * Finds the model, solution and syntax tree that answer for a file, since a part library can belong
 * to several roots.
 */
final class OwningModels {
  private OwningModels() {}

  /** OwningModels in a stable order (by root path). */
  static List<ResolvedModel> ordered(Result r) {
    return r.models().values().stream()
        .sorted(Comparator.comparing(m -> m.root().toString()))
        .toList();
  }

  /** The models that read this file: its own root first, then the roots that use it. */
  static List<ResolvedModel> reading(Result r, Path file) {
    return ordered(r).stream()
        .filter(m -> m.scopes().containsKey(file))
        .sorted(Comparator.comparing(m -> m.root().equals(file) ? 0 : 1))
        .toList();
  }

  static Optional<ResolvedModel> primary(Result r, Path file) {
    return reading(r, file).stream().findFirst();
  }

  static Optional<TrainSolution> solution(Result r, ResolvedModel m) {
    return Optional.ofNullable(r.solutions().get(m.root()));
  }

  /**
   * Each line's own solution, shortest first, as the check solved it; empty for a model of one
   * line.
   */
  static Map<Double, TrainSolution> lines(Result r, ResolvedModel m) {
    return r.lineSolutions().getOrDefault(m.root(), Map.of());
  }

  /** The syntax tree the check built for a spec file; none for a data file or an unread one. */
  static Optional<SpecFile> tree(Result r, Path file) {
    return Optional.ofNullable(r.trees().get(file));
  }

  /** Spec files (not the n,k data files that a result also carries). */
  static boolean isSpec(Result r, Path file) {
    return r.models().values().stream().anyMatch(m -> m.scopes().containsKey(file))
        || file.getFileName().toString().endsWith(".jonq");
  }

  static Path norm(Path file) {
    return file.toAbsolutePath().normalize();
  }
}
