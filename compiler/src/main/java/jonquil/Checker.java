package jonquil;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.BiConsumer;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import jonquil.analysis.Analyzer;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.TrainSolution;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Severity;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Resolver;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.ParseResult;
import jonquil.syntax.SpecFile;

/**
 * The façade: checks spec files in a workspace and returns one immutable {@link Result}. Each file
 * given is checked as the root of its own spec; files brought in with 'use' are parsed once and
 * shared. Never throws for user input; an internal failure becomes a J901 diagnostic on the file
 * being checked.
 */
public final class Checker {
  /**
   * Diagnostics shown per file; more usually repeat one mistake (precedent: compilers cap at ~100
   * errors).
   */
  static final int MAX_DIAGNOSTICS_PER_FILE = 150;

  private Checker() {}

  public static Result check(Workspace workspace, List<Path> files) {
    return check(workspace, files, CheckOptions.FULL);
  }

  public static Result check(Workspace workspace, List<Path> files, CheckOptions options) {
    return check(workspace, files, options, () -> false).orElseThrow();
  }

  /**
   * As above, but gives up (empty) when {@code superseded} turns true: an editor asks this when a
   * newer edit has made the check's input stale, so the next check starts sooner. It is polled
   * between stages only, so every stage still runs to completion or not at all.
   */
  public static Optional<Result> check(
      Workspace workspace, List<Path> files, CheckOptions options, BooleanSupplier superseded) {
    return check(workspace, files, options, superseded, (file, failure) -> {});
  }

  /**
   * As above, handing each internal failure to {@code onInternalError} as well (the command line
   * prints its stack trace under '--debug'; the J901 finding carries no trace).
   */
  public static Optional<Result> check(
      Workspace workspace,
      List<Path> files,
      CheckOptions options,
      BooleanSupplier superseded,
      BiConsumer<Path, Throwable> onInternalError) {
    return check(workspace, files, options, superseded, onInternalError, true, root -> {});
  }

  /**
   * Checks {@code files} one after another, handing each root's model and solution to {@code
   * onRoot} as soon as it is checked and keeping none of them: the result holds the texts read, the
   * diagnostics and the verdicts, but no trees, models or solutions. Memory then stays flat however
   * many files a folder holds (a command-line check of a whole tree needs nothing more).
   */
  public static Result checkEach(
      Workspace workspace,
      List<Path> files,
      CheckOptions options,
      BiConsumer<Path, Throwable> onInternalError,
      Consumer<CheckedRoot> onRoot) {
    return check(workspace, files, options, () -> false, onInternalError, false, onRoot)
        .orElseThrow();
  }

  private static Optional<Result> check(
      Workspace workspace,
      List<Path> files,
      CheckOptions options,
      BooleanSupplier superseded,
      BiConsumer<Path, Throwable> onInternalError,
      boolean keep,
      Consumer<CheckedRoot> onRoot) {
    Map<Path, ParseResult> parsed = new LinkedHashMap<>();
    Map<Path, SourceFile> read = new LinkedHashMap<>();
    Set<Diagnostic> diagnostics = new LinkedHashSet<>();
    List<RequirementOutcome> requirements = new ArrayList<>();
    Map<Path, ResolvedModel> models = new LinkedHashMap<>();
    Map<Path, TrainSolution> solutions = new LinkedHashMap<>();
    Map<Path, Map<Double, TrainSolution>> lineSolutions = new LinkedHashMap<>();
    Map<Path, SourceFile> dataSources = new LinkedHashMap<>();
    for (Path file : files) {
      if (superseded.getAsBoolean()) {
        return Optional.empty();
      }
      Path root = file.toAbsolutePath().normalize();
      int requirementsBefore = requirements.size();
      ResolvedModel model = null;
      TrainSolution solution = null;
      Map<Double, TrainSolution> lines = Map.of();
      try {
        SpecLoader loader = new SpecLoader(workspace, parsed);
        boolean loaded = loader.load(root);
        if (superseded.getAsBoolean()) {
          return Optional.empty();
        }
        if (!loaded) {
          diagnostics.add(
              Diagnostic.of(
                  DiagnosticCode.UNREADABLE_FILE,
                  root,
                  TextRange.EMPTY,
                  "cannot read '" + root.getFileName() + "'"));
          continue;
        }
        List<Diagnostic> found = new ArrayList<>();
        for (Path p : loader.closure().keySet()) {
          found.addAll(parsed.get(p).diagnostics());
        }
        found.addAll(loader.diagnostics());
        ResolvedModel resolved =
            Resolver.resolve(
                root,
                loader.closure(),
                loader.edges(),
                loader.dataFiles(),
                loader.dataFileProblems());
        model = options.standard().map(resolved::withStandard).orElse(resolved);
        loader
            .dataFiles()
            .forEach((p, text) -> dataSources.putIfAbsent(p, new SourceFile(p, text)));
        found.addAll(model.diagnostics());
        diagnostics.addAll(found);
        if (keep) {
          models.put(root, model);
        }
        if (superseded.getAsBoolean()) {
          return Optional.empty();
        }
        if (!options.analyses()) {
          continue; // names only: no requirement verdicts, no physics
        }
        if (found.stream().anyMatch(d -> d.severity() == Severity.ERROR)) {
          requirements.addAll(
              RequirementOutcome.noneEvaluated(model, "not evaluated: the spec has errors"));
          continue;
        }
        Analyzer.Analysis analysis =
            Analyzer.analyze(model, options.yields(), options.draws(), superseded);
        diagnostics.addAll(analysis.diagnostics());
        requirements.addAll(analysis.outcomes());
        solution = analysis.solution().orElse(null);
        lines = analysis.lines();
        if (keep && solution != null) {
          solutions.put(root, solution);
          lineSolutions.put(root, lines);
        }
      } catch (jonquil.analysis.CheckSuperseded stale) {
        return Optional.empty();
      } catch (RuntimeException | StackOverflowError e) {
        onInternalError.accept(root, e);
        // Fail closed: the file's requirements stay in the summary, none of them judged.
        requirements.subList(requirementsBefore, requirements.size()).clear();
        solution = null;
        lines = Map.of();
        if (model != null) {
          requirements.addAll(
              RequirementOutcome.noneEvaluated(
                  model, "not evaluated: the checker failed internally"));
        }
        diagnostics.add(
            Diagnostic.of(
                DiagnosticCode.INTERNAL_ERROR,
                root,
                TextRange.EMPTY,
                "the checker failed internally ("
                    + e.getClass().getSimpleName()
                    + "); please report this file"));
      } finally {
        if (!keep) {
          // Only what a later file may 'use' stays parsed; the root's text stays for positions.
          ParseResult own = parsed.remove(root);
          if (own != null) {
            read.putIfAbsent(root, own.source());
          }
          onRoot.accept(
              new CheckedRoot(
                  root, Optional.ofNullable(model), Optional.ofNullable(solution), lines));
        }
      }
    }
    Map<Path, SourceFile> sources = new LinkedHashMap<>(read);
    Map<Path, SpecFile> trees = new LinkedHashMap<>();
    parsed.forEach(
        (p, r) -> {
          sources.putIfAbsent(p, r.source());
          if (keep) {
            trees.put(p, r.ast());
          }
        });
    dataSources.forEach(sources::putIfAbsent);
    return Optional.of(
        new Result(
            sources, trees, capped(diagnostics), requirements, models, solutions, lineSolutions));
  }

  private static List<Diagnostic> capped(Set<Diagnostic> all) {
    Map<Path, List<Diagnostic>> byFile = new LinkedHashMap<>();
    all.stream()
        .sorted(Diagnostic.ORDER)
        .forEach(d -> byFile.computeIfAbsent(d.file(), k -> new ArrayList<>()).add(d));
    List<Diagnostic> out = new ArrayList<>();
    byFile.forEach(
        (file, list) -> {
          if (list.size() <= MAX_DIAGNOSTICS_PER_FILE) {
            out.addAll(list);
            return;
          }
          out.addAll(list.subList(0, MAX_DIAGNOSTICS_PER_FILE));
          out.add(
              Diagnostic.of(
                  DiagnosticCode.TOO_MANY_ERRORS,
                  file,
                  list.get(MAX_DIAGNOSTICS_PER_FILE).range(),
                  (list.size() - MAX_DIAGNOSTICS_PER_FILE)
                      + " more problems in this file are not shown"));
        });
    return out;
  }
}
