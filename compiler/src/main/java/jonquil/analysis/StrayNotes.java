package jonquil.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.TextRange;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;

/**
 * The stray-light notes (J610): one per stray beam of an element, with the ghosts that each line of
 * a several-line source makes merged into one note that gives the total and every line's share.
 */
final class StrayNotes {
  /** Stray beams weaker than this fraction of the source power are not worth a note. */
  static final double THRESHOLD = 1e-9;

  private StrayNotes() {}

  /** One stray beam as a note sees it: where it comes from and what it is. */
  private record Key(Path file, TextRange range, String description, boolean backward) {}

  static List<Diagnostic> of(TrainSolution solution) {
    Map<Key, List<StrayBeam>> groups = new LinkedHashMap<>();
    for (StrayBeam s : solution.stray()) {
      if (s.file() != null) {
        groups
            .computeIfAbsent(
                new Key(s.file(), s.range(), s.description(), s.backward()), k -> new ArrayList<>())
            .add(s);
      }
    }
    List<Diagnostic> notes = new ArrayList<>();
    for (Map.Entry<Key, List<StrayBeam>> g : groups.entrySet()) {
      double total = g.getValue().stream().mapToDouble(StrayBeam::power).sum();
      if (total > THRESHOLD * solution.sourcePower()) {
        Key k = g.getKey();
        notes.add(
            Diagnostic.of(
                DiagnosticCode.STRAY_BEAM,
                k.file(),
                k.range(),
                "stray light: "
                    + QuantityFormat.format(total, Dimension.POWER)
                    + " "
                    + k.description()
                    + byLine(g.getValue())));
      }
    }
    return notes;
  }

  /** ", in 2 lines: 1 mW at 532 nm, 3 mW at 1064 nm", shortest wavelength first; or nothing. */
  private static String byLine(List<StrayBeam> beams) {
    Map<Double, Double> power = new TreeMap<>();
    for (StrayBeam b : beams) {
      if (b.wavelength().isEmpty()) {
        return ""; // a port's stray beam already sums its lines
      }
      power.merge(b.wavelength().getAsDouble(), b.power(), Double::sum);
    }
    if (power.size() < 2) {
      return "";
    }
    return ", in "
        + power.size()
        + " lines: "
        + power.entrySet().stream()
            .map(
                e ->
                    QuantityFormat.format(e.getValue(), Dimension.POWER)
                        + " at "
                        + QuantityFormat.format(e.getKey(), Dimension.LENGTH))
            .collect(Collectors.joining(", "));
  }
}
