package jonquil.safety;

import java.util.Objects;
import java.util.Optional;

/**
 * Why it exists: a safety figure is either a value with the standard/table it came from, or "not
 * evaluated" with a reason; a caller can never mistake a gap in coverage for a number.
 *
 * @param value the value, empty when not evaluated
 * @param reason why it was not evaluated (empty string when evaluated)
 * @param standard standard, edition and table/clause the value (or the refusal) refers to
 * @param caution text that must accompany the figure wherever it is shown
 * @param atLeast when not evaluated, what is nevertheless known: the figure is at least this (a
 *     class above Class 3R is at least Class 3B), so a bound it already breaks can fail
 */
public record Outcome<T>(
    Optional<T> value, String reason, String standard, String caution, Optional<T> atLeast) {

  /** Caution carried by every MPE, AEL/class, NOHD and OD result. */
  public static final String CAUTION =
      "Computed estimate only: a qualified laser safety officer must confirm it under the"
          + " applicable standard and local regulations; this tool does not replace a hazard"
          + " evaluation.";

  public Outcome {
    Objects.requireNonNull(value, "value");
    Objects.requireNonNull(reason, "reason");
    Objects.requireNonNull(standard, "standard");
    Objects.requireNonNull(caution, "caution");
    Objects.requireNonNull(atLeast, "atLeast");
    if (value.isEmpty() && reason.isBlank()) {
      throw new IllegalArgumentException("a not-evaluated outcome needs a reason");
    }
  }

  /** Without a known lower bound. */
  public Outcome(Optional<T> value, String reason, String standard, String caution) {
    this(value, reason, standard, caution, Optional.empty());
  }

  /** An evaluated value, with the standard/table it came from and the safety caution. */
  public static <T> Outcome<T> of(T value, String standard) {
    return new Outcome<>(Optional.of(value), "", standard, CAUTION);
  }

  /** Not evaluated, with the reason and the standard whose coverage was checked. */
  public static <T> Outcome<T> notEvaluated(String reason, String standard) {
    return new Outcome<>(Optional.empty(), reason, standard, CAUTION);
  }

  /** Not evaluated, but known to be at least {@code floor}. */
  public static <T> Outcome<T> notEvaluatedAtLeast(T floor, String reason, String standard) {
    return new Outcome<>(Optional.empty(), reason, standard, CAUTION, Optional.of(floor));
  }

  public boolean evaluated() {
    return value.isPresent();
  }

  /** The value; throws if not evaluated (the message carries the reason). */
  public T get() {
    return value.orElseThrow(() -> new IllegalStateException("not evaluated: " + reason));
  }

  /** Same outcome with a different caution text (used for non-safety-limit figures). */
  Outcome<T> withCaution(String otherCaution) {
    return new Outcome<>(value, reason, standard, otherCaution, atLeast);
  }
}
