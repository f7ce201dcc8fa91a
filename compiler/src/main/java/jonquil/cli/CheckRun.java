package jonquil.cli;

import java.nio.file.Path;
import java.util.List;
import jonquil.Result;

/**
 * One finished check as every report format sees it: the checker's result, the two directories
 * paths are shown against, and the inputs that could not be read.
 */
public record CheckRun(Result result, Path root, Path cwd, List<String> inputProblems) {
  public CheckRun {
    root = root.toAbsolutePath().normalize();
    cwd = cwd.toAbsolutePath().normalize();
    inputProblems = List.copyOf(inputProblems);
  }

  /** Ran to the end and read every input it was given. */
  public boolean complete() {
    return inputProblems.isEmpty();
  }
}
