package jonquil.syntax;

import java.util.List;
import java.util.Optional;
import jonquil.source.TextRange;

/**
 * One line of a {@code require} block: a measure at a place, a condition, optional extra
 * conditions, an optional wavelength band, and optionally a yield over tolerances.
 */
public record Requirement(Optional<Yield> yield, Check check, String text, TextRange range) {

  /**
   * {@code yield >= 99 % for ...}: the fraction of toleranced builds that must pass, optionally
   * with how many builds to draw ({@code yield >= 99 % over 2000 builds for ...}).
   */
  public record Yield(Comparator comparator, Arg bound, Optional<Builds> builds, TextRange range) {
    public Yield(Comparator comparator, Arg bound, TextRange range) {
      this(comparator, bound, Optional.empty(), range);
    }
  }

  /** {@code over 2000 builds}: the count and the word after it, as written. */
  public record Builds(Arg.NumberLit count, Name word, TextRange range) {}

  /** The core of a requirement. */
  public record Check(
      Measure measure,
      List<Place> places,
      Optional<Condition> condition,
      List<Extra> extras,
      Optional<Band> band,
      TextRange range) {
    public Check {
      places = List.copyOf(places);
      extras = List.copyOf(extras);
    }
  }

  /** What is measured, as one or more words ({@code power}, {@code margin damage}). */
  public record Measure(List<Name> words, TextRange range) {
    public Measure {
      words = List.copyOf(words);
    }

    public String text() {
      return String.join(" ", words.stream().map(Name::text).toList());
    }
  }

  /** Where it is measured. */
  public sealed interface Place {
    TextRange range();
  }

  /** {@code at trap}. */
  public record At(Arg.RefArg target, TextRange range) implements Place {}

  /** {@code everywhere}. */
  public record Everywhere(TextRange range) implements Place {}

  /** {@code from a to b}. */
  public record Between(Arg.RefArg from, Arg.RefArg to, TextRange range) implements Place {}

  /**
   * {@code for line 532 nm}: which line of a source the requirement judges. Written among the
   * places because it narrows where the light is looked at; {@code word} is checked later.
   */
  public record ForLine(Name word, Arg wavelength, TextRange range) implements Place {}

  /** The bound. */
  public sealed interface Condition {
    TextRange range();
  }

  /**
   * {@code >= 400 mW}; {@code >= 40 deg right}: a handedness after the bound, which only an
   * ellipticity bound takes.
   */
  public record Compare(
      Comparator comparator, Arg value, Optional<Name> handedness, TextRange range)
      implements Condition {
    public Compare(Comparator comparator, Arg value, TextRange range) {
      this(comparator, value, Optional.empty(), range);
    }
  }

  /** {@code in 400 mW .. 600 mW}. */
  public record Within(Arg low, Arg high, TextRange range) implements Condition {}

  /** {@code is linear 90 deg ± 2 deg}. */
  public record Is(List<Arg> state, TextRange range) implements Condition {
    public Is {
      state = List.copyOf(state);
    }
  }

  /** {@code , extinction >= 100}: a further condition on the same place. */
  public record Extra(Optional<Measure> measure, Condition condition, TextRange range) {}

  /** {@code over wavelength 1060 nm .. 1070 nm}. */
  public record Band(Name quantity, Arg low, Arg high, TextRange range) {}

  /** Comparison operators. */
  public enum Comparator {
    LE("<="),
    GE(">="),
    LT("<"),
    GT(">"),
    EQ("==");

    private final String symbol;

    Comparator(String symbol) {
      this.symbol = symbol;
    }

    public String symbol() {
      return symbol;
    }
  }
}
