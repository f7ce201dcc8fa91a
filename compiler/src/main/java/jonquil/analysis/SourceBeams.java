package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.optics.Coherency;
import jonquil.optics.Handedness;
import jonquil.optics.beam.GaussianBeam;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedTrain;
import jonquil.resolve.StateForm;
import jonquil.resolve.Value;

/**
 * The beams a source emits: one per laser line, with its average power and its stated polarization.
 * A source with no stated polarization is taken as unpolarized, the assumption that claims nothing
 * about extinction or azimuth.
 */
final class SourceBeams {
  private SourceBeams() {}

  /**
   * The beams of a source: every line, or with {@code onlyLine} the one line at that vacuum
   * wavelength (none when the source lacks it, so a per-line solution carries that line alone).
   */
  static List<TracedBeam> of(ResolvedElement source, OptionalDouble onlyLine, double ambientIndex) {
    List<double[]> lines = new ArrayList<>();
    if (!source.all(Param.LINE).isEmpty()) {
      for (Value.Group g : source.all(Param.LINE)) {
        lines.add(new double[] {g.number("wavelength").orElse(0), g.number("power").orElse(0)});
      }
    } else {
      lines.add(
          new double[] {
            source.number(Param.WAVELENGTH, "wavelength").orElse(0), averagePower(source)
          });
    }
    List<TracedBeam> beams = new ArrayList<>();
    for (int i = 0; i < lines.size(); i++) {
      double wavelength = lines.get(i)[0];
      if (onlyLine.isPresent() && !ResolvedElement.sameLine(wavelength, onlyLine.getAsDouble())) {
        continue;
      }
      Coherency light = state(source.param(Param.POLARIZATION), lines.get(i)[1]);
      beams.add(
          new TracedBeam(
              source.symbol(),
              i,
              wavelength,
              light,
              BeamFrame.SOURCE,
              Medium.AMBIENT,
              mode(source, wavelength, ambientIndex),
              0)); // no optical path run yet
    }
    return beams;
  }

  /**
   * The distinct vacuum wavelengths of the lines of every source that starts a path, shortest
   * first: what a band or a per-line safety sum ranges over.
   */
  static List<Double> lines(ResolvedModel model) {
    java.util.TreeSet<Double> out = new java.util.TreeSet<>();
    for (ResolvedTrain train : model.trains()) {
      for (ResolvedTrain.BeamPath path : train.paths()) {
        if (path.branchFrom().isEmpty()
            && !path.steps().isEmpty()
            && path.steps().get(0) instanceof ResolvedTrain.Element start) {
          model
              .element(start.symbol())
              .filter(e -> e.kind() == ElementKind.SOURCE)
              .ifPresent(e -> out.addAll(e.lineWavelengths()));
        }
      }
    }
    return List.copyOf(out);
  }

  /**
   * The source's Gaussian mode from its 'beam' line: a waist radius (1/e²), or a far-field
   * half-angle divergence; M² defaults to 1 (or follows from waist and divergence together) and the
   * waist to the exit face.
   */
  static Optional<GaussianBeam> mode(ResolvedElement source, double wavelength, double index) {
    Optional<Value.Group> beam = source.param(Param.BEAM);
    if (beam.isEmpty()) {
      return Optional.empty();
    }
    double m2 = beam.get().number("m2").orElse(1);
    double waistAhead = beam.get().number("waist_at").orElse(0);
    OptionalDouble waist = beam.get().number("waist");
    OptionalDouble divergence = beam.get().number("divergence");
    if (waist.isPresent() && divergence.isPresent() && beam.get().number("m2").isEmpty()) {
      // Waist and divergence fix the beam quality: θ = M² λ/(π n W0) (Siegman, Lasers, 1986,
      // ch. 17); the resolver refused a pair that would make M² < 1 beyond rounding.
      m2 =
          Math.max(
              1, Math.PI * index * waist.getAsDouble() * divergence.getAsDouble() / wavelength);
    }
    if (waist.isPresent()) {
      return Optional.of(
          GaussianBeam.fromWaist(wavelength, m2, waist.getAsDouble(), waistAhead, index));
    }
    if (divergence.isPresent()) {
      return Optional.of(
          GaussianBeam.fromDivergence(wavelength, m2, divergence.getAsDouble(), waistAhead, index));
    }
    return Optional.empty();
  }

  /**
   * The power a source's beam carries through the train: the stated (average) power, or pulse
   * energy × repetition rate; a single pulse (energy and duration, no rate) is carried at its peak
   * power E/τ ({@link Pulses}), never as 0 W.
   */
  static double averagePower(ResolvedElement source) {
    OptionalDouble power = source.number(Param.POWER, "power");
    if (power.isPresent()) {
      return power.getAsDouble();
    }
    OptionalDouble energy = source.number(Param.PULSE_ENERGY, "energy");
    OptionalDouble rate = source.number(Param.REPETITION_RATE, "rate");
    OptionalDouble duration = source.number(Param.PULSE_DURATION, "duration");
    if (energy.isPresent() && rate.isPresent()) {
      return energy.getAsDouble() * rate.getAsDouble();
    }
    if (energy.isPresent() && duration.isPresent()) {
      return energy.getAsDouble() / duration.getAsDouble();
    }
    return 0;
  }

  /**
   * The coherency matrix of a stated polarization state ('partial 0.9 linear 0 deg' mixes in
   * unpolarized light).
   */
  static Coherency state(Optional<Value.Group> written, double power) {
    if (written.isEmpty()) {
      return Coherency.unpolarized(power);
    }
    Value.Group g = written.get();
    if (g.word("form_mix").isPresent()) {
      double dop = g.number("dop").orElse(1);
      return pure(g, dop * power).plus(Coherency.unpolarized((1 - dop) * power));
    }
    return pure(g, power);
  }

  private static Coherency pure(Value.Group g, double power) {
    Handedness hand =
        g.word("handedness")
            .map(h -> h.equals("left") ? Handedness.LEFT : Handedness.RIGHT)
            .orElse(Handedness.RIGHT);
    return switch (StateForm.of(g)) {
      case LINEAR -> Coherency.linear(g.number("azimuth").orElse(0), power);
      case CIRCULAR -> Coherency.circular(hand, power);
      case ELLIPTICAL -> {
        double chi =
            Math.atan(g.number("axis_ratio").orElse(0)) * (hand == Handedness.LEFT ? -1 : 1);
        yield Coherency.elliptical(g.number("azimuth").orElse(0), chi, power);
      }
      case UNPOLARIZED -> Coherency.unpolarized(power);
    };
  }
}
