package jonquil.ide;

import java.util.Optional;
import jonquil.analysis.SafetySummary;
import jonquil.analysis.TrainSolution;
import jonquil.resolve.ResolvedModel;
import jonquil.safety.Outcome;
import jonquil.units.Dimension;

/**
 * The eye-safety figures of one source, each with its standard or the reason it was not evaluated,
 * and the caution.
 */
final class SafetyText {
  private SafetyText() {}

  /**
   * The beam at the source's exit and its eye-safety figures, then the caution. A source of several
   * lines has no figures of its own here: each line's are given under that line (LineText), and a
   * safety requirement on several lines adds the lines that act on the same tissue.
   */
  static void append(
      StringBuilder md,
      ResolvedModel model,
      Optional<TrainSolution> solution,
      String source,
      boolean perLine) {
    if (perLine) {
      beam(md, solution, source);
      MarkdownText.para(md)
          .append(
              "**Eye safety**: each line's own figures follow under its wavelength; a safety"
                  + " requirement on several lines adds the lines that act on the same tissue"
                  + " (IEC 60825-1:2014, 4.3)");
      return;
    }
    figures(md, model, solution, source);
    caution(md);
  }

  /** The caution every set of eye-safety figures ends with. */
  static void caution(StringBuilder md) {
    MarkdownText.para(md).append("> ").append(Outcome.CAUTION);
  }

  /** The beam at the exit and the hazard class, MPE and NOHD of the light of {@code solution}. */
  static void figures(
      StringBuilder md, ResolvedModel model, Optional<TrainSolution> solution, String source) {
    beam(md, solution, source);
    MarkdownText.para(md).append("**Eye safety** (IEC 60825-1:2014, at the source's exit)\n\n");
    Optional<SafetySummary.SourceSafety> found =
        solution.flatMap(
            s ->
                SafetySummary.sources(model, s, java.util.Map.of()).stream()
                    .filter(x -> x.source().equals(source))
                    .findFirst());
    if (found.isEmpty()) {
      md.append(
          solution.isEmpty()
              ? "_Not evaluated: the spec has errors._"
              : "_Not evaluated: no beam leaves this source._");
    } else {
      SafetySummary.SourceSafety s = found.get();
      md.append("- hazard class: ")
          .append(figure(s.hazardClass(), c -> c.label()))
          .append("\n- ocular MPE: ")
          .append(
              figure(
                  s.mpe(),
                  e ->
                      MarkdownText.q(e.irradiance(), Dimension.IRRADIANCE)
                          + " ("
                          + MarkdownText.q(e.radiantExposure(), Dimension.FLUENCE)
                          + " over "
                          + MarkdownText.q(e.exposureDuration(), Dimension.TIME)
                          + ")"))
          .append("\n- NOHD: ")
          .append(figure(s.nohd(), d -> MarkdownText.q(d, Dimension.LENGTH)))
          .append('\n');
    }
  }

  /** The source's lines and the Gaussian beam leaving it. */
  private static void beam(StringBuilder md, Optional<TrainSolution> solution, String source) {
    Optional<jonquil.analysis.PortValue> out =
        solution.flatMap(s -> s.port(source + ".out").or(() -> s.port(source)));
    out.flatMap(jonquil.analysis.PortValue::mode)
        .ifPresent(
            g ->
                MarkdownText.para(md)
                    .append("**Beam** at the exit: waist radius ")
                    .append(MarkdownText.q(g.waistRadius(), Dimension.LENGTH))
                    .append(", M² ")
                    .append(MarkdownText.num(g.m2()))
                    .append(", divergence (half angle) ")
                    .append(MarkdownText.num(g.divergence() * 1e3) + " mrad")
                    .append(", Rayleigh range ")
                    .append(MarkdownText.q(g.rayleighRange(), Dimension.LENGTH)));
  }

  private static <T> String figure(Outcome<T> o, java.util.function.Function<T, String> show) {
    if (o.evaluated()) {
      return show.apply(o.get()) + " — " + o.standard();
    }
    return "not evaluated: " + o.reason();
  }
}
