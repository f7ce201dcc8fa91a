package jonquil.resolve;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A declaration with its parameters checked: parameter name to its values (several if repeatable).
 */
public record ResolvedElement(
    Symbol symbol, ElementKind kind, Map<String, List<Value.Group>> params) {
  public ResolvedElement {
    params = Map.copyOf(params);
  }

  public Optional<Value.Group> param(String name) {
    List<Value.Group> values = params.get(name);
    return values == null || values.isEmpty() ? Optional.empty() : Optional.of(values.get(0));
  }

  public List<Value.Group> all(String name) {
    return params.getOrDefault(name, List.of());
  }

  public boolean has(String name) {
    return params.containsKey(name);
  }

  /** The SI number in one slot of a parameter, e.g. number("thickness", "thickness"). */
  public OptionalDouble number(String param, String slot) {
    return param(param).map(g -> g.number(slot)).orElse(OptionalDouble.empty());
  }
}
