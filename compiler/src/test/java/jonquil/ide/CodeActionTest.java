package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Edit;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Code actions: applying a diagnostic's quick fix and checking again makes that diagnostic go away
 * (the acceptance for every fix), and the fix's title says what it does.
 */
class CodeActionTest {
  /** A bench that checks clean; each case writes one mistake into it. */
  static final String CLEAN =
      """
      source seed { wavelength 1064 nm; power 2 W }
      coating ar_stack { layer magnesium_fluoride quarter at 1064 nm }
      splitter pbs { polarizing; coating ar_stack }
      mirror m1 { metal silver; aoi 45 deg }
      lens l1 { focal 100 mm }
      filter nd { transmission 0.5 }
      probe spot
      dump d1

      train main {
        seed -> 100 mm -> pbs.through -> 50 mm -> m1 -> 20 mm -> l1 -> 10 mm in water -> nd -> 10 mm -> spot
        pbs.reflected -> 30 mm -> d1
      }

      require {
        power at spot >= 400 mW
      }
      """;

  private static String apply(String text, List<Edit> edits) {
    StringBuilder out = new StringBuilder(text);
    for (int i = edits.size() - 1; i >= 0; i--) {
      Edit e = edits.get(i);
      out.replace(e.range().start(), e.range().end(), e.newText());
    }
    return out.toString();
  }

  private static List<Diagnostic> of(Result r, DiagnosticCode code) {
    return r.diagnostics().stream().filter(d -> d.code() == code).toList();
  }

  /**
   * Checks the spec, takes the preferred action on the one diagnostic of the code, applies it, and
   * checks again.
   */
  private static String fixOnce(String spec, DiagnosticCode code, String title) {
    Result r = Specs.check(spec).result();
    List<Diagnostic> found = of(r, code);
    assertEquals(1, found.size(), spec + "\n" + r.diagnostics());
    List<CodeActionInfo> actions =
        EditorFeatures.standard().codeActions(r, Specs.MAIN, found.get(0).range()).stream()
            .filter(a -> a.diagnostic().equals(found.get(0)))
            .toList();
    assertEquals(1, actions.size(), actions.toString());
    CodeActionInfo action = actions.get(0);
    assertEquals(title, action.title());
    assertEquals("quickfix", action.kind());
    assertTrue(action.preferred());
    assertEquals(List.of(Specs.MAIN), List.copyOf(action.edits().keySet()));
    String fixed = apply(r.files().get(Specs.MAIN).text(), action.edits().get(Specs.MAIN));
    Result again = Specs.check(fixed).result();
    assertEquals(List.of(), of(again, code), fixed);
    return fixed;
  }

  @Test
  void theCleanBenchHasNothingToFix() {
    Result r = Specs.check(CLEAN).result();
    assertEquals(
        List.of(),
        r.diagnostics().stream().filter(d -> d.severity() != jonquil.diag.Severity.NOTE).toList());
    assertEquals(
        List.of(),
        EditorFeatures.standard()
            .codeActions(r, Specs.MAIN, new TextRange(0, CLEAN.length()))
            .stream()
            .filter(a -> a.diagnostic().severity() != jonquil.diag.Severity.NOTE)
            .toList());
  }

  @ParameterizedTest(name = "{0}: ''{1}'' -> ''{2}''")
  @CsvSource(
      delimiter = '|',
      value = {
        "UNDEFINED_NAME           | -> m1 ->              | -> m11 ->         | change 'm11' to"
            + " 'm1'",
        "UNDEFINED_NAME           | power at spot         | power at spott    | change 'spott' to"
            + " 'spot'",
        "UNDEFINED_NAME           | coating ar_stack }    | coating ar_stak } | change 'ar_stak' to"
            + " 'ar_stack'",
        "UNKNOWN_CATALOG_MATERIAL | metal silver          | metal silvr       | change 'silvr' to"
            + " 'silver'",
        "UNKNOWN_CATALOG_MATERIAL | in water              | in watr           | change 'watr' to"
            + " 'water'",
        "UNKNOWN_PARAMETER        | focal 100 mm          | focl 100 mm       | change 'focl' to"
            + " 'focal'",
        "UNKNOWN_KIND             | lens l1               | lense l1          | change 'lense' to"
            + " 'lens'",
        "UNKNOWN_PORT             | pbs.reflected ->      | pbs.reflectd ->   | change 'reflectd'"
            + " to 'reflected'",
        "UNKNOWN_MEASURE          | power at spot         | powr at spot      | change 'powr' to"
            + " 'power'",
        "OUT_OF_RANGE             | transmission 0.5      | transmission 50   | write '50 %'",
        "MISSING_UNIT             | focal 100 mm          | focal 100         | write '100 mm'",
      })
  void applyingTheFixRemovesTheDiagnostic(String code, String good, String bad, String title) {
    String broken =
        CLEAN.replaceFirst(
            java.util.regex.Pattern.quote(good.strip()),
            java.util.regex.Matcher.quoteReplacement(bad.strip()));
    String fixed = fixOnce(broken, DiagnosticCode.valueOf(code.strip()), title.strip());
    if (!code.strip().equals("OUT_OF_RANGE")) {
      assertEquals(CLEAN, fixed, "the fix restores the intended word exactly");
    }
  }

  @Test
  void aPortOnARequirementPlaceIsFixedToo() {
    String spec = CLEAN.replace("power at spot >= 400 mW", "power at pbs.throughh >= 400 mW");
    assertTrue(
        fixOnce(spec, DiagnosticCode.UNKNOWN_PORT, "change 'throughh' to 'through'")
            .contains("power at pbs.through >= 400 mW"));
  }

  @Test
  void noFixWhenNoNameIsClose() {
    Result r = Specs.check(CLEAN.replace("-> m1 ->", "-> periscope ->")).result();
    Diagnostic d = of(r, DiagnosticCode.UNDEFINED_NAME).get(0);
    assertEquals(List.of(), d.fixes());
    assertEquals(
        List.of(),
        EditorFeatures.standard().codeActions(r, Specs.MAIN, d.range()).stream()
            .filter(a -> a.diagnostic().equals(d))
            .toList());
  }

  @Test
  void anUnfollowedSplitterPortGetsADump() {
    String spec = CLEAN.replace("  pbs.reflected -> 30 mm -> d1\n", "");
    String fixed = fixOnce(spec, DiagnosticCode.PORT_NOT_FOLLOWED, "add a dump for the stray beam");
    assertEquals(
        CLEAN
            .replace(
                "  pbs.reflected -> 30 mm -> d1\n", "  pbs.reflected -> 50 mm -> reflected_dump\n")
            .replace("train main {", "dump reflected_dump\n\ntrain main {"),
        fixed);
    Result again = Specs.check(fixed).result();
    // Only the dump the edit above took out of the train is left, unplaced (J517).
    assertEquals(
        List.of("J517 dump 'd1' is declared but no path places it"),
        again.diagnostics().stream()
            .filter(d -> d.severity() != jonquil.diag.Severity.NOTE)
            .map(d -> d.code().id() + " " + d.message().substring(0, d.message().indexOf(",")))
            .toList());
  }

  @Test
  void aDumpForAOneLineTrainAndAFreeName() {
    String spec =
        """
        source seed { wavelength 532 nm; power 10 mW }
        splitter bs { ratio 50 % }
        dump reflected_dump
        train main { seed -> 10 mm -> bs -> 20 mm -> reflected_dump }
        """;
    String fixed = fixOnce(spec, DiagnosticCode.PORT_NOT_FOLLOWED, "add a dump for the stray beam");
    assertEquals(
        """
        source seed { wavelength 532 nm; power 10 mW }
        splitter bs { ratio 50 % }
        dump reflected_dump
        dump bs_reflected_dump

        train main { seed -> 10 mm -> bs -> 20 mm -> reflected_dump \n\
          bs.reflected -> 50 mm -> bs_reflected_dump
        }
        """,
        fixed);
  }

  @Test
  void onlyDiagnosticsOverlappingTheRangeAndTheirFilesEdits() {
    String spec =
        CLEAN.replace("focal 100 mm", "focl 100 mm").replace("metal silver", "metal silvr");
    Result r = Specs.check(spec).result();
    int focl = spec.indexOf("focl");
    List<CodeActionInfo> actions =
        EditorFeatures.standard().codeActions(r, Specs.MAIN, new TextRange(focl + 1, focl + 1));
    assertEquals(
        List.of("change 'focl' to 'focal'"), actions.stream().map(CodeActionInfo::title).toList());
    Map<Path, List<Edit>> edits = actions.get(0).edits();
    assertEquals(
        List.of(new Edit(Specs.MAIN, new TextRange(focl, focl + 4), "focal")),
        edits.get(Specs.MAIN));
    assertEquals(
        2,
        EditorFeatures.standard()
            .codeActions(r, Specs.MAIN, new TextRange(0, spec.length()))
            .size());
  }
}
