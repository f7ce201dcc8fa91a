package jonquil.ide;

import java.util.List;
import java.util.Optional;
import jonquil.analysis.PortJones;
import jonquil.analysis.SurfaceAtAngle;
import jonquil.analysis.TrainSolution;
import jonquil.optics.Jones;
import jonquil.resolve.Ambient;
import jonquil.resolve.ElementKind;
import jonquil.units.Dimension;
import org.apache.commons.math3.complex.Complex;

/**
 * An element's Jones matrices and an interface's surface figures, as the analysis computed them.
 */
final class OpticsText {
  private OpticsText() {}

  /**
   * The surface figures and Jones matrices of the element; with {@code matricesPerLine} the
   * matrices are left to each line's own figures (LineText), as they differ from line to line.
   */
  static void append(
      StringBuilder md,
      Ambient ambient,
      Optional<TrainSolution> solution,
      String name,
      ElementKind kind,
      boolean matricesPerLine) {
    if (solution.isEmpty() || solution.get().incidentAt(name).isEmpty()) {
      return;
    }
    TrainSolution s = solution.get();
    s.surfaceOf(name).ifPresent(f -> surface(md, f, ambient));
    if (!matricesPerLine) {
      jones(md, s, name, kind);
    }
  }

  /** The Jones matrix behind each port of the element, at the wavelength of the solution. */
  static void jones(StringBuilder md, TrainSolution s, String name, ElementKind kind) {
    if (s.incidentAt(name).isEmpty()) {
      return;
    }
    if (kind == ElementKind.DEPOLARIZER) {
      MarkdownText.para(md)
          .append(
              "_No Jones matrix: a depolarizer mixes polarizations, which a Jones matrix cannot"
                  + " describe._");
      return;
    }
    List<PortJones> matrices = s.jonesOf(name, kind.ports());
    for (PortJones j : matrices) {
      MarkdownText.para(md)
          .append("**Jones matrix**, out ")
          .append(MarkdownText.code(j.port()))
          .append(" at ")
          .append(MarkdownText.q(j.wavelength(), Dimension.LENGTH))
          .append(" (the beam's own x/y frame; |J·E|² is the power out)\n\n");
      Jones m = j.matrix();
      md.append("| | from x | from y |\n|---|---|---|\n")
          .append("| to x | ")
          .append(complex(m.a(), m))
          .append(" | ")
          .append(complex(m.b(), m))
          .append(" |\n")
          .append("| to y | ")
          .append(complex(m.c(), m))
          .append(" | ")
          .append(complex(m.d(), m))
          .append(" |\n");
    }
  }

  private static void surface(StringBuilder md, SurfaceAtAngle f, Ambient ambient) {
    MarkdownText.para(md)
        .append("**Surface** at ")
        .append(MarkdownText.q(f.wavelength(), Dimension.LENGTH))
        .append(", AOI ")
        .append(MarkdownText.deg(f.aoi()))
        .append(": n₁ = ")
        .append(index(f.n1()))
        .append(" → n₂ = ")
        .append(index(f.n2()))
        .append(f.coated() ? " (with its coating)" : " (uncoated)")
        .append("\n\n");
    md.append("| Rs | Rp | Ts | Tp |\n|---|---|---|---|\n| ")
        .append(percent(f.rs()))
        .append(" | ")
        .append(percent(f.rp()))
        .append(" | ")
        .append(percent(f.ts()))
        .append(" | ")
        .append(percent(f.tp()))
        .append(" |\n\n");
    md.append("Brewster angle ")
        .append(
            f.brewster().isPresent() ? MarkdownText.deg(f.brewster().getAsDouble()) : "undefined")
        .append(
            f.critical().isPresent()
                ? ", critical angle " + MarkdownText.deg(f.critical().getAsDouble())
                : ", no critical angle (the far side is denser)")
        .append("; both from the bare indices\n\n")
        .append("The bench's ambient (the air side of every surface, and between elements) is ")
        .append(ambient.describe())
        .append(ambient.declared().isPresent() ? "" : ", the default")
        .append("\n");
  }

  private static String percent(double fraction) {
    return MarkdownText.num(Math.abs(fraction) < 1e-15 ? 0 : 100 * fraction) + " %";
  }

  private static String index(Complex n) {
    return Math.abs(n.getImaginary()) < 1e-12
        ? MarkdownText.num(n.getReal())
        : MarkdownText.num(n.getReal()) + " + " + MarkdownText.num(n.getImaginary()) + "i";
  }

  /**
   * One entry to four significant digits; parts below 1e-9 of the matrix's largest entry print as
   * zero.
   */
  private static String complex(Complex z, Jones m) {
    double scale = Math.max(Math.max(m.a().abs(), m.b().abs()), Math.max(m.c().abs(), m.d().abs()));
    double re = Math.abs(z.getReal()) < 1e-9 * scale ? 0 : z.getReal();
    double im = Math.abs(z.getImaginary()) < 1e-9 * scale ? 0 : z.getImaginary();
    if (im == 0) {
      return MarkdownText.num(re);
    }
    if (re == 0) {
      return MarkdownText.num(im) + "i";
    }
    return MarkdownText.num(re) + (im < 0 ? " - " : " + ") + MarkdownText.num(Math.abs(im)) + "i";
  }
}
