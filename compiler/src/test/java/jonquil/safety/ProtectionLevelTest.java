package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * EN 207 LB and EN 208 RB scale numbers. EN 207:2017 Annex B Table B.1 as restated in the public
 * "EN 207" encyclopedia article (315-1400 nm: D 10^(n+1) W/m2, I/R 5x10^(n-3) J/m2); EN 208:2009
 * Annex B Table B.1 as restated in eyewear makers' public EN 208 guides (RB1: 0.01 W, 2x10^-6 J).
 */
class ProtectionLevelTest {

  @Test
  void en207ContinuousVisible() {
    // 1 W at 532 nm, 2 mm 1/e2 diameter: E = 1/(pi*1e-6) = 3.18e5 W/m2; log10(E) - 1 = 4.50,
    // rounded up: LB5 (EN 207:2017 Table B.1, public restatement)
    Outcome<List<ProtectionLevel>> o = Eyewear.en207(Emission.continuous(532e-9, 1), 2e-3);
    assertEquals(1, o.get().size());
    ProtectionLevel d = o.get().get(0);
    assertEquals(5, d.level());
    assertEquals("D 532 LB5", d.marking());
    assertTrue(d.testConditions().contains("5 s"), d.testConditions());
    assertEquals(Outcome.CAUTION, o.caution());
  }

  @Test
  void en207SinglePulseInfrared() {
    // 10 mJ, 10 ns at 1064 nm (R: 1 ns to 1 us), 2 mm: H = 0.01/(pi*1e-6) = 3183 J/m2;
    // log10(H/5) + 3 = 5.80, rounded up: LB6 (EN 207:2017 Table B.1, public restatement)
    ProtectionLevel r = Eyewear.en207(Emission.singlePulse(1064e-9, 1e-2, 1e-8), 2e-3).get().get(0);
    assertEquals("R", r.mode());
    assertEquals(6, r.level());
    assertEquals("R 1064 LB6", r.marking());
    assertTrue(r.testConditions().contains("50 pulses"), r.testConditions());
  }

  @Test
  void en207PulseTrainNeedsBothLevels() {
    // 1 mJ, 10 ns, 10 Hz at 1064 nm, 2 mm. D: 10 mW -> 3183 W/m2, log10 - 1 = 2.50 -> LB3.
    // R: 318.3 J/m2 x 50^(1/4) (N in 5 s, from memory) = 846.4 J/m2, log10(/5) + 3 = 5.23 -> LB6
    // (EN 207:2017 Table B.1, public restatement)
    List<ProtectionLevel> levels =
        Eyewear.en207(Emission.pulseTrain(1064e-9, 1e-3, 1e-8, 10), 2e-3).get();
    assertEquals(
        List.of("D 1064 LB3", "R 1064 LB6"),
        levels.stream().map(ProtectionLevel::marking).toList());
  }

  @Test
  void en207ModesByPulseDuration() {
    // EN 207:2017 working modes (public restatement): I above 1 us, R above 1 ns, M at 1 ns or less
    assertEquals("I", Eyewear.en207Mode(Emission.singlePulse(1064e-9, 1e-3, 1e-4)));
    assertEquals("R", Eyewear.en207Mode(Emission.singlePulse(1064e-9, 1e-3, 1e-8)));
    assertEquals("M", Eyewear.en207Mode(Emission.singlePulse(1064e-9, 1e-3, 1e-13)));
    assertEquals("D", Eyewear.en207Mode(Emission.continuous(1064e-9, 1)));
  }

  @Test
  void en208Alignment() {
    // 5 mW at 532 nm, 1 mm beam, all through the 7 mm pupil: <= 0.01 W -> RB1; 30 mW -> RB2
    // (EN 208:2009 Table B.1, public restatement)
    assertEquals(1, Eyewear.en208(Emission.continuous(532e-9, 5e-3), 1e-3).get().level());
    ProtectionLevel rb2 = Eyewear.en208(Emission.continuous(532e-9, 30e-3), 1e-3).get();
    assertEquals("532 RB2", rb2.marking());
    assertTrue(rb2.testConditions().contains("Class 2"), rb2.testConditions());
    // 1 uJ, 10 ns single pulse: <= 2e-6 J -> RB1 (same table)
    assertEquals(1, Eyewear.en208(Emission.singlePulse(532e-9, 1e-6, 1e-8), 1e-3).get().level());
  }

  @Test
  void en208RefusesWhatItDoesNotCover() {
    assertFalse(Eyewear.en208(Emission.continuous(1064e-9, 5e-3), 1e-3).evaluated());
    // RB5, the top of the scale, is 100 W (EN 208:2009 Table B.1, public restatement; RB5 ceiling
    // from memory): 200 W needs EN 207 eyewear
    Outcome<ProtectionLevel> strong = Eyewear.en208(Emission.continuous(532e-9, 200), 1e-3);
    assertFalse(strong.evaluated());
    assertTrue(strong.reason().contains("EN 207"), strong.reason());
  }
}
