package jonquil.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.concurrent.Callable;
import jonquil.CheckOptions;
import jonquil.CheckedRoot;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.analysis.TrainSolution;
import jonquil.analysis.YieldDraws;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ResolvedModel;
import jonquil.source.ProjectRoot;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code jonquil check}: the CI gate and the one command people run by hand. */
@Command(
    name = "check",
    sortOptions = false,
    description = {
      "Checks .jonq spec files and reports every finding.",
      "",
      "The text format prints one line per finding:",
      "  PATH:LINE:COLUMN: SEVERITY: MESSAGE [CODE]",
      "PATH is relative to the current directory. LINE and COLUMN start at 1;",
      "COLUMN counts Unicode code points, so every character counts once,",
      "even one outside the Basic Multilingual Plane. A summary line follows.",
      ""
    },
    footer = {
      "",
      "Project root: --root, else the nearest directory at or above the first PATH",
      "that holds .git or a .jonquil-root file, else the current directory.",
      "JSON and SARIF paths are relative to it.",
      "",
      "Exit status:",
      "  0  no error and every requirement met (no warning either with --strict)",
      "  1  an error, a requirement failed or not evaluated, or with --strict a warning",
      "  2  bad usage, an input that cannot be read, or an internal error",
      ""
    })
final class CheckCommand implements Callable<Integer> {
  private final PrintStream out;
  private final PrintStream err;
  private final Path cwd;

  @Spec CommandSpec spec;

  @Option(
      names = "--format",
      paramLabel = "FORMAT",
      defaultValue = "text",
      converter = OutputFormat.Converter.class,
      description = "Report format: text, json or sarif (default: ${DEFAULT-VALUE}).")
  OutputFormat format;

  @Option(names = "--strict", description = "Fail on warnings as well as on errors.")
  boolean strict;

  @Option(
      names = "--exit-zero",
      description = "Exit 0 even when there are findings; trouble running still exits 2.")
  boolean exitZero;

  @Option(names = "--root", paramLabel = "DIR", description = "The project root; see below.")
  String root;

  @Option(names = "--debug", description = "Print the stack trace of an internal error.")
  boolean debug;

  @Option(
      names = "--builds",
      paramLabel = "N",
      description =
          "Monte Carlo builds per yield requirement, 1 to 100000 (default 400); a requirement's"
              + " own 'over N builds' wins.")
  Integer builds;

  @Option(
      names = "--seed",
      paramLabel = "N",
      description =
          "Another draw of the yield builds: N is hashed in after the spec's content, which"
              + " alone seeds them when this is left out.")
  Long seed;

  @Option(
      names = "--standard",
      paramLabel = "NAME",
      converter = StandardConverter.class,
      description =
          "The laser-safety standard that gates the safety requirements: iec (IEC 60825-1:2014,"
              + " the default), directive (Directive 2006/25/EC) or ansi (ANSI Z136.1-2014); it"
              + " wins over a spec's 'standard' line. The others are reported for comparison.")
  jonquil.resolve.SafetyStandard standard;

  @Option(
      names = "--quiet",
      description =
          "Text: show only what fails the check (errors, failed or unevaluated requirements, with"
              + " --strict warnings), then the summary.")
  boolean quiet;

  @Option(
      names = "--budget",
      description = "Text: add each path's power budget, element by element, before the summary.")
  boolean budget;

  @Mixin HelpOption help;

  @Mixin SpecPaths specPaths;

  CheckCommand(PrintStream out, PrintStream err, Path cwd) {
    this.out = out;
    this.err = err;
    this.cwd = cwd.toAbsolutePath().normalize();
  }

  @Override
  public Integer call() {
    try {
      return check().code();
    } catch (ParameterException e) {
      throw e;
    } catch (RuntimeException | StackOverflowError e) {
      Commands.reportInternalError(e, debug, err);
      return ExitCode.TROUBLE.code();
    }
  }

  private CheckOptions options() {
    CheckOptions options = CheckOptions.FULL.withDraws(draws());
    return standard == null ? options : options.withStandard(standard);
  }

  private ExitCode check() {
    textOnlyOptions();
    Path projectRoot = projectRoot();
    Inputs inputs = Inputs.collect(specPaths.paths, cwd);
    List<String> problems = new ArrayList<>(inputs.problems());
    try (PathOrderedSpool perFile = new PathOrderedSpool()) {
      Result result = new Result(Map.of(), List.of(), List.of());
      if (!inputs.files().isEmpty()) {
        // Each file's model and solution go into the report as soon as it is checked and are let
        // go: memory stays flat however many files a folder holds.
        result =
            withoutUnreadable(
                Checker.checkEach(
                    Workspace.onDisk(projectRoot),
                    inputs.files(),
                    options(),
                    this::internalError,
                    checked -> putAside(checked, projectRoot, perFile)),
                problems);
      }
      problems.forEach(err::println);
      err.flush();
      if (result.files().isEmpty() && !problems.isEmpty()) {
        return ExitCode.TROUBLE; // nothing was checked, so there is nothing to report
      }
      CheckRun run = new CheckRun(result, projectRoot, cwd, problems);
      switch (format) {
        case TEXT ->
            TextReport.write(run, out, new TextReport.Shown(quiet, strict, budget), perFile);
        case JSON -> writeJson(run, perFile);
        case SARIF -> writeUtf8(SarifReport.render(run));
      }
      return ExitCode.of(result, strict, exitZero, !problems.isEmpty());
    }
  }

  /** What the report will show of one checked file's model and solution, before they go. */
  private void putAside(CheckedRoot checked, Path projectRoot, PathOrderedSpool perFile) {
    if (checked.model().isEmpty() || checked.solution().isEmpty()) {
      return; // no solved train: neither values nor a budget to show
    }
    ResolvedModel model = checked.model().get();
    TrainSolution solution = checked.solution().get();
    switch (format) {
      case TEXT -> {
        if (budget) {
          List<String> lines = new ArrayList<>();
          BudgetTable.add(lines, cwd, checked.file(), model, solution);
          if (!lines.isEmpty()) {
            perFile.put(checked.file(), String.join("\n", lines));
          }
        }
      }
      case JSON ->
          perFile.put(
              checked.file(),
              JsonReport.valuesEntry(
                  ValuesJson.of(projectRoot, checked.file(), model, solution, checked.lines())));
      case SARIF -> {} // SARIF carries findings only
    }
  }

  /** JSON is UTF-8 by definition, whatever the platform's console encoding. */
  private void writeJson(CheckRun run, Iterable<String> valuesEntries) {
    Writer writer = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    try {
      JsonReport.write(run, valuesEntries, writer);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the report", e);
    }
    out.flush();
  }

  /**
   * JSON and SARIF always carry every finding and the budget: the text options would do nothing.
   */
  private void textOnlyOptions() {
    if (format != OutputFormat.TEXT && (quiet || budget)) {
      throw new ParameterException(
          spec.commandLine(),
          (quiet ? "--quiet" : "--budget")
              + " shapes the text report; JSON and SARIF always carry every finding and the"
              + " budget");
    }
  }

  private YieldDraws draws() {
    int n = builds == null ? YieldDraws.DEFAULT_BUILDS : builds;
    if (n < 1 || n > YieldDraws.MAX_BUILDS) {
      throw new ParameterException(
          spec.commandLine(),
          "--builds must be from 1 to " + YieldDraws.MAX_BUILDS + "; got " + builds);
    }
    return new YieldDraws(n, seed == null ? OptionalLong.empty() : OptionalLong.of(seed));
  }

  private Path projectRoot() {
    if (root == null) {
      try {
        return ProjectRoot.discover(cwd.resolve(specPaths.paths.get(0)), cwd);
      } catch (InvalidPathException e) {
        return cwd; // the argument is reported as a problem of its own
      }
    }
    Path dir = cwd.resolve(root).toAbsolutePath().normalize();
    if (!Files.isDirectory(dir)) {
      throw new ParameterException(spec.commandLine(), "--root '" + root + "' is not a directory");
    }
    return dir;
  }

  /**
   * A file the checker could not read is trouble running, not a finding about the specs: it goes to
   * stderr and exit status 2, and stays out of the report and its counts.
   */
  private Result withoutUnreadable(Result result, List<String> problems) {
    List<Diagnostic> kept = new ArrayList<>();
    for (Diagnostic d : result.diagnostics()) {
      if (d.code() == DiagnosticCode.UNREADABLE_FILE) {
        problems.add("jonquil: " + PathText.oneLine(d.message()));
      } else {
        kept.add(d);
      }
    }
    return kept.size() == result.diagnostics().size()
        ? result
        : new Result(result.files(), kept, result.requirements());
  }

  /** The stack trace behind a J901 finding, printed under '--debug' only. */
  private void internalError(Path file, Throwable failure) {
    if (debug) {
      err.println("jonquil: internal error checking '" + PathText.oneLine(file.toString()) + "':");
      failure.printStackTrace(err);
    }
  }

  /** SARIF is UTF-8 by definition, whatever the platform's console encoding. */
  private void writeUtf8(String document) {
    byte[] bytes = document.getBytes(StandardCharsets.UTF_8);
    out.write(bytes, 0, bytes.length);
    out.flush();
  }
}
