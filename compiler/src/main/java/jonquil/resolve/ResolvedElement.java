package jonquil.resolve;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A declaration with its parameters checked: parameter name to its values (several if repeatable).
 * Code reads them through {@link Param}, so a parameter that no table names cannot be asked for.
 */
public record ResolvedElement(
    Symbol symbol, ElementKind kind, Map<String, List<Value.Group>> params) {
  public ResolvedElement {
    params = jonquil.source.InOrder.copyOf(params);
  }

  public Optional<Value.Group> param(Param p) {
    List<Value.Group> values = params.get(p.word());
    return values == null || values.isEmpty() ? Optional.empty() : Optional.of(values.get(0));
  }

  public List<Value.Group> all(Param p) {
    return params.getOrDefault(p.word(), List.of());
  }

  public boolean has(Param p) {
    return params.containsKey(p.word());
  }

  /**
   * The SI number in one slot of a parameter, e.g. number(Param.THICKNESS, "thickness"); a slot
   * that the parameter's shape never fills is a programming error and throws.
   */
  public OptionalDouble number(Param p, String slot) {
    p.checkSlot(slot);
    return param(p).map(g -> g.number(slot)).orElse(OptionalDouble.empty());
  }

  /** The word in one slot of a parameter ('multi' in 'order multi 5'). */
  public Optional<String> word(Param p, String slot) {
    p.checkSlot(slot);
    return param(p).flatMap(g -> g.word(slot));
  }

  /** The declaration or catalog entry named in one slot of a parameter. */
  public Optional<Symbol> ref(Param p, String slot) {
    p.checkSlot(slot);
    return param(p).flatMap(g -> g.slot(slot)).map(v -> ((Value.Ref) v).symbol());
  }

  /**
   * The vacuum wavelengths a source emits, one per laser line: its 'line' entries in order, or its
   * one 'wavelength' (a source without lines is a source of one line).
   */
  public List<Double> lineWavelengths() {
    List<Double> out = new java.util.ArrayList<>();
    for (Value.Group g : all(Param.LINE)) {
      g.number("wavelength").ifPresent(out::add);
    }
    if (out.isEmpty()) {
      number(Param.WAVELENGTH, "wavelength").ifPresent(out::add);
    }
    return List.copyOf(out);
  }

  /** Two written wavelengths name the same line when they agree to rounding (1e-9 relative). */
  public static boolean sameLine(double a, double b) {
    return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  }
}
