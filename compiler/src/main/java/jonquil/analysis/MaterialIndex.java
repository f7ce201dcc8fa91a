package jonquil.analysis;

import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import org.apache.commons.math3.complex.Complex;

/** The complex index n + iκ the analysis uses for a material, for editors that show it. */
public final class MaterialIndex {
  private MaterialIndex() {}

  public static Complex at(ResolvedModel model, Symbol material, double wavelength) {
    return new MaterialModel(model).index(material, wavelength);
  }
}
