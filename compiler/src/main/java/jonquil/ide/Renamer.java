package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.resolve.CatalogSpellings;
import jonquil.syntax.Tokens;

/**
 * Renames a declared name at its declaration and every use, refusing names the language would
 * reject.
 */
final class Renamer {
  private Renamer() {}

  static Optional<SymbolUses.Occurrence> renamable(SymbolUses names, Path file, int offset) {
    return names.at(file, offset).filter(o -> !o.symbol().isCatalog());
  }

  static RenameResult rename(Result r, Path file, int offset, String newName) {
    SymbolUses names = SymbolUses.of(r);
    Optional<SymbolUses.Occurrence> at = renamable(names, file, offset);
    if (at.isEmpty()) {
      return RenameResult.refused("nothing that can be renamed is at this position");
    }
    String old = at.get().symbol().name();
    if (Tokens.isKeyword(newName)) {
      return RenameResult.refused("'" + newName + "' is a reserved word and cannot be a name");
    }
    if (!Tokens.isIdentifier(newName)) {
      return RenameResult.refused(
          "'"
              + newName
              + "' is not a name: a name starts with a letter or '_' and"
              + " continues with letters, digits or '_'");
    }
    if (newName.equals(old)) {
      return new RenameResult(Map.of(), null);
    }
    if (names.declarations().stream().anyMatch(o -> o.symbol().name().equals(newName))) {
      return RenameResult.refused("'" + newName + "' is already declared; names must be unique");
    }
    if (CatalogSpellings.lookup(newName).isPresent()) {
      return RenameResult.refused("'" + newName + "' is the name of a catalog material");
    }
    Map<Path, List<Edit>> edits = new LinkedHashMap<>();
    for (SymbolUses.Occurrence o : names.of(at.get().key())) {
      edits
          .computeIfAbsent(o.file(), k -> new ArrayList<>())
          .add(new Edit(o.file(), o.range(), newName));
    }
    edits.values().forEach(list -> list.sort(Comparator.comparing(Edit::range)));
    return new RenameResult(edits, null);
  }
}
