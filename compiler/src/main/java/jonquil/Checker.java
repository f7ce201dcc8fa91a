package jonquil;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import jonquil.analysis.RequirementOutcome;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.Resolver;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.ParseResult;

/**
 * The façade: checks spec files in a workspace and returns one immutable {@link Result}.
 * Each file given is checked as the root of its own spec; files brought in with 'use'
 * are parsed once and shared. Never throws for user input; an internal failure becomes
 * a J901 diagnostic on the file being checked.
 */
public final class Checker {
  /** Diagnostics shown per file; more usually repeat one mistake (precedent: compilers cap at ~100 errors). */
  static final int MAX_DIAGNOSTICS_PER_FILE = 150;

  private Checker() {}

  public static Result check(Workspace workspace, List<Path> files) {
    Map<Path, ParseResult> parsed = new HashMap<>();
    Set<Diagnostic> diagnostics = new LinkedHashSet<>();
    List<RequirementOutcome> requirements = new ArrayList<>();
    Map<Path, ResolvedModel> models = new LinkedHashMap<>();
    for (Path file : files) {
      Path root = file.toAbsolutePath().normalize();
      try {
        SpecLoader loader = new SpecLoader(workspace, parsed);
        if (!loader.load(root)) {
          diagnostics.add(Diagnostic.of(DiagnosticCode.UNREADABLE_FILE, root, TextRange.EMPTY,
              "cannot read '" + root.getFileName() + "'"));
          continue;
        }
        for (Path p : loader.closure().keySet()) {
          diagnostics.addAll(parsed.get(p).diagnostics());
        }
        diagnostics.addAll(loader.diagnostics());
        ResolvedModel model = Resolver.resolve(root, loader.closure(), loader.edges());
        diagnostics.addAll(model.diagnostics());
        models.put(root, model);
        for (ResolvedRequirement r : model.requirements()) {
          requirements.add(RequirementOutcome.notEvaluated(r.file(), r.syntax().range(), r.syntax().text(),
              r.valid() ? "form checked; this version does not compute "
                  + r.measure().map(m -> m.word()).orElse("it") + " yet"
                  : "the requirement has errors"));
        }
      } catch (RuntimeException | StackOverflowError e) {
        diagnostics.add(Diagnostic.of(DiagnosticCode.INTERNAL_ERROR, root, TextRange.EMPTY,
            "the checker failed internally (" + e.getClass().getSimpleName() + "); please report this file"));
      }
    }
    Map<Path, SourceFile> sources = new LinkedHashMap<>();
    parsed.forEach((p, r) -> sources.put(p, r.source()));
    return new Result(sources, capped(diagnostics), requirements, models);
  }

  private static List<Diagnostic> capped(Set<Diagnostic> all) {
    Map<Path, List<Diagnostic>> byFile = new LinkedHashMap<>();
    all.stream().sorted(Diagnostic.ORDER).forEach(d -> byFile.computeIfAbsent(d.file(), k -> new ArrayList<>()).add(d));
    List<Diagnostic> out = new ArrayList<>();
    byFile.forEach((file, list) -> {
      if (list.size() <= MAX_DIAGNOSTICS_PER_FILE) {
        out.addAll(list);
        return;
      }
      out.addAll(list.subList(0, MAX_DIAGNOSTICS_PER_FILE));
      out.add(Diagnostic.of(DiagnosticCode.TOO_MANY_ERRORS, file, list.get(MAX_DIAGNOSTICS_PER_FILE).range(),
          (list.size() - MAX_DIAGNOSTICS_PER_FILE) + " more problems in this file are not shown"));
    });
    return out;
  }
}
