package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

/**
 * Rename touches the declaration and every use in every file, and refuses names the language
 * rejects.
 */
class RenameTest {
  private static String apply(String text, List<Edit> edits) {
    StringBuilder out = new StringBuilder(text);
    for (int i = edits.size() - 1; i >= 0; i--) {
      Edit e = edits.get(i);
      out.replace(e.range().start(), e.range().end(), e.newText());
    }
    return out.toString();
  }

  @Test
  void renamingAPartEditsBothFiles() {
    Specs.Checked c = Specs.check(NavigationTest.twoFiles("main", "fold ->"));
    Result r = c.result();
    RenameResult rename = EditorFeatures.standard().rename(r, c.file(), c.offset(), "steer");
    assertNull(rename.error());
    assertEquals(2, rename.edits().size());
    Path parts = NavigationTest.PARTS;
    assertEquals(
        "mirror steer { reflectance 99 %; aoi 45 deg }\nmirror spare { reflectance 90 % }\n",
        apply(r.files().get(parts).text(), rename.edits().get(parts)));
    String main = apply(r.files().get(Specs.MAIN).text(), rename.edits().get(Specs.MAIN));
    assertTrue(main.contains("seed -> 10 mm -> steer -> 20 mm"));
    assertTrue(main.contains("power at steer >= 1 mW"));
    assertTrue(!main.contains("fold"));
  }

  @Test
  void theRenamedSpecChecksAsBefore() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    Result r = c.result();
    RenameResult rename =
        EditorFeatures.standard()
            .rename(r, Specs.MAIN, Specs.offsetOf(r, Specs.MAIN, "w1", 0), "entry_window");
    String renamed = apply(r.files().get(Specs.MAIN).text(), rename.edits().get(Specs.MAIN));
    assertTrue(renamed.contains("entry_window.reflected -> 30 mm"));
    Result again = Specs.check(renamed).result();
    assertEquals(
        r.requirements().stream().map(o -> o.status()).toList(),
        again.requirements().stream().map(o -> o.status()).toList());
    assertEquals(r.diagnostics().size(), again.diagnostics().size());
  }

  @Test
  void acceptsEveryNameTheParserReads() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    Result r = c.result();
    int w1 = Specs.offsetOf(r, Specs.MAIN, "w1", 0);
    for (String name : List.of("spiegel_ä", "w²", "𝑥_1", "xⅫ")) {
      RenameResult rename = EditorFeatures.standard().rename(r, Specs.MAIN, w1, name);
      assertNull(rename.error(), name);
      String renamed = apply(r.files().get(Specs.MAIN).text(), rename.edits().get(Specs.MAIN));
      assertEquals(
          r.diagnostics().size(), Specs.check(renamed).result().diagnostics().size(), name);
    }
  }

  @Test
  void theSameNameGivesNoEdits() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    RenameResult rename =
        EditorFeatures.standard()
            .rename(
                c.result(), Specs.MAIN, Specs.offsetOf(c.result(), Specs.MAIN, "qwp", 0), "qwp");
    assertNull(rename.error());
    assertEquals(Map.of(), rename.edits());
  }

  @Test
  void refusesWhatCannotBeAName() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    int qwp = Specs.offsetOf(c.result(), Specs.MAIN, "qwp", 0);
    for (String bad : List.of("2qwp", "q-wp", "", "q w", "٣qwp", "q😀", "Ⅻ", "x\n")) {
      RenameResult rename = EditorFeatures.standard().rename(c.result(), Specs.MAIN, qwp, bad);
      assertNotNull(rename.error(), bad);
      assertTrue(rename.error().contains("is not a name"), rename.error());
      assertEquals(Map.of(), rename.edits());
    }
  }

  @Test
  void refusesReservedWords() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    RenameResult rename =
        EditorFeatures.standard()
            .rename(
                c.result(), Specs.MAIN, Specs.offsetOf(c.result(), Specs.MAIN, "qwp", 0), "linear");
    assertEquals("'linear' is a reserved word and cannot be a name", rename.error());
  }

  @Test
  void refusesANameThatIsTakenInAnyFile() {
    Specs.Checked c = Specs.check(NavigationTest.twoFiles("main", "fold ->"));
    assertEquals(
        "'spare' is already declared; names must be unique",
        EditorFeatures.standard().rename(c.result(), c.file(), c.offset(), "spare").error());
    assertEquals(
        "'seed' is already declared; names must be unique",
        EditorFeatures.standard().rename(c.result(), c.file(), c.offset(), "seed").error());
    assertEquals(
        "'water' is the name of a catalog material",
        EditorFeatures.standard().rename(c.result(), c.file(), c.offset(), "water").error());
  }

  @Test
  void prepareRenameOffersNamesOnly() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    Result r = c.result();
    int m1 = Specs.offsetOf(r, Specs.MAIN, "m1", 1);
    assertEquals(
        Optional.of(new TextRange(m1, m1 + 2)),
        EditorFeatures.standard().prepareRename(r, Specs.MAIN, m1 + 1));
    for (String notAName :
        List.of("train", "require", "1064", "5 kW", "silver", "through", "wavelength")) {
      int at = Specs.offsetOf(r, Specs.MAIN, notAName, 0);
      assertEquals(
          Optional.empty(),
          EditorFeatures.standard().prepareRename(r, Specs.MAIN, at + 1),
          notAName);
      assertNotNull(EditorFeatures.standard().rename(r, Specs.MAIN, at + 1, "x").error(), notAName);
    }
  }
}
