package jonquil.analysis;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;
import jonquil.optics.Coherency;
import jonquil.optics.Handedness;
import jonquil.resolve.Measure;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRequirement;
import jonquil.resolve.ResolvedRequirement.Criterion;
import jonquil.resolve.StateForm;
import jonquil.resolve.Value;

/**
 * Evaluates requirements on a solved train: the computed value, the bound and the margin (positive
 * inside the bound, negative outside) in SI units. Measures this version does not compute are
 * reported as not evaluated, with the reason.
 */
final class RequirementEvaluator {
  /** Tolerance on a stated polarization state when the spec gives none. */
  static final double DEFAULT_STATE_TOLERANCE = Math.toRadians(1);

  /** Largest DOP that still counts as 'unpolarized'. */
  static final double UNPOLARIZED_DOP = 0.01;

  /**
   * The verdict on one criterion. {@code what} names the measure it judged when that is not the
   * requirement's own (a further condition of a compound requirement).
   */
  record Verdict(
      boolean evaluated,
      boolean pass,
      double value,
      double bound,
      double margin,
      String unit,
      String text,
      boolean valueIsFloor,
      String shownUnit,
      String what) {
    Verdict withText(String newText) {
      return new Verdict(
          evaluated, pass, value, bound, margin, unit, newText, valueIsFloor, shownUnit, what);
    }

    Verdict shownIn(String shown) {
      return new Verdict(
          evaluated, pass, value, bound, margin, unit, text, valueIsFloor, shown, what);
    }

    Verdict about(String measure) {
      return new Verdict(
          evaluated, pass, value, bound, margin, unit, text, valueIsFloor, shownUnit, measure);
    }

    static Verdict notEvaluated(String reason) {
      return new Verdict(
          false, false, Double.NaN, Double.NaN, Double.NaN, "", reason, false, "", "");
    }
  }

  private RequirementEvaluator() {}

  /**
   * All criteria of a requirement, worst margin first. Lines are beams of their own: 'for line 532
   * nm' judges that line alone; 'over wavelength a .. b' judges each line inside the band alone and
   * reports the worst, naming the lines (a source without lines is one line at its wavelength; a
   * band holding no line fails closed); a safety bound on light of several lines adds the lines by
   * the standard's rule ({@link LineSafety}). {@code solve} gives the solution of one line (by its
   * vacuum wavelength) or, given nothing, of every line together. A yield's bound is judged by
   * {@link YieldMonteCarlo}, which calls this once per build.
   */
  static Verdict evaluate(
      ResolvedRequirement r, ResolvedModel model, Function<OptionalDouble, TrainSolution> solve) {
    if (r.line().isPresent()) {
      double wl = r.line().getAsDouble();
      Verdict v = evaluate(r, model, solve.apply(OptionalDouble.of(wl)));
      return v.evaluated() ? v.withText(noted("line " + LineSafety.name(wl) + " alone", v)) : v;
    }
    java.util.List<Double> lines = SourceBeams.lines(model);
    if (r.band().isPresent()) {
      ResolvedRequirement.Band band = r.band().get();
      java.util.List<Double> inside =
          lines.stream().filter(w -> w >= band.low() && w <= band.high()).toList();
      if (inside.isEmpty()) {
        return Verdict.notEvaluated(
            "no laser line lies in the band "
                + LineSafety.name(band.low())
                + " .. "
                + LineSafety.name(band.high())
                + (lines.isEmpty()
                    ? ""
                    : "; the lines are "
                        + String.join(", ", lines.stream().map(LineSafety::name).toList())));
      }
      Verdict worst = null;
      double worstLine = 0;
      for (double wl : inside) {
        Verdict v = evaluate(r, model, solve.apply(OptionalDouble.of(wl)));
        if (!v.evaluated()) {
          return Verdict.notEvaluated("line " + LineSafety.name(wl) + ": " + v.text());
        }
        if (worst == null || (worst.pass() && !v.pass()) || v.margin() < worst.margin()) {
          worst = v;
          worstLine = wl;
        }
      }
      String which =
          inside.size() == 1
              ? "line " + LineSafety.name(worstLine) + ", the one line in the band"
              : "lines in the band, each alone: "
                  + String.join(", ", inside.stream().map(LineSafety::name).toList())
                  + "; worst "
                  + LineSafety.name(worstLine);
      return worst.withText(noted(which, worst));
    }
    if (LineSafety.applies(r, lines)) {
      return LineSafety.evaluate(r, model, solve, lines);
    }
    return evaluate(r, model, solve.apply(OptionalDouble.empty()));
  }

  private static String noted(String lead, Verdict v) {
    return v.text().isEmpty() ? lead : lead + "; " + v.text();
  }

  static Verdict evaluate(ResolvedRequirement r, ResolvedModel model, TrainSolution s) {
    Verdict worst = null;
    java.util.List<String> failed = new java.util.ArrayList<>();
    for (Criterion c : r.criteria()) {
      Verdict v = criterion(r, c, s, model);
      if (!v.evaluated()) {
        return v;
      }
      v = v.shownIn(BoundText.shownUnit(r, c, v.unit()));
      if (r.measure().isPresent() && c.measure() != r.measure().get()) {
        v = v.about(c.measure().word());
      }
      if (!v.pass()) {
        failed.add(BoundText.condition(r, c));
      }
      // A failed condition outranks a passed one whatever their margins (their units differ).
      if (worst == null
          || (worst.pass() && !v.pass())
          || (worst.pass() == v.pass() && v.margin() < worst.margin())) {
        worst = v;
      }
    }
    if (worst == null) {
      return Verdict.notEvaluated("the requirement has no bound");
    }
    if (r.criteria().size() > 1 && !failed.isEmpty()) {
      String which =
          "fails " + String.join(" and ", failed.stream().map(f -> "'" + f + "'").toList());
      worst = worst.withText(worst.text().isEmpty() ? which : which + "; " + worst.text());
    }
    return worst;
  }

  private static Verdict criterion(
      ResolvedRequirement r, Criterion c, TrainSolution s, ResolvedModel model) {
    Measure m = c.measure();
    Optional<PortValue> at = r.at().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
    return switch (m) {
      case POWER -> {
        if (at.isEmpty()) {
          yield unreached(r);
        }
        double p = at.get().power();
        jonquil.optics.PowerRange range = PortInterference.powerRange(model, s, at.get().key(), p);
        if (range.varies()) {
          yield overPhase(c, range, s.sourcePower());
        }
        yield c.relativeToSource()
            ? compare(c, s.sourcePower() == 0 ? 0 : p / s.sourcePower(), "", "of the source power")
            : compare(c, p, "W", "");
      }
      case VISIBILITY -> at.isEmpty() ? unreached(r) : visibility(c, s, model, at.get().key());
      case TRANSMISSION -> {
        Optional<PortValue> a = r.from().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
        Optional<PortValue> b = r.to().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
        if (a.isEmpty() || b.isEmpty()) {
          yield unreached(r);
        }
        double in = a.get().power();
        jonquil.optics.PowerRange out =
            PortInterference.powerRange(model, s, b.get().key(), b.get().power());
        if (out.varies() && in > 0) {
          Verdict low = compare(c, out.min() / in, "", "over the unknown phase of beams that meet");
          Verdict high =
              compare(c, out.max() / in, "", "over the unknown phase of beams that meet");
          yield low.pass() != high.pass()
              ? (low.pass() ? high : low)
              : (low.margin() <= high.margin() ? low : high);
        }
        yield compare(c, in == 0 ? 0 : b.get().power() / in, "", "");
      }
      case STRAY -> compare(c, s.strayPower(), "W", "");
      case BACK_REFLECTION -> {
        double back = s.backReflected(r.at().map(t -> t.symbol()));
        // Beams of one line that return to a source meet at its output: what comes back is judged
        // over their relative phase, the bright fringe included (fail closed).
        java.util.Optional<String> source =
            r.at()
                .map(t -> t.symbol())
                .filter(x -> x.category() == jonquil.resolve.Category.SOURCE)
                .map(x -> x.name());
        jonquil.optics.PowerRange range =
            source.isPresent()
                ? PortInterference.powerRange(model, s, TrainSolution.returnKey(source.get()), back)
                : jonquil.optics.PowerRange.of(back);
        if (range.varies()) {
          yield overPhase(c, range, s.sourcePower());
        }
        yield c.relativeToSource()
            ? compare(
                c, s.sourcePower() == 0 ? 0 : back / s.sourcePower(), "", "of the source power")
            : compare(c, back, "W", "");
      }
      case DOP -> at.isEmpty() ? unreached(r) : compare(c, at.get().light().dop(), "", "");
      case EXTINCTION ->
          at.isEmpty() ? unreached(r) : compare(c, at.get().light().extinctionRatio(), "", "");
      case AZIMUTH ->
          at.isEmpty()
              ? unreached(r)
              : compare(c, nearBound(c, at.get().light().azimuth()), "rad", "");
      case ELLIPTICITY -> at.isEmpty() ? unreached(r) : EllipticityBound.judge(c, at.get().light());
      case POLARIZATION, HANDEDNESS -> at.isEmpty() ? unreached(r) : state(c, at.get().light());
      case IRRADIANCE ->
          exposure(r, c, s, model, e -> OptionalDouble.of(e.averageIrradiance()), "W/m2");
      case PEAK_IRRADIANCE ->
          exposure(r, c, s, model, e -> OptionalDouble.of(e.timeAndSpacePeakIrradiance()), "W/m2");
      case AVERAGE_PEAK_IRRADIANCE ->
          exposure(r, c, s, model, e -> OptionalDouble.of(e.peakIrradiance()), "W/m2");
      case FLUENCE -> exposure(r, c, s, model, BeamExposure::peakFluence, "J/m2");
      case PEAK_FIELD -> exposure(r, c, s, model, e -> OptionalDouble.of(e.peakField()), "V/m");
      case PEAK_POWER -> exposure(r, c, s, model, BeamExposure::peakPower, "W");
      case PULSE_ENERGY -> exposure(r, c, s, model, BeamExposure::pulseEnergy, "J");
      case BEAM_RADIUS -> exposure(r, c, s, model, e -> OptionalDouble.of(e.beamRadius()), "m");
      case DAMAGE_MARGIN -> damage(r, c, s, model);
      case HAZARD_CLASS, NOHD, EXPOSURE, EYEWEAR_OD -> SafetyVerdicts.evaluate(r, c, s, model);
    };
  }

  /**
   * A power bound where beams of one line meet: it must hold over the whole range the unknown phase
   * sweeps, so both ends are judged and the worse one reported.
   */
  private static Verdict overPhase(
      Criterion c, jonquil.optics.PowerRange range, double sourcePower) {
    boolean relative = c.relativeToSource();
    double scale = relative ? (sourcePower == 0 ? 0 : 1 / sourcePower) : 1;
    String unit = relative ? "" : "W";
    String note =
        "over the unknown phase of beams that meet here: "
            + VerdictText.format(range.min(), "W")
            + " .. "
            + VerdictText.format(range.max(), "W")
            + (range.exact() ? "" : " (an enclosure)")
            + (relative ? " of the source power" : "");
    Verdict low = compare(c, range.min() * scale, unit, note);
    Verdict high = compare(c, range.max() * scale, unit, note);
    if (low.pass() != high.pass()) {
      return low.pass() ? high : low;
    }
    return low.margin() <= high.margin() ? low : high;
  }

  /** The fringe visibility of every line whose beams meet at a port; the worst line counts. */
  private static Verdict visibility(
      Criterion c, TrainSolution s, ResolvedModel model, String port) {
    java.util.List<PortInterference> lines = PortInterference.at(model, s, port);
    if (lines.isEmpty()) {
      return Verdict.notEvaluated(PortInterference.NONE_MEET);
    }
    Verdict worst = null;
    for (PortInterference i : lines) {
      if (i.visibility().isEmpty()) {
        return Verdict.notEvaluated(i.unknownReason());
      }
      Verdict v =
          compare(c, i.visibility().getAsDouble(), "", "line " + LineSafety.name(i.wavelength()));
      if (worst == null || (worst.pass() && !v.pass()) || v.margin() < worst.margin()) {
        worst = v;
      }
    }
    return worst;
  }

  /**
   * A quantity of the exposure, at a place (the light arriving there) or everywhere (the largest
   * value over every element's input, which is where parts take the beam).
   */
  private static Verdict exposure(
      ResolvedRequirement r,
      Criterion c,
      TrainSolution s,
      ResolvedModel model,
      Function<BeamExposure, OptionalDouble> quantity,
      String unit) {
    java.util.List<PortValue> places = new java.util.ArrayList<>();
    if (r.everywhere()) {
      places.addAll(s.incident().values());
    } else if (r.at().isPresent()) {
      var t = r.at().get();
      String key = Propagator.key(t.symbol(), t.port());
      Optional<PortValue> v =
          t.port().isPresent() ? s.port(key) : s.incidentAt(key).or(() -> s.port(key));
      v.ifPresent(places::add);
    }
    if (places.isEmpty()) {
      return unreached(r);
    }
    Verdict worst = null;
    for (PortValue p : atPhaseExtremes(places, s, model)) {
      Optional<BeamExposure> e = p.exposure();
      if (e.isEmpty()) {
        return Verdict.notEvaluated(
            "the beam size is unknown: give the source a 'beam' line (waist or divergence)");
      }
      OptionalDouble value = quantity.apply(e.get());
      if (value.isEmpty()) {
        return Verdict.notEvaluated(
            "'" + c.measure().word() + "' applies to pulsed sources; this one is continuous");
      }
      Verdict v =
          compare(c, value.getAsDouble(), unit, r.everywhere() ? "at '" + p.element() + "'" : "");
      if (worst == null || v.margin() < worst.margin()) {
        worst = v;
      }
    }
    return worst;
  }

  /**
   * Each place as light at both ends of its interference range (power scaled, beam unchanged) where
   * beams of one line meet there, else as it is: a bound must hold at every phase.
   */
  private static java.util.List<PortValue> atPhaseExtremes(
      java.util.List<PortValue> places, TrainSolution s, ResolvedModel model) {
    java.util.List<PortValue> out = new java.util.ArrayList<>();
    for (PortValue p : places) {
      jonquil.optics.PowerRange range = PortInterference.powerRange(model, s, p.key(), p.power());
      if (!range.varies() || p.power() <= 0) {
        out.add(p);
        continue;
      }
      out.add(p.scaledBy(range.min() / p.power()));
      out.add(p.scaledBy(range.max() / p.power()));
    }
    return out;
  }

  /** The smallest damage margin at a part, or over every part that declares thresholds. */
  private static Verdict damage(
      ResolvedRequirement r, Criterion c, TrainSolution s, ResolvedModel model) {
    java.util.List<String> names = new java.util.ArrayList<>();
    if (r.everywhere()) {
      names.addAll(s.incident().keySet());
    } else {
      r.at().ifPresent(t -> names.add(t.symbol().name()));
    }
    Verdict worst = null;
    for (String name : names) {
      Optional<jonquil.resolve.ResolvedElement> part = model.element(name);
      Optional<PortValue> in = s.incidentAt(name).map(v -> PortInterference.brightest(model, s, v));
      if (part.isEmpty() || in.isEmpty()) {
        continue;
      }
      double wavelength = in.get().wavelength();
      OptionalDouble margin = DamageModel.margin(part.get(), in.get(), wavelength);
      if (margin.isPresent()) {
        Verdict v =
            compare(
                c,
                margin.getAsDouble(),
                "",
                "at '" + name + "'; thresholds scaled by common-practice rules");
        if (worst == null || v.margin() < worst.margin()) {
          worst = v;
        }
      }
    }
    if (worst == null) {
      return Verdict.notEvaluated(
          s.incident().values().stream().anyMatch(v -> v.mode().isPresent())
              ? "no part in reach declares a damage threshold that applies to this beam"
              : "the beam size is unknown: give the source a 'beam' line");
    }
    return worst;
  }

  private static Verdict unreached(ResolvedRequirement r) {
    return Verdict.notEvaluated("no beam reaches the place this requirement names");
  }

  static Verdict compare(Criterion c, double value, String unit, String note) {
    double low = c.low();
    return switch (c.relation()) {
      case AT_MOST -> verdict(value <= low, value, low, low - value, unit, note);
      case BELOW -> verdict(value < low, value, low, low - value, unit, note);
      case AT_LEAST -> verdict(value >= low, value, low, value - low, unit, note);
      case ABOVE -> verdict(value > low, value, low, value - low, unit, note);
      // The end nearest to being broken, with its margin.
      case WITHIN ->
          verdict(
              value >= low && value <= c.high(),
              value,
              value - low <= c.high() - value ? low : c.high(),
              Math.min(value - low, c.high() - value),
              unit,
              note);
      // Within a relative 1e-9, since computed values carry rounding.
      case EQUAL ->
          verdict(
              Math.abs(value - low) <= 1e-9 * Math.max(1, Math.abs(low)),
              value,
              low,
              -Math.abs(value - low),
              unit,
              note);
      // A stated state is judged by state(), never by a number.
      case IS -> throw new IllegalArgumentException("'is' bounds a state, not a number");
    };
  }

  /**
   * A value that was not computed but is known to be at least {@code floor}: a bound that floor
   * already breaks fails, one it already meets passes, and otherwise the value stays unknown.
   */
  static Verdict knownAtLeast(
      Criterion c, double floor, String unit, String note, String unknownReason) {
    double low = c.low();
    Boolean known =
        switch (c.relation()) {
          case AT_MOST -> floor > low ? false : null;
          case BELOW -> floor >= low ? false : null;
          case EQUAL -> floor > low ? false : null;
          case WITHIN -> floor > c.high() ? false : null;
          case AT_LEAST -> floor >= low ? true : null;
          case ABOVE -> floor > low ? true : null;
          case IS -> null;
        };
    if (known == null) {
      return Verdict.notEvaluated(unknownReason);
    }
    double edge = c.relation() == ResolvedRequirement.Relation.WITHIN ? c.high() : low;
    // The true margin is no larger than this when failing, no smaller when passing.
    double margin = known ? floor - edge : edge - floor;
    return new Verdict(true, known, floor, edge, margin, unit, note, true, unit, "");
  }

  /** A value that was computed (not only bounded from below), shown in its SI unit. */
  static Verdict verdict(
      boolean pass, double value, double bound, double margin, String unit, String note) {
    return new Verdict(true, pass, value, bound, margin, unit, note, false, unit, "");
  }

  /**
   * 'is linear 90 deg ± 2 deg', 'is circular right', 'is unpolarized', ... against the computed
   * light.
   */
  static Verdict state(Criterion c, Coherency light) {
    Value.Group g = c.state().orElseThrow();
    Optional<String> hand = g.word("handedness");
    if (c.measure() == Measure.HANDEDNESS) {
      Handedness wanted = hand.orElse("right").equals("left") ? Handedness.LEFT : Handedness.RIGHT;
      double chi = light.ellipticityAngle();
      double signed = wanted == Handedness.RIGHT ? chi : -chi;
      return verdict(
          signed > 0, chi, 0, signed, "rad", "ellipticity angle; " + light.handedness().describe());
    }
    StateForm form = StateForm.of(g);
    if (g.word("form_mix").isPresent()) {
      double dop = g.number("dop").orElse(1);
      double margin = UNPOLARIZED_DOP - Math.abs(light.dop() - dop);
      Verdict polarized = pureState(g, form, light);
      double worst = Math.min(margin, polarized.margin());
      return verdict(worst >= 0, light.dop(), dop, worst, "", "");
    }
    return pureState(g, form, light);
  }

  private static Verdict pureState(Value.Group g, StateForm form, Coherency light) {
    double chi = light.ellipticityAngle();
    return switch (form) {
      case LINEAR -> azimuthState(g, light, chi, "azimuth against the table frame");
      case CIRCULAR -> {
        Handedness wanted =
            g.word("handedness").orElse("right").equals("left")
                ? Handedness.LEFT
                : Handedness.RIGHT;
        double signed = wanted == Handedness.RIGHT ? chi : -chi;
        double margin = signed - (Math.PI / 4 - DEFAULT_STATE_TOLERANCE);
        yield verdict(
            margin >= 0,
            chi,
            wanted == Handedness.RIGHT ? Math.PI / 4 : -Math.PI / 4,
            margin,
            "rad",
            "ellipticity angle; " + light.handedness().describe());
      }
      case ELLIPTICAL -> {
        double wantedChi =
            Math.atan(g.number("axis_ratio").orElse(0))
                * (g.word("handedness").orElse("right").equals("left") ? -1 : 1);
        yield azimuthState(g, light, chi - wantedChi, "");
      }
      case UNPOLARIZED -> {
        double margin = UNPOLARIZED_DOP - light.dop();
        yield verdict(margin >= 0, light.dop(), UNPOLARIZED_DOP, margin, "", "");
      }
    };
  }

  /**
   * A state with an azimuth (linear, elliptical): the value is the light's azimuth in the bound's
   * half turn; the margin is the smaller of the azimuth's and the ellipticity's distances to the
   * tolerance, {@code chiOff} being how far the ellipticity angle is from the one wanted.
   */
  private static Verdict azimuthState(Value.Group g, Coherency light, double chiOff, String note) {
    Value.Num az = (Value.Num) g.slot("azimuth").orElseThrow();
    double tol = az.tolerance().orElse(DEFAULT_STATE_TOLERANCE);
    double off = wrapHalfTurn(light.azimuth() - az.si());
    double margin = Math.min(tol - Math.abs(off), tol - Math.abs(chiOff));
    return verdict(margin >= 0, az.si() + off, az.si(), margin, "rad", note);
  }

  /**
   * A linear azimuth in the half turn the bound uses: the same polarization as {@code azimuth},
   * within 90° of the bound's middle (90° ± 2° reads light at −88.2° as 91.8°).
   */
  static double nearBound(Criterion c, double azimuth) {
    double middle =
        c.relation() == ResolvedRequirement.Relation.WITHIN ? (c.low() + c.high()) / 2 : c.low();
    return middle + wrapHalfTurn(azimuth - middle);
  }

  /** An azimuth difference folded into (−90°, 90°]: linear polarization repeats every half turn. */
  static double wrapHalfTurn(double angle) {
    double a = angle % Math.PI;
    if (a <= -Math.PI / 2) {
      a += Math.PI;
    } else if (a > Math.PI / 2) {
      a -= Math.PI;
    }
    return a;
  }
}
