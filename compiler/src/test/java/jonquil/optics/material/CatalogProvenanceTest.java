package jonquil.optics.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Every catalog entry says where in its source its numbers are (a page, an equation or a table),
 * and states the basis it is stored in, so the relative-to-air conversion can be traced.
 */
class CatalogProvenanceTest {
  private static final Pattern PLACE =
      Pattern.compile("(\\bp\\. \\d|\\bpp\\. \\d|\\beqs?\\. \\(\\d|\\bTable [0-9IVX])");

  @Test
  void everyEntryNamesAPageEquationOrTable() {
    for (CatalogMaterial entry : MaterialCatalog.all()) {
      assertTrue(
          PLACE.matcher(entry.reference().citation()).find(),
          entry.name() + ": " + entry.reference().citation());
    }
  }

  @Test
  void everyCitationStatesTheBasisTheEntryIsStoredIn() {
    for (CatalogMaterial entry : MaterialCatalog.all()) {
      String words =
          switch (entry.basis()) {
            case ABSOLUTE -> "absolute";
            case RELATIVE_TO_AIR -> "relative to air";
          };
      assertTrue(
          entry.reference().citation().contains(words),
          entry.name() + " is stored " + entry.basis() + " but its citation does not say so");
    }
  }

  @Test
  void waterIsAbsoluteAsDaimonAndMasumuraReportIt() {
    // Daimon & Masumura, Appl. Opt. 46, 3811 (2007): indices relative to vacuum (from memory),
    // so the catalog must not scale them by the index of air again.
    CatalogMaterial water = MaterialCatalog.lookup("water").orElseThrow();
    assertEquals(IndexBasis.ABSOLUTE, water.basis());
    double d = 587.56e-9;
    assertEquals(water.dispersion().index(d), water.absoluteIndex(d));
  }
}
