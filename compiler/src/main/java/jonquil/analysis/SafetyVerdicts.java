package jonquil.analysis;

import java.util.Optional;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;
import jonquil.safety.HazardClass;
import jonquil.safety.Outcome;

/**
 * Requirements on eye safety: hazard class and NOHD of a source, exposure against the MPE and the
 * eyewear OD needed at a place. Each verdict names the standard it used and carries the caution
 * that a laser safety officer must confirm it.
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
    double wavelength = at.wavelength();
    double exposureTime =
        element
            .get()
            .number(Param.EXPOSURE_TIME, "time")
            .orElse(SafetyModel.defaultExposureTime(wavelength));
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
          return withNote(v, brief(o.standard()) + "; " + o.caution());
        }
      case NOHD:
        return verdict(c, SafetyModel.nohd(element.get(), at), "m");
      case EXPOSURE:
        return verdict(
            c,
            SafetyModel.mpeFraction(
                wavelength,
                at,
                exposureTime,
                element.get().number(Param.APERTURE, "diameter").orElse(Double.POSITIVE_INFINITY)),
            "");
      default:
        {
          var od = SafetyModel.eyewear(wavelength, at, exposureTime);
          if (!od.evaluated()) {
            return RequirementEvaluator.Verdict.notEvaluated(unevaluated(od));
          }
          RequirementEvaluator.Verdict v =
              RequirementEvaluator.compare(c, od.get().atAperture(), "OD", "");
          return withNote(
              v,
              String.format(
                  java.util.Locale.ROOT,
                  "averaged over the 7 mm limiting aperture; OD %.2f at the beam's peak; %s; %s",
                  od.get().atPeak(),
                  brief(od.standard()),
                  od.caution()));
        }
    }
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

  private static RequirementEvaluator.Verdict verdict(Criterion c, Outcome<Double> o, String unit) {
    if (!o.evaluated()) {
      return RequirementEvaluator.Verdict.notEvaluated(unevaluated(o));
    }
    return withNote(
        RequirementEvaluator.compare(c, o.get(), unit, ""),
        brief(o.standard()) + "; " + o.caution());
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
