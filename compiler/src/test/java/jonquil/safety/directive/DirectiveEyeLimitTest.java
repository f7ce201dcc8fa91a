package jonquil.safety.directive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.safety.Emission;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Outcome;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reference values of the eye's exposure limit values, Directive 2006/25/EC Annex II, one or more
 * per band and pulse regime. Each row names its table (2.2: t &lt; 10 s, 2.3: t ≥ 10 s) and the
 * hand calculation from the row and the Table 2.5 factors; rows marked "from memory" in {@link
 * AnnexII} are from memory here too.
 */
class DirectiveEyeLimitTest {

  @ParameterizedTest(name = "{0} nm, single pulse {1} s: {2} J/m2 ({4})")
  @CsvSource({
    // nm, t (s), H (J/m2), aperture (mm), table and working
    "193,   1e-8,  30,       1,   Table 2.2 UV-C 180-302.5 nm: H = 30",
    "355,   1e-12, 0.03,     1,   Table 2.2 UV-A below 1 ns: E = 3e10 W/m2 x 1e-12 s",
    "308,   1e-8,  56,       1,   Table 2.2 UV-B 302.5-315 nm t < T1 = 2.5e-5 s: C1 = 5.6e3 t^0.25",
    "308,   1,     398.107,  1.5, Table 2.2 UV-B t > T1: C2 = 10^(0.2 x 13)",
    "355,   1e-8,  56,       1,   Table 2.2 UV-A 315-400 nm: C1",
    "532,   1e-12, 1.5e-4,   7,   Table 2.2 visible 1e-13-1e-11 s: 1.5e-4 C_A",
    "532,   1e-10, 8.538e-4, 7,   Table 2.2 visible 1e-11-1e-9 s: 2.7e4 t^0.75",
    "532,   1e-8,  5e-3,     7,   Table 2.2 visible 1e-9-1.8e-5 s: 5e-3 C_A",
    "532,   1e-3,  0.10122,  7,   Table 2.2 visible 1.8e-5-10 s: 18 t^0.75",
    "808,   1e-8,  8.2219e-3, 7,  Table 2.2 IR-A 700-1050 nm: 5e-3 C_A with C_A = 10^0.216 (Table"
        + " 2.5)",
    "1064,  1e-8,  0.05,     7,   Table 2.2 IR-A 1050-1400 nm 1e-9-5e-5 s: 5e-2 C_C",
    "1064,  1e-3,  0.50610,  7,   Table 2.2 IR-A 5e-5-10 s: 90 t^0.75 C_C",
    "1300,  1e-8,  0.4,      7,   Table 2.2 IR-A 5e-2 C_C with C_C = 8 (Table 2.5 1200-1400 nm)",
    "1450,  1e-6,  1000,     1,   Table 2.2 IR-B 1400-1500 nm 1e-9-1e-3 s: 1e3",
    "1550,  1e-8,  1e4,      1,   Table 2.2 IR-B 1500-1800 nm: 1e4",
    "2000,  1,     5600,     1.5, Table 2.2 IR-B 1800-2600 nm 1e-3-10 s: C1; aperture 1.5 t^0.375"
        + " mm",
    "10600, 1e-8,  100,      1,   Table 2.2 IR-C 2600 nm-1 mm 1e-9-1e-7 s: 100",
    "10600, 1e-5,  314.91,   1,   Table 2.2 IR-C 1e-7-10 s: C1 = 5.6e3 t^0.25",
    "10600, 1e-12, 0.1,      1,   Table 2.2 IR-C below 1 ns: E = 1e11 W/m2 x 1e-12 s",
    "500000, 1e-5, 314.91,   11,  Table 2.2 far infrared 1e5-1e6 nm: C1 over 11 mm"
  })
  void singlePulses(double nm, double t, double h, double apertureMm, String table) {
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.singlePulse(nm * 1e-9, 1e-9, t), 1).get();
    assertEquals(h, m.radiantExposure(), h * 1e-4, table);
    assertEquals(apertureMm * 1e-3, m.apertureDiameter(), 1e-5, table);
    assertTrue(m.table().contains("Table 2.2"), m.table());
  }

  @ParameterizedTest(name = "{0} nm, continuous over {1} s: {2} W/m2 ({3})")
  @CsvSource({
    // nm, T (s), E (W/m2), table and working
    "266,   100,   0.3,    Table 2.3 UV-C 180-302.5 nm: H = 30 J/m2 over 100 s",
    "355,   100,   100,    Table 2.3 UV-A 10-1e3 s: H = 1e4 J/m2 over 100 s",
    "355,   1e4,   10,     Table 2.3 UV-A 1e3-3e4 s: E = 10",
    "532,   0.25,  25.456, Table 2.2 visible 18 t^0.75 J/m2 over 0.25 s",
    "532,   100,   10,     Table 2.3 visible thermal: E = 10 C_A C_C",
    "450,   100,   1,      Table 2.3 photochemical 400-600 nm from 100 s: E = 1 C_B",
    "450,   50,    2,      Table 2.3 photochemical 10-100 s: H = 100 C_B J/m2 over 50 s",
    "808,   100,   16.444, Table 2.3 IR-A thermal: E = 10 C_A with C_A = 10^0.216",
    "1064,  100,   50,     Table 2.3 IR-A 1050-1400 nm: E = 10 C_A C_C with C_A = 5",
    "1550,  100,   1000,   Table 2.3 IR-B: E = 1000",
    "10600, 3e4,   1000,   Table 2.3 IR-C: E = 1000"
  })
  void continuousWave(double nm, double t, double e, String table) {
    Outcome<MaximumPermissibleExposure> o =
        DirectiveEyeLimit.at(Emission.continuous(nm * 1e-9, 1e-3), t);
    assertEquals(e, o.get().irradiance(), e * 1e-4, table);
    assertTrue(o.standard().contains(t < 10 ? "Table 2.2" : "Table 2.3"), o.standard());
  }

  @Test
  void ultravioletT1IsWhereC1MeetsC2() {
    // Table 2.2 (from memory): at T1 = 10^(0.8(λ-295)) fs the thermal C1 meets the photochemical
    // C2, so the two rows join within the tables' rounding (0.5 %).
    for (double n = 302.5; n < 315; n += 0.5) {
      double t1 = AnnexII.t1Ultraviolet(n);
      assertEquals(1, AnnexII.c1(t1) / AnnexII.c2(n), 0.005, "at " + n + " nm");
    }
  }

  @Test
  void visibleT1IsTenTimesCb() {
    // Table 2.5 (confirmed, Norwegian §11-5): T1 = 10·10^(0.02(λ-450)) s for 450-500 nm, which is
    // 10 C_B, where 100 C_B J/m2 equals 10 W/m2 × t.
    for (double n = 450; n <= 500; n += 5) {
      assertEquals(10 * AnnexII.cB(n), AnnexII.t1Visible(n), 1e-9, "at " + n + " nm");
    }
  }

  @Test
  void aRepetitivelyPulsedNearInfraredLaserIsLimitedByRuleThree() {
    // 1064 nm, 100 us pulses at 100 Hz over 10 s: N = 1000 pulses, spacing 10 ms > T_min 50 us.
    // Table 2.2: single pulse 90 (1e-4)^0.75 = 0.09 J/m2; Table 2.6 rule 3: x 1000^-0.25 = 0.1778
    // -> 0.016 J/m2; rule 2: 500 J/m2 / 1000 = 0.5 J/m2. Rule 3 governs.
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.pulseTrain(1064e-9, 1e-6, 1e-4, 100), 10).get();
    assertEquals(0.09 * Math.pow(1000, -0.25), m.radiantExposure(), 1e-6);
    assertTrue(m.limitingCriterion().startsWith("rule 3"), m.limitingCriterion());
    assertTrue(m.table().contains("Table 2.6"), m.table());
    // Its single pulses come from Table 2.2, its 10 s exposure from Table 2.3: both are cited.
    assertTrue(m.table().contains("Table 2.2") && m.table().contains("Table 2.3"), m.table());
  }

  @Test
  void pulsesWithinTminCountAsOne() {
    // 532 nm, 1 ns pulses at 1 MHz over 0.25 s: spacing 1 us < T_min 18 us (Table 2.6), so 18
    // pulses act as one 18 us pulse of 18 (18e-6)^0.75 J/m2 (Table 2.2), N = 2.5e5/18 groups.
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.pulseTrain(532e-9, 1e-12, 1e-9, 1e6), 0.25).get();
    double groups = 0.25e6 / 18;
    assertEquals(
        18 * Math.pow(18e-6, 0.75) * Math.pow(groups, -0.25) / 18, m.repetitivePulse(), 1e-12);
  }

  @Test
  void outsideTheTablesIsNotEvaluated() {
    Outcome<MaximumPermissibleExposure> uvc =
        DirectiveEyeLimit.at(Emission.continuous(150e-9, 1), 1);
    assertFalse(uvc.evaluated());
    assertTrue(uvc.reason().contains("180 nm to 1 mm"), uvc.reason());
    assertFalse(DirectiveEyeLimit.at(Emission.singlePulse(532e-9, 1e-9, 1e-14), 1).evaluated());
    assertFalse(DirectiveEyeLimit.at(Emission.continuous(532e-9, 1), 4e4).evaluated());
  }

  @Test
  void everyAnswerCarriesTheCaution() {
    assertEquals(
        Outcome.CAUTION, DirectiveEyeLimit.at(Emission.continuous(532e-9, 1e-3), 1).caution());
  }
}
