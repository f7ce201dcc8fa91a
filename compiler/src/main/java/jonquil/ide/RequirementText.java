package jonquil.ide;

import java.nio.file.Path;
import java.util.Optional;
import jonquil.Result;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.VerdictText;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.Symbol;
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
    lineFigures(md, r, file, req);
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

  /**
   * For a requirement on one line of a spec of several ('for line'), that line's own figures at the
   * place it names: what the verdict judged, where the other hovers show the lines' total.
   */
  private static void lineFigures(StringBuilder md, Result r, Path file, Requirement req) {
    for (ResolvedModel m : OwningModels.reading(r, file)) {
      for (ResolvedRequirement q : m.requirements()) {
        if (!q.file().equals(file) || !q.syntax().range().equals(req.range())) {
          continue;
        }
        if (q.line().isEmpty()
            || q.at().isEmpty()
            || q.at().get().symbol().kind().isEmpty()
            || OwningModels.solution(r, m).isEmpty()) {
          return;
        }
        Symbol at = q.at().get().symbol();
        ElementKind kind = at.kind().get();
        OwningModels.lines(r, m)
            .forEach(
                (wavelength, line) -> {
                  if (ResolvedElement.sameLine(wavelength, q.line().getAsDouble())) {
                    LineText.one(
                        md,
                        m,
                        wavelength,
                        line,
                        at.name(),
                        kind,
                        " at " + MarkdownText.code(at.name()));
                    if (kind == ElementKind.SOURCE) {
                      SafetyText.caution(md);
                    }
                  }
                });
        return;
      }
    }
  }
}
