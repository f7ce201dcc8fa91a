package jonquil.units;

import java.util.Map;

/**
 * Exponents of the SI base quantities, plus plane angle as a pseudo-base, so that a length written
 * where an angle belongs is caught instead of silently read as radians.
 *
 * <p>Luminous intensity and amount of substance are left out: no optical-train fact needs them, and
 * every extra axis is one more thing a reader of a diagnostic has to ignore.
 */
public record Dimension(int length, int mass, int time, int current, int temperature, int angle) {
  public static final Dimension DIMENSIONLESS = new Dimension(0, 0, 0, 0, 0, 0);
  public static final Dimension LENGTH = new Dimension(1, 0, 0, 0, 0, 0);
  public static final Dimension MASS = new Dimension(0, 1, 0, 0, 0, 0);
  public static final Dimension TIME = new Dimension(0, 0, 1, 0, 0, 0);
  public static final Dimension CURRENT = new Dimension(0, 0, 0, 1, 0, 0);
  public static final Dimension TEMPERATURE = new Dimension(0, 0, 0, 0, 1, 0);
  public static final Dimension ANGLE = new Dimension(0, 0, 0, 0, 0, 1);

  public static final Dimension AREA = LENGTH.pow(2);

  /** Length to the fourth power: the unit of the third Cauchy dispersion coefficient. */
  public static final Dimension LENGTH4 = LENGTH.pow(4);

  public static final Dimension INVERSE_LENGTH = LENGTH.pow(-1);
  public static final Dimension FREQUENCY = TIME.pow(-1);
  public static final Dimension ENERGY = MASS.times(AREA).divide(TIME.pow(2));
  public static final Dimension POWER = ENERGY.divide(TIME);
  public static final Dimension IRRADIANCE = POWER.divide(AREA);
  public static final Dimension FLUENCE = ENERGY.divide(AREA);
  public static final Dimension LINEAR_POWER_DENSITY = POWER.divide(LENGTH);
  public static final Dimension VOLTAGE = POWER.divide(CURRENT);
  public static final Dimension ELECTRIC_FIELD = VOLTAGE.divide(LENGTH);
  public static final Dimension RESPONSIVITY = CURRENT.divide(POWER);

  /** Force per area: the ambient air's pressure. */
  public static final Dimension PRESSURE = ENERGY.divide(LENGTH.pow(3));

  // Insertion order is irrelevant: dimensions are unique keys, so lookups never compete.
  private static final Map<Dimension, String> NAMES =
      Map.ofEntries(
          Map.entry(DIMENSIONLESS, "plain number (ratio)"),
          Map.entry(LENGTH, "length"),
          Map.entry(MASS, "mass"),
          Map.entry(TIME, "time"),
          Map.entry(CURRENT, "electric current"),
          Map.entry(TEMPERATURE, "temperature"),
          Map.entry(ANGLE, "angle"),
          Map.entry(AREA, "area"),
          Map.entry(LENGTH4, "length to the fourth power"),
          Map.entry(INVERSE_LENGTH, "inverse length (per length)"),
          Map.entry(FREQUENCY, "frequency"),
          Map.entry(ENERGY, "energy"),
          Map.entry(POWER, "power"),
          Map.entry(IRRADIANCE, "irradiance (power per area)"),
          Map.entry(FLUENCE, "fluence (energy per area)"),
          Map.entry(LINEAR_POWER_DENSITY, "power per length"),
          Map.entry(VOLTAGE, "voltage"),
          Map.entry(ELECTRIC_FIELD, "electric field strength"),
          Map.entry(RESPONSIVITY, "responsivity (current per power)"),
          Map.entry(PRESSURE, "pressure"));

  /** Base symbols in the order SI texts write coherent units (kg·m²·s⁻³·A⁻¹). */
  static final String[] BASE_SYMBOLS = {"kg", "m", "s", "A", "K", "rad"};

  public Dimension times(Dimension o) {
    return new Dimension(
        length + o.length,
        mass + o.mass,
        time + o.time,
        current + o.current,
        temperature + o.temperature,
        angle + o.angle);
  }

  public Dimension divide(Dimension o) {
    return times(o.pow(-1));
  }

  public Dimension pow(int n) {
    return new Dimension(length * n, mass * n, time * n, current * n, temperature * n, angle * n);
  }

  public boolean isDimensionless() {
    return equals(DIMENSIONLESS);
  }

  /** The exponents in {@link #BASE_SYMBOLS} order. */
  int[] exponents() {
    return new int[] {mass, length, time, current, temperature, angle};
  }

  /** A friendly English name where the trade has one, else the base-unit formula. */
  public String describe() {
    String name = NAMES.get(this);
    return name != null ? name : formula();
  }

  /** The coherent SI unit of this dimension in base symbols, e.g. "kg·m²·s⁻³". */
  public String formula() {
    if (isDimensionless()) {
      return "1";
    }
    StringBuilder out = new StringBuilder();
    int[] exps = exponents();
    for (int i = 0; i < exps.length; i++) {
      if (exps[i] == 0) {
        continue;
      }
      if (out.length() > 0) {
        out.append('·');
      }
      out.append(BASE_SYMBOLS[i]);
      if (exps[i] != 1) {
        out.append(Superscripts.of(exps[i]));
      }
    }
    return out.toString();
  }
}
