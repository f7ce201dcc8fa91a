package jonquil.optics.material;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * The refractive index of air after Ciddor (1996), which every relative-to-air index needs to
 * become absolute and which a spec's "air" medium is.
 *
 * <p>Source: P. E. Ciddor, "Refractive index of air: new equations for the visible and near
 * infrared", Applied Optics 35(9), 1566–1573 (1996), doi:10.1364/AO.35.001566. The wavelength is
 * the vacuum wavelength; the result is the absolute (phase) index. Stated validity: 230 nm to 1690
 * nm, −40 °C to 100 °C, 80 kPa to 120 kPa, 0 to 100 % relative humidity, 0 to 2000 ppm CO₂. The
 * steps follow the paper's appendix: the dispersion of standard air (dry, 15 °C, 101 325 Pa, 450
 * ppm CO₂) and its CO₂ correction, the dispersion of water vapour at 20 °C and 1333 Pa, the
 * densities of both from the BIPM equation of state with its compressibility Z, and the sum of the
 * two refractivities scaled by density. Saturation vapour pressure and the enhancement factor use
 * the constants given with the paper's procedure (the Davis 1992 / BIPM forms; attribution from
 * memory).
 */
public record CiddorAir(
    double temperatureKelvin, double pressurePascal, double relativeHumidity, double co2Ppm)
    implements Dispersion {

  /** Ciddor's stated wavelength range, 230 nm to 1690 nm. */
  public static final WavelengthRange RANGE = WavelengthRange.ofMicrometres(0.23, 1.69);

  /** ISO standard atmosphere pressure, the reference of every "standard air". */
  public static final double STANDARD_PRESSURE = 101_325;

  /** Ciddor's stated validity (abstract of the paper): −40 °C to 100 °C. */
  public static final double MIN_CELSIUS = -40;

  public static final double MAX_CELSIUS = 100;

  /** Ciddor's stated validity: 80 kPa to 120 kPa. */
  public static final double MIN_PRESSURE = 80_000;

  public static final double MAX_PRESSURE = 120_000;

  /** Ciddor's stated validity: 0 to 2000 ppm CO₂. */
  public static final double MAX_CO2_PPM = 2000;

  private static final double R = 8.314510; // J/(mol K), the value the paper uses
  private static final double K0 = 238.0185;
  private static final double K1 = 5_792_105;
  private static final double K2 = 57.362;
  private static final double K3 = 167_917;
  private static final double W0 = 295.235;
  private static final double W1 = 2.6422;
  private static final double W2 = -0.032380;
  private static final double W3 = 0.004028;
  private static final double MW = 0.018015; // kg/mol, water vapour

  public CiddorAir {
    double celsius = temperatureKelvin - 273.15;
    if (!(celsius >= MIN_CELSIUS && celsius <= MAX_CELSIUS)) {
      throw new IllegalArgumentException(
          "Ciddor's equations hold from -40 °C to 100 °C; got " + temperatureKelvin + " K");
    }
    if (!(pressurePascal >= MIN_PRESSURE && pressurePascal <= MAX_PRESSURE)) {
      throw new IllegalArgumentException(
          "Ciddor's equations hold from 80 kPa to 120 kPa; got " + pressurePascal + " Pa");
    }
    if (!(relativeHumidity >= 0 && relativeHumidity <= 1)) {
      throw new IllegalArgumentException(
          "relative humidity is a fraction from 0 to 1; got " + relativeHumidity);
    }
    if (!(co2Ppm >= 0 && co2Ppm <= MAX_CO2_PPM)) {
      throw new IllegalArgumentException("CO2 content must be 0 to 2000 ppm; got " + co2Ppm);
    }
  }

  /**
   * Ciddor's "standard air": dry, 15 °C, 101 325 Pa, 450 ppm CO₂, for which the first dispersion
   * formula holds as it stands.
   */
  public static CiddorAir standard() {
    return new CiddorAir(288.15, STANDARD_PRESSURE, 0, 450);
  }

  /**
   * Dry air with 450 ppm CO₂ at standard pressure and the given temperature: the reference for
   * relative indices.
   */
  public static CiddorAir dryAt(double temperatureKelvin) {
    return new CiddorAir(temperatureKelvin, STANDARD_PRESSURE, 0, 450);
  }

  @Override
  public Complex index(double wavelength) {
    return new Complex(1 + refractivity(wavelength), 0);
  }

  /** {@code n − 1} at the vacuum {@code wavelength} (metres). */
  public double refractivity(double wavelength) {
    Dispersion.requireWavelength(wavelength);
    double sigma = 1e-6 / wavelength; // wavenumber in 1/µm
    double s2 = sigma * sigma;
    double nas = 1e-8 * (K1 / (K0 - s2) + K3 / (K2 - s2));
    double naxs = nas * (1 + 0.534e-6 * (co2Ppm - 450));
    double nws = 1.022e-8 * (W0 + W1 * s2 + W2 * s2 * s2 + W3 * s2 * s2 * s2);

    double ma = 1e-3 * (28.9635 + 12.011e-6 * (co2Ppm - 400));
    double t = temperatureKelvin - 273.15;
    double xw = waterMoleFraction(t);

    double rhoAxs = 101_325 * ma / (compressibility(288.15, 101_325, 0) * R * 288.15);
    double rhoWs = 1333 * MW / (compressibility(293.15, 1333, 1) * R * 293.15);
    double z = compressibility(temperatureKelvin, pressurePascal, xw);
    double rhoA = pressurePascal * ma * (1 - xw) / (z * R * temperatureKelvin);
    double rhoW = pressurePascal * MW * xw / (z * R * temperatureKelvin);
    return rhoA / rhoAxs * naxs + rhoW / rhoWs * nws;
  }

  @Override
  public Optional<WavelengthRange> validRange() {
    return Optional.of(RANGE);
  }

  private double waterMoleFraction(double celsius) {
    if (relativeHumidity == 0) {
      return 0;
    }
    double svp;
    if (celsius >= 0) {
      double tk = temperatureKelvin;
      svp = Math.exp(1.2378847e-5 * tk * tk - 1.9121316e-2 * tk + 33.93711047 - 6.3431645e3 / tk);
    } else {
      svp = Math.pow(10, -2663.5 / temperatureKelvin + 12.537);
    }
    double enhancement = 1.00062 + 3.14e-8 * pressurePascal + 5.6e-7 * celsius * celsius;
    return enhancement * relativeHumidity * svp / pressurePascal;
  }

  /** Compressibility of moist air, BIPM form as given by Ciddor. */
  private static double compressibility(double tk, double p, double xw) {
    double t = tk - 273.15;
    double pt = p / tk;
    return 1
        - pt
            * (1.58123e-6
                - 2.9331e-8 * t
                + 1.1043e-10 * t * t
                + (5.707e-6 - 2.051e-8 * t) * xw
                + (1.9898e-4 - 2.376e-6 * t) * xw * xw)
        + pt * pt * (1.83e-11 - 0.765e-8 * xw * xw);
  }
}
