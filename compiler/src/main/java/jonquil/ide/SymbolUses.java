package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRef;
import jonquil.resolve.Symbol;
import jonquil.source.TextRange;

/**
 * Every declared name and every resolved use of one across all files of a result, merged over the
 * roots' models, so navigation and rename see one symbol however many roots use it.
 */
final class SymbolUses {
  /** Identifies a symbol across models: its declaration site, or its name for catalog entries. */
  record Key(String name, Path file, int start) {
    static Key of(Symbol s) {
      return s.isCatalog()
          ? new Key(s.name(), null, -1)
          : new Key(s.name(), s.file(), s.nameNode().map(n -> n.range().start()).orElse(-1));
    }
  }

  /** One place a name is written: its declaration or a use. */
  record Occurrence(Path file, TextRange range, Symbol symbol, boolean declaration) {
    Key key() {
      return Key.of(symbol);
    }
  }

  private final List<Occurrence> all;

  private SymbolUses(List<Occurrence> all) {
    this.all = List.copyOf(all);
  }

  static SymbolUses of(Result r) {
    Map<String, Occurrence> unique = new LinkedHashMap<>();
    for (ResolvedModel m : OwningModels.ordered(r)) {
      m.scopes()
          .values()
          .forEach(
              scope ->
                  scope
                      .symbols()
                      .values()
                      .forEach(
                          s -> {
                            if (!s.isCatalog() && s.nameNode().isPresent()) {
                              add(
                                  unique,
                                  new Occurrence(s.file(), s.nameNode().get().range(), s, true));
                            }
                          }));
      for (ResolvedRef ref : m.references()) {
        add(unique, new Occurrence(ref.file(), ref.range(), ref.target(), false));
      }
    }
    List<Occurrence> list = new ArrayList<>(unique.values());
    list.sort(
        Comparator.comparing((Occurrence o) -> o.file().toString())
            .thenComparing(Occurrence::range));
    return new SymbolUses(list);
  }

  private static void add(Map<String, Occurrence> unique, Occurrence o) {
    unique.putIfAbsent(o.file() + "#" + o.range().start() + ":" + o.range().end(), o);
  }

  /** The name written at this offset (a cursor just after a name still counts). */
  Optional<Occurrence> at(Path file, int offset) {
    Occurrence touching = null;
    for (Occurrence o : all) {
      if (!o.file().equals(file) || !o.range().contains(offset)) {
        continue;
      }
      if (offset < o.range().end()) {
        return Optional.of(o);
      }
      touching = o;
    }
    return Optional.ofNullable(touching);
  }

  /** Every occurrence of the symbol, declaration first, then uses in file and offset order. */
  List<Occurrence> of(Key key) {
    List<Occurrence> out = new ArrayList<>();
    all.stream().filter(o -> o.declaration() && o.key().equals(key)).forEach(out::add);
    all.stream().filter(o -> !o.declaration() && o.key().equals(key)).forEach(out::add);
    return out;
  }

  /** All declarations, in file and offset order. */
  List<Occurrence> declarations() {
    return all.stream().filter(Occurrence::declaration).toList();
  }
}
