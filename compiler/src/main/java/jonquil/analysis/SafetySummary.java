package jonquil.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.SafetyStandard;
import jonquil.safety.HazardClass;
import jonquil.safety.Outcome;

/**
 * The per-source safety figures and per-part damage margins reported with the computed values:
 * hazard class, ocular MPE, NOHD and eyewear OD at the exit, each with its standard (or the reason
 * it was not evaluated) and the caution.
 */
public final class SafetySummary {
  /** Safety figures of one source at its exit. */
  public record SourceSafety(
      String source,
      double wavelength,
      Outcome<HazardClass> hazardClass,
      Outcome<jonquil.safety.MaximumPermissibleExposure> mpe,
      Outcome<jonquil.safety.MaximumPermissibleExposure> skinMpe,
      Outcome<jonquil.safety.MaximumPermissibleExposure> ansiMpe,
      Outcome<jonquil.safety.MaximumPermissibleExposure> directiveMpe,
      Outcome<Double> nohd,
      Outcome<jonquil.safety.OpticalDensity> eyewear,
      double exposureTime,
      String exposureTimeReason,
      List<SourceSafety> lines) {
    public SourceSafety {
      lines = List.copyOf(lines);
    }

    SourceSafety withLines(List<SourceSafety> own) {
      return new SourceSafety(
          source,
          wavelength,
          hazardClass,
          mpe,
          skinMpe,
          ansiMpe,
          directiveMpe,
          nohd,
          eyewear,
          exposureTime,
          exposureTimeReason,
          own);
    }
  }

  private SafetySummary() {}

  /**
   * The figures of every source at its exit; a source whose light is of several lines also lists
   * each line's own figures (from {@code lines}, each line solved alone), since the figures of the
   * summed light, taken at its strongest line's wavelength, are no line's.
   */
  public static List<SourceSafety> sources(
      ResolvedModel model, TrainSolution s, Map<Double, TrainSolution> lines) {
    List<SourceSafety> out = new ArrayList<>();
    for (SourceSafety total : sources(model, s)) {
      List<SourceSafety> own = new ArrayList<>();
      lines.values().stream()
          .flatMap(line -> sources(model, line).stream())
          .filter(l -> l.source().equals(total.source()))
          .forEach(own::add);
      out.add(own.size() < 2 ? total : total.withLines(own));
    }
    return out;
  }

  private static List<SourceSafety> sources(ResolvedModel model, TrainSolution s) {
    List<SourceSafety> out = new ArrayList<>();
    for (ResolvedElement e : model.elements().values()) {
      if (e.kind() != ElementKind.SOURCE) {
        continue;
      }
      Optional<PortValue> exit = s.port(e.symbol().name());
      if (exit.isEmpty()) {
        continue;
      }
      // The wavelength the exit's figures describe (its strongest line; a line's own in the
      // solution of that line alone), the one the class and NOHD are judged at too.
      double wl = exit.get().wavelength();
      jonquil.safety.ExposureDuration d = SafetyModel.defaultExposure(wl);
      double t = d.seconds();
      var emission = SafetyModel.emission(wl, exit.get().power(), exit.get().pulses());
      out.add(
          new SourceSafety(
              e.symbol().name(),
              wl,
              SafetyModel.hazardClass(e, exit.get()),
              jonquil.safety.OcularMpe.at(emission, t),
              jonquil.safety.SkinMpe.at(emission, t),
              jonquil.safety.ansi.AnsiOcularMpe.at(emission, t),
              jonquil.safety.directive.DirectiveEyeLimit.at(emission, t),
              SafetyModel.nohd(SafetyStandard.IEC_60825_1, e, exit.get()),
              SafetyModel.eyewear(SafetyStandard.IEC_60825_1, wl, exit.get(), t),
              t,
              d.reason(),
              List.of()));
    }
    return out;
  }

  /**
   * The damage margin of every part that declares thresholds and is reached by a beam of known
   * size.
   */
  public static Map<String, Double> damageMargins(ResolvedModel model, TrainSolution s) {
    Map<String, Double> out = new LinkedHashMap<>();
    s.incident()
        .forEach(
            (name, in) ->
                model
                    .element(name)
                    .filter(e -> e.symbol().category() != Category.SOURCE)
                    .ifPresent(
                        e -> {
                          OptionalDouble m = DamageModel.margin(e, in, in.wavelength());
                          if (m.isPresent()) {
                            out.put(name, m.getAsDouble());
                          }
                        }));
    return out;
  }
}
