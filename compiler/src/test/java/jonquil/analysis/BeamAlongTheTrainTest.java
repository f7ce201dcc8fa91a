package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jonquil.Result;
import jonquil.diag.DiagnosticCode;
import org.junit.jupiter.api.Test;

/** The source's Gaussian mode carried along the train, and the exposure it gives. */
class BeamAlongTheTrainTest {
  @Test
  void aCollimatedBeamFocusesNearTheFocalPlaneToTheTextbookSpot() {
    // w_f ≈ λ f / (π w0) for a collimated TEM00 beam with z_R ≫ f
    // (Saleh & Teich, Fundamentals of Photonics, 2nd ed. 2007, §3.2, eq. 3.2-14 form). [section
    // numbers from memory]
    TrainSolution s =
        Bench.solve(
            """
            source s { wavelength 1064 nm; power 1 W; beam waist 2 mm }
            lens l { focal 100 mm }
            probe focus
            train t { s -> 10 mm -> l -> 100 mm -> focus }
            """);
    double expected = 1064e-9 * 0.1 / (Math.PI * 2e-3);
    double radius = s.port("focus").orElseThrow().exposure().orElseThrow().beamRadius();
    assertEquals(expected, radius, expected * 0.01);
  }

  @Test
  void theTrapCoverGlassSeesALowerPeakFieldThanTheAirBeforeIt() {
    // The optical trap's focus region: 3.2 kW/cm² at the cover glass (index 1.523, the sample's
    // cover_glass), first in the air before it, then inside it. A plane wave's irradiance is
    // I = n|E0|²/(2 Z0), so |E0| = √(2 I Z0 / n) (Saleh & Teich, Fundamentals of Photonics, 2nd
    // ed. 2007, §5.4, section number from memory), with the impedance of free space
    // Z0 = 376.730313668 Ω (CODATA 2018 recommended values, Tiesinga et al., Rev. Mod. Phys. 93,
    // 025010, 2021).
    double z0 = 376.730313668;
    double irradiance = 3.2e7; // 3.2 kW/cm²
    // √(2 · 3.2e7 · Z0) = 155.28 kV/m in air of index 1 (Saleh & Teich §5.4, as above).
    assertEquals(155_276.33, BeamExposure.peakField(irradiance, 1.0), 0.01);
    // √(2 · 3.2e7 · Z0 / 1.523) = 125.82 kV/m in the glass (Saleh & Teich §5.4, as above).
    assertEquals(125_821.63, BeamExposure.peakField(irradiance, 1.523), 0.01);
    assertEquals(
        Math.sqrt(2 * irradiance * z0 / 1.523), BeamExposure.peakField(irradiance, 1.523), 1e-6);
  }

  @Test
  void aGaussianPeakIsTwiceTheAverageIrradiance() {
    // I(0) = 2P/(πw²) for a Gaussian beam of 1/e² radius w (Siegman, Lasers, 1986, §17.1,
    // section number from memory); the average over πw² is P/(πw²) by definition.
    BeamExposure e = BeamExposure.of(1.0, 1e-3, java.util.Optional.empty(), 1);
    assertEquals(2 / (Math.PI * 1e-6), e.peakIrradiance(), 1e-6);
    assertEquals(e.peakIrradiance() / 2, e.averageIrradiance(), 1e-9);
  }

  @Test
  void pulsedExposureGivesEnergyPeakPowerAndFluence() {
    BeamExposure e = BeamExposure.of(10.0, 1e-3, java.util.Optional.of(new Pulses(10e3, 10e-9)), 1);
    // Definition: pulse energy = average power / repetition rate = 10 W / 10 kHz.
    assertEquals(1e-3, e.pulseEnergy().getAsDouble(), 1e-15);
    // Common practice for a rectangular pulse: peak power = energy / duration = 1 mJ / 10 ns.
    assertEquals(1e5, e.peakPower().getAsDouble(), 1e-6);
    // Peak fluence of a Gaussian spot, 2Q/(πw²): the spatial peak as in I(0) = 2P/(πw²) (Siegman,
    // Lasers, 1986, §17.1, section number from memory), with energy in place of power.
    assertEquals(2e-3 / (Math.PI * 1e-6), e.peakFluence().getAsDouble(), 1e-9);
  }

  @Test
  void anApertureOfTheBeamDiameterPassesEightySixPercentAndIsFlagged() {
    // 1 − e^{−2} of a Gaussian passes a circular aperture of its 1/e² diameter
    // (Saleh & Teich, Fundamentals of Photonics, 2nd ed. 2007, §3.1, section number from memory).
    Result r =
        Bench.check(
            """
            source s { wavelength 633 nm; power 1 W; beam waist 1 mm }
            aperture iris { diameter 2 mm }
            probe p
            train t { s -> 1 mm -> iris -> 1 mm -> p }
            """);
    TrainSolution s = r.solutions().values().iterator().next();
    assertEquals(1 - Math.exp(-2), s.port("p").orElseThrow().power(), 1e-4);
    assertTrue(r.diagnostics().stream().anyMatch(d -> d.code() == DiagnosticCode.APERTURE_CLIPS));
    assertTrue(s.conservationError() < 1e-9);
  }
}
