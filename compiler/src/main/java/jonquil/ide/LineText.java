package jonquil.ide;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.analysis.TrainSolution;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ResolvedModel;
import jonquil.units.Dimension;

/**
 * Each laser line's own figures where light of several lines meets, under the line's wavelength:
 * its power, beam and polarization at the element and the element's Jones matrices at that
 * wavelength; at a source, its beam and eye-safety figures. The totals above them add the lines up,
 * while a line's eye safety, its Jones matrices and its requirements ('for line') are its own.
 */
final class LineText {
  private LineText() {}

  /**
   * The lines whose light is at the element, shortest first, each with the trains solved for it
   * alone; empty when fewer than two are (the totals are then that line's figures).
   */
  static Map<Double, TrainSolution> at(
      Result r,
      ResolvedModel model,
      Optional<TrainSolution> solution,
      String name,
      ElementKind kind) {
    if (solution.isEmpty()) {
      return Map.of();
    }
    Map<Double, TrainSolution> out = new LinkedHashMap<>();
    OwningModels.lines(r, model)
        .forEach(
            (wavelength, line) -> {
              if (LightText.lit(line, name, kind)) {
                out.put(wavelength, line);
              }
            });
    return out.size() < 2 ? Map.of() : out;
  }

  /** Every line of {@code lines} under its own heading, a source's caution after them all. */
  static void append(
      StringBuilder md,
      ResolvedModel model,
      Map<Double, TrainSolution> lines,
      String name,
      ElementKind kind) {
    lines.forEach((wavelength, line) -> one(md, model, wavelength, line, name, kind, ""));
    if (kind == ElementKind.SOURCE && !lines.isEmpty()) {
      SafetyText.caution(md);
    }
  }

  /** One line's figures at the element, under "Line λ" and {@code where} after it. */
  static void one(
      StringBuilder md,
      ResolvedModel model,
      double wavelength,
      TrainSolution line,
      String name,
      ElementKind kind,
      String where) {
    heading(md, wavelength).append(where);
    LightText.line(md, line, name, kind);
    OpticsText.jones(md, line, name, kind);
    if (kind == ElementKind.SOURCE) {
      SafetyText.figures(md, model, Optional.of(line), name);
    }
  }

  /** Each line's own light leaving by one port ("element.port"), where two or more lines do. */
  static void port(StringBuilder md, Result r, ResolvedModel model, String key) {
    Map<Double, TrainSolution> lines = new LinkedHashMap<>();
    OwningModels.lines(r, model)
        .forEach(
            (wavelength, line) -> {
              if (line.port(key).filter(v -> v.power() > 0).isPresent()) {
                lines.put(wavelength, line);
              }
            });
    if (lines.size() < 2) {
      return;
    }
    lines.forEach(
        (wavelength, line) -> {
          heading(md, wavelength);
          LightText.port(md, line, key, "**Light** (this line alone, in the table frame)");
        });
  }

  private static StringBuilder heading(StringBuilder md, double wavelength) {
    return MarkdownText.para(md)
        .append("### Line ")
        .append(MarkdownText.q(wavelength, Dimension.LENGTH));
  }
}
