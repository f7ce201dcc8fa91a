package jonquil.resolve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Related;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.TrainDecl;
import jonquil.units.Dimension;

/**
 * Resolves the beam paths of a file's trains into a graph and checks that it is well formed: paths
 * start at a source or a port, every element sits in one place, ports exist and are followed at
 * most once, and paths end where the beam is stopped.
 */
final class TrainResolver {
  private final Sink sink;
  private final Scope scope;
  private final ElementRefs refs;
  private final ValueChecker values;

  /** Where each element is placed: the step that placed it. */
  private final Map<Symbol, ResolvedTrain.Element> placed = new LinkedHashMap<>();

  /** Output ports already followed, with where. */
  private final Map<String, TextRange> followedPorts = new HashMap<>();

  private final List<Pending> branches = new ArrayList<>();

  /** Faces light enters by, checked once every path is read (a path may enter before placing). */
  private final List<ResolvedTrain.PortRef> entries = new ArrayList<>();

  /** Elements named with a wrong port somewhere: whether their ports are followed is unknowable. */
  private final Set<Symbol> badPorts = new HashSet<>();

  private final jonquil.syntax.SpecFile file;

  private record Pending(ResolvedTrain.PortRef port) {}

  /** Two elements written next to each other, and the element or source whose light they get. */
  private record Adjacent(Symbol before, Symbol after, TextRange range, Symbol origin) {}

  private final List<Adjacent> adjacent = new ArrayList<>();

  /** The source or branching element each placed element's path starts from. */
  private final Map<Symbol, Symbol> originOf = new HashMap<>();

  TrainResolver(Sink sink, Scope scope, jonquil.syntax.SpecFile file) {
    this.refs = new ElementRefs(sink, scope);
    this.sink = sink;
    this.scope = scope;
    this.values = new ValueChecker(sink, scope);
    this.file = file;
  }

  List<ResolvedTrain> resolve(List<TrainDecl> trains) {
    List<ResolvedTrain> out = new ArrayList<>();
    for (TrainDecl train : trains) {
      if (train.paths().isEmpty()) {
        sink.report(
            DiagnosticCode.EMPTY_TRAIN,
            train.range(),
            "train"
                + train.name().map(n -> " '" + n.text() + "'").orElse("")
                + " has no beam paths");
      }
      List<ResolvedTrain.BeamPath> paths = new ArrayList<>();
      for (TrainDecl.BeamPath path : train.paths()) {
        path(path).ifPresent(paths::add);
      }
      out.add(new ResolvedTrain(sink.file, train.name().map(n -> n.text()), paths, train.range()));
    }
    checkBranches();
    checkEntries();
    checkUnfollowedPorts();
    checkDistances();
    return out;
  }

  /** Elements placed in some path, including sources; requirements warn about targets not here. */
  Set<Symbol> placedElements() {
    return placed.keySet();
  }

  private Optional<ResolvedTrain.BeamPath> path(TrainDecl.BeamPath path) {
    List<ResolvedTrain.Step> steps = new ArrayList<>();
    Optional<ResolvedTrain.PortRef> branchFrom = Optional.empty();
    Set<Symbol> inThisPath = new HashSet<>();
    List<TrainDecl.Step> written = path.steps();
    boolean damaged = file.damaged(path.range());
    Symbol previous = null;
    Symbol origin = null;
    for (int i = 0; i < written.size(); i++) {
      TrainDecl.Step step = written.get(i);
      boolean first = i == 0;
      boolean last = i == written.size() - 1;
      if (step instanceof TrainDecl.Distance d) {
        if (first) {
          sink.report(
              DiagnosticCode.PATH_START_NOT_SOURCE,
              d.range(),
              "a beam path cannot start with a distance: start it at a source, or at a port such as"
                  + " 'bs1.reflected'");
          return Optional.empty();
        }
        gap(d).ifPresent(steps::add);
        previous = null;
        if (last && !damaged) {
          sink.report(
              DiagnosticCode.PATH_ENDS_WITH_DISTANCE,
              d.range(),
              "the path ends in empty space after this distance: end it at a dump, a detector or a"
                  + " probe");
        }
        continue;
      }
      Arg.RefArg ref = ((TrainDecl.Place) step).ref();
      Optional<Symbol> symbol = placeable(ref);
      if (symbol.isEmpty()) {
        continue;
      }
      Symbol s = symbol.get();
      ElementKind kind = s.kind().orElseThrow();
      if (first) {
        origin = s;
      } else if (previous != null && origin != null) {
        adjacent.add(new Adjacent(previous, s, ref.range(), origin));
      }
      previous = s;
      if (origin != null && !first) {
        originOf.putIfAbsent(s, origin);
      }
      if (first && ref.port().isPresent()) {
        String word = ref.port().get().text();
        if (!kind.exits().contains(word)
            && kind.exits().size() > kind.ports().size()
            && (kind.ports().size() < 2 || Suggest.closest(word, kind.ports()).isEmpty())) {
          // A path may start at the returning light's exits too: suggest among all of them
          // (a word close to a forward port keeps the port's own message).
          badStart(ref, s, kind, word);
          inThisPath.add(s);
          continue;
        }
        Optional<String> leaving =
            kind.exits().contains(word) && !kind.ports().contains(word)
                ? Optional.of(word)
                : portOf(ref, kind);
        branchFrom = leaving.map(port -> new ResolvedTrain.PortRef(s, port, ref.range()));
        branchFrom.ifPresent(b -> branches.add(new Pending(b)));
        inThisPath.add(s);
        continue;
      }
      if (first && kind.category() != Category.SOURCE) {
        sink.report(
            DiagnosticCode.PATH_START_NOT_SOURCE,
            ref.range(),
            "a beam path starts at a source, or at an output port such as 'bs1.reflected'; '"
                + s.name()
                + "' is "
                + s.kindPhrase());
        return Optional.empty();
      }
      if (!first && kind.category() == Category.SOURCE) {
        sink.report(
            DiagnosticCode.SOURCE_INSIDE_PATH,
            ref.range(),
            "source '" + s.name() + "' can only start a path; a beam cannot pass through it");
        continue;
      }
      if (!first && ref.port().isPresent()) {
        String word = ref.port().get().text();
        boolean entryOnly = kind.entryFaces().contains(word) && !kind.ports().contains(word);
        if (placed.containsKey(s) || entryOnly) {
          entry(ref, s, kind, word, last).ifPresent(steps::add);
          continue;
        }
      }
      if (!inThisPath.add(s)) {
        sink.report(
            DiagnosticCode.ELEMENT_TWICE_IN_PATH,
            ref.range(),
            "'" + s.name() + "' appears twice in this path; " + reentryHint(s, kind));
        continue;
      }
      ResolvedTrain.Element already = placed.get(s);
      if (already != null) {
        var diag =
            sink.report(
                DiagnosticCode.ELEMENT_PLACED_TWICE,
                ref.range(),
                "'"
                    + s.name()
                    + "' is already placed in another path; "
                    + (kind.ports().size() > 1
                        ? "to continue from it, start a path at one of its ports, such as '"
                            + s.name()
                            + "."
                            + kind.ports().get(1)
                            + "'; "
                        : "")
                    + reentryHint(s, kind));
        sink.replace(
            diag, diag.withRelated(new Related(sink.file, already.range(), "placed here")));
        continue;
      }
      if (kind.category() == Category.TERMINAL && !last) {
        sink.report(
            DiagnosticCode.TERMINAL_INSIDE_PATH,
            ref.range(),
            kind.word()
                + " '"
                + s.name()
                + "' stops the beam, so nothing can follow it in the path");
      }
      String exit;
      if (ref.port().isPresent()) {
        Optional<String> port = portOf(ref, kind);
        if (port.isEmpty()) {
          continue;
        }
        exit = port.get();
      } else {
        exit = kind.ports().isEmpty() ? "" : kind.ports().get(0);
      }
      ResolvedTrain.Element element = new ResolvedTrain.Element(s, exit, ref.range());
      placed.put(s, element);
      if (!exit.isEmpty() && !last) {
        followedPorts.put(s.name() + "." + exit, ref.range());
      }
      steps.add(element);
      if (last
          && !damaged
          && kind.category() != Category.TERMINAL
          && kind.category() != Category.PROBE) {
        sink.report(
            DiagnosticCode.UNTERMINATED_BRANCH,
            ref.range(),
            "the beam leaving "
                + s.describe()
                + " goes nowhere: end the path at a dump, a detector or a probe"
                + " (until then its light counts as stray)");
      }
    }
    return Optional.of(new ResolvedTrain.BeamPath(branchFrom, steps, path.range()));
  }

  /** What to write instead of naming an element a second time. */
  private static String reentryHint(Symbol s, ElementKind kind) {
    if (kind.entryFaces().isEmpty()) {
      return "an element sits in one place; for another one, declare a second element";
    }
    return "to send light into it again, name the face it enters by, such as '"
        + s.name()
        + ".back' (its faces: "
        + ShapeMatcher.quoteList(kind.entryFaces())
        + ")";
  }

  /**
   * Light entering an element placed elsewhere by one of its faces; checked against the faces, and
   * remembered so that an element no path places is reported once every path is read.
   */
  private Optional<ResolvedTrain.Step> entry(
      Arg.RefArg ref, Symbol s, ElementKind kind, String face, boolean last) {
    List<String> faces = kind.entryFaces();
    TextRange at = ref.port().orElseThrow().range();
    if (!faces.contains(face)) {
      Optional<String> close = Suggest.closest(face, faces);
      badPorts.add(s);
      sink.report(
          DiagnosticCode.UNKNOWN_PORT,
          at,
          faces.isEmpty()
              ? s.kindPhrase()
                  + " '"
                  + s.name()
                  + "' is already placed; light cannot enter it again"
              : "'"
                  + s.name()
                  + "' is already placed, so light enters it again by one of its faces; it has no"
                  + " face '"
                  + face
                  + "'"
                  + Suggest.hintOr(close, "; its faces are " + ShapeMatcher.quoteList(faces)),
          Resolver.replacement(sink.file, at, face, close));
      return Optional.empty();
    }
    String exit = kind.exitFor(face, kind.ports().get(0));
    if (!last) {
      followedPorts.put(s.name() + "." + exit, ref.range());
    }
    entries.add(new ResolvedTrain.PortRef(s, face, ref.range()));
    return Optional.of(new ResolvedTrain.Entry(s, face, exit, ref.range()));
  }

  /** Every face entered must belong to an element some path places. */
  private void checkEntries() {
    for (ResolvedTrain.PortRef e : entries) {
      if (!placed.containsKey(e.element())) {
        sink.report(
            DiagnosticCode.ENTRY_INTO_UNPLACED,
            e.range(),
            "light enters '"
                + e.element().name()
                + "' by its "
                + e.port()
                + " face, but no path places '"
                + e.element().name()
                + "' in the beam; place it first, such as 'laser -> 100 mm -> "
                + e.element().name()
                + "'");
      }
    }
  }

  private Optional<ResolvedTrain.Step> gap(TrainDecl.Distance d) {
    Optional<Value.Num> length =
        values.quantity(
            d.length(), List.of(Dimension.LENGTH), Bounds.NON_NEGATIVE, "150 mm", "distance");
    Optional<Symbol> medium = Optional.empty();
    if (d.medium().isPresent()) {
      Optional<Value.Ref> ref =
          values.reference(d.medium().get(), List.of(Category.MATERIAL), "distance");
      if (ref.isEmpty()) {
        return Optional.empty();
      }
      medium = Optional.of(ref.get().symbol());
    }
    if (length.isEmpty()) {
      return Optional.empty();
    }
    OptionalDouble tol = length.get().tolerance();
    return Optional.of(new ResolvedTrain.Gap(length.get().si(), tol, medium, d.range()));
  }

  private Optional<Symbol> placeable(Arg.RefArg ref) {
    String name = ref.name().text();
    return refs.placeable(
        ref,
        DiagnosticCode.NOT_PLACEABLE,
        ", which cannot stand in a beam path"
            + (scope.lookup(name).map(Symbol::category).orElse(null) == Category.MATERIAL
                ? "; to run a distance in it, write '10 mm in " + name + "'"
                : ""));
  }

  /**
   * The port written after the name, checked; an element named with a bad port is remembered, so
   * its path is not followed.
   */
  /** A path starting at a port the element does not have, with the closest of its exits. */
  private void badStart(Arg.RefArg ref, Symbol s, ElementKind kind, String word) {
    TextRange at = ref.port().orElseThrow().range();
    // A one-port element's forward exit is not written: the path starts at its returning exits.
    List<String> starts =
        kind.ports().size() > 1
            ? kind.exits()
            : kind.exits().stream().filter(x -> !kind.ports().contains(x)).toList();
    Optional<String> close = Suggest.closest(word, starts);
    badPorts.add(s);
    sink.report(
        DiagnosticCode.UNKNOWN_PORT,
        at,
        kind.word()
            + " '"
            + s.name()
            + "' has no port '"
            + word
            + "' to start a path at"
            + close
                .map(c -> "; did you mean '" + c + "'?")
                .orElse("; its ports are " + ShapeMatcher.quoteList(starts)),
        Resolver.replacement(sink.file, at, word, close));
  }

  private Optional<String> portOf(Arg.RefArg ref, ElementKind kind) {
    Optional<String> port = refs.port(ref, kind);
    if (ref.port().isPresent() && port.isEmpty()) {
      scope.lookup(ref.name().text()).ifPresent(badPorts::add);
    }
    return port;
  }

  private void checkBranches() {
    for (Pending p : branches) {
      ResolvedTrain.PortRef port = p.port();
      if (!placed.containsKey(port.element())) {
        sink.report(
            DiagnosticCode.BRANCH_FROM_UNPLACED,
            port.range(),
            "this path branches from '"
                + port.element().name()
                + "', but no path places '"
                + port.element().name()
                + "' in the beam");
        continue;
      }
      String key = port.element().name() + "." + port.port();
      TextRange earlier = followedPorts.putIfAbsent(key, port.range());
      if (earlier != null) {
        var d =
            sink.report(
                DiagnosticCode.PORT_USED_TWICE,
                port.range(),
                "port '"
                    + key
                    + "' is already followed by another path; each output port feeds one path");
        sink.replace(d, d.withRelated(new Related(sink.file, earlier, "already followed here")));
      }
    }
  }

  /**
   * Two elements written with no distance between them: where the beam's size is known (its source
   * states a 'beam'), every size downstream depends on that distance, so it must be written ('0 mm'
   * for parts in contact) rather than taken as zero. Without a 'beam' line nothing depends on it
   * (no figure uses the beam's size and the ambient medium does not absorb).
   */
  private void checkDistances() {
    Map<Symbol, Symbol> sourceOf = new HashMap<>();
    for (Adjacent a : adjacent) {
      Symbol source = sourceOf(a.origin(), sourceOf);
      boolean sized =
          source.declaration().stream()
              .flatMap(d -> d.properties().stream())
              .anyMatch(p -> p.key().text().equals(Param.BEAM.word()));
      if (sized) {
        sink.report(
            DiagnosticCode.MISSING_DISTANCE,
            a.range(),
            "no distance between '"
                + a.before().name()
                + "' and '"
                + a.after().name()
                + "': the beam's size depends on it, so write it (such as '"
                + a.before().name()
                + " -> 20 mm -> "
                + a.after().name()
                + "', or '0 mm' for parts in contact)");
      }
    }
  }

  /**
   * Back along the branches to the path's source, however deep they nest (a broken graph may loop;
   * the walk stops where it would repeat), remembering the answer for every step passed.
   */
  private Symbol sourceOf(Symbol origin, Map<Symbol, Symbol> known) {
    List<Symbol> passed = new ArrayList<>();
    Set<Symbol> seen = new HashSet<>();
    Symbol at = origin;
    while (!known.containsKey(at) && originOf.containsKey(at) && seen.add(at)) {
      passed.add(at);
      at = originOf.get(at);
    }
    Symbol source = known.getOrDefault(at, at);
    passed.forEach(s -> known.put(s, source));
    return source;
  }

  private void checkUnfollowedPorts() {
    for (ResolvedTrain.Element e : placed.values()) {
      if (badPorts.contains(e.symbol())) {
        continue;
      }
      ElementKind kind = e.symbol().kind().orElseThrow();
      for (String port : kind.primaryPorts()) {
        String key = e.symbol().name() + "." + port;
        if (!followedPorts.containsKey(key)) {
          sink.report(
              DiagnosticCode.PORT_NOT_FOLLOWED,
              e.range(),
              "light leaving '"
                  + key
                  + "' is not followed by any path; add one such as '"
                  + key
                  + " -> 50 mm -> dump1' (until then it counts as stray)");
        }
      }
    }
  }
}
