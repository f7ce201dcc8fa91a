package jonquil.cli;

import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Parameters;

/** The PATH arguments of the commands that read specs (a picocli mixin). */
final class SpecPaths {
  @Parameters(
      paramLabel = "PATH",
      arity = "1..*",
      description = "A .jonq file, or a directory: every .jonq file below it, in sorted order.")
  List<String> paths = new ArrayList<>();
}
