package jonquil.analysis;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.SafetyStandard;
import jonquil.resolve.ViewingTerms;
import jonquil.safety.Emission;
import jonquil.safety.ExposureDuration;
import jonquil.safety.ExtendedSource;
import jonquil.safety.Eyewear;
import jonquil.safety.MaximumPermissibleExposure;
import jonquil.safety.Nohd;
import jonquil.safety.OcularLimit;
import jonquil.safety.OpticalDensity;
import jonquil.safety.Outcome;
import jonquil.safety.ProtectionLevel;
import jonquil.safety.Viewing;

/**
 * The eye-safety figures of one requirement as its viewing says the light meets the eye: the direct
 * beam, a mirror-like reflection scaled by its reflectance, or a Lambertian reflection of the spot
 * at the place, with the exposure duration and the reason it was chosen.
 */
final class ViewingSafety {
  private ViewingSafety() {}

  /** Nearest distance the eye focuses, m: the default eye position for a diffuse spot. */
  static final double NEAREST_VIEWING = 0.1;

  /**
   * What a requirement assumes, every default named.
   *
   * @param viewing how the light meets the eye
   * @param duration the exposure duration and why
   * @param reflectance ρ of the reflector (1 for direct viewing)
   * @param subtense α of the apparent source for direct or specular viewing, rad
   * @param distance the eye's distance from a diffuse spot, m
   * @param text the assumptions, for findings
   */
  record Setting(
      Viewing viewing,
      ExposureDuration duration,
      double reflectance,
      OptionalDouble subtense,
      double distance,
      String text) {}

  /** The setting of a requirement at an element, for the light there. */
  static Setting setting(ViewingTerms terms, ResolvedElement element, PortValue at) {
    double wavelength = at.wavelength();
    Viewing v = terms.viewingOrDirect();
    OptionalDouble onElement = element.number(Param.EXPOSURE_TIME, "time");
    ExposureDuration d =
        terms
            .duration()
            .orElse(
                onElement.isPresent()
                    ? ExposureDuration.stated(
                        onElement.getAsDouble(),
                        "as 'exposure_time' on '" + element.symbol().name() + "'")
                    : ExposureDuration.byDefault(wavelength, v));
    StringBuilder text = new StringBuilder(v.description());
    double rho = 1;
    double distance = NEAREST_VIEWING;
    if (v != Viewing.DIRECT) {
      OptionalDouble onPart = element.number(Param.REFLECTANCE, "r");
      rho = terms.reflectance().orElse(onPart.orElse(1));
      text.append(
          terms.reflectance().isPresent()
              ? ", reflectance " + percent(rho)
              : onPart.isPresent()
                  ? ", reflectance "
                      + percent(rho)
                      + " (its 'reflectance' on '"
                      + element.symbol().name()
                      + "')"
                  : ", reflectance 100 % (not stated: the worst case)");
    }
    if (v == Viewing.DIFFUSE) {
      distance = terms.distance().orElse(NEAREST_VIEWING);
      text.append(
          terms.distance().isPresent()
              ? ", eye at " + number(distance) + " m from the spot"
              : ", eye at 0.1 m from the spot (not stated: the nearest distance the eye focuses,"
                  + " the worst case)");
    }
    terms
        .subtense()
        .ifPresent(a -> text.append(", apparent source " + number(a * 1e3) + " mrad (stated)"));
    text.append("; exposure duration ").append(d.text());
    if (at.pulses().isPresent() && at.pulses().get().single()) {
      // The tables judge a lone pulse over its own duration; say so rather than seem to use d.
      text.append(" (a single pulse: its MPE is that of the pulse's own duration)");
    }
    return new Setting(v, d, rho, terms.subtense(), distance, text.toString());
  }

  /** NOHD of the source for the setting's viewing, against {@code standard}'s ocular limit. */
  static Outcome<Double> nohd(SafetyStandard standard, PortValue exit, Setting s) {
    OcularLimit limit = SafetyModel.ocularLimit(standard);
    Emission e = SafetyModel.emission(exit.wavelength(), exit.power(), exit.pulses());
    if (s.viewing() == Viewing.DIFFUSE) {
      return Nohd.diffuse(limit, e, s.duration().seconds(), s.reflectance());
    }
    if (exit.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", standard.title());
    }
    var mode = exit.mode().get();
    return s.viewing() == Viewing.SPECULAR
        ? Nohd.specular(
            limit,
            e,
            2 * mode.radius(),
            2 * mode.divergence(),
            s.duration().seconds(),
            s.reflectance())
        : Nohd.of(limit, e, 2 * mode.radius(), 2 * mode.divergence(), s.duration().seconds());
  }

  /**
   * The exposure at the place as a fraction of {@code standard}'s ocular MPE, for the setting's
   * viewing.
   */
  static Outcome<Double> exposure(
      SafetyStandard standard, PortValue at, Setting s, double probeAperture) {
    double t = s.duration().seconds();
    if (s.viewing() == Viewing.DIFFUSE) {
      Outcome<Diffuse> d = diffuse(standard, at, s);
      return d.evaluated()
          ? Outcome.of(d.get().exposure / d.get().limit, d.standard())
          : Outcome.notEvaluated(d.reason(), d.standard());
    }
    Outcome<Double> direct =
        SafetyModel.mpeFraction(standard, at.wavelength(), at, t, probeAperture);
    if (!direct.evaluated()) {
      return direct;
    }
    ExtendedSource.Correction c = correction(at, s);
    return Outcome.of(direct.get() * s.reflectance() / c.c6(), direct.standard() + c6Note(c));
  }

  /** The OD needed at the place, for the setting's viewing, against {@code standard}'s limit. */
  static Outcome<OpticalDensity> eyewear(SafetyStandard standard, PortValue at, Setting s) {
    if (s.viewing() == Viewing.DIFFUSE) {
      Outcome<Diffuse> o = diffuse(standard, at, s);
      if (!o.evaluated()) {
        return Outcome.notEvaluated(o.reason(), o.standard());
      }
      Diffuse d = o.get();
      double density = od(d.exposure, d.limit);
      return Outcome.of(
          new OpticalDensity(density, density, d.exposure, d.exposure, d.limit), o.standard());
    }
    if (at.mode().isEmpty()) {
      return Outcome.notEvaluated(
          "the beam size is unknown: give the source a 'beam' line", standard.title());
    }
    Emission e = reflected(at, s);
    if (e == null) {
      return Outcome.of(new OpticalDensity(0, 0, 0, 0, 0), standard.title());
    }
    ExtendedSource.Correction c = correction(at, s);
    Outcome<OpticalDensity> od =
        Eyewear.required(
            SafetyModel.ocularLimit(standard),
            e,
            2 * at.mode().get().radius(),
            s.duration().seconds(),
            c.c6());
    return od.evaluated() ? Outcome.of(od.get(), od.standard() + c6Note(c)) : od;
  }

  /**
   * The EN 207 and EN 208 markings for the beam the eye meets (direct or specular), or why none is
   * given; empty text for diffuse viewing, where the selection tables do not apply.
   */
  static String markings(PortValue at, Setting s) {
    if (s.viewing() == Viewing.DIFFUSE || at.mode().isEmpty()) {
      return s.viewing() == Viewing.DIFFUSE
          ? "EN 207/EN 208 scale numbers are chosen for the direct beam: not given for diffuse"
              + " viewing"
          : "EN 207/EN 208 scale numbers need the beam size: not given";
    }
    Emission e = reflected(at, s);
    if (e == null) {
      return "no light reaches the eye: no EN 207/EN 208 scale number needed";
    }
    double d = 2 * at.mode().get().radius();
    Outcome<List<ProtectionLevel>> lb = Eyewear.en207(e, d);
    Outcome<ProtectionLevel> rb = Eyewear.en208(e, d);
    String en207 =
        lb.evaluated()
            ? String.join(" + ", lb.get().stream().map(ProtectionLevel::text).toList())
            : "EN 207: " + lb.reason() + " (" + lb.standard() + ")";
    String en208 =
        rb.evaluated() ? rb.get().text() : "none: " + rb.reason() + " (" + rb.standard() + ")";
    return "eyewear " + en207 + "; alignment eyewear " + en208;
  }

  /** The emission the eye meets: the beam at the place, scaled by the reflectance; null if none. */
  private static Emission reflected(PortValue at, Setting s) {
    double p = at.power() * s.reflectance();
    return p > 0 ? SafetyModel.emission(at.wavelength(), p, at.pulses()) : null;
  }

  private static ExtendedSource.Correction correction(PortValue at, Setting s) {
    if (s.subtense().isEmpty()) {
      return new ExtendedSource.Correction(1, 0, 0, "");
    }
    Emission e = SafetyModel.emission(at.wavelength(), Math.max(at.power(), 1e-30), at.pulses());
    return ExtendedSource.of(e, s.subtense().getAsDouble(), s.duration().seconds());
  }

  private static String c6Note(ExtendedSource.Correction c) {
    return c.note().isEmpty() ? "" : "; extended source, " + c.note();
  }

  private record Diffuse(double exposure, double limit) {}

  /**
   * The light a Lambertian spot at the place sends into the eye at the setting's distance r, along
   * the normal: E = ρ P/(π r²) (ρ Q/(π r²) per pulse), against the MPE raised by C6 for the spot's
   * subtense 2w/r (ANSI Z136.1-2014 and IEC TR 60825-14:2004, diffuse reflection; from memory).
   */
  private static Outcome<Diffuse> diffuse(SafetyStandard standard, PortValue at, Setting s) {
    double t = s.duration().seconds();
    Emission e = SafetyModel.emission(at.wavelength(), Math.max(at.power(), 1e-30), at.pulses());
    Outcome<MaximumPermissibleExposure> mpe = SafetyModel.ocularMpe(standard, e, t);
    String formula =
        "diffuse: E = rho P/(pi r^2), Lambertian, viewed along the normal (ANSI Z136.1-2014,"
            + " IEC TR 60825-14:2004; from memory); MPE: ";
    if (!mpe.evaluated()) {
      return Outcome.notEvaluated(mpe.reason(), formula + mpe.standard());
    }
    double r = s.distance();
    double q = at.pulses().isPresent() ? e.pulseEnergy() : at.power();
    double exposure = s.reflectance() * q / (Math.PI * r * r);
    double limit = e.pulsed() ? mpe.get().radiantExposure() : mpe.get().irradiance();
    String spot;
    double c6 = 1;
    if (at.mode().isPresent()) {
      double alpha = 2 * at.mode().get().radius() / r;
      ExtendedSource.Correction c = ExtendedSource.of(e, alpha, t);
      c6 = c.c6();
      spot = "; apparent source = the illuminated spot, " + c.note();
    } else {
      spot = "; spot size unknown: C6 = 1, conservative";
    }
    return Outcome.of(new Diffuse(exposure, limit * c6), formula + mpe.standard() + spot);
  }

  /** The limiting aperture the direct or specular exposure is averaged over, m. */
  static double limitingAperture(SafetyStandard standard, PortValue at, Setting s) {
    return SafetyModel.limitingAperture(standard, at.wavelength(), at, s.duration().seconds());
  }

  private static double od(double exposure, double limit) {
    return exposure <= limit ? 0 : Math.log10(exposure / limit);
  }

  private static String percent(double f) {
    return number(100 * f) + " %";
  }

  /** Four significant digits without trailing zeros. */
  private static String number(double v) {
    String s = String.format(Locale.ROOT, "%.4g", v);
    return s.contains(".") && !s.contains("e") ? s.replaceFirst("\\.?0+$", "") : s;
  }
}
