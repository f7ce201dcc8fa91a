package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/** The ghosts each line of a several-line source makes at one element are one stray-light note. */
class StrayNotesTest {
  private static List<String> strayNotes(String source) {
    Result r =
        Bench.check(
            source
                + """
                rhomb r { material fused_silica; aoi 55.6 deg; reflections 2; axis 45 deg }
                detector d
                train t { s -> 10 mm -> r -> 10 mm -> d }
                """);
    return r.diagnostics().stream()
        .filter(d -> d.code() == DiagnosticCode.STRAY_BEAM)
        .map(Diagnostic::message)
        .toList();
  }

  @Test
  void threeLinesMakeOneNoteWithEachLineAndTheTotal() {
    List<String> notes =
        strayNotes(
            "source s { line 1064 nm 700 mW; line 532 nm 200 mW; line 633 nm 100 mW;"
                + " polarization linear 0 deg }\n");
    assertEquals(1, notes.size(), notes.toString());
    String note = notes.get(0);
    assertTrue(note.startsWith("stray light: "), note);
    // Shortest wavelength first, whatever the order the source lists its lines in.
    assertTrue(note.matches(".*, in 3 lines: .* at 532 nm, .* at 633 nm, .* at 1064 nm"), note);
  }

  @Test
  void theNoteTotalIsTheSumOfTheLines() {
    TrainSolution s =
        Bench.solve(
            "source s { line 532 nm 200 mW; line 1064 nm 800 mW; polarization linear 0 deg }\n"
                + """
                rhomb r { material fused_silica; aoi 55.6 deg; reflections 2; axis 45 deg }
                detector d
                train t { s -> 10 mm -> r -> 10 mm -> d }
                """);
    // The rhomb's face reflections run back to the source's output, each line's on its own.
    List<StrayBeam> ghosts = s.stray().stream().filter(b -> b.origin().equals("s")).toList();
    assertEquals(2, ghosts.size(), "one returned ghost beam per line, each with its wavelength");
    List<Diagnostic> notes = StrayNotes.of(s);
    assertEquals(1, notes.size());
    String total =
        jonquil.units.QuantityFormat.format(
            ghosts.get(0).power() + ghosts.get(1).power(), jonquil.units.Dimension.POWER);
    assertTrue(notes.get(0).message().startsWith("stray light: " + total + " "), total);
  }

  @Test
  void oneLineKeepsItsNoteAsItWas() {
    List<String> notes =
        strayNotes("source s { wavelength 633 nm; power 1 mW; polarization linear 0 deg }\n");
    assertEquals(1, notes.size());
    assertTrue(!notes.get(0).contains(" lines:"), notes.get(0));
  }
}
