package jonquil.ide;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeSet;
import jonquil.optics.material.CatalogMaterial;
import jonquil.optics.material.MaterialCatalog;
import jonquil.optics.material.TabulatedIndex;
import jonquil.resolve.CatalogNames;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;
import jonquil.units.Dimension;
import org.apache.commons.math3.complex.Complex;

/**
 * The refractive index of a material at the wavelengths the train uses, with the catalog
 * entry's reference, so a hover shows the numbers the analysis works with.
 */
final class MaterialText {
  private MaterialText() {}

  /** Appends the index table for a catalog or declared material. */
  static void append(StringBuilder md, List<ResolvedModel> models, Symbol material) {
    TreeSet<Double> wavelengths = new TreeSet<>();
    models.forEach(m -> wavelengths.addAll(wavelengths(m)));
    Optional<CatalogMaterial> entry = catalogEntry(models, material);
    if (wavelengths.isEmpty()) {
      md.append("\n\n_No source in this spec states a wavelength, so no index is shown._");
    } else {
      boolean uniaxial = entry.map(CatalogMaterial::isBirefringent).orElse(false);
      md.append("\n\n**Index n + iκ** at the wavelengths the train uses\n\n| wavelength | n | κ |")
          .append(uniaxial ? " n (extraordinary) |" : "").append("\n|---|---|---|").append(uniaxial ? "---|" : "")
          .append('\n');
      for (double wl : wavelengths) {
        Optional<Complex> n = index(models, material, wl);
        md.append("| ").append(Md.q(wl, Dimension.LENGTH)).append(" | ")
            .append(n.map(c -> Md.num(c.getReal())).orElse("not known")).append(" | ")
            .append(n.map(c -> Md.num(c.getImaginary())).orElse("not known")).append(" |");
        if (uniaxial) {
          md.append(' ').append(entry.get().absoluteExtraordinaryIndex(wl).map(c -> Md.num(c.getReal())).orElse(""))
              .append(" |");
        }
        md.append('\n');
        entry.filter(e -> !e.isValidAt(wl)).ifPresent(e -> md.append("\n_")
            .append(Md.q(wl, Dimension.LENGTH)).append(" lies outside the wavelengths the data cover._\n"));
      }
    }
    entry.ifPresent(e -> md.append("\nCatalog entry ").append(Md.code(e.name())).append(", absolute index; source: ")
        .append(e.reference().citation()).append('\n'));
  }

  /** The vacuum wavelengths of every source line of the model. */
  static List<Double> wavelengths(ResolvedModel m) {
    TreeSet<Double> out = new TreeSet<>();
    for (ResolvedElement e : m.elements().values()) {
      if (e.kind() != ElementKind.SOURCE) {
        continue;
      }
      e.number("wavelength", "wavelength").ifPresent(out::add);
      e.all("line").forEach(g -> g.number("wavelength").ifPresent(out::add));
    }
    return List.copyOf(out);
  }

  private static Optional<CatalogMaterial> catalogEntry(List<ResolvedModel> models, Symbol material) {
    if (material.isCatalog()) {
      return CatalogNames.lookup(material.name()).flatMap(n -> MaterialCatalog.lookup(n.name()));
    }
    return declared(models, material).flatMap(MaterialText::catalogRef).flatMap(s -> catalogEntry(models, s));
  }

  private static Optional<ResolvedElement> declared(List<ResolvedModel> models, Symbol s) {
    return models.stream().map(m -> m.element(s)).flatMap(Optional::stream).findFirst();
  }

  private static Optional<Symbol> catalogRef(ResolvedElement m) {
    Optional<Value> name = m.param("catalog").flatMap(g -> g.slot("name"));
    return name.filter(v -> v instanceof Value.Ref).map(v -> ((Value.Ref) v).symbol());
  }

  /** The same evaluation the analysis makes for each way of declaring a material. */
  private static Optional<Complex> index(List<ResolvedModel> models, Symbol material, double wl) {
    if (material.isCatalog()) {
      return catalogEntry(models, material).map(e -> e.absoluteIndex(wl));
    }
    Optional<ResolvedElement> found = declared(models, material);
    if (found.isEmpty()) {
      return Optional.empty();
    }
    ResolvedElement m = found.get();
    Optional<Symbol> ref = catalogRef(m);
    if (ref.isPresent()) {
      return index(models, ref.get(), wl);
    }
    OptionalDouble n = m.number("index", "n");
    if (n.isPresent()) {
      return Optional.of(new Complex(n.getAsDouble(), m.number("k", "k").orElse(0)));
    }
    OptionalDouble no = m.number("ordinary", "n_o");
    if (no.isPresent()) {
      return Optional.of(new Complex(no.getAsDouble(), 0));
    }
    double l2 = wl * wl;
    Optional<Value.Group> cauchy = m.param("cauchy");
    if (cauchy.isPresent()) {
      Value.Group g = cauchy.get();
      double a = g.number("a").orElse(1.5);
      return Optional.of(new Complex(a + g.number("b").orElse(0) / l2 + g.number("c").orElse(0) / (l2 * l2), 0));
    }
    Optional<Value.Group> sellmeier = m.param("sellmeier");
    if (sellmeier.isPresent()) {
      double n2 = 1;
      for (Value.Group term : sellmeier.get().items()) {
        n2 += term.number("b").orElse(0) * l2 / (l2 - term.number("c").orElse(0));
      }
      return Optional.of(new Complex(Math.sqrt(Math.max(n2, 0)), 0));
    }
    Optional<Value> rows = m.param("table").flatMap(g -> g.slot("rows"));
    if (rows.isPresent() && rows.get() instanceof Value.Table t) {
      int size = t.rows().size();
      double[] w = new double[size];
      double[] nn = new double[size];
      double[] k = new double[size];
      for (int i = 0; i < size; i++) {
        w[i] = t.rows().get(i)[0];
        nn[i] = t.rows().get(i)[1];
        k[i] = t.rows().get(i)[2];
      }
      return Optional.of(new TabulatedIndex(w, nn, k).index(wl));
    }
    return Optional.empty();
  }
}
