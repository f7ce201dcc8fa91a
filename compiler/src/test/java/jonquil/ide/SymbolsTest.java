package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import jonquil.Result;
import org.junit.jupiter.api.Test;

/** The document outline and the workspace-wide symbol search. */
class SymbolsTest {
  private static void render(List<SymbolInfo> nodes, String indent, StringBuilder out) {
    for (SymbolInfo s : nodes) {
      out.append(indent).append(s.detail()).append(' ').append(s.name()).append('\n');
      render(s.children(), indent + "  ", out);
    }
  }

  private static void everyNode(List<SymbolInfo> nodes, List<SymbolInfo> out) {
    for (SymbolInfo s : nodes) {
      out.add(s);
      everyNode(s.children(), out);
    }
  }

  @Test
  void theOutlineIsHierarchical() {
    Result r = Specs.check(Specs.BENCH).result();
    StringBuilder out = new StringBuilder();
    render(EditorFeatures.standard().documentSymbols(r, Specs.MAIN), "", out);
    assertEquals(
        """
        source seed
          parameter wavelength 1064 nm
          parameter power 2 W
          parameter polarization linear 0 deg
          parameter beam waist 1.0 mm, m2 1.1
        material slab_glass
        waveplate qwp
          parameter retardance 0.25 wave at 1064 nm
          parameter fast_axis 45 deg
        window w1
          parameter material slab_glass
          parameter thickness 3 mm
          parameter aoi 10 deg
        mirror m1
          parameter metal silver
          parameter aoi 45 deg
          parameter damage 5 kW/cm2
        probe spot
        dump d1
        train main
          path seed -> 100 mm -> w1.through -> 50 mm -> qwp -> 80 mm -> m1 -> 20 mm -> spot
          path w1.reflected -> 30 mm -> d1
        require require
          requirement power at spot >= 1 W
          requirement power at spot >= 1.95 W
          requirement stray < 5 mW
        """,
        out.toString());
  }

  @Test
  void everySelectionRangeLiesInsideItsRangeAndEveryChildInsideItsParent() {
    Specs.Checked c = Specs.check(NavigationTest.twoFiles("main", "fold"));
    for (var file : c.result().files().keySet()) {
      List<SymbolInfo> all = new ArrayList<>();
      everyNode(EditorFeatures.standard().documentSymbols(c.result(), file), all);
      assertTrue(!all.isEmpty(), file.toString());
      for (SymbolInfo s : all) {
        assertTrue(s.range().contains(s.selectionRange()), s.name());
        s.children().forEach(k -> assertTrue(s.range().contains(k.range()), k.name()));
      }
    }
    List<SymbolInfo> bench = new ArrayList<>();
    everyNode(
        EditorFeatures.standard().documentSymbols(Specs.check(Specs.BENCH).result(), Specs.MAIN),
        bench);
    for (SymbolInfo s : bench) {
      assertTrue(s.range().contains(s.selectionRange()), s.name());
    }
  }

  @Test
  void theSelectionOfADeclarationIsItsName() {
    Result r = Specs.check(Specs.BENCH).result();
    SymbolInfo m1 =
        EditorFeatures.standard().documentSymbols(r, Specs.MAIN).stream()
            .filter(s -> s.name().equals("m1"))
            .findFirst()
            .orElseThrow();
    assertEquals("m1", r.files().get(Specs.MAIN).slice(m1.selectionRange()));
    assertTrue(r.files().get(Specs.MAIN).slice(m1.range()).startsWith("mirror"));
  }

  @Test
  void workspaceSearchIsACaseInsensitiveSubstringMatchOverAllFiles() {
    Result r = Specs.check(NavigationTest.twoFiles("main", "fold")).result();
    assertEquals(
        List.of("fold"),
        EditorFeatures.standard().workspaceSymbols(r, "OL").stream()
            .map(f -> f.symbol().name())
            .toList());
    assertEquals(
        List.of(NavigationTest.PARTS),
        EditorFeatures.standard().workspaceSymbols(r, "OL").stream()
            .map(FoundSymbol::file)
            .toList());
    List<String> all =
        EditorFeatures.standard().workspaceSymbols(r, "").stream()
            .map(f -> f.symbol().detail() + " " + f.symbol().name())
            .toList();
    assertEquals(
        List.of("source seed", "dump d1", "train main", "mirror fold", "mirror spare"), all);
    assertEquals(List.of(), EditorFeatures.standard().workspaceSymbols(r, "nothing_like_this"));
  }

  @Test
  void workspaceSearchIsCapped() {
    StringBuilder spec = new StringBuilder();
    for (int i = 0; i < 250; i++) {
      spec.append("probe p").append(i).append('\n');
    }
    Result r = Specs.check(spec.toString()).result();
    assertEquals(200, EditorFeatures.standard().workspaceSymbols(r, "p").size());
  }
}
