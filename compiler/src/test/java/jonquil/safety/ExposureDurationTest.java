package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Default exposure durations per wavelength and viewing (IEC 60825-1:2014 time bases and ANSI
 * Z136.1-2014 hazard-evaluation durations; clause numbers from memory, the durations common
 * practice): 0.25 s aversion in the visible, 10 s outside it, 100 s for diffuse viewing, 30 000 s
 * in the ultraviolet. Each comes with its reason.
 */
class ExposureDurationTest {

  @Test
  void visibleIntrabeamIsTheAversionResponse() {
    ExposureDuration d = ExposureDuration.byDefault(532e-9, Viewing.DIRECT);
    // 0.25 s aversion response (common practice; IEC 60825-1:2014 Class 2 time base)
    assertEquals(0.25, d.seconds(), 0.0);
    assertTrue(d.text().startsWith("0.25 s: aversion response, visible"), d.text());
    // Mirror-like reflections are intrabeam too; 700 nm is still visible (common practice)
    assertEquals(0.25, ExposureDuration.byDefault(700e-9, Viewing.SPECULAR).seconds(), 0.0);
  }

  @Test
  void infraredIntrabeamIsTenSeconds() {
    // 10 s for accidental near-infrared viewing (ANSI Z136.1-2014, from memory)
    assertEquals(10, ExposureDuration.byDefault(808e-9, Viewing.DIRECT).seconds(), 0.0);
    assertEquals(10, ExposureDuration.byDefault(1550e-9, Viewing.SPECULAR).seconds(), 0.0);
    assertTrue(
        ExposureDuration.byDefault(1064e-9, Viewing.DIRECT).reason().contains("no aversion"));
  }

  @Test
  void diffuseIsUnintendedLongTermViewing() {
    // 100 s time base (IEC 60825-1:2014, from memory)
    ExposureDuration d = ExposureDuration.byDefault(532e-9, Viewing.DIFFUSE);
    assertEquals(100, d.seconds(), 0.0);
    assertTrue(d.text().startsWith("100 s: diffuse viewing"), d.text());
  }

  @Test
  void ultravioletAndDeliberateViewingAreAWorkingDay() {
    // 30 000 s (IEC 60825-1:2014 time base, ANSI Z136.1-2014; from memory)
    assertEquals(3e4, ExposureDuration.byDefault(355e-9, Viewing.DIRECT).seconds(), 0.0);
    assertEquals(3e4, ExposureDuration.deliberate().seconds(), 0.0);
    assertEquals(
        "30000 s: deliberate long-term viewing, a working day (stated)",
        ExposureDuration.deliberate().text());
  }
}
