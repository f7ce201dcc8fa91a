package jonquil.ide;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.analysis.BeamExposure;
import jonquil.analysis.PortInterference;
import jonquil.analysis.PortValue;
import jonquil.analysis.SafetySummary;
import jonquil.analysis.TrainSolution;
import jonquil.optics.Coherency;
import jonquil.optics.Handedness;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ResolvedModel;
import jonquil.units.Dimension;

/**
 * Describes the light arriving at and leaving an element from the solved train, in Markdown tables.
 */
final class LightText {
  private LightText() {}

  private record Row(String label, PortValue value) {}

  static final String NO_ANALYSIS =
      "_No beam analysis: the spec has errors, so power and polarization were not computed._";

  /**
   * Appends the power, beam and polarization at every port of the element, or says why there is
   * none.
   */
  static void append(
      StringBuilder md,
      ResolvedModel model,
      Optional<TrainSolution> solution,
      String name,
      ElementKind kind) {
    if (solution.isEmpty()) {
      MarkdownText.para(md).append(NO_ANALYSIS);
      return;
    }
    TrainSolution s = solution.get();
    List<Row> rows = rows(s, name, kind);
    if (rows.isEmpty()) {
      MarkdownText.para(md)
          .append("_No beam reaches ")
          .append(MarkdownText.code(name))
          .append("._");
      return;
    }
    MarkdownText.para(md)
        .append("**Light** (power in the table frame, summed over the source's lines)\n\n");
    light(md, rows);
    Map<String, Double> margins = SafetySummary.damageMargins(model, s);
    if (margins.containsKey(name)) {
      md.append("\nDamage margin: ")
          .append(MarkdownText.num(margins.get(name)))
          .append(" (threshold ÷ exposure)\n");
    }
    interference(md, model, s, name, kind);
    polarization(md, rows);
    passes(md, s.passesOf(name));
    s.returnedTo(name)
        .ifPresent(
            back ->
                md.append("\nReturned to its output (traced back through the train): ")
                    .append(MarkdownText.q(back.power(), Dimension.POWER))
                    .append(", ")
                    .append(InlayHints.polarization(back))
                    .append('\n'));
  }

  /** Whether any light of {@code s} is at the element: arriving, or leaving one of its ports. */
  static boolean lit(TrainSolution s, String name, ElementKind kind) {
    return rows(s, name, kind).stream().anyMatch(r -> r.value().power() > 0);
  }

  /**
   * The power, beam and polarization at every port of the element in the solution of one line
   * alone.
   */
  static void line(StringBuilder md, TrainSolution line, String name, ElementKind kind) {
    List<Row> rows = rows(line, name, kind);
    MarkdownText.para(md).append("**Light** (this line alone, in the table frame)\n\n");
    light(md, rows);
    polarization(md, rows);
  }

  /** The light leaving by one port ("element.port") under {@code title}, if any leaves. */
  static void port(StringBuilder md, TrainSolution s, String key, String title) {
    s.port(key)
        .ifPresent(
            v -> {
              List<Row> rows = List.of(new Row("out `" + v.port() + "`", v));
              MarkdownText.para(md).append(title).append("\n\n");
              light(md, rows);
              polarization(md, rows);
            });
  }

  /** The table of power, beam radius, irradiance and field, then the pulses where pulsed. */
  private static void light(StringBuilder md, List<Row> rows) {
    md.append(
        "| | power | beam radius | irradiance avg / avg peak | peak field |\n"
            + "|---|---|---|---|---|\n");
    for (Row row : rows) {
      Optional<BeamExposure> e = row.value().exposure();
      md.append("| ")
          .append(row.label())
          .append(" | ")
          .append(MarkdownText.q(row.value().power(), Dimension.POWER))
          .append(" | ")
          .append(e.map(x -> MarkdownText.q(x.beamRadius(), Dimension.LENGTH)).orElse("unknown"))
          .append(" | ")
          .append(
              e.map(
                      x ->
                          MarkdownText.q(x.averageIrradiance(), Dimension.IRRADIANCE)
                              + " / "
                              + MarkdownText.q(x.peakIrradiance(), Dimension.IRRADIANCE))
                  .orElse("unknown"))
          .append(" | ")
          .append(
              e.map(x -> MarkdownText.q(x.peakField(), Dimension.ELECTRIC_FIELD)).orElse("unknown"))
          .append(" |\n");
    }
    if (rows.stream().anyMatch(r -> r.value().exposure().isEmpty())) {
      md.append("\nBeam size unknown where marked: the source states no `beam`.\n");
    }
    for (Row row : rows) {
      row.value()
          .exposure()
          .filter(BeamExposure::pulsed)
          .ifPresent(
              x ->
                  md.append("\nPulses at ")
                      .append(row.label())
                      .append(": energy ")
                      .append(MarkdownText.q(x.pulseEnergy().getAsDouble(), Dimension.ENERGY))
                      .append(", peak power ")
                      .append(MarkdownText.q(x.peakPower().getAsDouble(), Dimension.POWER))
                      .append(", peak irradiance (time and space) ")
                      .append(MarkdownText.q(x.timeAndSpacePeakIrradiance(), Dimension.IRRADIANCE))
                      .append(", peak fluence ")
                      .append(MarkdownText.q(x.peakFluence().getAsDouble(), Dimension.FLUENCE))
                      .append('\n'));
    }
  }

  /** Each pass of light through an element met more than once, in the order light takes them. */
  private static void passes(StringBuilder md, List<jonquil.analysis.ElementPass> passes) {
    if (passes.size() < 2) {
      return;
    }
    md.append("\n**Passes** (in the order light takes them)\n\n")
        .append("| # | enters by | direction | power in | power out | polarization out |\n")
        .append("|---|---|---|---|---|---|\n");
    int n = 1;
    for (jonquil.analysis.ElementPass p : passes) {
      md.append("| ")
          .append(n++)
          .append(" | `")
          .append(p.face())
          .append("` | ")
          .append(p.backward() ? "backward" : "forward")
          .append(" | ")
          .append(MarkdownText.q(p.powerIn(), Dimension.POWER))
          .append(" | ")
          .append(MarkdownText.q(p.powerOut(), Dimension.POWER))
          .append(" | ")
          .append(InlayHints.polarization(p.out()))
          .append(" |\n");
    }
  }

  /** Where beams of one line meet at a port of the element: visibility and power over phase. */
  private static void interference(
      StringBuilder md, ResolvedModel model, TrainSolution s, String name, ElementKind kind) {
    // An element without ports (a detector) is its own one place.
    List<String> ports = kind.ports().isEmpty() ? List.of("") : kind.exits();
    for (String port : ports) {
      String key = port.isEmpty() ? name : name + "." + port;
      for (PortInterference i : PortInterference.at(model, s, key)) {
        md.append("\nInterference")
            .append(port.isEmpty() ? "" : " at `" + port + "`")
            .append(": line ")
            .append(MarkdownText.q(i.wavelength(), Dimension.LENGTH))
            .append(", ")
            .append(i.beams())
            .append(" beams meet; visibility ")
            .append(
                i.visibility().isPresent()
                    ? MarkdownText.num(i.visibility().getAsDouble())
                    : "unknown (" + i.unknownReason() + ")")
            .append("; power ")
            .append(MarkdownText.q(i.range().min(), Dimension.POWER))
            .append(" .. ")
            .append(MarkdownText.q(i.range().max(), Dimension.POWER))
            .append(i.range().exact() ? "" : " (an enclosure)")
            .append(" over their relative phase\n");
      }
    }
  }

  private static List<Row> rows(TrainSolution s, String name, ElementKind kind) {
    List<Row> rows = new ArrayList<>();
    s.incidentAt(name).ifPresent(v -> rows.add(new Row("in", v)));
    for (String port : kind.ports()) {
      Optional<PortValue> v = s.port(name + "." + port);
      if (v.isEmpty() && kind == ElementKind.SOURCE) {
        v = s.port(name);
      }
      v.ifPresent(x -> rows.add(new Row("out `" + port + "`", x)));
    }
    return rows;
  }

  private static void polarization(StringBuilder md, List<Row> rows) {
    MarkdownText.para(md)
        .append("**Polarization** (azimuth against the table frame: x horizontal, y up)\n\n");
    md.append(
        "| | azimuth | ellipticity | handedness (as seen by the receiver, looking back towards the"
            + " source) | DOP | Stokes [S0, S1, S2, S3] |\n"
            + "|---|---|---|---|---|---|\n");
    for (Row row : rows) {
      Coherency c = row.value().light();
      if (c.power() <= 0) {
        md.append("| ").append(row.label()).append(" | no light | | | | |\n");
        continue;
      }
      if (c.dop() < 1e-9) {
        md.append("| ")
            .append(row.label())
            .append(" | — | — | none (unpolarized) | 0 | ")
            .append(stokes(c))
            .append(" |\n");
        continue;
      }
      String azimuth =
          MarkdownText.deg(clean(c.azimuth(), 1))
              + (row.value().vertical() ? " (carried frame: the beam runs vertically)" : "");
      md.append("| ")
          .append(row.label())
          .append(" | ")
          .append(azimuth)
          .append(" | ")
          .append(MarkdownText.deg(clean(c.ellipticityAngle(), 1)))
          .append(" | ")
          .append(hand(c.handedness()))
          .append(" | ")
          .append(MarkdownText.num(clean(c.dop(), 1)))
          .append(" | ")
          .append(stokes(c))
          .append(" |\n");
    }
  }

  private static String hand(Handedness h) {
    switch (h) {
      case RIGHT:
        return "right";
      case LEFT:
        return "left";
      default:
        return "none";
    }
  }

  private static String stokes(Coherency c) {
    double[] s = c.stokes();
    List<String> parts = new ArrayList<>();
    for (double x : s) {
      parts.add(MarkdownText.num(clean(x, s[0])));
    }
    return "[" + String.join(", ", parts) + "] W";
  }

  /** Rounding leaves ulps where the value is zero; they would print as noise. */
  private static double clean(double x, double scale) {
    return Math.abs(x) < 1e-12 * Math.max(Math.abs(scale), 1e-300) ? 0 : x;
  }
}
