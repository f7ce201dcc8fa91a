package jonquil.cli;

import java.io.PrintStream;
import java.util.List;
import jonquil.Result;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.RequirementStatus;
import jonquil.analysis.VerdictText;
import jonquil.diag.Diagnostic;
import jonquil.diag.Related;
import jonquil.diag.Severity;

/**
 * The default report: one compiler-style line per finding, which editors and CI log viewers already
 * know how to turn into links, then one summary line.
 */
final class TextReport {
  private TextReport() {}

  /**
   * What the text report shows beyond its default. {@code quiet}: only the findings that fail the
   * gate (errors, failed and unevaluated requirements, and warnings when {@code strict}), then the
   * summary, whose counts stay those of the whole check. {@code budget}: each path's power budget
   * before the summary.
   */
  record Shown(boolean quiet, boolean strict, boolean budget) {
    static final Shown ALL = new Shown(false, false, false);

    boolean shows(Diagnostic d) {
      return !quiet
          || d.severity() == Severity.ERROR
          || (strict && d.severity() == Severity.WARNING);
    }
  }

  static void write(CheckRun run, PrintStream out) {
    write(run, out, Shown.ALL);
  }

  static void write(CheckRun run, PrintStream out, Shown shown) {
    List<String> budget = shown.budget() ? BudgetTable.lines(run) : List.of();
    write(run, out, shown, budget.isEmpty() ? List.of() : List.of(String.join("\n", budget)));
  }

  /**
   * As above, with the budget tables given as one block of lines per checked file, in the order
   * shown (a check that streams its files has no models left to build them from).
   */
  static void write(CheckRun run, PrintStream out, Shown shown, Iterable<String> budgetBlocks) {
    Result result = run.result();
    boolean printed = false;
    for (Diagnostic d : result.diagnostics()) {
      if (!shown.shows(d)) {
        continue;
      }
      out.println(line(run, d));
      printed = true;
      for (Related r : d.related()) {
        // Printed as a note on its own line so that the same tools can jump to it.
        out.println(
            location(run, r.file(), r.range().start())
                + ": note: "
                + oneLine(r.message())
                + " ["
                + d.code().id()
                + "]");
      }
    }
    for (RequirementOutcome r : result.requirements()) {
      // Verdicts are already findings (J609 failed, J611 met, J613 not evaluated); list the
      // others, those a spec's errors kept from being evaluated.
      if (r.status() == RequirementStatus.NOT_EVALUATED && !isFinding(result, r)) {
        out.println(requirement(run, r));
        printed = true;
      }
    }
    boolean first = true;
    for (String block : shown.budget() ? budgetBlocks : List.<String>of()) {
      if (!first || printed) {
        out.println(); // a blank line between blocks, and after the findings
      }
      first = false;
      block.lines().forEach(out::println);
    }
    if (!first) {
      out.println();
    }
    out.println(summary(result));
    out.flush();
  }

  private static boolean isFinding(Result result, RequirementOutcome r) {
    return result.diagnostics().stream()
        .anyMatch(
            d ->
                d.code() == jonquil.diag.DiagnosticCode.REQUIREMENT_NOT_EVALUATED
                    && d.file().equals(r.file())
                    && d.range().equals(r.range()));
  }

  /**
   * One line per requirement verdict, after the findings. The word "requirement" stands where
   * findings have a severity, so quickfix parsers skip these lines.
   */
  static String requirement(CheckRun run, RequirementOutcome r) {
    StringBuilder line =
        new StringBuilder(location(run, r.file(), r.range().start()))
            .append(": requirement ")
            .append(r.status().word())
            .append(": ")
            .append(oneLine(r.text()));
    if (r.value().isPresent()) {
      double value = r.value().getAsDouble();
      line.append(" (value ").append(VerdictText.format(value, r.shownUnit()));
      r.margin()
          .ifPresent(
              m ->
                  line.append(", margin ")
                      .append(
                          VerdictText.margin(
                              value, r.bound().orElse(Double.NaN), m, r.shownUnit())));
      line.append(')');
    }
    if (r.reason() != null && !r.reason().isBlank()) {
      line.append(" — ").append(oneLine(r.reason()));
    }
    return line.toString();
  }

  static String line(CheckRun run, Diagnostic d) {
    return location(run, d.file(), d.range().start())
        + ": "
        + d.severity().word()
        + ": "
        + oneLine(d.message())
        + " ["
        + d.code().id()
        + "]";
  }

  static String summary(Result result) {
    return "checked "
        + count(result.files().size(), "file")
        + ": "
        + count(result.count(Severity.ERROR), "error")
        + ", "
        + count(result.count(Severity.WARNING), "warning")
        + ", "
        + count(result.count(Severity.NOTE), "note")
        + "; requirements: "
        + result.count(RequirementStatus.PASS)
        + " pass, "
        + result.count(RequirementStatus.FAIL)
        + " fail, "
        + result.count(RequirementStatus.NOT_EVALUATED)
        + " not evaluated";
  }

  private static String location(CheckRun run, java.nio.file.Path file, int offset) {
    Position p = Position.of(run.result().files(), file, offset);
    return PathText.oneLine(PathText.relative(run.cwd(), file)) + ":" + p.line() + ":" + p.column();
  }

  /** A line break inside a message would split one finding into two for every log parser. */
  private static String oneLine(String message) {
    return message.replaceAll("\\R", " ").strip();
  }

  private static String count(long n, String noun) {
    return n + " " + noun + (n == 1 ? "" : "s");
  }
}
