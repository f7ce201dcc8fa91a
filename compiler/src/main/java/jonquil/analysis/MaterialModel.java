package jonquil.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.diag.DiagnosticCode;
import jonquil.optics.material.CatalogMaterial;
import jonquil.optics.material.CiddorAir;
import jonquil.optics.material.MaterialCatalog;
import jonquil.optics.material.PhysicalIndex;
import jonquil.optics.material.TabulatedIndex;
import jonquil.optics.material.ThermoOptic;
import jonquil.optics.material.Uniaxial;
import jonquil.optics.material.WavelengthRange;
import jonquil.resolve.Ambient;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;
import org.apache.commons.math3.complex.Complex;

/**
 * Refractive indices of the spec's materials at a wavelength: declared ones from their parameters,
 * catalog ones from their published formulas (absolute indices). Records every use outside a
 * formula's valid range so the analysis can warn about it.
 */
final class MaterialModel {
  /** A material evaluated outside the wavelengths its data cover. */
  record OutOfRange(Symbol material, double wavelength, WavelengthRange valid) {}

  private static final Complex AIR_FALLBACK = new Complex(1.0, 0);

  private final ResolvedModel model;
  private final List<OutOfRange> outOfRange = new ArrayList<>();

  MaterialModel(ResolvedModel model) {
    this.model = model;
  }

  List<OutOfRange> outOfRange() {
    return outOfRange;
  }

  /** The complex index n + iκ of a medium; the ambient is the spec's (default: dry air). */
  Complex index(Medium medium, double wavelength) {
    return medium.material().map(m -> index(m, wavelength)).orElseGet(() -> ambient(wavelength));
  }

  /**
   * The ambient's index at a vacuum wavelength: Ciddor's air of the stated conditions, extrapolated
   * with the same equations outside 230-1690 nm as the catalog's relative indices are.
   */
  private Complex ambient(double wavelength) {
    Ambient a = model.ambient();
    return switch (a.fill()) {
      case VACUUM -> Complex.ONE;
      case AIR ->
          new CiddorAir(
                  a.temperatureKelvin(),
                  a.pressurePascal(),
                  a.relativeHumidity(),
                  a.co2Fraction() * 1e6)
              .index(wavelength);
    };
  }

  /**
   * As {@link #indexAsStated}, refusing an index that is not physical at this wavelength on the
   * material's line (a formula can pass resolution and still give n² < 0 or meet a pole).
   */
  Complex index(Symbol material, double wavelength) {
    Complex n = indexAsStated(material, wavelength);
    Optional<String> problem = PhysicalIndex.problem(n);
    if (problem.isPresent() && !material.isCatalog() && material.declaration().isPresent()) {
      throw new UnphysicalModel(
          DiagnosticCode.OUT_OF_RANGE,
          material.file(),
          material.declaration().get().range(),
          "material '"
              + material.name()
              + "' gives no physical index at "
              + QuantityFormat.format(wavelength, Dimension.LENGTH)
              + ": "
              + problem.get()
              + "; check its dispersion terms (a Sellmeier pole near this wavelength, or terms"
              + " that make n² negative)");
    }
    if (problem.isPresent()) {
      throw new IllegalStateException(
          "catalog material '" + material.name() + "' gives " + problem.get());
    }
    return n;
  }

  private Complex indexAsStated(Symbol material, double wavelength) {
    if (material.isCatalog()) {
      return catalogIndex(material.name(), material, wavelength);
    }
    Optional<ResolvedElement> e = model.element(material);
    if (e.isEmpty() || e.get().kind() != ElementKind.MATERIAL) {
      return AIR_FALLBACK;
    }
    ResolvedElement m = e.get();
    m.param(Param.VALID)
        .ifPresent(
            v -> {
              double low =
                  v.slot("from..to")
                      .filter(x -> x instanceof Value.Group)
                      .map(x -> ((Value.Group) x).number("low"))
                      .orElse(OptionalDouble.empty())
                      .orElse(0);
              double high =
                  v.slot("from..to")
                      .filter(x -> x instanceof Value.Group)
                      .map(x -> ((Value.Group) x).number("high"))
                      .orElse(OptionalDouble.empty())
                      .orElse(Double.POSITIVE_INFINITY);
              if (wavelength < low || wavelength > high) {
                outOfRange.add(
                    new OutOfRange(material, wavelength, new WavelengthRange(low, high)));
              }
            });
    Optional<Value.Group> catalog = m.param(Param.CATALOG);
    if (catalog.isPresent() && catalog.get().slot("name").orElse(null) instanceof Value.Ref ref) {
      OptionalDouble kelvin = m.number(Param.TEMPERATURE, "temperature");
      Optional<CatalogMaterial> entry = MaterialCatalog.lookup(ref.symbol().name());
      Optional<ThermoOptic> thermo = ThermoOptic.of(ref.symbol().name());
      if (kelvin.isPresent() && entry.isPresent() && thermo.isPresent()) {
        // The resolver refused a temperature that no published data cover.
        check(ref.symbol(), entry.get(), wavelength);
        return thermo.get().index(entry.get(), wavelength, kelvin.getAsDouble());
      }
      return index(ref.symbol(), wavelength);
    }
    OptionalDouble n = m.number(Param.INDEX, "n");
    if (n.isPresent()) {
      return new Complex(n.getAsDouble(), m.number(Param.K, "k").orElse(0));
    }
    OptionalDouble no = m.number(Param.ORDINARY, "n_o");
    if (no.isPresent()) {
      return new Complex(no.getAsDouble(), 0);
    }
    Optional<Value.Group> cauchy = m.param(Param.CAUCHY);
    if (cauchy.isPresent()) {
      double a = cauchy.get().number("a").orElse(1.5);
      double b = cauchy.get().number("b").orElse(0);
      double c = cauchy.get().number("c").orElse(0);
      double l2 = wavelength * wavelength;
      return new Complex(a + b / l2 + c / (l2 * l2), 0);
    }
    Optional<Value.Group> sellmeier = m.param(Param.SELLMEIER);
    if (sellmeier.isPresent()) {
      double l2 = wavelength * wavelength;
      double n2 = 1;
      for (Value.Group term : sellmeier.get().items()) {
        n2 += term.number("b").orElse(0) * l2 / (l2 - term.number("c").orElse(0));
      }
      // n² ≤ 0 is no index; NaN lets the check above refuse it instead of a made-up n = 0.
      return new Complex(n2 > 0 ? Math.sqrt(n2) : Double.NaN, 0);
    }
    Optional<Value.Group> table = m.param(Param.TABLE);
    if (table.isPresent() && table.get().slot("rows").orElse(null) instanceof Value.Table t) {
      return tabulated(material, t, wavelength);
    }
    return AIR_FALLBACK; // unreachable for a checked spec: every material kind is covered above
  }

  /** Birefringence n_e − n_o of a material at a wavelength, when it has one. */
  OptionalDouble birefringence(Symbol material, double wavelength) {
    if (material.isCatalog()) {
      Optional<CatalogMaterial> entry = MaterialCatalog.lookup(material.name());
      if (entry.isPresent() && entry.get().uniaxial().isPresent()) {
        Uniaxial u = entry.get().uniaxial().get();
        check(material, entry.get(), wavelength);
        return OptionalDouble.of(u.birefringence(wavelength));
      }
      return OptionalDouble.empty();
    }
    Optional<ResolvedElement> e = model.element(material);
    if (e.isPresent()) {
      OptionalDouble no = e.get().number(Param.ORDINARY, "n_o");
      OptionalDouble ne = e.get().number(Param.EXTRAORDINARY, "n_e");
      if (no.isPresent() && ne.isPresent()) {
        return OptionalDouble.of(ne.getAsDouble() - no.getAsDouble());
      }
      Optional<Value.Group> catalog = e.get().param(Param.CATALOG);
      if (catalog.isPresent() && catalog.get().slot("name").orElse(null) instanceof Value.Ref ref) {
        return birefringence(ref.symbol(), wavelength);
      }
    }
    return OptionalDouble.empty();
  }

  /**
   * Power absorption coefficient (1/m) of a material: declared, or from its extinction coefficient
   * κ.
   */
  double absorption(Medium medium, double wavelength) {
    if (medium.material().isEmpty()) {
      return 0;
    }
    Symbol s = medium.material().get();
    Optional<ResolvedElement> e = s.isCatalog() ? Optional.empty() : model.element(s);
    OptionalDouble declared =
        e.map(m -> m.number(Param.ABSORPTION, "alpha")).orElse(OptionalDouble.empty());
    if (declared.isPresent()) {
      return declared.getAsDouble();
    }
    double kappa = index(s, wavelength).getImaginary();
    return 4 * Math.PI * kappa / wavelength;
  }

  /**
   * Linear interpolation in n and k (TabulatedIndex); outside the table the end row holds, with a
   * warning.
   */
  private Complex tabulated(Symbol material, Value.Table t, double wavelength) {
    int size = t.rows().size();
    double[] wl = new double[size];
    double[] n = new double[size];
    double[] k = new double[size];
    for (int i = 0; i < size; i++) {
      wl[i] = t.rows().get(i)[0];
      n[i] = t.rows().get(i)[1];
      k[i] = t.rows().get(i)[2];
    }
    TabulatedIndex table = new TabulatedIndex(wl, n, k);
    table
        .validRange()
        .filter(r -> !r.contains(wavelength))
        .ifPresent(r -> outOfRange.add(new OutOfRange(material, wavelength, r)));
    return table.index(wavelength);
  }

  private Complex catalogIndex(String name, Symbol symbol, double wavelength) {
    Optional<CatalogMaterial> entry = MaterialCatalog.lookup(name);
    if (entry.isEmpty()) {
      return AIR_FALLBACK;
    }
    if (symbol != null) {
      check(symbol, entry.get(), wavelength);
    }
    return entry.get().absoluteIndex(wavelength);
  }

  private void check(Symbol symbol, CatalogMaterial entry, double wavelength) {
    entry
        .valid()
        .filter(r -> !r.contains(wavelength))
        .ifPresent(r -> outOfRange.add(new OutOfRange(symbol, wavelength, r)));
  }
}
