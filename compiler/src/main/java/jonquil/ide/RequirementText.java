package jonquil.ide;

import java.nio.file.Path;
import java.util.Optional;
import jonquil.Result;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.VerdictText;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.syntax.Requirement;

/** The verdict on a requirement line: status, value, bound, margin, reason and its finding. */
final class RequirementText {
  private RequirementText() {}

  static HoverInfo hover(Result r, Path file, Requirement req) {
    StringBuilder md =
        new StringBuilder("**requirement** ")
            .append(MarkdownText.code(MarkdownText.oneLine(req.text())));
    Optional<RequirementOutcome> outcome =
        r.requirements().stream()
            .filter(o -> o.file().equals(file) && o.range().equals(req.range()))
            .findFirst();
    if (outcome.isEmpty()) {
      md.append("\n\n_Not evaluated: no checked root reads this requirement._");
    } else {
      RequirementOutcome o = outcome.get();
      md.append("\n\n| status | value | bound | margin |\n|---|---|---|---|\n| ")
          .append(o.status().word())
          .append(" | ")
          .append(
              o.value().isPresent()
                  ? MarkdownText.cell(
                      (o.valueIsLowerBound() ? "at least " : "")
                          + VerdictText.format(o.value().getAsDouble(), o.shownUnit()))
                  : "—")
          .append(" | ")
          .append(
              o.bound().isPresent()
                  ? MarkdownText.cell(VerdictText.format(o.bound().getAsDouble(), o.shownUnit()))
                  : "—")
          .append(" | ")
          .append(
              o.margin().isPresent()
                  ? MarkdownText.cell(
                      VerdictText.margin(
                          o.value().orElse(Double.NaN),
                          o.bound().orElse(Double.NaN),
                          o.margin().getAsDouble(),
                          o.shownUnit()))
                  : "—")
          .append(" |\n");
      o.yield()
          .ifPresent(
              y ->
                  md.append("\n95 % Wilson score interval ")
                      .append(VerdictText.format(y.interval().low(), "%"))
                      .append(" .. ")
                      .append(VerdictText.format(y.interval().high(), "%"))
                      .append(" from ")
                      .append(y.passes())
                      .append(" of ")
                      .append(y.builds())
                      .append(" builds (seed ")
                      .append(y.seedHex())
                      .append(y.settled() ? ")\n" : "): not settled, raise the builds\n"));
      if (!o.reason().isBlank()) {
        md.append("\n").append(o.reason()).append('\n');
      }
    }
    r.diagnostics().stream()
        .filter(d -> d.file().equals(file) && d.range().equals(req.range()))
        .filter(
            d ->
                d.code() == DiagnosticCode.REQUIREMENT_FAILED
                    || d.code() == DiagnosticCode.REQUIREMENT_MET
                    || d.code() == DiagnosticCode.REQUIREMENT_NOT_EVALUATED)
        .findFirst()
        .ifPresent(
            (Diagnostic d) ->
                md.append("\n")
                    .append(d.code().id())
                    .append(": ")
                    .append(d.message())
                    .append('\n'));
    return new HoverInfo(md.toString().stripTrailing(), req.range());
  }
}
