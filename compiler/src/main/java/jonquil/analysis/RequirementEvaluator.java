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
    switch (m) {
      case POWER:
        {
          if (at.isEmpty()) {
            return unreached(r);
          }
          double p = at.get().power();
          return c.relativeToSource()
              ? compare(
                  c, s.sourcePower() == 0 ? 0 : p / s.sourcePower(), "", "of the source power")
              : compare(c, p, "W", "");
        }
      case TRANSMISSION:
        {
          Optional<PortValue> a =
              r.from().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
          Optional<PortValue> b = r.to().flatMap(t -> s.port(Propagator.key(t.symbol(), t.port())));
          if (a.isEmpty() || b.isEmpty()) {
            return unreached(r);
          }
          return compare(c, a.get().power() == 0 ? 0 : b.get().power() / a.get().power(), "", "");
        }
      case STRAY:
        return compare(c, s.strayPower(), "W", "");
      case BACK_REFLECTION:
        return c.relativeToSource()
            ? compare(
                c,
                s.sourcePower() == 0 ? 0 : s.backReflected() / s.sourcePower(),
                "",
                "of the source power")
            : compare(c, s.backReflected(), "W", "");
      case DOP:
        return at.isEmpty() ? unreached(r) : compare(c, at.get().light().dop(), "", "");
      case EXTINCTION:
        return at.isEmpty() ? unreached(r) : compare(c, at.get().light().extinctionRatio(), "", "");
      case AZIMUTH:
        return at.isEmpty() ? unreached(r) : compare(c, at.get().light().azimuth(), "rad", "");
      case ELLIPTICITY:
        return at.isEmpty()
            ? unreached(r)
            : compare(c, at.get().light().ellipticityAngle(), "rad", "");
      case POLARIZATION:
      case HANDEDNESS:
        return at.isEmpty() ? unreached(r) : state(c, at.get().light());
      case IRRADIANCE:
      case PEAK_IRRADIANCE:
      case FLUENCE:
      case PEAK_FIELD:
      case PEAK_POWER:
      case PULSE_ENERGY:
      case BEAM_RADIUS:
        return exposure(r, c, s);
      case DAMAGE_MARGIN:
        return damage(r, c, s, model);
      case HAZARD_CLASS:
      case NOHD:
      case EXPOSURE:
      case EYEWEAR_OD:
        return SafetyVerdicts.evaluate(r, c, s, model);
      default:
        return Verdict.notEvaluated(
            "'"
                + m.word()
                + "' needs the beam and exposure analysis, which this version does not run");
    }
  }

  /**
   * A quantity of the exposure, at a place (the light arriving there) or everywhere (the largest
   * value over every element's input, which is where parts take the beam).
   */
  private static Verdict exposure(ResolvedRequirement r, Criterion c, TrainSolution s) {
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
      OptionalDouble value = quantity(c.measure(), e.get());
      if (value.isEmpty()) {
        return Verdict.notEvaluated(
            "'" + c.measure().word() + "' applies to pulsed sources; this one is continuous");
      }
      Verdict v =
          compare(
              c,
              value.getAsDouble(),
              unit(c.measure()),
              r.everywhere() ? "at '" + p.element() + "'" : "");
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

  private static OptionalDouble quantity(Measure m, BeamExposure e) {
    switch (m) {
      case IRRADIANCE:
        return OptionalDouble.of(e.averageIrradiance());
      case PEAK_IRRADIANCE:
        return OptionalDouble.of(
            e.peakPower().isPresent()
                ? 2 * e.peakPower().getAsDouble() / (Math.PI * e.beamRadius() * e.beamRadius())
                : e.peakIrradiance());
      case FLUENCE:
        return e.peakFluence();
      case PEAK_FIELD:
        return OptionalDouble.of(e.peakField());
      case PEAK_POWER:
        return e.peakPower();
      case PULSE_ENERGY:
        return e.pulseEnergy();
      default:
        return OptionalDouble.of(e.beamRadius());
    }
  }

  private static String unit(Measure m) {
    switch (m) {
      case IRRADIANCE:
      case PEAK_IRRADIANCE:
        return "W/m2";
      case FLUENCE:
        return "J/m2";
      case PEAK_FIELD:
        return "V/m";
      case PEAK_POWER:
        return "W";
      case PULSE_ENERGY:
        return "J";
      default:
        return "m";
    }
  }

  private static Verdict unreached(ResolvedRequirement r) {
    return Verdict.notEvaluated("no beam reaches the place this requirement names");
  }

  static Verdict compare(Criterion c, double value, String unit, String note) {
    double margin;
    boolean pass;
    double bound = c.low();
    switch (c.relation()) {
      case AT_MOST:
        margin = c.low() - value;
        pass = value <= c.low();
        break;
      case BELOW:
        margin = c.low() - value;
        pass = value < c.low();
        break;
      case AT_LEAST:
        margin = value - c.low();
        pass = value >= c.low();
        break;
      case ABOVE:
        margin = value - c.low();
        pass = value > c.low();
        break;
      case WITHIN:
        margin = Math.min(value - c.low(), c.high() - value);
        pass = value >= c.low() && value <= c.high();
        bound = value < c.low() ? c.low() : c.high();
        break;
      default: // EQUAL: within a relative 1e-9, since computed values carry rounding
        margin = -Math.abs(value - c.low());
        pass = Math.abs(value - c.low()) <= 1e-9 * Math.max(1, Math.abs(c.low()));
        break;
    }
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
    String form = g.word("form").orElse("unpolarized");
    if (g.word("form_mix").isPresent()) {
      double dop = g.number("dop").orElse(1);
      double margin = UNPOLARIZED_DOP - Math.abs(light.dop() - dop);
      Verdict polarized = pureState(g, form, light);
      double worst = Math.min(margin, polarized.margin());
      return new Verdict(true, worst >= 0, light.dop(), dop, worst, "", "");
    }
    return pureState(g, form, light);
  }

  private static Verdict pureState(Value.Group g, String form, Coherency light) {
    double chi = light.ellipticityAngle();
    switch (form) {
      case "linear":
        {
          Value.Num az = (Value.Num) g.slot("azimuth").orElseThrow();
          double tol = az.tolerance().orElse(DEFAULT_STATE_TOLERANCE);
          double off = Math.abs(wrapHalfTurn(light.azimuth() - az.si()));
          double margin = Math.min(tol - off, tol - Math.abs(chi));
          return new Verdict(
              true,
              margin >= 0,
              light.azimuth(),
              az.si(),
              margin,
              "rad",
              "azimuth against the table frame");
        }
      case "circular":
        {
          Handedness wanted =
              g.word("handedness").orElse("right").equals("left")
                  ? Handedness.LEFT
                  : Handedness.RIGHT;
          double signed = wanted == Handedness.RIGHT ? chi : -chi;
          double margin = signed - (Math.PI / 4 - DEFAULT_STATE_TOLERANCE);
          return new Verdict(
              true,
              margin >= 0,
              chi,
              wanted == Handedness.RIGHT ? Math.PI / 4 : -Math.PI / 4,
              margin,
              "rad",
              "ellipticity angle; " + light.handedness().describe());
        }
      case "elliptical":
        {
          Value.Num az = (Value.Num) g.slot("azimuth").orElseThrow();
          double tol = az.tolerance().orElse(DEFAULT_STATE_TOLERANCE);
          double wantedChi =
              Math.atan(g.number("axis_ratio").orElse(0))
                  * (g.word("handedness").orElse("right").equals("left") ? -1 : 1);
          double margin =
              Math.min(
                  tol - Math.abs(wrapHalfTurn(light.azimuth() - az.si())),
                  tol - Math.abs(chi - wantedChi));
          return new Verdict(true, margin >= 0, light.azimuth(), az.si(), margin, "rad", "");
        }
      default:
        {
          double margin = UNPOLARIZED_DOP - light.dop();
          return new Verdict(true, margin >= 0, light.dop(), UNPOLARIZED_DOP, margin, "", "");
        }
    }
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
