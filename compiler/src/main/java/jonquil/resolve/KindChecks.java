package jonquil.resolve;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.diag.DiagnosticCode;
import jonquil.optics.material.ThermoOptic;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/** Consistency rules of single kinds that a parameter table cannot express. */
final class KindChecks {
  private KindChecks() {}

  /**
   * Relative mismatch tolerated between average power and pulse energy × repetition rate (rounding
   * in datasheets).
   */
  static final double PULSE_CONSISTENCY = 0.01;

  static void check(
      Sink sink,
      Symbol symbol,
      ElementKind kind,
      Declaration decl,
      Map<String, List<Value.Group>> params,
      Map<String, Property> given) {
    String who = kind.word() + " '" + symbol.name() + "'";
    // A switch expression, so that a new kind does not compile until it is listed here.
    Runnable rules =
        switch (kind) {
          case SOURCE ->
              () -> {
                pulses(sink, who, decl, params, given);
                beamQuality(sink, who, params, given);
              };
          case MATERIAL ->
              () -> {
                needs(sink, who, decl, given, Param.K, Param.INDEX);
                needs(sink, who, decl, given, Param.ORDINARY, Param.EXTRAORDINARY);
                needs(sink, who, decl, given, Param.EXTRAORDINARY, Param.ORDINARY);
                temperature(sink, who, params, given);
              };
          // Outside its band a filter does what 'blocking' says: nothing is assumed, since a
          // guessed out-of-band transmission would be wrong one way for eye safety and the other
          // for a power budget.
          case FILTER ->
              () -> {
                needs(sink, who, decl, given, Param.BAND, Param.BLOCKING);
                needs(sink, who, decl, given, Param.BLOCKING, Param.BAND);
              };
          case SPLITTER ->
              () -> {
                if (!given.containsKey(Param.POLARIZING.word())) {
                  needs(sink, who, decl, given, Param.REFLECT_S, Param.REFLECT_P);
                  needs(sink, who, decl, given, Param.REFLECT_P, Param.REFLECT_S);
                  refused(
                      sink,
                      who,
                      given,
                      Param.EXTINCTION,
                      "an extinction ratio describes a polarizing splitter, and this one is not"
                          + " 'polarizing'; its split is set by 'ratio' or the reflectances");
                }
                splitterConserves(sink, who, params, given);
              };
          case LENS -> () -> needs(sink, who, decl, given, Param.THICKNESS, Param.MATERIAL);
          case WAVEPLATE -> () -> needs(sink, who, decl, given, Param.THICKNESS, Param.MATERIAL);
          // The tables (with the parameters they refuse) and KindRules say all there is to check
          // of these.
          case WINDOW,
              PLATE,
              DETECTOR,
              COATING,
              INTERFACE,
              POLARIZER,
              ROTATOR,
              DEPOLARIZER,
              MIRROR,
              APERTURE,
              RHOMB,
              ISOLATOR,
              PROBE,
              DUMP ->
              () -> {};
        };
    rules.run();
  }

  /**
   * A material's temperature moves its index only where the change is published
   * (optics.material.ThermoOptic): a catalog entry with such data, within the temperatures they
   * cover. Anything else is refused: an index written in the spec holds as given, and for other
   * entries the index at that temperature is unknown.
   */
  private static void temperature(
      Sink sink, String who, Map<String, List<Value.Group>> params, Map<String, Property> given) {
    OptionalDouble kelvin = number(params, Param.TEMPERATURE, "temperature");
    if (kelvin.isEmpty()) {
      return;
    }
    List<Value.Group> catalog = params.get(Param.CATALOG.word());
    Symbol entry =
        catalog == null
                || catalog.isEmpty()
                || !(catalog.get(0).slot("name").orElse(null) instanceof Value.Ref ref)
            ? null
            : ref.symbol();
    Optional<ThermoOptic> thermo =
        entry == null || !entry.isCatalog() ? Optional.empty() : ThermoOptic.of(entry.name());
    Property line = given.get(Param.TEMPERATURE.word());
    if (thermo.isEmpty()) {
      KeyReports.notModelled(
          sink,
          line,
          who,
          (entry == null || !entry.isCatalog()
                  ? "an index written in the spec holds as given"
                  : "catalog entry '" + entry.name() + "' has no published dn/dT in Jonquil")
              + "; a temperature is taken only by the catalog entries "
              + ThermoOptic.names());
      return;
    }
    if (!thermo.get().covers(kelvin.getAsDouble())) {
      sink.report(
          DiagnosticCode.OUT_OF_RANGE,
          line.range(),
          "the temperature dependence of '"
              + entry.name()
              + "' is published from "
              + QuantityFormat.format(thermo.get().minKelvin(), Dimension.TEMPERATURE)
              + " to "
              + QuantityFormat.format(thermo.get().maxKelvin(), Dimension.TEMPERATURE)
              + " ("
              + thermo.get().reference()
              + "); "
              + QuantityFormat.format(kelvin.getAsDouble(), Dimension.TEMPERATURE)
              + " is outside it");
    }
  }

  /**
   * A parameter the language accepts but whose effect Jonquil does not model: refused with why,
   * rather than accepted and silently ignored.
   */
  private static void refused(
      Sink sink, String who, Map<String, Property> given, Param param, String why) {
    if (given.containsKey(param.word())) {
      KeyReports.notModelled(sink, given.get(param.word()), who, why);
    }
  }

  /**
   * A splitter may lose light (absorption) but never make it: per polarization, reflected plus
   * transmitted is at most 100 %. The fractions are those the optics use (SplitterFractions, whose
   * defaults yield to stated figures), each stated one at the edge of its tolerance that sends out
   * the most.
   */
  private static void splitterConserves(
      Sink sink, String who, Map<String, List<Value.Group>> params, Map<String, Property> given) {
    SplitterFractions f =
        SplitterFractions.of(
            given.containsKey(Param.POLARIZING.word()),
            edge(params, Param.RATIO, "reflected", 1),
            edge(params, Param.TRANSMIT_P, "t", 1),
            edge(params, Param.TRANSMIT_S, "t", 1),
            edge(params, Param.REFLECT_P, "r", 1),
            edge(params, Param.REFLECT_S, "r", 1),
            edge(params, Param.EXTINCTION, "ratio", -1));
    List<String> broken = new java.util.ArrayList<>();
    double worst = 0;
    if (f.tp() + f.rp() > 1 + CONSERVATION_SLACK) {
      broken.add("p: transmitted " + percent(f.tp()) + " + reflected " + percent(f.rp()));
      worst = f.tp() + f.rp();
    }
    if (f.ts() + f.rs() > 1 + CONSERVATION_SLACK) {
      broken.add("s: transmitted " + percent(f.ts()) + " + reflected " + percent(f.rs()));
      worst = Math.max(worst, f.ts() + f.rs());
    }
    if (broken.isEmpty()) {
      return;
    }
    // The line that states the last of the fractions in play: the one that tipped the sum.
    Property at =
        java.util.stream.Stream.of(
                Param.RATIO,
                Param.TRANSMIT_P,
                Param.TRANSMIT_S,
                Param.REFLECT_P,
                Param.REFLECT_S,
                Param.EXTINCTION,
                Param.POLARIZING)
            .map(p -> given.get(p.word()))
            .filter(java.util.Objects::nonNull)
            .max(java.util.Comparator.comparingInt(p -> p.range().start()))
            .orElseThrow();
    sink.report(
        DiagnosticCode.ENERGY_NOT_CONSERVED_BY_PARAMETERS,
        at.range(),
        who
            + " would send out more light than comes in ("
            + String.join("; ", broken)
            + ", up to "
            + percent(worst)
            + (given.containsKey(Param.EXTINCTION.word())
                    && !given.containsKey(Param.TRANSMIT_S.word())
                ? "; s is transmitted as transmit_p / extinction"
                : "")
            + "); make reflected plus transmitted at most 100 % for each polarization, the rest"
            + " is absorbed");
  }

  /**
   * Excess over 100 % let pass: the power budget's own tolerance (Analyzer.CONSERVATION_TOLERANCE),
   * so that a near-ideal splitter ('reflect_s 100 %' with an extinction of 1e9) is not refused for
   * light the budget itself would not notice.
   */
  static final double CONSERVATION_SLACK = 1e-9;

  /**
   * A stated number at the edge of its tolerance ({@code side} +1 for the top, −1 for the bottom),
   * empty when not stated.
   */
  private static OptionalDouble edge(
      Map<String, List<Value.Group>> params, Param param, String slot, int side) {
    List<Value.Group> v = params.get(param.word());
    param.checkSlot(slot);
    if (v == null || v.isEmpty() || !(v.get(0).slot(slot).orElse(null) instanceof Value.Num n)) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(n.si() + side * n.tolerance().orElse(0));
  }

  private static String percent(double fraction) {
    return QuantityFormat.format(100 * fraction, Dimension.DIMENSIONLESS) + " %";
  }

  private static void needs(
      Sink sink,
      String who,
      Declaration decl,
      Map<String, Property> given,
      Param has,
      Param needs) {
    if (given.containsKey(has.word()) && !given.containsKey(needs.word())) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          given.get(has.word()).key().range(),
          "'" + has.word() + "' in " + who + " needs '" + needs.word() + "' as well");
    }
  }

  private static void pulses(
      Sink sink,
      String who,
      Declaration decl,
      Map<String, List<Value.Group>> params,
      Map<String, Property> given) {
    boolean pulsed =
        given.containsKey(Param.PULSE_ENERGY.word())
            || given.containsKey(Param.PULSE_DURATION.word())
            || given.containsKey(Param.REPETITION_RATE.word());
    if (!pulsed) {
      return;
    }
    if (!given.containsKey(Param.PULSE_DURATION.word())) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          decl.name().range(),
          "pulsed " + who + " needs 'pulse_duration'");
    }
    if (given.containsKey(Param.POWER.word())
        && !given.containsKey(Param.PULSE_ENERGY.word())
        && !given.containsKey(Param.REPETITION_RATE.word())) {
      sink.report(
          DiagnosticCode.MISSING_PARAMETER,
          given.get(Param.POWER.word()).key().range(),
          "pulsed "
              + who
              + " gives an average 'power'; add 'repetition_rate' (or 'pulse_energy') to know the"
              + " pulses");
    }
    OptionalDouble p = number(params, Param.POWER, "power");
    OptionalDouble e = number(params, Param.PULSE_ENERGY, "energy");
    OptionalDouble f = number(params, Param.REPETITION_RATE, "rate");
    if (p.isPresent() && e.isPresent() && f.isPresent()) {
      double product = e.getAsDouble() * f.getAsDouble();
      if (Math.abs(product - p.getAsDouble()) > PULSE_CONSISTENCY * p.getAsDouble()) {
        sink.report(
            DiagnosticCode.CONFLICTING_PARAMETERS,
            given.get(Param.POWER.word()).range(),
            "'power' "
                + QuantityFormat.format(p.getAsDouble(), Dimension.POWER)
                + " disagrees with pulse_energy × repetition_rate = "
                + QuantityFormat.format(product, Dimension.POWER)
                + "; give two of the three, or make them agree");
      }
    }
  }

  /**
   * Relative mismatch tolerated between a stated M² and the one waist and divergence give (data
   * sheets round each figure to two or three digits; a chosen, documented tolerance).
   */
  static final double BEAM_CONSISTENCY = 0.05;

  /**
   * Waist and divergence together fix M² = π W0 θ/λ (Siegman, Lasers, 1986, ch. 17, θ = M² λ/(π
   * W0)), in vacuum (the ambient index differs from 1 by 3e-4, far inside the tolerance). With M²
   * also stated the three must agree; a pair below the diffraction limit (M² < 1) is refused.
   */
  private static void beamQuality(
      Sink sink, String who, Map<String, List<Value.Group>> params, Map<String, Property> given) {
    List<Value.Group> beam = params.get(Param.BEAM.word());
    if (beam == null || beam.isEmpty()) {
      return;
    }
    OptionalDouble w0 = beam.get(0).number("waist");
    OptionalDouble theta = beam.get(0).number("divergence");
    OptionalDouble stated = beam.get(0).number("m2");
    List<Double> wavelengths = new java.util.ArrayList<>();
    number(params, Param.WAVELENGTH, "wavelength").ifPresent(wavelengths::add);
    for (Value.Group line : params.getOrDefault(Param.LINE.word(), List.of())) {
      line.number("wavelength").ifPresent(wavelengths::add);
    }
    if (w0.isPresent() && theta.isEmpty()) {
      for (double wl : wavelengths) {
        // θ = M² λ/(π W0) (Siegman, Lasers, 1986, ch. 17): a waist so small that the half angle
        // reaches 90° is no beam, and every figure drawn from it would overflow.
        double spread = stated.orElse(1) * wl / (Math.PI * w0.getAsDouble());
        if (!(spread < Math.PI / 2)) {
          sink.report(
              DiagnosticCode.OUT_OF_RANGE,
              given.get(Param.BEAM.word()).range(),
              "the beam of "
                  + who
                  + " cannot have a waist of "
                  + QuantityFormat.format(w0.getAsDouble(), Dimension.LENGTH)
                  + " at "
                  + QuantityFormat.format(wl, Dimension.LENGTH)
                  + ": its half-angle divergence M² λ/(π W0) would reach 90° or more; a"
                  + " waist radius (1/e²) is at least about M² λ/π");
          return;
        }
      }
    }
    if (w0.isEmpty() || theta.isEmpty()) {
      return;
    }
    for (double wl : wavelengths) {
      double m2 = Math.PI * w0.getAsDouble() * theta.getAsDouble() / wl;
      String derived =
          "waist "
              + QuantityFormat.format(w0.getAsDouble(), Dimension.LENGTH)
              + " and divergence "
              + QuantityFormat.format(theta.getAsDouble(), Dimension.ANGLE)
              + " at "
              + QuantityFormat.format(wl, Dimension.LENGTH)
              + " give M² = π W0 θ/λ = "
              + QuantityFormat.format(m2, Dimension.DIMENSIONLESS);
      if (stated.isPresent()) {
        if (Math.abs(m2 - stated.getAsDouble()) > BEAM_CONSISTENCY * stated.getAsDouble()) {
          sink.report(
              DiagnosticCode.CONFLICTING_PARAMETERS,
              given.get(Param.BEAM.word()).range(),
              "the beam of "
                  + who
                  + " is over-determined and inconsistent: "
                  + derived
                  + ", not the stated "
                  + QuantityFormat.format(stated.getAsDouble(), Dimension.DIMENSIONLESS)
                  + "; give two of the three, or make them agree");
          return;
        }
      } else if (m2 < 1 - BEAM_CONSISTENCY) {
        sink.report(
            DiagnosticCode.OUT_OF_RANGE,
            given.get(Param.BEAM.word()).range(),
            "the beam of "
                + who
                + " is below the diffraction limit: "
                + derived
                + ", and M² cannot be below 1; check the waist (a radius at 1/e²) and the"
                + " divergence (a half angle)");
        return;
      }
    }
  }

  private static OptionalDouble number(
      Map<String, List<Value.Group>> params, Param param, String slot) {
    List<Value.Group> v = params.get(param.word());
    param.checkSlot(slot);
    return v == null || v.isEmpty() ? OptionalDouble.empty() : v.get(0).number(slot);
  }
}
