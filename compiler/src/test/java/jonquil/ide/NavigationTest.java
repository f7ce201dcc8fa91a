package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.Result;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

/** Go to definition and find references, within a file and across a 'use'. */
class NavigationTest {
  static final Path PARTS = Specs.ROOT.resolve("parts/optics.jonq");

  static Map<String, String> twoFiles(String cursorIn, String word) {
    String main =
        """
        use "parts/optics.jonq"
        source seed { wavelength 532 nm; power 10 mW }
        dump d1
        train main { seed -> 10 mm -> fold -> 20 mm -> d1 }
        require {
          power at fold >= 1 mW
        }
        """;
    String parts =
        "mirror fold { reflectance 99 %; aoi 45 deg }\nmirror spare { reflectance 90 % }\n";
    if (cursorIn.equals("main")) {
      main =
          main.replaceFirst(
              java.util.regex.Pattern.quote(word),
              "\\$0" + java.util.regex.Matcher.quoteReplacement(word));
    } else {
      parts =
          parts.replaceFirst(
              java.util.regex.Pattern.quote(word),
              "\\$0" + java.util.regex.Matcher.quoteReplacement(word));
    }
    return Map.of("main.jonq", main, "parts/optics.jonq", parts);
  }

  private static String at(Result r, Location l) {
    return l.file().getFileName()
        + ":"
        + r.files().get(l.file()).slice(l.range())
        + "@"
        + l.range().start();
  }

  @Test
  void aUseOfAPartGoesToItsDeclarationInTheUsedFile() {
    Specs.Checked c = Specs.check(twoFiles("main", "fold ->"));
    List<Location> def = EditorFeatures.standard().definition(c.result(), c.file(), c.offset() + 2);
    assertEquals(1, def.size());
    assertEquals(PARTS, def.get(0).file());
    assertEquals("fold", c.result().files().get(PARTS).slice(def.get(0).range()));
  }

  @Test
  void theUsePathItselfGoesToThatFile() {
    Specs.Checked c = Specs.check(twoFiles("main", "parts/optics"));
    assertEquals(
        List.of(new Location(PARTS, TextRange.EMPTY)),
        EditorFeatures.standard().definition(c.result(), c.file(), c.offset()));
  }

  @Test
  void aDeclarationIsItsOwnDefinition() {
    Specs.Checked c = Specs.check(twoFiles("parts", "fold"));
    List<Location> def = EditorFeatures.standard().definition(c.result(), c.file(), c.offset());
    assertEquals(List.of(new Location(PARTS, new TextRange(c.offset(), c.offset() + 4))), def);
  }

  @Test
  void keywordsLiteralsAndCatalogNamesHaveNoDefinition() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    Result r = c.result();
    assertEquals(
        List.of(),
        EditorFeatures.standard()
            .definition(r, Specs.MAIN, Specs.offsetOf(r, Specs.MAIN, "train", 0) + 1));
    assertEquals(
        List.of(),
        EditorFeatures.standard()
            .definition(r, Specs.MAIN, Specs.offsetOf(r, Specs.MAIN, "1064", 0) + 1));
    assertEquals(
        List.of(),
        EditorFeatures.standard()
            .definition(r, Specs.MAIN, Specs.offsetOf(r, Specs.MAIN, "silver", 0) + 1));
  }

  @Test
  void referencesAcrossFilesWithAndWithoutTheDeclaration() {
    Specs.Checked c = Specs.check(twoFiles("main", "fold ->"));
    Result r = c.result();
    List<String> with =
        EditorFeatures.standard().references(r, c.file(), c.offset(), true).stream()
            .map(l -> at(r, l))
            .toList();
    List<String> without =
        EditorFeatures.standard().references(r, c.file(), c.offset(), false).stream()
            .map(l -> at(r, l))
            .toList();
    int pathUse = Specs.offsetOf(r, Specs.MAIN, "fold", 0);
    int requireUse = Specs.offsetOf(r, Specs.MAIN, "fold", 1);
    assertEquals(
        List.of("optics.jonq:fold@7", "main.jonq:fold@" + pathUse, "main.jonq:fold@" + requireUse),
        with);
    assertEquals(with.subList(1, 3), without);
  }

  @Test
  void referencesFromTheDeclarationFindTheSameUses() {
    Specs.Checked fromUse = Specs.check(twoFiles("main", "fold ->"));
    Specs.Checked fromDecl = Specs.check(twoFiles("parts", "fold"));
    assertEquals(
        EditorFeatures.standard()
            .references(fromUse.result(), fromUse.file(), fromUse.offset(), true),
        EditorFeatures.standard()
            .references(fromDecl.result(), fromDecl.file(), fromDecl.offset(), true));
  }

  @Test
  void anUnusedDeclarationHasOnlyItself() {
    Specs.Checked c = Specs.check(twoFiles("parts", "spare"));
    assertEquals(
        List.of(), EditorFeatures.standard().references(c.result(), c.file(), c.offset(), false));
    assertEquals(
        1, EditorFeatures.standard().references(c.result(), c.file(), c.offset(), true).size());
  }

  @Test
  void aCatalogMaterialIsFoundWhereverItIsUsed() {
    Specs.Checked c = Specs.check(Specs.BENCH);
    Result r = c.result();
    List<Location> refs =
        EditorFeatures.standard()
            .references(r, Specs.MAIN, Specs.offsetOf(r, Specs.MAIN, "silver", 0), true);
    assertEquals(1, refs.size());
    assertTrue(
        refs.stream().allMatch(l -> r.files().get(l.file()).slice(l.range()).equals("silver")));
  }
}
