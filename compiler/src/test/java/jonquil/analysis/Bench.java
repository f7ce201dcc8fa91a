package jonquil.analysis;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Severity;

/** Checks a spec written inline in a test, as if it were a file of an empty project. */
final class Bench {
  static final Path ROOT = Path.of("/virtual/bench").toAbsolutePath();

  private Bench() {}

  static Result check(String spec) {
    Path file = ROOT.resolve("test.jonq");
    Result r = Checker.check(Workspace.withOverlay(ROOT, Map.of(file, spec)), List.of(file));
    if (r.count(Severity.ERROR) > 0 && r.solutions().isEmpty()) {
      throw new AssertionError("the test spec has errors: " + r.diagnostics());
    }
    return r;
  }

  static TrainSolution solve(String spec) {
    return check(spec).solutions().values().iterator().next();
  }
}
