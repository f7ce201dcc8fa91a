package jonquil.analysis;

import java.util.List;
import java.util.Optional;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;
import jonquil.resolve.SafetyStandard;
import jonquil.safety.HazardClass;
import jonquil.safety.Outcome;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * Requirements on eye safety: hazard class and NOHD of a source, exposure against the MPE and the
 * eyewear OD needed at a place. The model's standard gates them (the hazard class is IEC 60825-1's
 * whatever the choice); NOHD, exposure and OD state the other standards' figures beside. Each
 * verdict names the standard it used and carries the caution that a laser safety officer must
 * confirm it.
 */
final class SafetyVerdicts {
  private SafetyVerdicts() {}

  static RequirementEvaluator.Verdict evaluate(
      ResolvedRequirement r, Criterion c, TrainSolution s, ResolvedModel model) {
    return evaluate(r, c, s, model, 1);
  }

  /** The light a safety criterion judges: at a source its exit, elsewhere what arrives there. */
  static Optional<PortValue> lightAt(ResolvedRequirement r, Measure m, TrainSolution s) {
    if (r.at().isEmpty()) {
      return Optional.empty();
    }
    String name = r.at().get().symbol().name();
    Optional<PortValue> here = s.incidentAt(name).or(() -> s.port(name));
    return m == Measure.HAZARD_CLASS || m == Measure.NOHD ? s.port(name).or(() -> here) : here;
  }

  /**
   * As above, with the light at the place scaled by {@code powerScale}: one line carrying the power
   * of every line it adds with ({@link LineSafety}).
   */
  static RequirementEvaluator.Verdict evaluate(
      ResolvedRequirement r, Criterion c, TrainSolution s, ResolvedModel model, double powerScale) {
    if (r.at().isEmpty()) {
      return RequirementEvaluator.Verdict.notEvaluated("no place given");
    }
    var target = r.at().get();
    String name = target.symbol().name();
    Optional<ResolvedElement> element = model.element(target.symbol());
    Optional<PortValue> here = s.incidentAt(name).or(() -> s.port(name));
    if (element.isEmpty() || here.isEmpty()) {
      return RequirementEvaluator.Verdict.notEvaluated("no beam reaches '" + name + "'");
    }
    Measure m = c.measure();
    if ((m == Measure.HAZARD_CLASS || m == Measure.NOHD)
        && element.get().kind() != ElementKind.SOURCE) {
      return RequirementEvaluator.Verdict.notEvaluated(
          "'" + m.word() + "' is a property of a source; name the source");
    }
    PortValue at =
        scaled(PortInterference.brightest(model, s, lightAt(r, m, s).orElseThrow()), powerScale);
    SafetyStandard standard = model.standard();
    ResolvedElement place = element.get();
    ViewingSafety.Setting setting = ViewingSafety.setting(r.viewing(), place, at);
    double probeAperture =
        place.number(Param.APERTURE, "diameter").orElse(Double.POSITIVE_INFINITY);
    switch (m) {
      case HAZARD_CLASS:
        {
          Outcome<HazardClass> o = SafetyModel.hazardClass(element.get(), at);
          if (!o.evaluated() && o.atLeast().isPresent()) {
            HazardClass floor = o.atLeast().get();
            return RequirementEvaluator.knownAtLeast(
                c,
                floor.rank(),
                "class",
                o.reason() + "; " + brief(o.standard()) + "; " + o.caution(),
                unevaluated(o));
          }
          if (!o.evaluated()) {
            return RequirementEvaluator.Verdict.notEvaluated(unevaluated(o));
          }
          RequirementEvaluator.Verdict v =
              RequirementEvaluator.compare(c, o.get().rank(), "class", "");
          return withNote(v, brief(o.standard()) + classOnly(standard) + "; " + o.caution());
        }
      case NOHD:
        return verdict(
            c,
            ViewingSafety.nohd(standard, at, setting),
            "m",
            standard,
            other -> ViewingSafety.nohd(other, at, setting),
            v -> QuantityFormat.format(v, Dimension.LENGTH),
            setting);
      case EXPOSURE:
        return verdict(
            c,
            ViewingSafety.exposure(standard, at, setting, probeAperture),
            "",
            standard,
            other -> ViewingSafety.exposure(other, at, setting, probeAperture),
            v -> QuantityFormat.format(100 * v, Dimension.DIMENSIONLESS) + " %",
            setting);
      case EYEWEAR_OD:
        {
          var od = ViewingSafety.eyewear(standard, at, setting);
          String beside =
              StandardComparison.beside(
                  standard,
                  od.evaluated() ? od.get().atAperture() : Double.NaN,
                  std -> {
                    var other = ViewingSafety.eyewear(std, at, setting);
                    return other.evaluated()
                        ? Outcome.of(other.get().atAperture(), other.standard())
                        : Outcome.notEvaluated(other.reason(), other.standard());
                  },
                  v -> "OD " + QuantityFormat.format(v, Dimension.DIMENSIONLESS));
          if (!od.evaluated()) {
            return RequirementEvaluator.Verdict.notEvaluated(unevaluated(od, beside, setting));
          }
          RequirementEvaluator.Verdict v =
              RequirementEvaluator.compare(c, od.get().atAperture(), "OD", "");
          return withNote(
              v,
              setting.text()
                  + "; "
                  + (setting.viewing() == jonquil.safety.Viewing.DIFFUSE
                      ? "at the eye, uniform over the pupil"
                      : String.format(
                          java.util.Locale.ROOT,
                          "averaged over the %s limiting aperture; OD %.2f at the beam's peak",
                          QuantityFormat.format(
                              ViewingSafety.limitingAperture(standard, at, setting),
                              Dimension.LENGTH),
                          od.get().atPeak()))
                  + "; "
                  + ViewingSafety.markings(at, setting)
                  + "; "
                  + brief(od.standard())
                  + sourceNote(od.standard())
                  + "; "
                  + beside
                  + "; "
                  + od.caution());
        }
      default:
        // RequirementEvaluator dispatches only HAZARD_CLASS, NOHD, EXPOSURE and EYEWEAR_OD here.
        throw new IllegalStateException("not a safety measure: " + m);
    }
  }

  /**
   * The assumptions (viewing, duration and why) the verdict on this requirement states first,
   * recomputed for one line's solution; empty when the requirement is not judged there.
   */
  static Optional<String> settingText(
      ResolvedRequirement r, Measure m, TrainSolution s, ResolvedModel model) {
    return setting(r, m, s, model).map(ViewingSafety.Setting::text);
  }

  /** The EN 207 / EN 208 markings an eyewear verdict states, for one line's solution. */
  static Optional<String> markingText(
      ResolvedRequirement r, Measure m, TrainSolution s, ResolvedModel model) {
    Optional<PortValue> at = lightAt(r, m, s);
    return setting(r, m, s, model).flatMap(st -> at.map(a -> ViewingSafety.markings(a, st)));
  }

  private static Optional<ViewingSafety.Setting> setting(
      ResolvedRequirement r, Measure m, TrainSolution s, ResolvedModel model) {
    Optional<PortValue> at = lightAt(r, m, s);
    Optional<ResolvedElement> element = r.at().flatMap(t -> model.element(t.symbol()));
    if (at.isEmpty() || element.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(ViewingSafety.setting(r.viewing(), element.get(), at.get()));
  }

  private static PortValue scaled(PortValue p, double scale) {
    return scale == 1
        ? p
        : new PortValue(
            p.element(),
            p.port(),
            p.file(),
            p.range(),
            p.light().scaled(scale),
            p.vertical(),
            p.mode(),
            p.pulses(),
            p.index(),
            p.wavelength());
  }

  /** A figure of the governing standard, judged, with the other standards' figures beside it. */
  private static RequirementEvaluator.Verdict verdict(
      Criterion c,
      Outcome<Double> o,
      String unit,
      SafetyStandard governing,
      java.util.function.Function<SafetyStandard, Outcome<Double>> under,
      java.util.function.DoubleFunction<String> shown,
      ViewingSafety.Setting setting) {
    String beside =
        StandardComparison.beside(governing, o.evaluated() ? o.get() : Double.NaN, under, shown);
    if (!o.evaluated()) {
      return RequirementEvaluator.Verdict.notEvaluated(unevaluated(o, beside, setting));
    }
    return withNote(
        RequirementEvaluator.compare(c, o.get(), unit, ""),
        setting.text()
            + "; "
            + brief(o.standard())
            + sourceNote(o.standard())
            + "; "
            + beside
            + "; "
            + o.caution());
  }

  /** Under another standard, why the class is still IEC's. */
  private static String classOnly(SafetyStandard standard) {
    return switch (standard) {
      case IEC_60825_1 -> "";
      case DIRECTIVE_2006_25, ANSI_Z136_1 ->
          ", whose classes stand whichever standard gates the limits: "
              + standard.title()
              + " defines no classes here";
    };
  }

  /** The extended-source part of a standard's text (C6 and the apparent source), if any. */
  static String sourceNote(String standard) {
    for (String marker : List.of("; extended source, ", "; apparent source = ", "; spot size")) {
      int i = standard.indexOf(marker);
      if (i >= 0) {
        return standard.substring(i);
      }
    }
    return "";
  }

  /** As {@link #unevaluated(Outcome)}, saying what was assumed and what the others give. */
  private static String unevaluated(Outcome<?> o, String beside, ViewingSafety.Setting setting) {
    return setting.text() + ": " + unevaluated(o, beside);
  }

  /**
   * Why a safety figure is missing. A gap in the tables is no all-clear, so the reason keeps the
   * caution and sends the reader to a person who can assess the emission.
   */
  static String unevaluated(Outcome<?> o) {
    return o.reason()
        + " ("
        + o.standard()
        + "); not evaluated here, so a qualified person must assess the emission. "
        + o.caution();
  }

  /** As above, with the other standards' figures stated before the caution. */
  private static String unevaluated(Outcome<?> o, String beside) {
    return o.reason()
        + " ("
        + o.standard()
        + "); not evaluated here, so a qualified person must assess the emission; "
        + beside
        + ". "
        + o.caution();
  }

  private static RequirementEvaluator.Verdict withNote(
      RequirementEvaluator.Verdict v, String note) {
    return v.withText(note);
  }

  /**
   * The standard and edition alone ("IEC 60825-1:2014 (Ed. 3)"); the tables are in the JSON reason.
   */
  static String brief(String standard) {
    int cut = standard.indexOf(", ");
    int semi = standard.indexOf("; ");
    int end = cut < 0 ? semi : (semi < 0 ? cut : Math.min(cut, semi));
    return end < 0 ? standard : standard.substring(0, end);
  }
}
