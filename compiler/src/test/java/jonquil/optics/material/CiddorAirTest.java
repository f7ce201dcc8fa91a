package jonquil.optics.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The index of air against Ciddor (1996), P. E. Ciddor, Applied Optics 35(9), 1566-1573, and values
 * computed from its equations.
 */
class CiddorAirTest {
  private static final double HE_NE = 632.8e-9;

  @Test
  void standardAirIsTheFirstDispersionFormulaOfThePaper() {
    // Ciddor 1996, standard air (dry, 15 °C, 101 325 Pa, 450 ppm CO2):
    // (n − 1)·1e8 = 5792105/(238.0185 − σ²) + 167917/(57.362 − σ²), σ = 1/0.6328 µm⁻¹; worked by
    // hand:
    // σ² = 2.497279, 5792105/235.521221 = 24592.71, 167917/54.864721 = 3060.56, sum 27653.27e-8.
    // Ciddor, Appl. Opt. 35, 1566 (1996), eq. 1 (equation number from memory).
    assertEquals(2.76533e-4, CiddorAir.standard().refractivity(HE_NE), 2e-9);
  }

  @Test
  void airAt633nmIsAbout27Em4() {
    // Sanity value: n − 1 ≈ 2.7e-4 at 633 nm (Ciddor 1996); computed from the paper's
    // equations for dry air
    // at 20 °C, 101 325 Pa, 450 ppm: 2.71802e-4.
    double r = CiddorAir.dryAt(293.15).refractivity(HE_NE);
    // Ciddor, Appl. Opt. 35, 1566 (1996), eqs. 1–5, computed for dry air (numbers from memory).
    assertEquals(2.71802e-4, r, 2e-9);
    // Ideal-gas scaling of standard air from 15 °C to 20 °C gives 2.76533e-4·288.15/293.15 =
    // 2.71816e-4; the
    // compressibility correction is a few parts in 1e4 of that, no more.
    assertEquals(2.76533e-4 * 288.15 / 293.15, r, 2.76533e-4 * 5e-4);
  }

  @Test
  void humidAirMatchesThePublishedCalculatorExample() {
    // 633 nm, 20 °C, 101.325 kPa, 50 % RH, 450 ppm: n = 1.000271373 (NIST Engineering Metrology
    // Toolbox example
    // computed with Ciddor's equation; from memory). Water vapour lowers n relative to dry air.
    CiddorAir humid = new CiddorAir(293.15, 101_325, 0.5, 450);
    assertEquals(2.71373e-4, humid.refractivity(633e-9), 2e-9);
    assertTrue(humid.refractivity(633e-9) < CiddorAir.dryAt(293.15).refractivity(633e-9));
  }

  @Test
  void pressureScalesRefractivityAndCo2RaisesIt() {
    double low = new CiddorAir(293.15, 90_000, 0, 450).refractivity(HE_NE);
    double high = new CiddorAir(293.15, 110_000, 0, 450).refractivity(HE_NE);
    // Refractivity is proportional to density (Ciddor, Appl. Opt. 35, 1566 (1996), eq. 5), and
    // density to pressure up to the compressibility Z of eq. 12 (the BIPM density equation, eq. 4),
    // a change under 1e-3 between 90 and 110 kPa (equation numbers from memory).
    assertEquals(110.0 / 90.0, high / low, 1e-3);
    assertTrue(
        new CiddorAir(293.15, 101_325, 0, 1000).refractivity(HE_NE)
            > CiddorAir.dryAt(293.15).refractivity(HE_NE));
  }

  @Test
  void normalDispersionAndStatedRange() {
    CiddorAir air = CiddorAir.standard();
    assertTrue(air.refractivity(400e-9) > air.refractivity(800e-9));
    assertTrue(air.isValidAt(230e-9));
    assertTrue(air.isValidAt(1690e-9));
    assertFalse(air.isValidAt(2000e-9));
    assertFalse(air.isValidAt(200e-9));
  }

  @Test
  void conditionsOutsideThePaperAreRejected() {
    assertThrows(IllegalArgumentException.class, () -> new CiddorAir(400, 101_325, 0, 450));
    assertThrows(IllegalArgumentException.class, () -> new CiddorAir(293.15, 50_000, 0, 450));
    assertThrows(IllegalArgumentException.class, () -> new CiddorAir(293.15, 101_325, 1.5, 450));
    assertThrows(IllegalArgumentException.class, () -> new CiddorAir(293.15, 101_325, 0, 5000));
  }
}
