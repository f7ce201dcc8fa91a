package jonquil.resolve;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Declaration;
import jonquil.syntax.Name;
import jonquil.syntax.Property;

/** Checks one declaration's parameters against its kind's table and cross-parameter rules. */
final class DeclarationChecker {
  private final Sink sink;
  private final ValueChecker values;
  private final jonquil.syntax.SpecFile file;

  private final Map<java.nio.file.Path, String> dataFiles;
  private final Map<java.nio.file.Path, String> dataFileProblems;

  DeclarationChecker(
      Sink sink,
      Scope scope,
      jonquil.syntax.SpecFile file,
      Map<java.nio.file.Path, String> dataFiles,
      Map<java.nio.file.Path, String> dataFileProblems) {
    this.sink = sink;
    this.values = new ValueChecker(sink, scope);
    this.file = file;
    this.dataFiles = dataFiles;
    this.dataFileProblems = dataFileProblems;
  }

  ResolvedElement check(Symbol symbol, ElementKind kind, Declaration decl) {
    Map<String, List<Value.Group>> params = new LinkedHashMap<>();
    Map<String, Property> firstSeen = new LinkedHashMap<>();
    String owner = kind.word() + " '" + symbol.name() + "'";
    for (Property p : properties(kind, decl)) {
      String key = p.key().text();
      Optional<ParamSpec> spec = kind.param(key);
      if (spec.isEmpty()) {
        KeyReports.unknown(
            sink,
            p.key(),
            "a parameter of " + ShapeMatcher.article(kind.word()),
            kind.takenParams().stream().map(ParamSpec::name).toList());
        continue;
      }
      if (spec.get().refusal().isPresent()) {
        KeyReports.notModelled(sink, p, owner, spec.get().refusal().get());
        continue;
      }
      Property earlier = firstSeen.putIfAbsent(key, p);
      if (earlier != null && !spec.get().repeatable()) {
        KeyReports.givenTwice(sink, p.key(), earlier.key(), owner);
        continue;
      }
      if (spec.get().shape() instanceof Shape.Seq seq && seq.parts().isEmpty()) {
        if (!p.args().isEmpty()) {
          sink.report(
              DiagnosticCode.BAD_ARGUMENT,
              TextRange.span(p.args().get(0).range(), p.args().get(p.args().size() - 1).range()),
              "'" + key + "' takes no value; write it alone on its line");
          continue;
        }
        params
            .computeIfAbsent(key, k -> new ArrayList<>())
            .add(new Value.Group(Map.of(), List.of(), p.range()));
        continue;
      }
      values
          .check(spec.get().shape(), p.args(), key, p.range())
          .ifPresent(g -> params.computeIfAbsent(key, k -> new ArrayList<>()).add(g));
    }
    // After a syntax error or a misused '=', what looks missing was most likely written but not
    // read.
    boolean incomplete =
        file.damaged(decl.range())
            || (decl.shorthand().isPresent() && kind != ElementKind.MATERIAL);
    if (!incomplete) {
      checkRequired(symbol, kind, decl, firstSeen.keySet());
      checkRules(symbol, kind, decl, firstSeen);
      KindChecks.check(sink, symbol, kind, decl, params, firstSeen);
    }
    if (kind == ElementKind.MATERIAL && params.containsKey(Param.TABLE.word())) {
      readTable(params);
    }
    return new ResolvedElement(symbol, kind, params);
  }

  /** Replaces the table's file name with its rows, read from the data file the loader found. */
  private void readTable(Map<String, List<Value.Group>> params) {
    Value.Group g = params.get(Param.TABLE.word()).get(0);
    if (!(g.slot("file").orElse(null) instanceof Value.Text name)) {
      return;
    }
    java.nio.file.Path target;
    try {
      target = file.path().getParent().resolve(name.text()).normalize();
    } catch (java.nio.file.InvalidPathException e) {
      target = null;
    }
    String text = target == null ? null : dataFiles.get(target);
    String problem = target == null ? null : dataFileProblems.get(target);
    if (text == null) {
      sink.report(
          DiagnosticCode.DATA_FILE_NOT_FOUND,
          name.range(),
          "table file '"
              + name.text()
              + (problem != null
                  ? "' cannot be read: " + problem
                  : "' not found in the project (paths are relative to this file)"));
      params.remove("table");
      return;
    }
    TableReader.read(target, text, sink.diagnostics)
        .ifPresentOrElse(
            rows ->
                params.put(
                    "table",
                    List.of(
                        new Value.Group(
                            tableSlots(name, new Value.Table(rows, name.range())),
                            List.of(),
                            g.range()))),
            () -> params.remove("table"));
  }

  /** A table's slots as written: file, then rows (not Map.of, whose order is salted per JVM). */
  private static Map<String, Value> tableSlots(Value file, Value rows) {
    Map<String, Value> slots = new LinkedHashMap<>();
    slots.put("file", file);
    slots.put("rows", rows);
    return slots;
  }

  /** Block lines as written, or the '=' shorthand split into lines at parameter names. */
  private List<Property> properties(ElementKind kind, Declaration decl) {
    if (decl.shorthand().isEmpty()) {
      return decl.properties();
    }
    List<Arg> args = decl.shorthand().get();
    if (kind != ElementKind.MATERIAL) {
      TextRange at = args.isEmpty() ? decl.name().range() : args.get(0).range();
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          at,
          "'=' gives a material in one line; write a block '{ ... }' for "
              + ShapeMatcher.article(kind.word()));
      return List.of();
    }
    List<Property> out = new ArrayList<>();
    Name key = null;
    List<Arg> current = new ArrayList<>();
    for (Arg a : args) {
      // '= index 1.5 k 0.001' reads '1.5 k' as a number with unit 'k'; 'k' is the next parameter.
      if (a instanceof Arg.QuantityArg q
          && q.unit().isPresent()
          && q.tolerance().isEmpty()
          && kind.param(q.unit().get().text()).isPresent()) {
        current.add(
            new Arg.QuantityArg(
                q.number(), Optional.empty(), Optional.empty(), q.number().range()));
        out.add(property(key, current, decl));
        key = new Name(q.unit().get().text(), q.unit().get().range());
        current = new ArrayList<>();
        continue;
      }
      if (a instanceof Arg.CommaArg && key != null) {
        continue; // '= index 1.5, k 0.001': commas only separate parameters here
      }
      if (a instanceof Arg.RefArg r
          && r.port().isEmpty()
          && kind.param(r.name().text()).isPresent()) {
        if (key != null || !current.isEmpty()) {
          out.add(property(key, current, decl));
        }
        key = r.name();
        current = new ArrayList<>();
      } else {
        current.add(a);
      }
    }
    if (key != null || !current.isEmpty()) {
      out.add(property(key, current, decl));
    }
    return out;
  }

  private static Property property(Name key, List<Arg> args, Declaration decl) {
    // A shorthand that starts with a plain name ('= water') means the catalog entry of that name.
    Name k =
        key != null
            ? key
            : new Name("catalog", args.isEmpty() ? decl.name().range() : args.get(0).range());
    TextRange end = args.isEmpty() ? k.range() : args.get(args.size() - 1).range();
    return new Property(k, args, TextRange.span(k.range(), end));
  }

  private void checkRequired(
      Symbol symbol, ElementKind kind, Declaration decl, java.util.Set<String> given) {
    for (ParamSpec p : kind.params()) {
      if (p.required() && !given.contains(p.name())) {
        sink.report(
            DiagnosticCode.MISSING_PARAMETER,
            decl.name().range(),
            kind.word() + " '" + symbol.name() + "' needs '" + p.name() + "' (" + p.doc() + ")");
      }
    }
    for (List<String> group : kind.rules().atLeastOneOf()) {
      if (group.stream().noneMatch(given::contains)) {
        sink.report(
            DiagnosticCode.MISSING_PARAMETER,
            decl.name().range(),
            kind.word()
                + " '"
                + symbol.name()
                + "' needs "
                + (group.size() == 1 ? "" : "one of ")
                + ShapeMatcher.quoteList(group));
      }
    }
  }

  private void checkRules(
      Symbol symbol, ElementKind kind, Declaration decl, Map<String, Property> given) {
    for (List<String> group : kind.rules().mutuallyExclusive()) {
      List<Property> present =
          group.stream()
              .filter(given::containsKey)
              .map(given::get)
              .sorted(java.util.Comparator.comparing(Property::range))
              .toList();
      for (int i = 1; i < present.size(); i++) {
        var d =
            sink.report(
                DiagnosticCode.CONFLICTING_PARAMETERS,
                present.get(i).key().range(),
                "'"
                    + present.get(i).key().text()
                    + "' and '"
                    + present.get(0).key().text()
                    + "' exclude each other in "
                    + kind.word()
                    + " '"
                    + symbol.name()
                    + "'; keep one");
        sink.replace(
            d,
            d.withRelated(
                new Related(
                    sink.file,
                    present.get(0).key().range(),
                    "'" + present.get(0).key().text() + "' is given here")));
      }
    }
  }
}
