package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;

/**
 * The warning (J626) on a source's 'linewidth' or 'coherence_length' where no two beams of one of
 * its lines meet again: the figure only acts on interference, so here it changes nothing, and the
 * author should know rather than believe it was used.
 */
final class CoherenceNotes {
  private CoherenceNotes() {}

  static List<Diagnostic> of(ResolvedModel model, TrainSolution solution) {
    List<Diagnostic> out = new ArrayList<>();
    for (ResolvedElement e : model.elements().values()) {
      if (e.kind() != ElementKind.SOURCE || meets(model, solution, e.symbol().name())) {
        continue;
      }
      for (Param p : List.of(Param.LINEWIDTH, Param.COHERENCE_LENGTH)) {
        e.param(p)
            .ifPresent(
                g ->
                    out.add(
                        Diagnostic.of(
                            DiagnosticCode.COHERENCE_UNUSED,
                            e.symbol().file(),
                            g.range(),
                            "'"
                                + p.word()
                                + "' of '"
                                + e.symbol().name()
                                + "' changes nothing here: no two beams of one of its lines"
                                + " meet again; it sets their fringe visibility where they do")));
      }
    }
    return out;
  }

  /** Whether beams of one of the source's lines meet at some port. */
  private static boolean meets(ResolvedModel model, TrainSolution s, String source) {
    for (String port : s.arrivals().keySet()) {
      for (PortInterference i : PortInterference.at(model, s, port)) {
        if (i.line().startsWith(source + "#")) {
          return true;
        }
      }
    }
    return false;
  }
}
