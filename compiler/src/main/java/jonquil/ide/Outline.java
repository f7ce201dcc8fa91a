package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import jonquil.Result;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.syntax.RequireDecl;
import jonquil.syntax.Requirement;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;
import jonquil.syntax.UseDecl;

/** The outline of a file and the workspace-wide symbol search, both read from the syntax trees. */
final class Outline {
  static final int WORKSPACE_CAP = 200;

  private Outline() {}

  static List<SymbolInfo> of(Result r, Path file) {
    SpecFile f = OwningModels.tree(r, file).orElse(null);
    return f == null ? List.of() : of(r.files().get(file), f);
  }

  /** The outline of one parsed file. */
  static List<SymbolInfo> of(SourceFile text, SpecFile f) {
    List<SymbolInfo> out = new ArrayList<>();
    for (UseDecl u : f.uses()) {
      out.add(
          node(
              "use \"" + u.target() + "\"",
              SymbolInfo.Kind.USE,
              "use",
              u.range(),
              u.targetRange(),
              List.of()));
    }
    for (Declaration d : f.declarations()) {
      out.add(declaration(text, d));
    }
    for (TrainDecl t : f.trains()) {
      List<SymbolInfo> paths = new ArrayList<>();
      for (TrainDecl.BeamPath p : t.paths()) {
        TextRange first = p.steps().isEmpty() ? p.range() : p.steps().get(0).range();
        paths.add(
            node(
                MarkdownText.oneLine(text.slice(p.range())),
                SymbolInfo.Kind.PATH,
                "path",
                p.range(),
                first,
                List.of()));
      }
      out.add(
          node(
              t.name().map(n -> n.text()).orElse("train"),
              SymbolInfo.Kind.TRAIN,
              "train",
              t.range(),
              t.name().map(n -> n.range()).orElse(t.range()),
              paths));
    }
    for (RequireDecl block : f.requires()) {
      List<SymbolInfo> lines = new ArrayList<>();
      for (Requirement q : block.requirements()) {
        lines.add(
            node(
                MarkdownText.oneLine(q.text()),
                SymbolInfo.Kind.REQUIREMENT,
                "requirement",
                q.range(),
                q.check().measure().range(),
                List.of()));
      }
      out.add(
          node(
              "require",
              SymbolInfo.Kind.REQUIRE,
              "require",
              block.range(),
              keyword(block.range(), "require"),
              lines));
    }
    out.sort(Comparator.comparing(SymbolInfo::range));
    return out;
  }

  private static SymbolInfo declaration(SourceFile text, Declaration d) {
    List<SymbolInfo> children = new ArrayList<>();
    for (Property p : d.properties()) {
      children.add(
          node(
              MarkdownText.oneLine(text.slice(p.range())),
              SymbolInfo.Kind.PARAMETER,
              "parameter",
              p.range(),
              p.key().range(),
              List.of()));
    }
    String word = d.kind().text();
    return node(
        d.name().text(),
        SymbolInfo.Kind.ofDeclaration(word),
        word,
        d.range(),
        d.name().range(),
        children);
  }

  /** A node whose selection is clamped inside its range, as editors require. */
  private static SymbolInfo node(
      String name,
      SymbolInfo.Kind kind,
      String word,
      TextRange range,
      TextRange selection,
      List<SymbolInfo> kids) {
    TextRange full = TextRange.span(range, selection);
    return new SymbolInfo(name.isBlank() ? word : name, kind, word, full, selection, kids);
  }

  private static TextRange keyword(TextRange range, String word) {
    return new TextRange(range.start(), Math.min(range.end(), range.start() + word.length()));
  }

  /** The declarations of the files {@code r} read whose name contains the query, capped. */
  static List<FoundSymbol> search(Result r, String query) {
    String q = query == null ? "" : query.toLowerCase(Locale.ROOT);
    List<FoundSymbol> out = new ArrayList<>();
    List<Path> files =
        r.files().keySet().stream()
            .filter(p -> OwningModels.isSpec(r, p))
            .sorted(Comparator.comparing(Path::toString))
            .toList();
    for (Path file : files) {
      for (SymbolInfo s : declared(of(r, file))) {
        if (matches(s, q)) {
          out.add(new FoundSymbol(file, s));
          if (out.size() == WORKSPACE_CAP) {
            return out;
          }
        }
      }
    }
    return out;
  }

  /**
   * A workspace search over indexed files, by path, with the same matching and cap as {@link
   * #search}.
   */
  static List<FoundSymbol> search(java.util.Collection<FileIndex> indexed, String query) {
    String q = query == null ? "" : query.toLowerCase(Locale.ROOT);
    List<FoundSymbol> out = new ArrayList<>();
    List<FileIndex> files =
        indexed.stream()
            .sorted(Comparator.comparing((FileIndex f) -> f.file().toString()))
            .toList();
    for (FileIndex f : files) {
      for (SymbolInfo s : f.declarations()) {
        if (matches(s, q)) {
          out.add(new FoundSymbol(f.file(), s));
          if (out.size() == WORKSPACE_CAP) {
            return out;
          }
        }
      }
    }
    return out;
  }

  private static boolean matches(SymbolInfo s, String lowerCaseQuery) {
    return s.name().toLowerCase(Locale.ROOT).contains(lowerCaseQuery);
  }

  /**
   * The outline's nodes that declare a name a search can find (elements, materials, named trains),
   * without their children: not 'use' lines, require blocks or unnamed trains.
   */
  static List<SymbolInfo> declared(List<SymbolInfo> outline) {
    List<SymbolInfo> out = new ArrayList<>();
    for (SymbolInfo s : outline) {
      boolean declared =
          switch (s.kind()) {
            case USE, REQUIRE -> false;
            case TRAIN -> !s.selectionRange().equals(s.range());
            case ELEMENT, SOURCE, MATERIAL, PATH, REQUIREMENT, PARAMETER -> true;
          };
      if (declared) {
        out.add(s.withoutChildren());
      }
    }
    return out;
  }
}
