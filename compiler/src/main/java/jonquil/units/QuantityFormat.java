package jonquil.units;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Turns SI values back into the units people read ("500 mW", "1064 nm", "1 kW/cm²"), so that SI
 * stays inside and diagnostics speak the author's language. Every printed unit is one {@link
 * UnitParser} reads back.
 */
public final class QuantityFormat {
  private QuantityFormat() {}

  /** The value in the unit and prefix the trade would use, to four significant digits. */
  public static String format(double si, Dimension dim) {
    Objects.requireNonNull(dim, "dim");
    return choose(si, dim).render(si);
  }

  /**
   * The same value in other common units, for hovers and messages ("W" and "dBm" for a power,
   * "W/cm²" and "W/m²" for an irradiance). Never repeats what {@link #format} prints; omits units
   * in which the number would be unreadably large or small, except the coherent SI unit.
   */
  public static List<String> alternatives(double si, Dimension dim) {
    Objects.requireNonNull(dim, "dim");
    String primary = format(si, dim);
    Set<String> out = new LinkedHashSet<>();
    List<DisplayUnit> ladder = DisplayLadders.BY_DIMENSION.get(dim);
    DisplayUnit coherent = ladder == null ? DisplayLadders.coherent(dim) : coherentOf(dim, ladder);
    out.add(coherent.render(si));
    for (DisplayUnit u : extras(dim)) {
      double shown = Math.abs((si - u.offset()) / u.factor());
      if (u.offset() != 0 || si == 0 || (shown >= 1e-3 && shown < 1e6)) {
        out.add(u.render(si));
      }
    }
    if (dim.equals(Dimension.POWER) && si > 0) {
      out.add(NumberText.format(10 * Math.log10(si / 1e-3)) + " dBm");
    }
    if (dim.isDimensionless() && si > 0) {
      out.add(NumberText.format(10 * Math.log10(si)) + " dB");
      out.add("OD " + NumberText.format(-Math.log10(si)));
    }
    out.remove(primary);
    return List.copyOf(out);
  }

  private static DisplayUnit choose(double si, Dimension dim) {
    List<DisplayUnit> ladder = DisplayLadders.BY_DIMENSION.get(dim);
    if (ladder == null) {
      return DisplayLadders.coherent(dim);
    }
    // Decide on the rounded value, so 0.99996 W prints "1 W" rather than "1000 mW".
    double magnitude = Math.abs(NumberText.round(si));
    if (magnitude == 0 || !Double.isFinite(magnitude)) {
      // Angles are written in degrees on a bench; "0 rad" beside "2°" reads as a unit mix-up.
      return dim.equals(Dimension.ANGLE) ? ladder.get(0) : coherentOf(dim, ladder);
    }
    for (DisplayUnit u : ladder) {
      if (magnitude >= u.from()) {
        return u;
      }
    }
    return ladder.get(ladder.size() - 1);
  }

  /** The ladder's rung with factor 1 (the coherent SI unit), or the generic base-unit form. */
  private static DisplayUnit coherentOf(Dimension dim, List<DisplayUnit> ladder) {
    DisplayUnit named = DisplayLadders.COHERENT_NAMES.get(dim);
    if (named != null) {
      return named;
    }
    for (DisplayUnit u : ladder) {
      if (u.factor() == 1 && u.offset() == 0) {
        return u;
      }
    }
    return DisplayLadders.coherent(dim);
  }

  private static List<DisplayUnit> extras(Dimension dim) {
    List<DisplayUnit> out = new ArrayList<>();
    if (dim.equals(Dimension.LENGTH)) {
      out.addAll(
          List.of(
              DisplayUnit.of("mm", 1e-3), DisplayUnit.of("µm", 1e-6), DisplayUnit.of("nm", 1e-9)));
    } else if (dim.equals(Dimension.AREA)) {
      out.addAll(
          List.of(
              DisplayUnit.of("cm²", 1e-4),
              DisplayUnit.of("mm²", 1e-6),
              DisplayUnit.of("µm²", 1e-12)));
    } else if (dim.equals(Dimension.INVERSE_LENGTH)) {
      out.addAll(List.of(DisplayUnit.of("/m", 1), DisplayUnit.of("/mm", 1e3)));
    } else if (dim.equals(Dimension.POWER)) {
      out.addAll(List.of(DisplayUnit.of("mW", 1e-3), DisplayUnit.of("kW", 1e3)));
    } else if (dim.equals(Dimension.ENERGY)) {
      out.addAll(
          List.of(
              DisplayUnit.of("mJ", 1e-3),
              DisplayUnit.of("µJ", 1e-6),
              DisplayUnit.of("eV", UnitCatalog.lookup("eV").orElseThrow().unit().factor())));
    } else if (dim.equals(Dimension.TIME)) {
      out.addAll(
          List.of(
              DisplayUnit.of("ms", 1e-3),
              DisplayUnit.of("µs", 1e-6),
              DisplayUnit.of("ns", 1e-9),
              DisplayUnit.of("ps", 1e-12),
              DisplayUnit.of("fs", 1e-15),
              DisplayUnit.of("min", 60),
              DisplayUnit.of("h", 3600)));
    } else if (dim.equals(Dimension.FREQUENCY)) {
      out.addAll(
          List.of(
              DisplayUnit.of("kHz", 1e3),
              DisplayUnit.of("MHz", 1e6),
              DisplayUnit.of("GHz", 1e9),
              DisplayUnit.of("THz", 1e12)));
    } else if (dim.equals(Dimension.ANGLE)) {
      out.addAll(
          List.of(
              DisplayLadders.DEGREE, DisplayUnit.of("mrad", 1e-3), DisplayUnit.of("µrad", 1e-6)));
    } else if (dim.equals(Dimension.IRRADIANCE)) {
      out.addAll(
          List.of(
              DisplayUnit.of("W/cm²", 1e4),
              DisplayUnit.of("kW/cm²", 1e7),
              DisplayUnit.of("MW/cm²", 1e10)));
    } else if (dim.equals(Dimension.FLUENCE)) {
      out.addAll(List.of(DisplayUnit.of("J/cm²", 1e4), DisplayUnit.of("mJ/cm²", 1e1)));
    } else if (dim.equals(Dimension.LINEAR_POWER_DENSITY)) {
      out.add(DisplayUnit.of("W/cm", 1e2));
    } else if (dim.equals(Dimension.ELECTRIC_FIELD)) {
      out.addAll(
          List.of(
              DisplayUnit.of("V/cm", 1e2),
              DisplayUnit.of("kV/cm", 1e5),
              DisplayUnit.of("MV/m", 1e6)));
    } else if (dim.equals(Dimension.TEMPERATURE)) {
      out.add(new DisplayUnit("°C", 1, 273.15, 0, true));
      out.add(new DisplayUnit("°F", 5.0 / 9, 273.15 - 32.0 * 5 / 9, 0, true));
    } else if (dim.isDimensionless()) {
      out.addAll(List.of(DisplayUnit.of("%", 1e-2), DisplayUnit.of("ppm", 1e-6)));
    }
    return out;
  }
}
