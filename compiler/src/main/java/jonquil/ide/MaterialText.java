package jonquil.ide;

import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import jonquil.analysis.MaterialIndex;
import jonquil.optics.material.CatalogMaterial;
import jonquil.optics.material.MaterialCatalog;
import jonquil.resolve.CatalogSpellings;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;
import jonquil.units.Dimension;
import org.apache.commons.math3.complex.Complex;

/**
 * The refractive index of a material at the wavelengths the train uses, with the catalog entry's
 * reference, so a hover shows the numbers the analysis works with.
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
          .append(uniaxial ? " n (extraordinary) |" : "")
          .append("\n|---|---|---|")
          .append(uniaxial ? "---|" : "")
          .append('\n');
      for (double wl : wavelengths) {
        Optional<Complex> n = index(models, material, wl);
        md.append("| ")
            .append(MarkdownText.q(wl, Dimension.LENGTH))
            .append(" | ")
            .append(n.map(c -> MarkdownText.num(c.getReal())).orElse("not known"))
            .append(" | ")
            .append(n.map(c -> MarkdownText.num(c.getImaginary())).orElse("not known"))
            .append(" |");
        if (uniaxial) {
          md.append(' ')
              .append(
                  entry
                      .get()
                      .absoluteExtraordinaryIndex(wl)
                      .map(c -> MarkdownText.num(c.getReal()))
                      .orElse(""))
              .append(" |");
        }
        md.append('\n');
        entry
            .filter(e -> !e.isValidAt(wl))
            .ifPresent(
                e ->
                    md.append("\n_")
                        .append(MarkdownText.q(wl, Dimension.LENGTH))
                        .append(" lies outside the wavelengths the data cover._\n"));
      }
    }
    entry.ifPresent(
        e ->
            md.append("\nCatalog entry ")
                .append(MarkdownText.code(e.name()))
                .append(", absolute index; source: ")
                .append(e.reference().citation())
                .append('\n'));
  }

  /** The vacuum wavelengths of every source line of the model. */
  static List<Double> wavelengths(ResolvedModel m) {
    TreeSet<Double> out = new TreeSet<>();
    for (ResolvedElement e : m.elements().values()) {
      if (e.kind() != ElementKind.SOURCE) {
        continue;
      }
      e.number(Param.WAVELENGTH, "wavelength").ifPresent(out::add);
      e.all(Param.LINE).forEach(g -> g.number("wavelength").ifPresent(out::add));
    }
    return List.copyOf(out);
  }

  private static Optional<CatalogMaterial> catalogEntry(
      List<ResolvedModel> models, Symbol material) {
    if (material.isCatalog()) {
      return CatalogSpellings.lookup(material.name())
          .flatMap(n -> MaterialCatalog.lookup(n.name()));
    }
    return declared(models, material)
        .flatMap(MaterialText::catalogRef)
        .flatMap(s -> catalogEntry(models, s));
  }

  private static Optional<ResolvedElement> declared(List<ResolvedModel> models, Symbol s) {
    return models.stream().map(m -> m.element(s)).flatMap(Optional::stream).findFirst();
  }

  private static Optional<Symbol> catalogRef(ResolvedElement m) {
    Optional<Value> name = m.param(Param.CATALOG).flatMap(g -> g.slot("name"));
    return name.filter(v -> v instanceof Value.Ref).map(v -> ((Value.Ref) v).symbol());
  }

  /** The index the analysis itself uses (one evaluation, so hover and verdicts cannot differ). */
  private static Optional<Complex> index(List<ResolvedModel> models, Symbol material, double wl) {
    if (material.isCatalog()) {
      return models.isEmpty()
          ? Optional.empty()
          : Optional.of(MaterialIndex.at(models.get(0), material, wl));
    }
    return models.stream()
        .filter(m -> m.element(material).isPresent())
        .findFirst()
        .map(m -> MaterialIndex.at(m, material, wl));
  }
}
