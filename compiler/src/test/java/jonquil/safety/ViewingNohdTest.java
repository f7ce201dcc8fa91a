package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * NOHD for a mirror-like reflection (the beam with ρP) and for a diffuse one, r = sqrt(ρ P cos θ/(π
 * MPE)) (ANSI Z136.1-2014 diffuse-reflection hazard distance; IEC TR 60825-14:2004; equation
 * numbers from memory). Scenarios are our own, each computed by hand with the formula named beside
 * it.
 */
class ViewingNohdTest {

  @Test
  void lambertianHazardDistanceByHand() {
    // 1 W on a white card (rho 1), viewed along the normal; MPE 25.46 W/m2 (532 nm, 0.25 s; IEC
    // 60825-1:2014 Table A.1, from memory): sqrt(1/(pi*25.46)) = 0.11181 m (ANSI Z136.1-2014
    // diffuse formula, from memory)
    assertEquals(0.11181, Nohd.diffuseForLimit(1, 1, 1, 25.46).get(), 1e-5);
    // rho 0.5 at 60 deg (cos 0.5): sqrt(0.25/(pi*25.46)) = 0.05591 m (same formula)
    assertEquals(0.05591, Nohd.diffuseForLimit(1, 0.5, 0.5, 25.46).get(), 1e-5);
  }

  @Test
  void diffuseUsesThePointSourceMpeForTheDuration() {
    // 532 nm, 1 W, 100 s: the thermal limit 10 W/m2 beyond T2 = 10 s governs (IEC 60825-1:2014
    // Table A.1, from memory); sqrt(1/(pi*10)) = 0.17841 m (ANSI Z136.1-2014 diffuse formula)
    Outcome<Double> d = Nohd.diffuse(Emission.continuous(532e-9, 1), 100, 1);
    assertEquals(0.17841, d.get(), 1e-4);
    assertTrue(d.standard().contains("Lambertian"), d.standard());
    assertEquals(Outcome.CAUTION, d.caution());
  }

  @Test
  void specularIsTheBeamScaledByItsReflectance() {
    // A 4 % glass surface reflecting a 100 mW, 1 mm / 1 mrad (1/e) beam; MPE 25.46 W/m2 (from
    // memory): sqrt(4*0.004/(pi*25.46)) = 0.014144 m -> (0.014144 - 0.001)/0.001 = 13.14 m
    // (NOHD formula of ANSI Z136.1-2014 with rho P, from memory)
    Outcome<Double> s =
        Nohd.specular(
            Emission.continuous(532e-9, 0.1), Math.sqrt(2) * 1e-3, Math.sqrt(2) * 1e-3, 0.25, 0.04);
    assertEquals(13.14, s.get(), 0.05);
    // A perfect mirror gives the direct beam's 69.7 m (definition: rho = 1; NohdTest's case)
    assertEquals(
        69.7,
        Nohd.specular(
                Emission.continuous(532e-9, 0.1), Math.sqrt(2) * 1e-3, Math.sqrt(2) * 1e-3, 0.25, 1)
            .get(),
        0.1);
    // rho 0 reflects nothing (definition)
    assertEquals(
        0.0, Nohd.specular(Emission.continuous(532e-9, 0.1), 1e-3, 1e-3, 0.25, 0).get(), 0.0);
  }

  @Test
  void aReflectanceOutsideZeroToOneIsRefused() {
    assertThrows(IllegalArgumentException.class, () -> Nohd.diffuseForLimit(1, 1.2, 1, 25));
  }
}
