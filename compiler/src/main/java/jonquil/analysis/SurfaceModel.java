package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.optics.Fresnel;
import jonquil.optics.ThinFilm;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;
import org.apache.commons.math3.complex.Complex;

/**
 * The power reflectance and transmittance of one surface of an element, for s and p: bare
 * (Fresnel), with a specified residual reflectance ('ar 0.5 %', 'hr 99.9 %'), or with a declared
 * thin-film stack computed by the characteristic-matrix method.
 */
final class SurfaceModel {
  /** Power coefficients of a surface; amplitude phases matter only for bare reflections. */
  record Powers(double rs, double rp, double ts, double tp) {
    static Powers of(Fresnel.Coefficients c) {
      return new Powers(c.Rs(), c.Rp(), c.Ts(), c.Tp());
    }

    static Powers lossless(double r) {
      return new Powers(r, r, 1 - r, 1 - r);
    }
  }

  private final ResolvedModel model;
  private final MaterialModel materials;

  SurfaceModel(ResolvedModel model, MaterialModel materials) {
    this.model = model;
    this.materials = materials;
  }

  /**
   * The surface from medium n1 into n2 at an angle of incidence, with the element's coating if any.
   */
  Powers surface(ResolvedElement e, Complex n1, Complex n2, double aoi, double wavelength) {
    Optional<Value.Group> coating = e.param(Param.COATING);
    if (coating.isPresent()) {
      Optional<String> type = coating.get().word("type");
      if (type.isPresent()) {
        double r = coating.get().number("reflectance").orElse(0);
        return Powers.lossless(r);
      }
      if (coating.get().slot("stack").orElse(null) instanceof Value.Ref ref) {
        return Powers.of(ThinFilm.stack(n1, layers(ref.symbol(), wavelength), n2, aoi, wavelength));
      }
    }
    return Powers.of(Fresnel.at(n1, n2, aoi));
  }

  /** The layers of a declared coating; quarter-wave layers are sized at their design wavelength. */
  List<ThinFilm.Layer> layers(Symbol coating, double wavelength) {
    List<ThinFilm.Layer> out = new ArrayList<>();
    Optional<ResolvedElement> c = model.element(coating);
    if (c.isEmpty() || c.get().kind() != ElementKind.COATING) {
      return out;
    }
    for (Value.Group layer : c.get().all(Param.LAYER)) {
      if (!(layer.slot("material").orElse(null) instanceof Value.Ref ref)) {
        continue;
      }
      Complex n = materials.index(ref.symbol(), wavelength);
      double thickness;
      if (layer.number("thickness").isPresent()) {
        thickness = layer.number("thickness").getAsDouble();
      } else {
        // 'quarter at λ0' is a physical thickness: a quarter wave at normal incidence at λ0.
        double design = layer.number("wavelength").orElse(wavelength);
        thickness = design / (4 * materials.index(ref.symbol(), design).getReal());
      }
      out.add(new ThinFilm.Layer(n, thickness));
    }
    return out;
  }
}
