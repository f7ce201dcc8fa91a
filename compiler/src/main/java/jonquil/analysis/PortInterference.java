package jonquil.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import jonquil.optics.Interference;
import jonquil.optics.PowerRange;
import jonquil.optics.TemporalCoherence;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedModel;

/**
 * What interference does at one port for one laser line whose beams meet there again: how many
 * beams, the range of their power over the unknown relative phase, and the fringe visibility, or
 * why the visibility is not known.
 */
public record PortInterference(
    String port,
    String line,
    double wavelength,
    int beams,
    PowerRange range,
    OptionalDouble visibility,
    String unknownReason) {

  /** The reason a visibility is asked where no two beams of one line meet. */
  public static final String NONE_MEET = "no two beams of one line meet here";

  /** Every line with two or more beams at {@code port}, in the order their beams arrived. */
  public static List<PortInterference> at(ResolvedModel model, TrainSolution s, String port) {
    Map<String, List<PortArrival>> byLine = new LinkedHashMap<>();
    for (PortArrival a : s.arrivalsAt(port)) {
      byLine.computeIfAbsent(a.line(), k -> new ArrayList<>()).add(a);
    }
    List<PortInterference> out = new ArrayList<>();
    byLine.forEach(
        (line, arrivals) -> {
          if (arrivals.size() >= 2) {
            out.add(of(port, line, arrivals, coherenceOf(model, arrivals.get(0).source())));
          }
        });
    return List.copyOf(out);
  }

  /** The interference of the beams of one line (two or more) with that line's coherence. */
  static PortInterference of(
      String port, String line, List<PortArrival> arrivals, TemporalCoherence coherence) {
    List<Interference.Beam> beams = arrivals.stream().map(PortArrival::beam).toList();
    boolean paired = arrivals.stream().allMatch(PortArrival::partsFollowed);
    PowerRange range =
        paired && arrivals.size() <= Interference.MOST_PAIRS_SUMMED
            ? Interference.range(beams, coherence)
            : Interference.enclosure(beams, coherence);
    double wavelength = arrivals.get(0).wavelength();
    // A visibility is judged for two beams, each with its polarization followed along its route.
    String unknown =
        !paired
            ? "the light of this line is partially polarized here, and which of its polarized parts"
                + " meets which is not followed along the routes"
            : arrivals.size() > 2
                ? arrivals.size() + " beams of this line meet here; a visibility is judged for two"
                : null;
    if (unknown != null) {
      return new PortInterference(
          port, line, wavelength, arrivals.size(), range, OptionalDouble.empty(), unknown);
    }
    double dl = arrivals.get(1).opticalPath() - arrivals.get(0).opticalPath();
    OptionalDouble gamma = coherence.factor(dl);
    if (gamma.isEmpty()) {
      return new PortInterference(
          port,
          line,
          wavelength,
          2,
          range,
          OptionalDouble.empty(),
          "source '"
              + arrivals.get(0).source()
              + "' states no 'linewidth' or 'coherence_length', and its beams meet "
              + jonquil.units.QuantityFormat.format(Math.abs(dl), jonquil.units.Dimension.LENGTH)
              + " apart in optical path");
    }
    return new PortInterference(
        port,
        line,
        wavelength,
        2,
        range,
        OptionalDouble.of(Interference.visibility(beams.get(0), beams.get(1), gamma.getAsDouble())),
        "");
  }

  /**
   * The power leaving a port over every relative phase: {@code incoherent} is the power the
   * propagation books there (every beam added as power), widened by each meeting line's swing. It
   * is one exact value where no beams of one line meet.
   */
  public static PowerRange powerRange(
      ResolvedModel model, TrainSolution s, String port, double incoherent) {
    double below = 0;
    double above = 0;
    boolean exact = true;
    for (PortInterference i : at(model, s, port)) {
      below += i.range().incoherent() - i.range().min();
      above += i.range().max() - i.range().incoherent();
      exact &= i.range().exact();
    }
    if (below == 0 && above == 0) {
      return PowerRange.of(incoherent);
    }
    return new PowerRange(Math.max(0, incoherent - below), incoherent + above, incoherent, exact);
  }

  /**
   * The light at a place at its bright fringe, where beams of one line meet there: what a limit on
   * exposure, damage or a rating must be judged on. Unchanged where none meet.
   */
  public static PortValue brightest(ResolvedModel model, TrainSolution s, PortValue v) {
    PowerRange range = powerRange(model, s, v.key(), v.power());
    return range.varies() && v.power() > 0 ? v.scaledBy(range.max() / v.power()) : v;
  }

  /**
   * The coherence of every line of a source: from its 'coherence_length', or from its Lorentzian
   * 'linewidth', or unstated.
   */
  public static TemporalCoherence coherenceOf(ResolvedModel model, String source) {
    return model
        .element(source)
        .filter(e -> e.kind() == ElementKind.SOURCE)
        .map(
            e -> {
              OptionalDouble length = e.number(Param.COHERENCE_LENGTH, "length");
              if (length.isPresent()) {
                return TemporalCoherence.ofLength(length.getAsDouble());
              }
              OptionalDouble width = e.number(Param.LINEWIDTH, "linewidth");
              return width.isPresent()
                  ? TemporalCoherence.lorentzian(width.getAsDouble())
                  : TemporalCoherence.UNSTATED;
            })
        .orElse(TemporalCoherence.UNSTATED);
  }
}
