package jonquil.resolve;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import jonquil.diag.Diagnostic;

/**
 * The spec rooted at one file, with names, units and parameters checked: its elements, trains and
 * requirements, plus a side table of every name reference (for navigation). The syntax trees are
 * untouched; everything learned lives here. The ambient is the medium between elements; the
 * standard is the laser-safety standard that gates the safety requirements.
 */
public record ResolvedModel(
    Path root,
    Map<Path, Scope> scopes,
    Map<Symbol, ResolvedElement> elements,
    List<ResolvedTrain> trains,
    List<ResolvedRequirement> requirements,
    List<ResolvedRef> references,
    List<Diagnostic> diagnostics,
    Ambient ambient,
    SafetyStandard standard) {

  public ResolvedModel {
    scopes = jonquil.source.InOrder.copyOf(scopes);
    elements = jonquil.source.InOrder.copyOf(elements);
    trains = List.copyOf(trains);
    requirements = List.copyOf(requirements);
    references = List.copyOf(references);
    diagnostics = List.copyOf(diagnostics);
    java.util.Objects.requireNonNull(ambient, "ambient");
    java.util.Objects.requireNonNull(standard, "standard");
  }

  /** The same model gated by another standard ('check --standard' overrides the spec's line). */
  public ResolvedModel withStandard(SafetyStandard other) {
    return new ResolvedModel(
        root, scopes, elements, trains, requirements, references, diagnostics, ambient, other);
  }

  /** The checked element behind a symbol (empty for catalog entries and broken declarations). */
  public Optional<ResolvedElement> element(Symbol symbol) {
    return Optional.ofNullable(elements.get(symbol));
  }

  /** The checked element declared under this name and visible from the root file. */
  public Optional<ResolvedElement> element(String name) {
    Scope scope = scopes.get(root);
    return scope == null ? Optional.empty() : scope.lookup(name).flatMap(this::element);
  }
}
