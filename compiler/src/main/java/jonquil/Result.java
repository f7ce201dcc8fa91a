package jonquil;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.RequirementStatus;
import jonquil.analysis.TrainSolution;
import jonquil.diag.Diagnostic;
import jonquil.diag.Severity;
import jonquil.resolve.ResolvedModel;
import jonquil.source.SourceFile;
import jonquil.syntax.SpecFile;

/**
 * Everything one check produced: the texts it read, the syntax tree of each spec file among them,
 * its diagnostics (sorted), and the verdict on every requirement, plus the resolved model (with its
 * name tables) and the solved trains of each checked root (and of each of its lines alone, where
 * its sources carry several). CLI formats, reports and the language server all read this one value,
 * so they cannot disagree, and editor answers never parse again.
 */
public record Result(
    Map<Path, SourceFile> files,
    Map<Path, SpecFile> trees,
    List<Diagnostic> diagnostics,
    List<RequirementOutcome> requirements,
    Map<Path, ResolvedModel> models,
    Map<Path, TrainSolution> solutions,
    Map<Path, Map<Double, TrainSolution>> lineSolutions) {
  public Result {
    files = byPath(files);
    trees = byPath(trees);
    diagnostics = diagnostics.stream().sorted(Diagnostic.ORDER).toList();
    requirements = List.copyOf(requirements);
    models = byPath(models);
    solutions = byPath(solutions);
    lineSolutions = byPath(lineSolutions);
  }

  /** Without each line's own solution (a spec of one line, or a caller that needs none). */
  public Result(
      Map<Path, SourceFile> files,
      Map<Path, SpecFile> trees,
      List<Diagnostic> diagnostics,
      List<RequirementOutcome> requirements,
      Map<Path, ResolvedModel> models,
      Map<Path, TrainSolution> solutions) {
    this(files, trees, diagnostics, requirements, models, solutions, Map.of());
  }

  /** A result without trees or resolved models, e.g. when nothing could be read. */
  public Result(
      Map<Path, SourceFile> files,
      List<Diagnostic> diagnostics,
      List<RequirementOutcome> requirements) {
    this(files, Map.of(), diagnostics, requirements, Map.of(), Map.of());
  }

  public long count(Severity severity) {
    return diagnostics.stream().filter(d -> d.severity() == severity).count();
  }

  public long count(RequirementStatus status) {
    return requirements.stream().filter(r -> r.status() == status).count();
  }

  /**
   * True when the CI gate must fail: any error (failed requirements are errors too), any
   * requirement not evaluated (fail closed: what cannot be evaluated does not pass), or any warning
   * when strict.
   */
  public boolean fails(boolean strict) {
    return count(Severity.ERROR) > 0
        || count(RequirementStatus.FAIL) > 0
        || count(RequirementStatus.NOT_EVALUATED) > 0
        || (strict && count(Severity.WARNING) > 0);
  }

  /**
   * Per-file maps iterate in path order, so outputs list files the same way on every run
   * (Map.copyOf's order changes from one JVM to the next).
   */
  private static <V> Map<Path, V> byPath(Map<Path, V> m) {
    return java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(m));
  }

  /**
   * True when some checked spec has a 'yield' requirement (an editor draws it in a second pass).
   */
  public boolean hasYields() {
    return models.values().stream()
        .flatMap(m -> m.requirements().stream())
        .anyMatch(q -> q.yield().isPresent());
  }
}
