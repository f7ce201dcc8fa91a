package jonquil.resolve;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import jonquil.source.TextRange;
import jonquil.units.Dimension;

/** A checked argument value, in SI units, with the range it was written at. */
public sealed interface Value {
  TextRange range();

  /** A quantity in SI units; the tolerance is a ± half-width in the same units. */
  record Num(double si, Dimension dimension, OptionalDouble tolerance, TextRange range)
      implements Value {}

  /** A word from a fixed list. */
  record Word(String text, TextRange range) implements Value {}

  /** A resolved name: a declaration, or an entry of the material catalog. */
  record Ref(Symbol symbol, TextRange range) implements Value {}

  /** A quoted string. */
  record Text(String text, TextRange range) implements Value {}

  /**
   * Tabulated optical constants read from a data file: wavelength (m), n and k, ascending in
   * wavelength.
   */
  record Table(java.util.List<double[]> rows, TextRange range) implements Value {
    public Table {
      rows = java.util.List.copyOf(rows);
    }
  }

  /** A parameter given without arguments ('polarizing'). */
  record Flag(TextRange range) implements Value {}

  /** Named parts of one parameter's value: slot name to value, plus repeated items in order. */
  record Group(Map<String, Value> slots, List<Group> items, TextRange range) implements Value {
    public Group {
      slots = jonquil.source.InOrder.copyOf(slots);
      items = List.copyOf(items);
    }

    public java.util.Optional<Value> slot(String name) {
      return java.util.Optional.ofNullable(slots.get(name));
    }

    public OptionalDouble number(String name) {
      return slots.get(name) instanceof Num n ? OptionalDouble.of(n.si()) : OptionalDouble.empty();
    }

    public java.util.Optional<String> word(String name) {
      return slots.get(name) instanceof Word w
          ? java.util.Optional.of(w.text())
          : java.util.Optional.empty();
    }
  }
}
