package jonquil.optics;

import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/**
 * Beams of one laser line meeting again. Their fields add as amplitudes, so the power is P = Σ Pk +
 * 2 Σ_{j<k} Re(Ej†Ek e^{ik₀(Lk − Lj)}) |γ(Lk − Lj)| (Born &amp; Wolf, Principles of Optics, 7th
 * ed., §10.3, the interference law for partially coherent light, with the polarization held in the
 * inner product Ej†Ek); for two beams the fringe visibility is V = 2√(P1P2)/(P1 + P2) · |E1†E2|/
 * √(P1P2) · |γ|, the product of power balance, polarization overlap and coherence factor. Beams of
 * different lines never interfere (they are separate calls), nor do the two orthogonal polarized
 * parts of partially polarized light (they pair only with themselves in {@link Beam#cross}).
 */
public final class Interference {
  private Interference() {}

  /**
   * One beam (one arm) arriving at the meeting point: the optical path it travelled from the source
   * (metres, vacuum-equivalent: Σ n·d) and its field, as the line's mutually incoherent polarized
   * parts after that path ({@link Coherency#polarizedParts()}: one part for fully polarized light,
   * two for partially polarized light). Both parts of one arm share its path, so the phase between
   * two arms is common to them: the cross term of arms j and k is Σp Ejp†Ekp.
   */
  public record Beam(List<JonesVector> parts, double opticalPath) {
    public Beam {
      parts = List.copyOf(parts);
      if (parts.isEmpty() || !Double.isFinite(opticalPath)) {
        throw new IllegalArgumentException("a beam needs a field and a finite optical path");
      }
    }

    /** A beam of fully polarized light. */
    public Beam(JonesVector field, double opticalPath) {
      this(List.of(field), opticalPath);
    }

    public double power() {
      double p = 0;
      for (JonesVector v : parts) {
        p += v.power();
      }
      return p;
    }

    /** Σp this_p† o_p, in watts: the mutual intensity of two arms (parts pair by index). */
    public Complex cross(Beam o) {
      Complex sum = Complex.ZERO;
      for (int i = 0; i < Math.min(parts.size(), o.parts.size()); i++) {
        sum = sum.add(parts.get(i).inner(o.parts.get(i)));
      }
      return sum;
    }
  }

  /** |a†b|/(|a||b|) in [0, 1]: 1 for the same state, 0 for orthogonal ones and for no light. */
  public static double polarizationOverlap(JonesVector a, JonesVector b) {
    double pa = a.power();
    double pb = b.power();
    if (pa <= 0 || pb <= 0) {
      return 0;
    }
    return Math.min(1, a.inner(b).abs() / Math.sqrt(pa * pb));
  }

  /** 2√(P1P2)/(P1 + P2): 1 for equal powers, 0 when either beam is dark. */
  public static double powerBalance(double p1, double p2) {
    return p1 + p2 > 0 ? Math.min(1, 2 * Math.sqrt(p1 * p2) / (p1 + p2)) : 0;
  }

  /** The fringe visibility of two beams given the modulus of their coherence factor. */
  public static double visibility(JonesVector a, JonesVector b, double coherenceFactor) {
    return powerBalance(a.power(), b.power())
        * polarizationOverlap(a, b)
        * Math.abs(coherenceFactor);
  }

  /**
   * The fringe visibility of two arms, 2|Σp E1p†E2p||γ|/(P1 + P2), partial polarization included.
   */
  public static double visibility(Beam a, Beam b, double coherenceFactor) {
    double sum = a.power() + b.power();
    return sum > 0 ? Math.min(1, 2 * a.cross(b).abs() * Math.abs(coherenceFactor) / sum) : 0;
  }

  /**
   * The visibility of two beams that left one partially polarized source (coherency Φ0) through
   * paths J1 and J2: 2|tr(J1†J2Φ0)||γ|/(P1 + P2), with P = tr(JΦ0J†).
   */
  public static double visibility(Coherency source, Jones path1, Jones path2, double factor) {
    double p1 = source.transform(path1).power();
    double p2 = source.transform(path2).power();
    if (p1 + p2 <= 0) {
      return 0;
    }
    return Math.min(
        1, 2 * mutualIntensity(source, path1, path2).abs() * Math.abs(factor) / (p1 + p2));
  }

  /**
   * ⟨E1†E2⟩ = tr(J1†J2Φ0), in watts: the cross term of two paths from one source, the mutual
   * coherency matrix's trace (it reduces to E1†E2 for a fully polarized source).
   */
  public static Complex mutualIntensity(Coherency source, Jones path1, Jones path2) {
    Jones m = path1.dagger().times(path2);
    Complex xy = new Complex(source.xyRe(), source.xyIm());
    // tr(MΦ) with Φ = [[xx, xy], [xy*, yy]]
    return m.a()
        .multiply(source.xx())
        .add(m.b().multiply(xy.conjugate()))
        .add(m.c().multiply(xy))
        .add(m.d().multiply(source.yy()));
  }

  /**
   * The power of the beams together over every relative phase (a spec's distances are never known
   * to a fraction of a wavelength). Each coherent pair swings the power by ±2|Ej†Ek||γ|; a line
   * with no stated coherence is taken at |γ| ≤ 1, which only widens the range. With at most one
   * interfering pair the range is exact; with more it encloses every phase.
   */
  public static PowerRange range(List<Beam> beams, TemporalCoherence line) {
    double incoherent = 0;
    for (Beam b : beams) {
      incoherent += b.power();
    }
    double swing = 0;
    int pairs = 0;
    for (int j = 0; j < beams.size(); j++) {
      for (int k = j + 1; k < beams.size(); k++) {
        Beam a = beams.get(j);
        Beam b = beams.get(k);
        double term = 2 * a.cross(b).abs() * line.factorAtMost(b.opticalPath() - a.opticalPath());
        if (term > 0) {
          swing += term;
          pairs++;
        }
      }
    }
    double min = darkest(incoherent, swing);
    return new PowerRange(min, incoherent + swing, incoherent, pairs <= 1);
  }

  /** Beams of one line above which {@link #range} is not summed pair by pair (a loop's trips). */
  public static final int MOST_PAIRS_SUMMED = 64;

  /**
   * A range that holds whatever the polarization of each beam: each pair swings the power by at
   * most 2√(PjPk)|γ| (Cauchy–Schwarz: |⟨Ej†Ek⟩| ≤ √(PjPk), definition of the mutual intensity's
   * bound), with |γ| ≤ 1 over more than {@link #MOST_PAIRS_SUMMED} beams, where the sum is (Σ√Pk)²
   * − ΣPk. Never exact: it may be wider than the truth.
   */
  public static PowerRange enclosure(List<Beam> beams, TemporalCoherence line) {
    double incoherent = 0;
    double roots = 0;
    for (Beam b : beams) {
      incoherent += b.power();
      roots += Math.sqrt(b.power());
    }
    double swing = 0;
    if (beams.size() > MOST_PAIRS_SUMMED) {
      swing = Math.max(0, roots * roots - incoherent);
    } else {
      for (int j = 0; j < beams.size(); j++) {
        for (int k = j + 1; k < beams.size(); k++) {
          Beam a = beams.get(j);
          Beam b = beams.get(k);
          swing +=
              2
                  * Math.sqrt(a.power() * b.power())
                  * line.factorAtMost(b.opticalPath() - a.opticalPath());
        }
      }
    }
    return new PowerRange(darkest(incoherent, swing), incoherent + swing, incoherent, false);
  }

  /**
   * The dark end of a range: a swing within rounding of the incoherent sum (the sums of a beam's
   * powers along different routes) is a fully dark fringe, not a few attowatts.
   */
  private static double darkest(double incoherent, double swing) {
    return incoherent - swing <= 1e-12 * incoherent ? 0 : incoherent - swing;
  }

  /**
   * The power when the optical paths are known to a fraction of a wavelength (a fixed path
   * difference): exact, with the phase k₀ΔL of each pair at the vacuum {@code wavelength}; empty
   * when a pair's coherence factor is unknown.
   */
  public static OptionalDouble power(List<Beam> beams, double wavelength, TemporalCoherence line) {
    double total = 0;
    for (Beam b : beams) {
      total += b.power();
    }
    double k0 = 2 * Math.PI / wavelength;
    for (int j = 0; j < beams.size(); j++) {
      for (int k = j + 1; k < beams.size(); k++) {
        Beam a = beams.get(j);
        Beam b = beams.get(k);
        double dl = b.opticalPath() - a.opticalPath();
        OptionalDouble gamma = line.factor(dl);
        if (gamma.isEmpty()) {
          return OptionalDouble.empty();
        }
        // Arm k's field carries e^{ik₀Lk}: the pair's phase is k₀ΔL, common to every part.
        Complex cross = a.cross(b).multiply(new Complex(Math.cos(k0 * dl), Math.sin(k0 * dl)));
        total += 2 * cross.getReal() * gamma.getAsDouble();
      }
    }
    // Rounding may leave a dark port a few ulps below zero; power cannot be.
    return OptionalDouble.of(Math.max(0, total));
  }
}
