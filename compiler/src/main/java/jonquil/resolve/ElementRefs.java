package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import jonquil.syntax.Arg;

/**
 * An element named in a beam path or a requirement ('pbs', 'pbs.reflected'): looked up in scope
 * with a did-you-mean when unknown, recorded as a reference, and its port checked against the
 * kind's ports. One place, so a path and a requirement word a slip alike.
 */
record ElementRefs(Sink sink, Scope scope) {
  /**
   * The symbol, when it names something that can stand in a beam path; otherwise reported with
   * {@code code} as "'name' is a material" followed by {@code why}, and empty.
   */
  Optional<Symbol> placeable(Arg.RefArg ref, jonquil.diag.DiagnosticCode code, String why) {
    Optional<Symbol> found = lookup(ref);
    if (found.isEmpty()) {
      return Optional.empty();
    }
    Symbol s = found.get();
    if (!s.category().placeable() || s.kind().isEmpty()) {
      sink.report(
          code, ref.name().range(), "'" + ref.name().text() + "' is " + s.kindPhrase() + why);
      return Optional.empty();
    }
    return found;
  }

  /**
   * The symbol the name refers to, recorded as a reference; empty (reported) when no such name
   * exists.
   */
  Optional<Symbol> lookup(Arg.RefArg ref) {
    String name = ref.name().text();
    Optional<Symbol> found = scope.lookup(name);
    if (found.isEmpty()) {
      var candidates =
          scope.namesOf(
              List.of(Category.SOURCE, Category.OPTIC, Category.PROBE, Category.TERMINAL));
      sink.report(
          jonquil.diag.DiagnosticCode.UNDEFINED_NAME,
          ref.name().range(),
          "unknown element '" + name + "'" + Suggest.hint(name, candidates),
          Resolver.replacement(
              sink.file, ref.name().range(), name, Suggest.closest(name, candidates)));
      return Optional.empty();
    }
    sink.refs.add(new ResolvedRef(sink.file, ref.name().range(), found.get()));
    return found;
  }

  /**
   * The port written after the name, if it is one of the kind's ports. Empty when none was written,
   * or (reported) when the kind has at most one output or no port of that name.
   */
  Optional<String> port(Arg.RefArg ref, ElementKind kind) {
    if (ref.port().isEmpty()) {
      return Optional.empty();
    }
    String name = ref.name().text();
    String port = ref.port().get().text();
    List<String> ports = kind.ports();
    String element = kind.word() + " '" + name + "'";
    if (ports.size() <= 1) {
      sink.report(
          jonquil.diag.DiagnosticCode.PORT_ON_ELEMENT_WITHOUT_PORTS,
          ref.port().get().range(),
          element
              + (ports.isEmpty()
                  ? " stops the beam and has no output port"
                  : " has a single output")
              + "; write '"
              + name
              + "' without a port");
      return Optional.empty();
    }
    if (!ports.contains(port)) {
      Optional<String> close = Suggest.closest(port, ports);
      sink.report(
          jonquil.diag.DiagnosticCode.UNKNOWN_PORT,
          ref.port().get().range(),
          element
              + " has no port '"
              + port
              + "'"
              + Suggest.hintOr(close, "; its ports are " + ShapeMatcher.quoteList(ports)),
          Resolver.replacement(sink.file, ref.port().get().range(), port, close));
      return Optional.empty();
    }
    return Optional.of(port);
  }
}
