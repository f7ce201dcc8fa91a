package jonquil.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;
import jonquil.resolve.Measure;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;
import jonquil.safety.OcularEffect;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * Eye-safety requirements on light of several laser lines. Each line is solved as its own beam;
 * lines acting on the same part of the eye ({@link OcularEffect}) are judged together and ranges
 * apart, the worst range deciding. The exposure is the standard's sum of each line's fraction of
 * its own MPE. Class, NOHD and eyewear OD have no such sum in this version: the range's total power
 * is judged at each of its lines' wavelengths and the strictest answer kept, which is never below
 * the sum of ratios (Σ Pᵢ/Lᵢ ≤ ΣPᵢ / min Lᵢ).
 */
final class LineSafety {
  private LineSafety() {}

  static boolean applies(ResolvedRequirement r, List<Double> lines) {
    return lines.size() > 1
        && r.line().isEmpty()
        && r.band().isEmpty()
        && r.criteria().size() == 1
        && switch (r.criteria().get(0).measure()) {
          case HAZARD_CLASS, NOHD, EXPOSURE, EYEWEAR_OD -> true;
          default -> false;
        };
  }

  static RequirementEvaluator.Verdict evaluate(
      ResolvedRequirement r,
      ResolvedModel model,
      Function<OptionalDouble, TrainSolution> solve,
      List<Double> lines) {
    Criterion c = r.criteria().get(0);
    Map<OcularEffect, List<Double>> ranges = new LinkedHashMap<>();
    Map<Double, TrainSolution> solved = new LinkedHashMap<>();
    Map<Double, Double> power = new LinkedHashMap<>();
    for (double wl : lines) {
      TrainSolution s = solve.apply(OptionalDouble.of(wl));
      Optional<PortValue> here = SafetyVerdicts.lightAt(r, c.measure(), s);
      if (here.isEmpty() || here.get().power() == 0) {
        continue; // this line does not reach the place
      }
      solved.put(wl, s);
      power.put(wl, here.get().power());
      ranges.computeIfAbsent(OcularEffect.of(wl), k -> new ArrayList<>()).add(wl);
    }
    if (solved.isEmpty()) {
      return RequirementEvaluator.evaluate(r, model, solve.apply(OptionalDouble.empty()));
    }
    RequirementEvaluator.Verdict worst = null;
    for (Map.Entry<OcularEffect, List<Double>> range : ranges.entrySet()) {
      RequirementEvaluator.Verdict v =
          c.measure() == Measure.EXPOSURE || c.measure() == Measure.EYEWEAR_OD
              ? summed(r, model, c, range.getKey(), range.getValue(), solved)
              : strictest(r, model, c, range.getKey(), range.getValue(), solved, power);
      if (!v.evaluated()) {
        return v;
      }
      if (worst == null || (worst.pass() && !v.pass()) || v.margin() < worst.margin()) {
        worst = v;
      }
    }
    return worst;
  }

  /**
   * The exposure of a range: each line's fraction of its own MPE, added; for the eyewear OD, the OD
   * that divides that sum down to 1.
   */
  private static RequirementEvaluator.Verdict summed(
      ResolvedRequirement r,
      ResolvedModel model,
      Criterion c,
      OcularEffect effect,
      List<Double> lines,
      Map<Double, TrainSolution> solved) {
    double sum = 0;
    List<String> parts = new ArrayList<>();
    RequirementEvaluator.Verdict first = null;
    boolean od = c.measure() == Measure.EYEWEAR_OD;
    double governingShare = -1;
    double governing = lines.get(0);
    Map<Double, String> settings = new LinkedHashMap<>();
    List<String> markings = new ArrayList<>();
    for (double wl : lines) {
      RequirementEvaluator.Verdict v = RequirementEvaluator.evaluate(r, model, solved.get(wl));
      if (!v.evaluated()) {
        return RequirementEvaluator.Verdict.notEvaluated("line " + name(wl) + ": " + v.text());
      }
      first = first == null ? v : first;
      double share = od ? Math.pow(10, v.value()) : v.value();
      sum += share;
      if (share > governingShare) {
        governingShare = share;
        governing = wl;
      }
      settings.put(
          wl, SafetyVerdicts.settingText(r, c.measure(), solved.get(wl), model).orElse(""));
      if (od) {
        SafetyVerdicts.markingText(r, c.measure(), solved.get(wl), model)
            .ifPresent(mark -> markings.add(name(wl) + ": " + mark));
      }
      parts.add(
          name(wl)
              + " "
              + (od
                  ? "OD " + QuantityFormat.format(v.value(), Dimension.DIMENSIONLESS)
                  : percent(v.value())));
    }
    double value = od ? Math.log10(sum) : sum;
    String how =
        lines.size() == 1
            ? "line " + name(lines.get(0)) + " alone acts on " + effect.description()
            : "lines acting on "
                + effect.description()
                + " add ("
                + OcularEffect.RULE
                + "): "
                + String.join(" + ", parts)
                + "; governing line "
                + name(governing)
                + " ("
                + percent(sum > 0 ? governingShare / sum : 0)
                + " of the sum)";
    // The first line's own note states its setting, its peak OD and its markings: not the sum's.
    String firstSetting = settings.get(lines.get(0));
    String rest = first.text();
    if (!firstSetting.isEmpty() && rest.startsWith(firstSetting + "; ")) {
      rest = rest.substring(firstSetting.length() + 2);
    }
    if (od) {
      String firstMark =
          SafetyVerdicts.markingText(r, c.measure(), solved.get(lines.get(0)), model).orElse("");
      rest = rest.replace("; " + firstMark, "").replaceFirst("OD [0-9.]+ at the beam's peak; ", "");
    }
    boolean oneSetting = settings.values().stream().distinct().count() == 1;
    String assumed =
        oneSetting
            ? firstSetting
            : String.join(
                " / ",
                settings.entrySet().stream()
                    .map(e -> name(e.getKey()) + ": " + e.getValue())
                    .toList());
    String note =
        how
            + (assumed.isEmpty() ? "" : "; " + assumed)
            + (markings.isEmpty() ? "" : "; " + String.join("; ", markings))
            + "; "
            + rest;
    RequirementEvaluator.Verdict combined =
        // Nor are the other standards' figures beside it: each line's are not the sum's.
        RequirementEvaluator.compare(c, value, first.unit(), StandardComparison.without(note));
    return combined.shownIn(first.shownUnit());
  }

  /** Class, NOHD or OD of a range: its total power judged at each line, the strictest kept. */
  private static RequirementEvaluator.Verdict strictest(
      ResolvedRequirement r,
      ResolvedModel model,
      Criterion c,
      OcularEffect effect,
      List<Double> lines,
      Map<Double, TrainSolution> solved,
      Map<Double, Double> power) {
    double total = lines.stream().mapToDouble(power::get).sum();
    RequirementEvaluator.Verdict worst = null;
    double at = 0;
    for (double wl : lines) {
      RequirementEvaluator.Verdict v =
          SafetyVerdicts.evaluate(r, c, solved.get(wl), model, total / power.get(wl));
      if (!v.evaluated()) {
        return RequirementEvaluator.Verdict.notEvaluated("line " + name(wl) + ": " + v.text());
      }
      if (worst == null || (worst.pass() && !v.pass()) || v.margin() < worst.margin()) {
        worst = v;
        at = wl;
      }
    }
    String how =
        lines.size() == 1
            ? "line " + name(at) + " alone acts on " + effect.description()
            : "lines "
                + String.join(", ", lines.stream().map(LineSafety::name).toList())
                + " act on "
                + effect.description()
                + " and add ("
                + OcularEffect.RULE
                + "); judged as their total "
                + QuantityFormat.format(total, Dimension.POWER)
                + " at "
                + name(at)
                + ", the strictest of their wavelengths, which is never below that sum;"
                + " governing line "
                + name(at);
    return worst.withText(worst.text().isEmpty() ? how : how + "; " + worst.text());
  }

  static String name(double wavelength) {
    return QuantityFormat.format(wavelength, Dimension.LENGTH);
  }

  private static String percent(double fraction) {
    return QuantityFormat.format(100 * fraction, Dimension.DIMENSIONLESS) + " %";
  }
}
