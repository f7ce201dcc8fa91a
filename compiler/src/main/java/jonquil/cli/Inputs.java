package jonquil.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * The spec files a check will read, expanded from the command line's PATH arguments, plus one-line
 * complaints about arguments that could not be used.
 */
record Inputs(List<Path> files, List<String> problems) {
  static final String EXTENSION = ".jonq";

  Inputs {
    files = List.copyOf(files);
    problems = List.copyOf(problems);
  }

  /**
   * Directories expand to every spec below them in sorted order, so that two runs over the same
   * tree report in the same order; a file named twice is checked once.
   */
  static Inputs collect(List<String> arguments, Path cwd) {
    Set<Path> files = new LinkedHashSet<>();
    List<String> problems = new ArrayList<>();
    for (String argument : arguments) {
      Path path;
      try {
        path = cwd.resolve(argument).toAbsolutePath().normalize();
      } catch (InvalidPathException e) {
        problems.add(cannotRead(argument, "not a valid file path"));
        continue;
      }
      if (!Files.exists(path)) {
        problems.add(cannotRead(argument, "no such file"));
      } else if (Files.isDirectory(path)) {
        List<Path> found;
        try {
          found = specsBelow(path);
        } catch (IOException | UncheckedIOException e) {
          problems.add(cannotRead(argument, "cannot list directory"));
          continue;
        }
        if (found.isEmpty()) {
          problems.add(
              "jonquil: no " + EXTENSION + " files in '" + PathText.oneLine(argument) + "'");
        }
        files.addAll(found);
      } else if (!Files.isRegularFile(path)) {
        // A FIFO would block the read until some writer came; a device may never end.
        problems.add(cannotRead(argument, "not a regular file"));
      } else if (!Files.isReadable(path)) {
        problems.add(cannotRead(argument, "permission denied"));
      } else {
        files.add(path);
      }
    }
    return new Inputs(new ArrayList<>(files), problems);
  }

  static String cannotRead(String shownPath, String reason) {
    return "jonquil: cannot read '" + PathText.oneLine(shownPath) + "': " + reason;
  }

  private static List<Path> specsBelow(Path dir) throws IOException {
    try (Stream<Path> walk = Files.walk(dir)) {
      return walk.filter(p -> p.getFileName().toString().endsWith(EXTENSION))
          .filter(Files::isRegularFile)
          .map(p -> p.toAbsolutePath().normalize())
          .sorted()
          .toList();
    }
  }
}
