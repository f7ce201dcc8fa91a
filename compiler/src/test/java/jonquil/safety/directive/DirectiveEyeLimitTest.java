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
 * per band and pulse regime, each worked by hand from the row it names and the Table 2.5 factors.
 * [FR]: the row was read in the directive's tables as restated, numbering and all, by the French
 * transposition (Code du travail, Annexe II on laser radiation; see {@link AnnexII}); Table 2.3
 * could not be read there, so its rows are "from memory" here as in {@link AnnexII}.
 */
class DirectiveEyeLimitTest {

  @ParameterizedTest(name = "{0} nm, single pulse {1} s: {2} J/m2 ({4})")
  @CsvSource({
    // nm, t (s), H (J/m2), aperture (mm), table row [FR] and working
    "193,   1e-8,  30,       1,   Table 2.2 row 180-280 nm 1e-9-10 s: H = 30",
    "302.7, 1,     30,       1.5, Table 2.2 row 280-302 nm (note a: the stricter of 302 and 303"
        + " nm)",
    "355,   1e-12, 0.03,     1,   Table 2.2 row 180-400 nm below 1 ns: E = 3e10 W/m2 x 1e-12 s",
    "308,   1e-8,  56,       1,   Table 2.2 row 308 nm t < 2.6e-5 s: 5.6e3 t^0.25",
    "308,   1,     400,      1.5, Table 2.2 row 308 nm t >= 2.6e-5 s: H = 400",
    "304,   1,     60,       1.5, Table 2.2 row 304 nm t >= 1.3e-8 s: H = 60",
    "304.6, 1,     60,       1.5, Table 2.2 row 304 nm (note a: the stricter of 304 and 305 nm)",
    "314,   1,     5600,     1.5, Table 2.2 row 314 nm t < 1.6 s: 5.6e3 x 1^0.25",
    "314,   5,     6300,     2.74287, Table 2.2 row 314 nm t >= 1.6 s: H = 6.3e3; 1.5 x 5^0.375 mm",
    "355,   1e-8,  56,       1,   Table 2.2 row 315-400 nm: 5.6e3 t^0.25",
    "532,   1e-12, 1.5e-4,   7,   Table 2.2 row 400-700 nm 1e-13-1e-11 s: 1.5e-4",
    "532,   1e-10, 8.538e-4, 7,   Table 2.2 row 400-700 nm 1e-11-1e-9 s: 2.7e4 t^0.75",
    "532,   1e-8,  5e-3,     7,   Table 2.2 row 400-700 nm 1e-9-1.8e-5 s: 5e-3",
    "532,   1e-3,  0.10122,  7,   Table 2.2 row 400-700 nm 1.8e-5-10 s: 18 t^0.75",
    "808,   1e-8,  8.2219e-3, 7,  Table 2.2 row 700-1050 nm: 5e-3 C_A with C_A = 10^0.216 (Table"
        + " 2.5)",
    "808,   1e-12, 2.4666e-4, 7,  Table 2.2 row 700-1050 nm 1e-13-1e-11 s: 1.5e-4 C_A",
    "1050,  1e-8,  0.025059, 7,   Table 2.2 note a at 1050 nm: 5e-3 C_A(1050) below 5e-2 C_C",
    "1064,  1e-8,  0.05,     7,   Table 2.2 row 1050-1400 nm 1e-9-5e-5 s: 5e-2 C_C",
    "1064,  1e-3,  0.50610,  7,   Table 2.2 row 1050-1400 nm 5e-5-10 s: 90 t^0.75 C_C",
    "1180,  1e-3,  1.75486,  7,   Table 2.2 row 1050-1400 nm: 90 t^0.75 C_C, C_C = 10^0.54 (2.5)",
    "1300,  1e-8,  0.4,      7,   Table 2.2 row 1050-1400 nm: 5e-2 C_C with C_C = 8 (Table 2.5)",
    "1400,  1e-8,  0.4,      7,   Table 2.2 note a at 1400 nm: 5e-2 x 8 below the 1e3 of 1400-1500",
    "1450,  1e-6,  1000,     1,   Table 2.2 row 1400-1500 nm 1e-9-1e-3 s: 1e3",
    "1450,  0.3,   4144.5,   1,   Table 2.2 row 1400-1500 nm: 5.6e3 t^0.25; note b: 1 mm to 0.3 s",
    "1550,  1e-8,  1e4,      1,   Table 2.2 row 1500-1800 nm 1e-9-10 s: 1e4",
    "1550,  1e-12, 10,       1,   Table 2.2 row 1500-1800 nm below 1 ns: E = 1e13 W/m2",
    "1800,  1e-6,  1000,     1,   Table 2.2 note a at 1800 nm: 1e3 of 1800-2600 below 1e4",
    "2000,  1,     5600,     1.5, Table 2.2 row 1800-2600 nm 1e-3-10 s: 5.6e3 t^0.25; note b",
    "10600, 1e-8,  100,      1,   Table 2.2 row 2600 nm-1e6 nm 1e-9-1e-7 s: 100",
    "10600, 1e-5,  314.91,   1,   Table 2.2 row 2600 nm-1e6 nm 1e-7-10 s: 5.6e3 t^0.25",
    "10600, 1e-12, 0.1,      1,   Table 2.2 row 2600 nm-1e6 nm below 1 ns: E = 1e11 W/m2",
    "500000, 1e-5, 314.91,   11,  Table 2.2 row 2600 nm-1e6 nm; note b: 11 mm from 1e5 nm"
  })
  void singlePulses(double nm, double t, double h, double apertureMm, String table) {
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.singlePulse(nm * 1e-9, 1e-9, t), 1).get();
    assertEquals(h, m.radiantExposure(), h * 1e-4, table);
    assertEquals(apertureMm * 1e-3, m.apertureDiameter(), 1e-6, table);
    assertTrue(m.table().contains("Table 2.2"), m.table());
  }

  @ParameterizedTest(name = "{0} nm, continuous over {1} s: {2} W/m2 ({3})")
  @CsvSource({
    // nm, T (s), E (W/m2), table row and working ([FR] for Table 2.2; Table 2.3 from memory)
    "266,   100,   0.3,    Table 2.3 UV-C 180-302 nm (from memory): H = 30 J/m2 over 100 s",
    "308,   100,   4,      Table 2.3 row 308 nm (from memory): H = 400 J/m2 over 100 s",
    "355,   100,   100,    Table 2.3 UV-A 10-1e3 s (from memory): H = 1e4 J/m2 over 100 s",
    "355,   1e4,   10,     Table 2.3 UV-A 1e3-3e4 s (from memory): E = 10",
    "355,   2,     3329.78, Table 2.2 row 315-400 nm [FR]: 5.6e3 x 2^0.25 J/m2 over 2 s",
    "532,   0.25,  25.456, Table 2.2 row 400-700 nm [FR]: 18 t^0.75 J/m2 over 0.25 s",
    "532,   100,   10,     Table 2.3 visible thermal (from memory): E = 10 C_A C_C",
    "450,   100,   1,      Table 2.3 photochemical 400-600 nm (from memory): E = 1 C_B",
    "450,   50,    2,      Table 2.3 photochemical 10-100 s (from memory): H = 100 C_B over 50 s",
    "500,   1e3,   10,     Table 2.3 (from memory) with C_B(500) = 10 (Table 2.5 [FR]): E = 10",
    "808,   100,   16.444, Table 2.3 IR-A thermal (from memory): E = 10 C_A, C_A = 10^0.216",
    "1064,  100,   50,     Table 2.3 IR-A 1050-1400 nm (from memory): E = 10 C_A C_C, C_A = 5",
    "1550,  100,   1000,   Table 2.3 IR-B (from memory): E = 1000",
    "1550,  5,     2000,   Table 2.2 row 1500-1800 nm [FR]: H = 1e4 J/m2 over 5 s",
    "10600, 3e4,   1000,   Table 2.3 IR-C (from memory): E = 1000"
  })
  void continuousWave(double nm, double t, double e, String table) {
    Outcome<MaximumPermissibleExposure> o =
        DirectiveEyeLimit.at(Emission.continuous(nm * 1e-9, 1e-3), t);
    assertEquals(e, o.get().irradiance(), e * 1e-4, table);
    assertTrue(o.standard().contains(t < 10 ? "Table 2.2" : "Table 2.3"), o.standard());
  }

  @Test
  void eachUltravioletBRowHandsOverWhereTheThermalLimitMeetsItsDose() {
    // Table 2.2 rows 303-314 nm [FR]: below T1 the row reads 5.6e3 t^0.25, from T1 its dose; the
    // table rounds both, so the two meet at T1 within 0.5 %.
    for (AnnexII.UltravioletBRow row : AnnexII.ULTRAVIOLET_B_ROWS) {
      assertEquals(1, AnnexII.c1(row.t1()) / row.dose(), 0.005, row.nm() + " nm");
    }
    assertEquals(12, AnnexII.ULTRAVIOLET_B_ROWS.size());
    assertEquals(303, AnnexII.ULTRAVIOLET_B_ROWS.get(0).nm());
    assertEquals(314, AnnexII.ULTRAVIOLET_B_ROWS.get(11).nm());
  }

  @ParameterizedTest(name = "{0}({1} nm) = {2} ({3})")
  @CsvSource({
    // factor, nm, value, Table 2.5 row [FR] and working
    "C_A, 650,  1,       Table 2.5 C_A below 700 nm: 1",
    "C_A, 808,  1.64437, Table 2.5 C_A 700-1050 nm: 10^(0.002 x 108)",
    "C_A, 1200, 5,       Table 2.5 C_A 1050-1400 nm: 5",
    "C_B, 420,  1,       Table 2.5 C_B 400-450 nm: 1",
    "C_B, 500,  10,      Table 2.5 C_B 450-700 nm: 10^(0.02 x 50)",
    "C_C, 1064, 1,       Table 2.5 C_C 700-1150 nm: 1",
    "C_C, 1175, 2.81838, Table 2.5 C_C 1150-1200 nm: 10^(0.018 x 25)",
    "C_C, 1300, 8,       Table 2.5 C_C 1200-1400 nm: 8",
    "T_1, 430,  10,      Table 2.5 T_1 below 450 nm: 10 s",
    "T_1, 475,  31.6228, Table 2.5 T_1 450-500 nm: 10 x 10^(0.02 x 25) s",
    "T_1, 600,  100,     Table 2.5 T_1 above 500 nm: 100 s"
  })
  void tableTwoPointFiveFactors(String factor, double nm, double value, String row) {
    double actual =
        switch (factor) {
          case "C_A" -> AnnexII.cA(nm);
          case "C_B" -> AnnexII.cB(nm);
          case "C_C" -> AnnexII.cC(nm);
          case "T_1" -> AnnexII.t1Visible(nm);
          default -> throw new IllegalArgumentException(factor);
        };
    assertEquals(value, actual, value * 1e-5, row);
  }

  @ParameterizedTest(name = "T_min at {0} nm = {1} s")
  @CsvSource({
    // nm, T_min (s): Table 2.6 rows [FR], each band (lower, upper]
    "355,    1e-9",
    "400,    1e-9",
    "400.5,  18e-6",
    "1050,   18e-6",
    "1064,   50e-6",
    "1450,   1e-3",
    "1550,   10",
    "2000,   1e-3",
    "2600,   1e-3",
    "10600,  1e-7",
    "1000000, 1e-7"
  })
  void tableTwoPointSixTmin(double nm, double tMin) {
    // Directive 2006/25/EC Annex II Table 2.6, T_min rows [FR] (to 1800 nm also the 2019
    // consolidated text).
    assertEquals(tMin, AnnexII.tMin(nm), tMin * 1e-12, nm + " nm");
  }

  @Test
  void noTminUpTo315Nanometres() {
    // Table 2.6 [FR] starts at 315 < lambda: no T_min, so no rule 3 in the photochemical UV.
    assertTrue(Double.isNaN(AnnexII.tMin(315)));
    assertTrue(Double.isNaN(AnnexII.tMin(250)));
  }

  @Test
  void visibleT1IsTenTimesCb() {
    // Table 2.5 ([FR]; Norwegian §11-5): T1 = 10·10^(0.02(λ-450)) s for 450-500 nm, which is
    // 10 C_B, where 100 C_B J/m2 equals 10 W/m2 × t.
    for (double n = 450; n <= 500; n += 5) {
      assertEquals(10 * AnnexII.cB(n), AnnexII.t1Visible(n), 1e-9, "at " + n + " nm");
    }
  }

  @Test
  void aRepetitivelyPulsedNearInfraredLaserIsLimitedByRuleThree() {
    // 1064 nm, 100 us pulses at 100 Hz over 10 s: N = 1000 pulses, spacing 10 ms > T_min 50 us
    // (Table 2.6 row 1050-1400 nm [FR]). Table 2.2 row 1050-1400 nm [FR]: single pulse 90
    // (1e-4)^0.75 = 0.09 J/m2; Table 2.6 rule 3: x 1000^-0.25 = 0.1778 -> 0.016 J/m2; rule 2: 500
    // J/m2 / 1000 = 0.5 J/m2 (Table 2.3, from memory). Rule 3 governs.
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
    // 532 nm, 1 ns pulses at 1 MHz over 0.25 s: spacing 1 us < T_min 18 us (Table 2.6 row 400-1050
    // nm [FR]), so 18 pulses act as one 18 us pulse of 18 (18e-6)^0.75 J/m2 (Table 2.2 row 400-700
    // nm [FR]), N = 2.5e5/18 groups.
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.pulseTrain(532e-9, 1e-12, 1e-9, 1e6), 0.25).get();
    double groups = 0.25e6 / 18;
    assertEquals(
        18 * Math.pow(18e-6, 0.75) * Math.pow(groups, -0.25) / 18, m.repetitivePulse(), 1e-12);
  }

  @Test
  void aFifteenFiftyNanometreTrainWithinTminOfTenSecondsIsOneGroup() {
    // 1550 nm, 1 us pulses at 1 kHz over 100 s: spacing 1 ms < T_min = 10 s (Table 2.6 row
    // 1500-1800 nm [FR]), so each 10 s holds 1e4 pulses acting as one pulse of 10 s: H(10 s) = 1e4
    // J/m2 (Table 2.2 row 1500-1800 nm [FR] up to 10 s; Table 2.3's 1000 W/m2 x 10 s, from memory,
    // is the same), N = 10 groups, C_P = 10^-0.25 (Table 2.6 rule 3): per pulse 1e4 x 0.56234 /
    // 1e4 = 0.56234 J/m2. Rule 2 gives 1e5 J/m2 / 1e5 pulses = 1 J/m2, so rule 3 governs.
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.pulseTrain(1550e-9, 1e-6, 1e-6, 1e3), 100).get();
    assertEquals(0.562341, m.repetitivePulse(), 1e-5);
    assertTrue(m.limitingCriterion().startsWith("rule 3"), m.limitingCriterion());
  }

  @Test
  void aTwoMicronTrainWithinTminOfOneMillisecondIsGrouped() {
    // 2000 nm, 10 ns pulses at 100 kHz over 1 s: spacing 10 us < T_min = 1 ms (Table 2.6 row
    // 1800-2600 nm [FR]), so 100 pulses act as one 1 ms pulse of 5.6e3 (1e-3)^0.25 = 995.85 J/m2
    // (Table 2.2 row 1800-2600 nm [FR]); N = 1e5/100 = 1000 groups, C_P = 1000^-0.25 = 0.17783
    // (Table 2.6 rule 3): per pulse 995.85 x 0.17783 / 100 = 1.77088 J/m2.
    MaximumPermissibleExposure m =
        DirectiveEyeLimit.at(Emission.pulseTrain(2000e-9, 1e-9, 1e-8, 1e5), 1).get();
    assertEquals(1.77088, m.repetitivePulse(), 1e-4);
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
