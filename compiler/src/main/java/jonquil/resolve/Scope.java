package jonquil.resolve;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The names visible in one file: its own declarations and those of the files it uses. */
public record Scope(Map<String, Symbol> symbols) {
  public Scope {
    symbols = jonquil.source.InOrder.copyOf(symbols);
  }

  public Optional<Symbol> lookup(String name) {
    return Optional.ofNullable(symbols.get(name));
  }

  /**
   * Names of the given categories, plus catalog names when materials are wanted, for suggestions.
   */
  public Collection<String> namesOf(List<Category> categories) {
    java.util.List<String> names = new java.util.ArrayList<>();
    symbols.values().stream()
        .filter(s -> categories.contains(s.category()))
        .map(Symbol::name)
        .forEach(names::add);
    if (categories.contains(Category.MATERIAL)) {
      names.addAll(CatalogSpellings.spellings());
    }
    return names;
  }
}
