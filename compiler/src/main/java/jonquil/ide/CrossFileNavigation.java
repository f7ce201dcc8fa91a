package jonquil.ide;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.Result;
import jonquil.diag.Edit;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.ResolvedRef;
import jonquil.resolve.Scope;
import jonquil.resolve.Symbol;
import jonquil.source.SourceFile;
import jonquil.syntax.SpecFile;
import jonquil.syntax.UseDecl;

/**
 * Navigation that reaches past one check: a result answers for the files it read, and a workspace
 * index ({@link FileIndex}) for the others. A name in the index is matched to a symbol by its
 * declaring file and its name (names are unique within a file), not by offset, so an index entry
 * stays valid while the declaring file is edited elsewhere in it.
 */
final class CrossFileNavigation {
  private CrossFileNavigation() {}

  static Optional<FileIndex> index(Result r, Path file) {
    SourceFile source = r.files().get(file);
    SpecFile tree = OwningModels.tree(r, file).orElse(null);
    if (source == null || tree == null) {
      return Optional.empty();
    }
    List<FileIndex.NameUse> names = new ArrayList<>();
    List<Path> reads = new ArrayList<>(List.of(file));
    ResolvedModel m = r.models().get(file);
    if (m != null) {
      Scope scope = m.scopes().get(file);
      if (scope != null) {
        for (Symbol s : scope.symbols().values()) {
          if (!s.isCatalog() && file.equals(s.file()) && s.nameNode().isPresent()) {
            names.add(new FileIndex.NameUse(s.name(), s.nameNode().get().range(), file, true));
          }
        }
      }
      for (ResolvedRef ref : m.references()) {
        if (ref.file().equals(file) && !ref.target().isCatalog()) {
          names.add(
              new FileIndex.NameUse(ref.target().name(), ref.range(), ref.target().file(), false));
        }
      }
      m.scopes().keySet().stream().filter(p -> !p.equals(file)).sorted().forEach(reads::add);
    }
    names.sort(Comparator.comparing(FileIndex.NameUse::range));
    List<Path> uses = new ArrayList<>();
    for (UseDecl u : tree.uses()) {
      if (u.target().isBlank()) {
        continue;
      }
      try {
        uses.add(UseTarget.of(file, u.target()));
      } catch (InvalidPathException e) {
        // not a path: the check reported it, and it names no file to watch for
      }
    }
    return Optional.of(
        new FileIndex(source, Outline.declared(Outline.of(source, tree)), names, uses, reads));
  }

  static List<Location> references(
      Result r,
      Path file,
      int offset,
      boolean includeDeclaration,
      Collection<FileIndex> elsewhere) {
    SymbolUses names = SymbolUses.of(r);
    Optional<SymbolUses.Occurrence> at = names.at(file, offset);
    if (at.isEmpty()) {
      return List.of();
    }
    List<Location> declarations = new ArrayList<>();
    List<Location> uses = new ArrayList<>();
    for (SymbolUses.Occurrence o : names.of(at.get().key())) {
      (o.declaration() ? declarations : uses).add(new Location(o.file(), o.range()));
    }
    Symbol symbol = at.get().symbol();
    if (!symbol.isCatalog()) {
      for (FileIndex f : unread(r, elsewhere).values()) {
        for (FileIndex.NameUse n : uses(f, symbol)) {
          (n.declaration() ? declarations : uses).add(new Location(f.file(), n.range()));
        }
      }
    }
    uses.sort(
        Comparator.comparing((Location l) -> l.file().toString()).thenComparing(Location::range));
    List<Location> out = new ArrayList<>();
    if (includeDeclaration) {
      out.addAll(declarations);
    }
    out.addAll(uses);
    return out;
  }

  static RenameResult rename(
      Result r, Path file, int offset, String newName, Collection<FileIndex> elsewhere) {
    RenameResult here = Renamer.rename(r, file, offset, newName);
    if (here.error() != null || here.edits().isEmpty()) {
      return here; // refused, or renamed to itself
    }
    Symbol symbol = Renamer.renamable(SymbolUses.of(r), file, offset).orElseThrow().symbol();
    Map<Path, FileIndex> unread = unread(r, elsewhere);
    Map<Path, List<Edit>> edits = new LinkedHashMap<>(here.edits());
    for (FileIndex f : unread.values()) {
      List<Edit> inFile = new ArrayList<>();
      for (FileIndex.NameUse n : uses(f, symbol)) {
        inFile.add(new Edit(f.file(), n.range(), newName));
      }
      if (inFile.isEmpty()) {
        continue;
      }
      // The new name must not already be visible where the old one is written: the file's own names
      // and those it uses.
      List<Path> visible = new ArrayList<>(List.of(f.file()));
      visible.addAll(f.uses());
      for (Path p : visible) {
        FileIndex seen = unread.get(p);
        if (seen != null
            && seen.names().stream().anyMatch(n -> n.declaration() && n.name().equals(newName))) {
          return RenameResult.refused(
              "'"
                  + newName
                  + "' is already declared in '"
                  + p.getFileName()
                  + "', where '"
                  + symbol.name()
                  + "' is used; names must be unique");
        }
      }
      inFile.sort(Comparator.comparing(Edit::range));
      edits.put(f.file(), inFile);
    }
    return new RenameResult(edits, null);
  }

  /** The indexed files that the result did not read, by path: the result answers for the rest. */
  private static Map<Path, FileIndex> unread(Result r, Collection<FileIndex> indexed) {
    Map<Path, FileIndex> out = new LinkedHashMap<>();
    for (FileIndex f : indexed) {
      if (!r.files().containsKey(f.file())) {
        out.putIfAbsent(f.file(), f);
      }
    }
    return out;
  }

  private static List<FileIndex.NameUse> uses(FileIndex f, Symbol symbol) {
    return f.names().stream()
        .filter(n -> n.name().equals(symbol.name()) && n.declaredIn().equals(symbol.file()))
        .toList();
  }
}
