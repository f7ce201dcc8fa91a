package jonquil.syntax;

import java.util.Optional;
import jonquil.source.TextRange;

/** One argument in a property, a train step or a requirement. */
public sealed interface Arg {
  TextRange range();

  /** A number as written: its value and its literal text. */
  record NumberLit(double value, String text, TextRange range) {}

  /** A unit as written after a number, in compact form without spaces ({@code kW/cm2}). */
  record UnitLit(String text, TextRange range) {}

  /** {@code ± 0.5 deg}: the unit may be omitted, in which case it is the value's unit. */
  record Tolerance(NumberLit number, Optional<UnitLit> unit, TextRange range) {}

  /** {@code 22.5 deg ± 0.5 deg}, {@code 1000}, {@code OD 3}. */
  record QuantityArg(
      NumberLit number, Optional<UnitLit> unit, Optional<Tolerance> tolerance, TextRange range)
      implements Arg {}

  /** A name, a keyword used as a word, or {@code element.port}. */
  record RefArg(Name name, Optional<Name> port, TextRange range) implements Arg {
    public String text() {
      return port.map(p -> name.text() + "." + p.text()).orElse(name.text());
    }
  }

  /** A quoted string, unescaped. */
  record StringArg(String value, TextRange range) implements Arg {}

  /** A comma separating groups of arguments. */
  record CommaArg(TextRange range) implements Arg {}

  /** {@code 400 mW .. 600 mW}. */
  record RangeArg(Arg low, Arg high, TextRange range) implements Arg {}
}
