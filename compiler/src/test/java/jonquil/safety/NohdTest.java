package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/**
 * NOHD = (sqrt(4P/(pi MPE)) - a)/phi (ANSI Z136.1-2014; IEC TR 60825-14:2004; formula from memory):
 * the distance at which a beam of exit diameter a and full divergence phi, both at 1/e, has spread
 * its power over the area where the irradiance equals the MPE. Every case is a scenario of our own,
 * computed by hand with that formula.
 */
class NohdTest {

  @Test
  void visibleContinuousWorkedExample() {
    // A 100 mW green bench beam, 1 mm exit, 1 mrad; MPE 25.46 W/m² for 0.25 s (IEC 60825-1:2014,
    // Table A.1, from memory): sqrt(4*0.1/(pi*25.46)) = 0.07072 m; (0.07072 - 0.001)/0.001 = 69.7 m
    Outcome<Double> o = Nohd.forLimit(0.1, 1e-3, 1e-3, 25.46);
    assertEquals(69.7, o.get(), 0.1);
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @Test
  void gaussianInputsUseTheOneOverEDiameter() {
    // 1/e^2 values sqrt(2) mm and sqrt(2) mrad are 1 mm and 1 mrad at 1/e (definition of the
    // Gaussian radii): same 69.7 m with the computed MPE (formula of the class comment, from
    // memory).
    Outcome<Double> o =
        Nohd.of(Emission.continuous(532e-9, 0.1), Math.sqrt(2) * 1e-3, Math.sqrt(2) * 1e-3, 0.25);
    assertEquals(69.7, o.get(), 0.1);
  }

  @Test
  void pulsedUsesEnergyAndRadiantExposure() {
    // 1064 nm, 1 mJ, 10 ns single pulse; MPE 2e-2 J/m2 (Ed. 3, from memory); a = 2 mm, phi = 1 mrad
    // at 1/e: sqrt(4e-3/(pi*0.02)) = 0.25231 m -> (0.25231 - 0.002)/0.001 = 250.3 m (formula of
    // the class comment, from memory)
    Outcome<Double> o =
        Nohd.of(
            Emission.singlePulse(1064e-9, 1e-3, 1e-8),
            2 * Math.sqrt(2) * 1e-3,
            Math.sqrt(2) * 1e-3,
            1);
    assertEquals(250.3, o.get(), 0.2);
  }

  @Test
  void safeAtTheExitIsZero() {
    // sqrt(4*0.3e-3/(pi*25.46)) = 3.9 mm < 7 mm exit beam
    assertEquals(0.0, Nohd.forLimit(0.3e-3, 7e-3, 1e-3, 25.46).get());
  }

  @Test
  void hazardousCollimatedBeamIsUnbounded() {
    assertEquals(Double.POSITIVE_INFINITY, Nohd.forLimit(0.1, 1e-3, 0, 25.46).get());
  }

  @Test
  void outsideCoverageIsNotEvaluated() {
    assertFalse(Nohd.of(Emission.continuous(1.3e-6, 10), 5e-3, 2e-3, 10).evaluated());
  }
}
