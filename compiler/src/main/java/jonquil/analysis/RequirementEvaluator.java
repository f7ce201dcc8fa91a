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

  /** The verdict on one criterion. */
  record Verdict(
      boolean evaluated,
      boolean pass,
      double value,
      double bound,
      double margin,
      String unit,
      String text) {
    static Verdict notEvaluated(String reason) {
      return new Verdict(false, false, Double.NaN, Double.NaN, Double.NaN, "", reason);
    }
  }

  private RequirementEvaluator() {}

  /** All criteria of a requirement, worst margin first; over a band, at its worst wavelength. */
  static Verdict evaluate(
      ResolvedRequirement r, ResolvedModel model, Function<OptionalDouble, TrainSolution> solve) {
    if (r.yield().isPresent()) {
      return yieldOverTolerances(r, model);
    }
    if (r.band().isPresent()) {
      Verdict worst = null;
      ResolvedRequirement.Band band = r.band().get();
      for (int i = 0; i <= 4; i++) {
        double wl = band.low() + (band.high() - band.low()) * i / 4.0;
        Verdict v = evaluate(r, model, solve.apply(OptionalDouble.of(wl)));
        if (!v.evaluated()) {
          return v;
        }
        if (worst == null || v.margin() < worst.margin()) {
          worst = v;
        }
      }
      return worst;
    }
    return evaluate(r, model, solve.apply(OptionalDouble.empty()));
  }

  /**
   * Builds drawn for a yield; the standard error of the estimate is then at most 0.5/√N ≈ 2.5 %.
   */
  static final int YIELD_TRIALS = 400;

  /** A fixed seed: the same spec gives the same yield on every run and in every tool. */
  static final long YIELD_SEED = 0x4A4F4E51L;

  /**
   * The fraction of toleranced builds that meet the requirement, by Monte Carlo over every '±' in
   * the spec (uniform within each tolerance), compared with the yield bound.
   */
  private static Verdict yieldOverTolerances(ResolvedRequirement r, ResolvedModel model) {
    if (!Tolerances.any(model)) {
      return Verdict.notEvaluated(
          "the spec states no tolerances ('± ...'), so every build is the same; "
              + "check the requirement itself without 'yield'");
    }
    java.util.SplittableRandom random = new java.util.SplittableRandom(YIELD_SEED);
    int pass = 0;
    for (int i = 0; i < YIELD_TRIALS; i++) {
      ResolvedModel build = Tolerances.draw(model, random);
      MaterialModel m = new MaterialModel(build);
      ElementOptics optics = new ElementOptics(m, new SurfaceModel(build, m));
      Verdict v =
          evaluate(r, build, new Propagator(build, optics, m).solve(OptionalDouble.empty()));
      if (!v.evaluated()) {
        return Verdict.notEvaluated("the yield's requirement cannot be evaluated: " + v.text());
      }
      if (v.pass()) {
        pass++;
      }
    }
    double fraction = (double) pass / YIELD_TRIALS;
    return compare(
        r.yield().get(),
        fraction,
        "%",
        YIELD_TRIALS + " toleranced builds, uniform within each '±'");
  }

  static Verdict evaluate(ResolvedRequirement r, ResolvedModel model, TrainSolution s) {
    Verdict worst = null;
    for (Criterion c : r.criteria()) {
      Verdict v = criterion(r, c, s, model);
      if (!v.evaluated()) {
        return v;
      }
      if (worst == null || v.margin() < worst.margin()) {
        worst = v;
      }
    }
    return worst == null ? Verdict.notEvaluated("the requirement has no bound") : worst;
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
        yield c.relativeToSource()
            ? compare(c, s.sourcePower() == 0 ? 0 : p / s.sourcePower(), "", "of the source power")
            : compare(c, p, "W", "");
      }
      case TRANSMISSION -> {
        Optional<PortValue> a = r.from().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
        Optional<PortValue> b = r.to().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
        if (a.isEmpty() || b.isEmpty()) {
          yield unreached(r);
        }
        yield compare(c, a.get().power() == 0 ? 0 : b.get().power() / a.get().power(), "", "");
      }
      case STRAY -> compare(c, s.strayPower(), "W", "");
      case BACK_REFLECTION -> {
        double back = s.backReflected(r.at().map(t -> t.symbol()));
        yield c.relativeToSource()
            ? compare(
                c, s.sourcePower() == 0 ? 0 : back / s.sourcePower(), "", "of the source power")
            : compare(c, back, "W", "");
      }
      case DOP -> at.isEmpty() ? unreached(r) : compare(c, at.get().light().dop(), "", "");
      case EXTINCTION ->
          at.isEmpty() ? unreached(r) : compare(c, at.get().light().extinctionRatio(), "", "");
      case AZIMUTH ->
          at.isEmpty() ? unreached(r) : compare(c, at.get().light().azimuth(), "rad", "");
      case ELLIPTICITY ->
          at.isEmpty() ? unreached(r) : compare(c, at.get().light().ellipticityAngle(), "rad", "");
      case POLARIZATION, HANDEDNESS -> at.isEmpty() ? unreached(r) : state(c, at.get().light());
      case IRRADIANCE -> exposure(r, c, s, e -> OptionalDouble.of(e.averageIrradiance()), "W/m2");
      case PEAK_IRRADIANCE -> exposure(r, c, s, RequirementEvaluator::peakIrradiance, "W/m2");
      case FLUENCE -> exposure(r, c, s, BeamExposure::peakFluence, "J/m2");
      case PEAK_FIELD -> exposure(r, c, s, e -> OptionalDouble.of(e.peakField()), "V/m");
      case PEAK_POWER -> exposure(r, c, s, BeamExposure::peakPower, "W");
      case PULSE_ENERGY -> exposure(r, c, s, BeamExposure::pulseEnergy, "J");
      case BEAM_RADIUS -> exposure(r, c, s, e -> OptionalDouble.of(e.beamRadius()), "m");
      case DAMAGE_MARGIN -> damage(r, c, s, model);
      case HAZARD_CLASS, NOHD, EXPOSURE, EYEWEAR_OD -> SafetyVerdicts.evaluate(r, c, s, model);
    };
  }

  /**
   * The Gaussian peak irradiance; for a pulsed beam, of the peak power (the pulse's peak, not the
   * average's).
   */
  private static OptionalDouble peakIrradiance(BeamExposure e) {
    return OptionalDouble.of(
        e.peakPower().isPresent()
            ? jonquil.optics.beam.Irradiance.peak(e.peakPower().getAsDouble(), e.beamRadius())
            : e.peakIrradiance());
  }

  /**
   * A quantity of the exposure, at a place (the light arriving there) or everywhere (the largest
   * value over every element's input, which is where parts take the beam).
   */
  private static Verdict exposure(
      ResolvedRequirement r,
      Criterion c,
      TrainSolution s,
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
    for (PortValue p : places) {
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
      Optional<PortValue> in = s.incidentAt(name);
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
      case WITHIN ->
          verdict(
              value >= low && value <= c.high(),
              value,
              value < low ? low : c.high(),
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

  private static Verdict verdict(
      boolean pass, double value, double bound, double margin, String unit, String note) {
    return new Verdict(true, pass, value, bound, margin, unit, note);
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
      return new Verdict(
          true,
          signed > 0,
          chi,
          0,
          signed,
          "rad",
          "ellipticity angle; " + light.handedness().describe());
    }
    StateForm form = StateForm.of(g);
    if (g.word("form_mix").isPresent()) {
      double dop = g.number("dop").orElse(1);
      double margin = UNPOLARIZED_DOP - Math.abs(light.dop() - dop);
      Verdict polarized = pureState(g, form, light);
      double worst = Math.min(margin, polarized.margin());
      return new Verdict(true, worst >= 0, light.dop(), dop, worst, "", "");
    }
    return pureState(g, form, light);
  }

  private static Verdict pureState(Value.Group g, StateForm form, Coherency light) {
    double chi = light.ellipticityAngle();
    return switch (form) {
      case LINEAR -> {
        Value.Num az = (Value.Num) g.slot("azimuth").orElseThrow();
        double tol = az.tolerance().orElse(DEFAULT_STATE_TOLERANCE);
        double off = Math.abs(wrapHalfTurn(light.azimuth() - az.si()));
        double margin = Math.min(tol - off, tol - Math.abs(chi));
        yield new Verdict(
            true,
            margin >= 0,
            light.azimuth(),
            az.si(),
            margin,
            "rad",
            "azimuth against the table frame");
      }
      case CIRCULAR -> {
        Handedness wanted =
            g.word("handedness").orElse("right").equals("left")
                ? Handedness.LEFT
                : Handedness.RIGHT;
        double signed = wanted == Handedness.RIGHT ? chi : -chi;
        double margin = signed - (Math.PI / 4 - DEFAULT_STATE_TOLERANCE);
        yield new Verdict(
            true,
            margin >= 0,
            chi,
            wanted == Handedness.RIGHT ? Math.PI / 4 : -Math.PI / 4,
            margin,
            "rad",
            "ellipticity angle; " + light.handedness().describe());
      }
      case ELLIPTICAL -> {
        Value.Num az = (Value.Num) g.slot("azimuth").orElseThrow();
        double tol = az.tolerance().orElse(DEFAULT_STATE_TOLERANCE);
        double wantedChi =
            Math.atan(g.number("axis_ratio").orElse(0))
                * (g.word("handedness").orElse("right").equals("left") ? -1 : 1);
        double margin =
            Math.min(
                tol - Math.abs(wrapHalfTurn(light.azimuth() - az.si())),
                tol - Math.abs(chi - wantedChi));
        yield new Verdict(true, margin >= 0, light.azimuth(), az.si(), margin, "rad", "");
      }
      case UNPOLARIZED -> {
        double margin = UNPOLARIZED_DOP - light.dop();
        yield new Verdict(true, margin >= 0, light.dop(), UNPOLARIZED_DOP, margin, "", "");
      }
    };
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
