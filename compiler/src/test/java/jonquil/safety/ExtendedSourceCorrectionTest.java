package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * C6 = 1 up to α_min = 1.5 mrad, α/α_min up to α_max, α_max/α_min beyond; α_max 5 mrad below 625
 * µs, 200 t^0.5 mrad to 0.25 s, 100 mrad above (IEC 60825-1:2014 Table 10 notes, from memory; α_min
 * and the 100 mrad ceiling also in Directive 2006/25/EC Annex II Table 2.5).
 */
class ExtendedSourceCorrectionTest {

  @Test
  void c6Cases() {
    // A point source: alpha below alpha_min gives 1 (IEC 60825-1:2014, from memory)
    assertEquals(1.0, ExtendedSource.c6(1e-3, 0.25), 1e-12);
    // 15 mrad over 10 s: 15/1.5 = 10 (IEC 60825-1:2014, from memory)
    assertEquals(10.0, ExtendedSource.c6(15e-3, 10), 1e-12);
    // 200 mrad over 10 s stops at alpha_max 100 mrad: 100/1.5 = 66.67 (from memory)
    assertEquals(66.667, ExtendedSource.c6(0.2, 10), 1e-3);
    // 10 mrad for a 100 us pulse: alpha_max 5 mrad, 5/1.5 = 3.333 (from memory)
    assertEquals(3.3333, ExtendedSource.c6(10e-3, 1e-4), 1e-4);
    // 50 mrad over 10 ms: alpha_max = 200 * sqrt(0.01) = 20 mrad, 20/1.5 = 13.33 (from memory)
    assertEquals(13.333, ExtendedSource.c6(50e-3, 0.01), 1e-3);
  }

  @Test
  void alphaMaxIsContinuousAtItsBreakpoints() {
    // 200 * sqrt(625e-6) = 5 mrad and 200 * sqrt(0.25) = 100 mrad (definition of the pieces)
    assertEquals(5e-3, ExtendedSource.alphaMax(625e-6), 1e-12);
    assertEquals(0.1, ExtendedSource.alphaMax(0.25), 1e-12);
  }

  @Test
  void notAppliedWhereItCouldBeLenient() {
    ExtendedSource.Correction train =
        ExtendedSource.of(Emission.pulseTrain(1064e-9, 1e-3, 1e-8, 10), 20e-3, 10);
    // C6 = 1 kept: the point-source MPE is never above the extended one (definition)
    assertEquals(1.0, train.c6(), 0.0);
    assertTrue(train.note().contains("pulse train"), train.note());
    ExtendedSource.Correction photochemical =
        ExtendedSource.of(Emission.continuous(488e-9, 1e-3), 20e-3, 100);
    // C6 = 1 kept where the photochemical limit may govern (definition of the fail-safe rule)
    assertEquals(1.0, photochemical.c6(), 0.0);
    assertTrue(photochemical.note().contains("photochemical"), photochemical.note());
    ExtendedSource.Correction cornea =
        ExtendedSource.of(Emission.continuous(1550e-9, 1e-3), 20e-3, 10);
    // No retinal image outside 400-1400 nm, so no C6 (definition)
    assertEquals(1.0, cornea.c6(), 0.0);
    // 633 nm over 100 s, 15 mrad: T2 = 10 * 10^(13.5/98.5) = 13.71 s, 10 * 1.371^-0.25 = 9.241
    // (IEC 60825-1:2014 Table 10, from memory)
    assertEquals(
        9.2414, ExtendedSource.of(Emission.continuous(633e-9, 1e-3), 15e-3, 100).c6(), 1e-4);
    // T2 reaches 100 s at 100 mrad (IEC 60825-1:2014, from memory)
    assertEquals(100, ExtendedSource.t2(0.1), 1e-9);
    // 633 nm over 10 s, 15 mrad: 10 (IEC 60825-1:2014, from memory)
    assertEquals(10.0, ExtendedSource.of(Emission.continuous(633e-9, 1e-3), 15e-3, 10).c6(), 1e-9);
  }
}
