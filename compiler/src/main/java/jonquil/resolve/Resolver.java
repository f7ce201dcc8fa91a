package jonquil.resolve;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.source.TextRange;
import jonquil.syntax.Declaration;
import jonquil.syntax.RequireDecl;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;

/**
 * Resolution of a spec rooted at one file: a pure function of the parsed files and their 'use'
 * edges. Each file sees its own names and those of the files it uses directly.
 */
public final class Resolver {
  private Resolver() {}

  /**
   * The fix of a "did you mean": replace what was written by the close name, or no fix when there
   * is none.
   */
  static jonquil.diag.Fix replacement(
      Path file, TextRange range, String written, Optional<String> suggestion) {
    return suggestion
        .map(
            s ->
                new jonquil.diag.Fix(
                    "change '" + written + "' to '" + s + "'",
                    List.of(new jonquil.diag.Edit(file, range, s))))
        .orElse(null);
  }

  public static ResolvedModel resolve(
      Path root, Map<Path, SpecFile> files, Map<Path, List<UseEdge>> uses) {
    return resolve(root, files, uses, Map.of());
  }

  /** As above, with the text of the data files (n,k tables) the specs name, read by the loader. */
  public static ResolvedModel resolve(
      Path root,
      Map<Path, SpecFile> files,
      Map<Path, List<UseEdge>> uses,
      Map<Path, String> dataFiles) {
    return resolve(root, files, uses, dataFiles, Map.of());
  }

  /** As above, with why each data file that is there could not be read ("not valid UTF-8"). */
  public static ResolvedModel resolve(
      Path root,
      Map<Path, SpecFile> files,
      Map<Path, List<UseEdge>> uses,
      Map<Path, String> dataFiles,
      Map<Path, String> dataFileProblems) {
    Map<Path, Sink> sinks = new LinkedHashMap<>();
    files.keySet().forEach(p -> sinks.put(p, new Sink(p)));
    Map<Path, Map<String, Symbol>> own = new LinkedHashMap<>();
    files.forEach((path, file) -> own.put(path, declare(file, sinks.get(path))));

    Map<Path, Scope> scopes = new LinkedHashMap<>();
    for (Path path : files.keySet()) {
      scopes.put(path, scope(path, own, uses.getOrDefault(path, List.of()), sinks.get(path)));
    }

    Map<Symbol, ResolvedElement> elements = new LinkedHashMap<>();
    files.forEach(
        (path, file) -> {
          DeclarationChecker checker =
              new DeclarationChecker(
                  sinks.get(path), scopes.get(path), file, dataFiles, dataFileProblems);
          for (Declaration decl : file.declarations()) {
            Symbol symbol = own.get(path).get(decl.name().text());
            if (symbol == null
                || symbol.declaration().orElse(null) != decl
                || symbol.kind().isEmpty()) {
              continue; // duplicate or unknown kind: already reported
            }
            elements.put(symbol, checker.check(symbol, symbol.kind().get(), decl));
          }
        });

    uses.forEach(
        (from, edges) ->
            edges.forEach(
                edge -> {
                  SpecFile lib = files.get(edge.target());
                  if (lib != null && !edge.target().equals(root)) {
                    Sink sink = sinks.get(edge.target());
                    for (TrainDecl t : lib.trains()) {
                      sink.report(
                          DiagnosticCode.USED_FILE_HAS_TRAIN,
                          t.range(),
                          "this file is used as a part library by '"
                              + from.getFileName()
                              + "', so it may only declare parts; move the train to the main spec");
                    }
                    AmbientResolver.refuseInLibrary(
                        lib.declarations(), sink, from.getFileName().toString());
                    StandardResolver.refuseInLibrary(
                        lib.declarations(), sink, from.getFileName().toString());
                    for (RequireDecl r : lib.requires()) {
                      sink.report(
                          DiagnosticCode.USED_FILE_HAS_TRAIN,
                          r.range(),
                          "this file is used as a part library by '"
                              + from.getFileName()
                              + "', so it may only declare parts; move the requirements to the main"
                              + " spec");
                    }
                  }
                }));

    List<ResolvedTrain> trains = List.of();
    List<ResolvedRequirement> requirements = new ArrayList<>();
    SpecFile rootFile = files.get(root);
    Ambient ambient = Ambient.DEFAULT;
    SafetyStandard standard = SafetyStandard.DEFAULT;
    if (rootFile != null) {
      Sink sink = sinks.get(root);
      ambient = AmbientResolver.resolve(rootFile.declarations(), sink, scopes.get(root));
      standard = StandardResolver.resolve(rootFile.declarations(), sink);
      TrainResolver trainResolver = new TrainResolver(sink, scopes.get(root), rootFile);
      trains = trainResolver.resolve(rootFile.trains());
      RequirementResolver reqs =
          new RequirementResolver(
              sink, scopes.get(root), trainResolver.placedElements(), rootFile, elements);
      for (RequireDecl block : rootFile.requires()) {
        block.requirements().forEach(r -> requirements.add(reqs.resolve(r)));
      }
      if (!rootFile.trains().isEmpty()) {
        neverPlaced(sink, own.get(root).values(), trainResolver.placedElements());
      }
    }

    List<Diagnostic> diagnostics = new ArrayList<>();
    List<ResolvedRef> refs = new ArrayList<>();
    for (Sink s : sinks.values()) {
      diagnostics.addAll(s.diagnostics);
      refs.addAll(s.refs);
    }
    return new ResolvedModel(
        root, scopes, elements, trains, requirements, refs, diagnostics, ambient, standard);
  }

  /**
   * An element of the main spec that no path places computes nothing, so it is flagged. Parts of a
   * used library are not: a library serves many benches. A spec without a train (a library opened
   * on its own) is not checked either.
   */
  private static void neverPlaced(Sink sink, Iterable<Symbol> declared, Set<Symbol> placed) {
    for (Symbol s : declared) {
      if (s.kind().isEmpty()
          || !s.kind().get().category().placeable()
          || placed.contains(s)
          || s.nameNode().isEmpty()) {
        continue;
      }
      sink.report(
          DiagnosticCode.ELEMENT_NEVER_PLACED,
          s.nameNode().get().range(),
          s.describe()
              + " is declared but no path places it, so nothing about it is computed; place it in"
              + " a train or remove it");
    }
  }

  /** The symbols a file declares itself; duplicates within the file are reported here. */
  private static Map<String, Symbol> declare(SpecFile file, Sink sink) {
    Map<String, Symbol> symbols = new LinkedHashMap<>();
    for (Declaration decl : file.declarations()) {
      if (AmbientResolver.isAmbient(decl) || StandardResolver.isStandard(decl)) {
        continue; // a statement about the bench, not a named part
      }
      Optional<ElementKind> kind = ElementKind.byWord(decl.kind().text());
      if (kind.isEmpty()) {
        Optional<String> close = Suggest.closest(decl.kind().text(), ElementKind.words());
        sink.report(
            DiagnosticCode.UNKNOWN_KIND,
            decl.kind().range(),
            "unknown kind '"
                + decl.kind().text()
                + "'"
                + Suggest.hintOr(
                    close, "; the kinds are " + String.join(", ", ElementKind.words())),
            replacement(sink.file, decl.kind().range(), decl.kind().text(), close));
      }
      Category category = kind.map(ElementKind::category).orElse(Category.OPTIC);
      Symbol symbol =
          new Symbol(
              decl.name().text(),
              category,
              kind,
              file.path(),
              Optional.of(decl.name()),
              Optional.of(decl));
      add(symbols, symbol, decl.name().range(), sink);
    }
    for (TrainDecl train : file.trains()) {
      train
          .name()
          .ifPresent(
              n ->
                  add(
                      symbols,
                      new Symbol(
                          n.text(),
                          Category.TRAIN,
                          Optional.empty(),
                          file.path(),
                          Optional.of(n),
                          Optional.empty()),
                      n.range(),
                      sink));
    }
    return symbols;
  }

  private static void add(Map<String, Symbol> symbols, Symbol symbol, TextRange at, Sink sink) {
    Symbol earlier = symbols.putIfAbsent(symbol.name(), symbol);
    if (earlier != null) {
      var d =
          sink.report(
              DiagnosticCode.DUPLICATE_NAME,
              at,
              "'" + symbol.name() + "' is already declared in this file; names must be unique");
      sink.replace(
          d,
          d.withRelated(
              new Related(sink.file, earlier.nameNode().get().range(), "first declared here")));
    }
  }

  private static Scope scope(
      Path path, Map<Path, Map<String, Symbol>> own, List<UseEdge> edges, Sink sink) {
    // Own names in source order, then each used file's in the order of its 'use' line.
    Map<String, Symbol> visible = new LinkedHashMap<>(own.getOrDefault(path, Map.of()));
    Map<String, UseEdge> via = new HashMap<>();
    for (UseEdge edge : edges) {
      for (Symbol s : own.getOrDefault(edge.target(), Map.of()).values()) {
        if (s.category() == Category.TRAIN) {
          continue;
        }
        Symbol mine = own.getOrDefault(path, Map.of()).get(s.name());
        if (mine != null) {
          var d =
              sink.report(
                  DiagnosticCode.DUPLICATE_NAME,
                  mine.nameNode().get().range(),
                  "'"
                      + s.name()
                      + "' is also declared in '"
                      + edge.decl().target()
                      + "', which this file uses; rename one");
          sink.replace(
              d,
              d.withRelated(
                  new Related(s.file(), s.nameNode().get().range(), "also declared here")));
          continue;
        }
        Symbol other = visible.get(s.name());
        if (other != null && !other.equals(s)) {
          UseEdge first = via.get(s.name());
          var d =
              sink.report(
                  DiagnosticCode.DUPLICATE_NAME,
                  edge.decl().range(),
                  "'"
                      + s.name()
                      + "' is declared both in '"
                      + first.decl().target()
                      + "' and in '"
                      + edge.decl().target()
                      + "'; rename one");
          sink.replace(
              d,
              d.withRelated(
                      new Related(other.file(), other.nameNode().get().range(), "declared here"))
                  .withRelated(new Related(s.file(), s.nameNode().get().range(), "and here")));
          continue;
        }
        visible.put(s.name(), s);
        via.putIfAbsent(s.name(), edge);
      }
    }
    return new Scope(visible);
  }
}
