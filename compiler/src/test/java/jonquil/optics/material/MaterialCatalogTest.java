package jonquil.optics.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import jonquil.resolve.CatalogSpellings;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Catalog indices against their sources. Each row names the paper; "computed from" means the value
 * was worked out independently from the coefficients as printed in that paper (rounded to 6
 * decimals), so a wrong coefficient, term, unit or formula form here fails the row.
 */
class MaterialCatalogTest {
  private static final double NM = 1e-9;
  private static final double F = 486.13 * NM;
  private static final double D = 587.56 * NM;
  private static final double C = 656.27 * NM;
  private static final double YAG = 1064 * NM;
  private static final double TOL = 1.5e-6;

  private static CatalogMaterial m(String name) {
    return MaterialCatalog.lookup(name)
        .orElseThrow(() -> new AssertionError("no catalog entry " + name));
  }

  private static void rows(Dispersion d, double... wavelengthThenIndex) {
    for (int i = 0; i < wavelengthThenIndex.length; i += 2) {
      double lambda = wavelengthThenIndex[i];
      assertEquals(
          wavelengthThenIndex[i + 1],
          d.index(lambda).getReal(),
          TOL,
          "n at " + lambda / NM + " nm");
      // k = 0: a real dispersion formula has no absorption (definition).
      assertEquals(0, d.index(lambda).getImaginary(), 0, "k at " + lambda / NM + " nm");
    }
  }

  @Test
  void fusedSilicaMalitson1965() {
    // Computed from Malitson 1965 (JOSA 55, 1205), three-term Sellmeier; n_d = 1.45846 is the value
    // the paper's fit reproduces at the d line.
    rows(m("fused_silica").dispersion(), F, 1.463127, D, 1.458464, C, 1.456367, YAG, 1.449631);
  }

  @Test
  void calciumFluorideMalitson1963() {
    // Computed from Malitson 1963 (Appl. Opt. 2, 1103), three-term Sellmeier, 24 °C.
    rows(m("calcium_fluoride").dispersion(), F, 1.437025, D, 1.433849, C, 1.432458, YAG, 1.428478);
  }

  @Test
  void sapphireMalitsonDodge1972() {
    // Computed from the Malitson & Dodge 1972 Sellmeier coefficients (as printed in Dodge 1986), 20
    // °C.
    Uniaxial u = m("sapphire").uniaxial().orElseThrow();
    rows(u.ordinary(), F, 1.775508, D, 1.768172, C, 1.764884, YAG, 1.754485);
    rows(u.extraordinary(), F, 1.767284, D, 1.760096, C, 1.756870, YAG, 1.746625);
    assertTrue(u.birefringence(D) < 0, "sapphire is negative uniaxial");
  }

  @Test
  void magnesiumFluorideDodge1984() {
    // Computed from Dodge 1984 (Appl. Opt. 23, 1980), three-term Sellmeier for o and e, 19 °C.
    Uniaxial u = m("magnesium_fluoride").uniaxial().orElseThrow();
    rows(u.ordinary(), F, 1.380199, D, 1.377744, C, 1.376643, YAG, 1.373193);
    rows(u.extraordinary(), F, 1.392121, D, 1.389557, C, 1.388405, YAG, 1.384779);
    assertTrue(u.birefringence(D) > 0, "MgF2 is positive uniaxial");
  }

  @Test
  void quartzGhosh1999() {
    // Computed from Ghosh 1999 (Opt. Commun. 163, 95), five-coefficient equation for o and e.
    Uniaxial u = m("quartz").uniaxial().orElseThrow();
    rows(u.ordinary(), F, 1.549664, D, 1.544276, C, 1.541854, YAG, 1.534099);
    rows(u.extraordinary(), F, 1.558951, D, 1.553379, C, 1.550873, YAG, 1.542835);
    // Δn at the d line: 1.553379 − 1.544276.
    // Definition of the birefringence, ne − no, from the rows above (Ghosh 1999, from memory).
    assertEquals(0.009103, u.birefringence(D), 2e-6);
  }

  @Test
  void calciteGhosh1999() {
    // Computed from Ghosh 1999 (Opt. Commun. 163, 95), five-coefficient equation for o and e.
    Uniaxial u = m("calcite").uniaxial().orElseThrow();
    rows(u.ordinary(), F, 1.667649, D, 1.658461, C, 1.654456, YAG, 1.642457);
    rows(u.extraordinary(), F, 1.490491, D, 1.486185, C, 1.484349, YAG, 1.479643);
    // Definition of the birefringence, ne − no, from the rows above (Ghosh 1999, from memory).
    assertEquals(1.486185 - 1.658461, u.birefringence(D), 2e-6);
  }

  @Test
  void waterDaimonMasumura2007() {
    // Computed from Daimon & Masumura 2007 (Appl. Opt. 46, 3811), four-term Sellmeier for 20.0 °C.
    // 1064 nm lies inside the paper's 182-1129 nm range.
    rows(m("water").dispersion(), F, 1.337492, D, 1.333403, C, 1.331513, YAG, 1.324534);
  }

  @Test
  void airCiddor1996() {
    // Ciddor 1996 for the catalog's air (dry, 20 °C, 101 325 Pa, 450 ppm): n − 1 ≈ 2.7e-4 at 633
    // nm;
    // computed from the paper's equations: 2.71802e-4 at 632.8 nm.
    // Ciddor, Appl. Opt. 35, 1566 (1996), eqs. 1–5 (equation numbers from memory).
    assertEquals(1 + 2.71802e-4, m("air").dispersion().index(632.8 * NM).getReal(), 2e-9);
  }

  @Test
  void silverJohnsonChristy1972() {
    // Johnson & Christy 1972 (Phys. Rev. B 6, 4370), table rows at 1.88 eV (659.5 nm) and 1.02 eV
    // (1216 nm).
    nk(m("silver"), 659.5 * NM, 0.05, 4.483);
    nk(m("silver"), 1216.0 * NM, 0.09, 8.828);
  }

  @Test
  void goldJohnsonChristy1972() {
    // Johnson & Christy 1972, table rows at 2.01 eV (616.8 nm) and 1.14 eV (1088 nm).
    nk(m("gold"), 616.8 * NM, 0.21, 3.272);
    nk(m("gold"), 1088.0 * NM, 0.27, 7.150);
  }

  @Test
  void copperJohnsonChristy1972() {
    // Johnson & Christy 1972, table rows at 1.88 eV (659.5 nm) and 0.77 eV (1610 nm).
    nk(m("copper"), 659.5 * NM, 0.22, 3.747);
    nk(m("copper"), 1610.0 * NM, 0.76, 11.12);
  }

  @Test
  void metalTableInterpolatesBetweenRows() {
    // Halfway (in wavelength) between the Johnson & Christy silver rows at 1216 and 1393 nm.
    Complex mid = m("silver").dispersion().index(1304.5 * NM);
    // Definition of linear interpolation; rows of Johnson & Christy, Phys. Rev. B 6, 4370 (1972),
    // Table 1 (table number from memory).
    assertEquals((0.09 + 0.13) / 2, mid.getReal(), 1e-12);
    assertEquals((8.828 + 10.10) / 2, mid.getImaginary(), 1e-12);
  }

  @Test
  void aluminiumRakic1998() {
    // Computed from the Rakić et al. 1998 (Appl. Opt. 37, 5271) Lorentz–Drude parameters for Al:
    // at 502.30 nm n = 0.76990, k = 5.9264; at 1000.5 nm n = 1.4766, k = 9.2883.
    Complex a = m("aluminium").dispersion().index(502.30 * NM);
    // Rakić et al., Appl. Opt. 37, 5271 (1998), Table 1 parameters in eq. 1 (numbers from memory).
    assertEquals(0.76990, a.getReal(), 2e-5);
    assertEquals(5.9264, a.getImaginary(), 2e-4);
    Complex b = m("aluminium").dispersion().index(1000.5 * NM);
    assertEquals(1.4766, b.getReal(), 2e-4);
    assertEquals(9.2883, b.getImaginary(), 2e-4);
  }

  @Test
  void metalsCoverAtLeast400nmTo1600nmWithPositiveKappa() {
    for (String metal : List.of("silver", "gold", "aluminium", "copper")) {
      CatalogMaterial entry = m(metal);
      assertTrue(entry.isValidAt(250 * NM) && entry.isValidAt(1900 * NM), metal + " range");
      for (double lambda = 250 * NM; lambda <= 1900 * NM; lambda += 25 * NM) {
        assertTrue(entry.absoluteIndex(lambda).getImaginary() > 0, metal + " κ at " + lambda);
      }
    }
  }

  @Test
  void relativeToAirBecomesAbsolute() {
    // Fused silica at the d line (Malitson 1965, relative to air at 20 °C) in dry 20 °C air (Ciddor
    // 1996):
    // n_air − 1 = 2.72433e-4; the formula taken at λ/n_air and times n_air gives 1.458867
    // (computed).
    CatalogMaterial silica = m("fused_silica");
    assertEquals(IndexBasis.RELATIVE_TO_AIR, silica.basis());
    double nAir = CiddorAir.dryAt(293.15).index(D).getReal();
    // Ciddor, Appl. Opt. 35, 1566 (1996), eqs. 1–5 (equation numbers from memory).
    assertEquals(1 + 2.72433e-4, nAir, 2e-9);
    assertEquals(1.458867, silica.absoluteIndex(D).getReal(), TOL);
    assertEquals(
        silica.dispersion().index(D / nAir).getReal() * nAir,
        silica.absoluteIndex(D).getReal(),
        1e-12);
    assertEquals(1.450025, silica.absoluteIndex(YAG).getReal(), TOL);
    // The shift is about n·(n_air − 1) ≈ 4.0e-4, far larger than the tolerance of the rows above.
    assertTrue(silica.absoluteIndex(D).getReal() - silica.dispersion().index(D).getReal() > 3.5e-4);
  }

  @Test
  void absoluteEntriesPassThroughUnchanged() {
    for (String name : List.of("vacuum", "air", "silver", "aluminium")) {
      CatalogMaterial entry = m(name);
      assertEquals(IndexBasis.ABSOLUTE, entry.basis(), name);
      assertEquals(entry.dispersion().index(D), entry.absoluteIndex(D), name);
    }
    assertEquals(new Complex(1, 0), m("vacuum").absoluteIndex(10.6e-6));
  }

  @Test
  void birefringentEntriesExposeBothIndicesAndOrdinaryIsTheDefault() {
    for (String name : List.of("magnesium_fluoride", "sapphire", "quartz", "calcite")) {
      CatalogMaterial entry = m(name);
      assertTrue(entry.isBirefringent(), name);
      Uniaxial u = entry.uniaxial().orElseThrow();
      assertEquals(u.ordinary().index(D), entry.dispersion().index(D), name);
      assertTrue(entry.absoluteExtraordinaryIndex(D).isPresent(), name);
      assertTrue(Math.abs(u.birefringence(D)) > 1e-3, name);
    }
    for (String name : List.of("water", "fused_silica", "calcium_fluoride", "gold")) {
      assertFalse(m(name).isBirefringent(), name);
    }
  }

  @Test
  void everyEntryHasCitationTemperatureAndRange() {
    for (CatalogMaterial entry : MaterialCatalog.all()) {
      String citation = entry.reference().citation();
      assertFalse(citation.isBlank(), entry.name());
      assertTrue(
          citation.matches(".*\\b(1[89]\\d\\d|20\\d\\d)\\b.*"),
          entry.name() + " citation names a year");
      assertTrue(entry.temperatureKelvin() > 0, entry.name());
      assertTrue(entry.valid().isPresent(), entry.name() + " has a valid range");
      assertTrue(entry.isValidAt(D), entry.name() + " covers the d line");
    }
  }

  @Test
  void validRangesExcludeWavelengthsOutsideThePapers() {
    // Malitson 1965: 0.21–3.71 µm; Malitson 1963: 0.23–9.7 µm; Daimon & Masumura 2007: 0.182–1.129
    // µm;
    // Ghosh 1999: quartz 0.198–2.0531 µm, calcite 0.204–2.172 µm; Dodge 1984: 0.2–7.0 µm;
    // Malitson & Dodge 1972: 0.2–5.0 µm; Johnson & Christy 1972: 0.1879–1.937 µm; Rakić 1998: 0.1–6
    // eV;
    // Ciddor 1996: 0.23–1.69 µm.
    outside("fused_silica", 0.20e-6, 3.8e-6);
    outside("calcium_fluoride", 0.22e-6, 9.8e-6);
    outside("water", 0.18e-6, 1.2e-6);
    outside("quartz", 0.19e-6, 2.1e-6);
    outside("calcite", 0.2e-6, 2.2e-6);
    outside("magnesium_fluoride", 0.19e-6, 7.1e-6);
    outside("sapphire", 0.19e-6, 5.1e-6);
    outside("silver", 0.18e-6, 2.0e-6);
    outside("gold", 0.18e-6, 2.0e-6);
    outside("copper", 0.18e-6, 2.0e-6);
    outside("aluminium", 0.2e-6, 12.5e-6);
    outside("air", 0.22e-6, 1.7e-6);
    assertTrue(m("water").isValidAt(YAG));
    assertTrue(m("aluminium").isValidAt(10.6e-6));
  }

  @Test
  void everyCanonicalNameOfTheLanguageHasAnEntry() {
    List<String> missing = new ArrayList<>();
    for (CatalogSpellings.Entry e : CatalogSpellings.entries()) {
      if (MaterialCatalog.lookup(e.name()).isEmpty()) {
        missing.add(e.name());
      }
    }
    if (!missing.isEmpty()) {
      fail("CatalogSpellings entries without catalog data: " + missing);
    }
    assertEquals(
        CatalogSpellings.entries().size(),
        MaterialCatalog.all().size(),
        "no entry outside the name table");
    for (CatalogSpellings.Entry e : CatalogSpellings.entries()) {
      boolean metal = e.materialClass() == CatalogSpellings.MaterialClass.METAL;
      boolean birefringent =
          e.materialClass() == CatalogSpellings.MaterialClass.BIREFRINGENT_CRYSTAL;
      CatalogMaterial entry = m(e.name());
      assertEquals(
          birefringent, entry.isBirefringent(), e.name() + " birefringence matches its class");
      assertEquals(
          metal,
          entry.dispersion().index(D).getImaginary() > 1,
          e.name() + " metal iff strongly absorbing");
    }
  }

  @Test
  void aliasesAreNotCatalogNames() {
    assertTrue(MaterialCatalog.lookup("silica").isEmpty());
    assertTrue(MaterialCatalog.lookup("aluminum").isEmpty());
  }

  private static void outside(String name, double below, double above) {
    CatalogMaterial entry = m(name);
    assertFalse(entry.isValidAt(below), name + " at " + below);
    assertFalse(entry.isValidAt(above), name + " at " + above);
    assertFalse(entry.dispersion().isValidAt(below), name + " dispersion at " + below);
  }

  private static void nk(CatalogMaterial entry, double lambda, double n, double k) {
    Complex index = entry.absoluteIndex(lambda);
    assertEquals(n, index.getReal(), 1e-9, entry.name() + " n at " + lambda);
    assertEquals(k, index.getImaginary(), 1e-9, entry.name() + " k at " + lambda);
  }
}
