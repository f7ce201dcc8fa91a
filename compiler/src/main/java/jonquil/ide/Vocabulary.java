package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.resolve.CatalogSpellings;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Symbol;
import jonquil.syntax.Declaration;
import jonquil.syntax.SpecFile;

/**
 * The names a file may use, from the last check's scope (which includes used files), or from the
 * file's own declarations when that check resolved nothing for it.
 */
final class Vocabulary {
  /** A declared name with its kind, when the kind is known. */
  record Named(String name, Optional<ElementKind> kind, Category category) {}

  private final List<Named> names;

  private Vocabulary(List<Named> names) {
    this.names = List.copyOf(names);
  }

  static Vocabulary of(Result r, Path file) {
    Map<String, Named> out = new LinkedHashMap<>();
    OwningModels.primary(r, file)
        .map(m -> m.scopes().get(file))
        .ifPresent(
            scope ->
                scope.symbols().values().stream()
                    .filter(s -> !s.isCatalog())
                    .sorted(java.util.Comparator.comparing(Symbol::name))
                    .forEach(s -> out.put(s.name(), new Named(s.name(), s.kind(), s.category()))));
    Optional<SpecFile> tree = OwningModels.tree(r, file);
    if (out.isEmpty() && tree.isPresent()) {
      for (Declaration d : tree.get().declarations()) {
        Optional<ElementKind> kind = ElementKind.byWord(d.kind().text());
        out.putIfAbsent(
            d.name().text(),
            new Named(
                d.name().text(), kind, kind.map(ElementKind::category).orElse(Category.OPTIC)));
      }
    }
    return new Vocabulary(new ArrayList<>(out.values()));
  }

  /** Things that can stand in a beam path, with their kind. */
  List<Named> placeable() {
    return names.stream().filter(n -> n.category().placeable() && n.kind().isPresent()).toList();
  }

  List<Named> of(Category category) {
    return names.stream().filter(n -> n.category() == category).toList();
  }

  Optional<Named> named(String name) {
    return names.stream().filter(n -> n.name().equals(name)).findFirst();
  }

  /** Declared materials first, then every catalog spelling (only metals when {@code metalOnly}). */
  List<CompletionItemInfo> materials(boolean metalOnly) {
    List<CompletionItemInfo> out = new ArrayList<>();
    of(Category.MATERIAL)
        .forEach(
            n ->
                out.add(
                    new CompletionItemInfo(
                        n.name(), CompletionItemInfo.Kind.MATERIAL, "declared material", "")));
    for (String spelling : CatalogSpellings.spellings()) {
      CatalogSpellings.Entry e = CatalogSpellings.lookup(spelling).orElseThrow();
      if (metalOnly && e.materialClass() != CatalogSpellings.MaterialClass.METAL) {
        continue;
      }
      String detail =
          "catalog material ("
              + e.materialClass().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')
              + ")";
      out.add(
          new CompletionItemInfo(
              spelling,
              CompletionItemInfo.Kind.MATERIAL,
              detail,
              spelling.equals(e.name()) ? "" : "another spelling of '" + e.name() + "'"));
    }
    return out;
  }
}
