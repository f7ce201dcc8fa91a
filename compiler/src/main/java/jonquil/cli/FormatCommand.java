package jonquil.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import jonquil.FileText;
import jonquil.diag.Diagnostic;
import jonquil.diag.Severity;
import jonquil.format.FormatOptions;
import jonquil.format.Formatter;
import jonquil.source.SourceFile;
import jonquil.syntax.SpecParser;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code jonquil fmt}: rewrites specs in the canonical layout, or in CI checks that they already
 * are.
 */
@Command(
    name = "fmt",
    sortOptions = false,
    description = {
      "Rewrites .jonq spec files in the canonical layout: one fact per line, blocks",
      "indented by two spaces, single spaces between tokens, every comment kept.",
      "Only whitespace, line breaks and ';' separators change. A file is written only",
      "when its text changes; a file with syntax errors is never touched, and its",
      "errors are printed as PATH:LINE:COLUMN: error: MESSAGE [CODE].",
      ""
    },
    footer = {
      "",
      "Exit status:",
      "  0  every file is formatted (with --check: every file already was)",
      "  1  a file has syntax errors, or with --check a file would change",
      "  2  bad usage, or a file that cannot be read or written",
      ""
    })
final class FormatCommand implements Callable<Integer> {
  private final PrintStream out;
  private final PrintStream err;
  private final Path cwd;

  @Spec CommandSpec spec;

  @Option(
      names = "--check",
      description = "Write nothing; list the files that would change and exit 1 if any.")
  boolean check;

  @Option(
      names = "--stdout",
      description = "Print the formatted text instead of rewriting the files.")
  boolean stdout;

  @Mixin HelpOption help;

  @Mixin SpecPaths specPaths;

  FormatCommand(PrintStream out, PrintStream err, Path cwd) {
    this.out = out;
    this.err = err;
    this.cwd = cwd.toAbsolutePath().normalize();
  }

  @Override
  public Integer call() {
    if (check && stdout) {
      throw new ParameterException(
          spec.commandLine(), "--check and --stdout cannot be used together");
    }
    Inputs inputs = Inputs.collect(specPaths.paths, cwd);
    List<String> problems = new ArrayList<>(inputs.problems());
    boolean findings = false;
    for (Path file : inputs.files()) {
      findings |= formatOne(file, problems);
    }
    problems.forEach(err::println);
    out.flush();
    err.flush();
    if (!problems.isEmpty()) {
      // As with 'check': findings outrank trouble, but trouble never looks clean.
      return findings ? ExitCode.FINDINGS.code() : ExitCode.TROUBLE.code();
    }
    return findings ? ExitCode.FINDINGS.code() : ExitCode.CLEAN.code();
  }

  /** Formats one file; true when it is a finding (syntax errors, or a change under --check). */
  private boolean formatOne(Path file, List<String> problems) {
    String shown = PathText.relative(cwd, file);
    String text;
    try {
      text = FileText.read(file, FileText.SPEC_LIMIT);
    } catch (FileText.Refused e) {
      problems.add(Inputs.cannotRead(shown, e.getMessage()));
      return false;
    } catch (IOException e) {
      problems.add(Inputs.cannotRead(shown, "input/output error"));
      return false;
    }
    SourceFile source = new SourceFile(file, text);
    Optional<String> formatted = Formatter.format(source, FormatOptions.DEFAULT);
    if (formatted.isEmpty()) {
      reportSyntaxErrors(source, shown);
      return true;
    }
    String result = formatted.get();
    if (stdout) {
      byte[] bytes = result.getBytes(StandardCharsets.UTF_8);
      out.write(bytes, 0, bytes.length);
      return false;
    }
    if (result.equals(text)) {
      return false;
    }
    if (check) {
      out.println(PathText.oneLine(shown));
      return true;
    }
    try {
      AtomicFile.replace(file, result.getBytes(StandardCharsets.UTF_8));
    } catch (AccessDeniedException e) {
      problems.add("jonquil: cannot write '" + PathText.oneLine(shown) + "': permission denied");
    } catch (IOException e) {
      problems.add("jonquil: cannot write '" + PathText.oneLine(shown) + "': input/output error");
    }
    return false;
  }

  private void reportSyntaxErrors(SourceFile source, String shown) {
    for (Diagnostic d : SpecParser.parse(source).diagnostics()) {
      if (d.severity() == Severity.ERROR) {
        int at = d.range().start();
        err.println(
            PathText.oneLine(shown)
                + ":"
                + source.humanLine(at)
                + ":"
                + source.humanColumn(at)
                + ": error: "
                + d.message().replaceAll("\\R", " ").strip()
                + " ["
                + d.code().id()
                + "]");
      }
    }
  }
}
