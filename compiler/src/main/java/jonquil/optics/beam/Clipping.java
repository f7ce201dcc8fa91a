package jonquil.optics.beam;

/**
 * Power a centred circular aperture passes from a Gaussian beam, so trains can flag apertures that
 * clip.
 */
public final class Clipping {
  private Clipping() {}

  /**
   * Loss above which clipping is reported: 1 %. This is a common rule of thumb rather than a
   * standard; an aperture of diameter π W (radius 1.57 W) passes about 99.3 % and stays below it.
   */
  public static final double SIGNIFICANT_LOSS = 0.01;

  /**
   * Fraction of a TEM00 beam of 1/e² radius {@code beamRadius} passed by a centred circular
   * aperture of diameter {@code apertureDiameter}: 1 − exp(−2a²/W²) with a = D/2. For a real beam
   * of M² &gt; 1 this treats the profile as Gaussian of the real radius, which is an approximation.
   */
  public static double transmittedFraction(double beamRadius, double apertureDiameter) {
    if (!(beamRadius > 0) || !Double.isFinite(beamRadius)) {
      throw new IllegalArgumentException("beam radius must be positive and finite: " + beamRadius);
    }
    if (!(apertureDiameter >= 0)) {
      throw new IllegalArgumentException(
          "aperture diameter must be non-negative: " + apertureDiameter);
    }
    // 2a²/W² with a = D/2 is D²/(2W²); −expm1 keeps precision for tiny apertures, where 1 − exp(−x)
    // would cancel.
    return -Math.expm1(-apertureDiameter * apertureDiameter / (2 * beamRadius * beamRadius));
  }

  /**
   * Aperture diameter that passes {@code fraction} of a beam of 1/e² radius {@code beamRadius}: the
   * inverse of {@link #transmittedFraction}.
   */
  public static double apertureFor(double beamRadius, double fraction) {
    if (!(beamRadius > 0) || !Double.isFinite(beamRadius)) {
      throw new IllegalArgumentException("beam radius must be positive and finite: " + beamRadius);
    }
    if (!(fraction >= 0 && fraction < 1)) {
      throw new IllegalArgumentException("fraction must be in [0, 1): " + fraction);
    }
    return 2 * beamRadius * Math.sqrt(-Math.log1p(-fraction) / 2);
  }

  /**
   * True when a transmitted {@code fraction} loses more than {@link #SIGNIFICANT_LOSS} of the
   * power.
   */
  public static boolean significant(double fraction) {
    if (!(fraction >= 0 && fraction <= 1)) {
      throw new IllegalArgumentException("fraction must be in [0, 1]: " + fraction);
    }
    return 1 - fraction > SIGNIFICANT_LOSS;
  }
}
