package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Skin MPE, IEC 60825-1:2014 (Ed. 3) Table A.5 (from memory; same as ANSI Z136.1-2014 Table 7). */
class SkinMpeTest {

  @ParameterizedTest(name = "{0} nm, {1} s -> {2} J/m2")
  @CsvSource(
      delimiter = '|',
      value = {
        "1064 | 1e-8 | 1000  | from memory: 200 C4 J/m2 (1-100 ns), C4 = 5",
        "532  | 1    | 11000 | from memory: 1.1e4 C4 t^0.25 J/m2",
        "532  | 100  | 2e5   | from memory: 2000 C4 W/m2 for 10 s-3e4 s",
        "1064 | 100  | 1e6   | from memory: 2000 C4 W/m2, C4 = 5",
        "1300 | 100  | 1e6   | from memory: skin row extends to 1400 nm",
      })
  void table(double nm, double t, double h, String source) {
    Emission e =
        t < 1e-6 ? Emission.singlePulse(nm * 1e-9, 1e-3, t) : Emission.continuous(nm * 1e-9, 1);
    Outcome<MaximumPermissibleExposure> o = SkinMpe.at(e, t);
    assertTrue(o.evaluated(), source);
    assertEquals(h, o.get().radiantExposure(), h * 0.01, source);
    // The 3.5 mm limiting aperture of the skin (IEC 60825-1:2014, Annex A, from memory).
    assertEquals(3.5e-3, o.get().apertureDiameter(), 1e-12);
  }

  @Test
  void breakpointsJoin() {
    // Common practice in reading Table A.5: adjacent rows meet at their breakpoint (within 3 %).
    assertEquals(1.0, Ed3.skinMpe(532e-9, 1e-7 * (1 - 1e-9)) / Ed3.skinMpe(532e-9, 1e-7), 0.03);
    assertEquals(1.0, Ed3.skinMpe(532e-9, 10 * (1 - 1e-9)) / Ed3.skinMpe(532e-9, 10), 0.03);
  }

  @Test
  void trainUsesAveragePower() {
    // 1064 nm, 10 ns, 1 kHz, 10 s: single 1000 J/m2; average 2000*5*10 / 1e4 = 10 J/m2 per pulse.
    MaximumPermissibleExposure x =
        SkinMpe.at(Emission.pulseTrain(1064e-9, 1e-3, 1e-8, 1e3), 10).get();
    // Skin MPE of IEC 60825-1:2014, Table A.5 (from memory): 2000 C4 W/m² for 10 s–3e4 s, with
    // C4 = 5 at 1064 nm: 2000 · 5 · 10 s = 1e5 J/m² shared by 1e4 pulses = 10 J/m² each.
    assertEquals(10, x.radiantExposure(), 1e-6);
    assertTrue(Double.isNaN(x.repetitivePulse()));
  }

  @Test
  void outsideCoverage() {
    assertFalse(SkinMpe.at(Emission.continuous(2e-3, 1), 10).evaluated());
    assertFalse(SkinMpe.at(Emission.continuous(150e-9, 1), 10).evaluated());
    assertFalse(SkinMpe.at(Emission.singlePulse(1064e-9, 1e-3, 5e-14), 1).evaluated());
  }
}
