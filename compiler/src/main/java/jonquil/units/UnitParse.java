package jonquil.units;

import java.util.Objects;

/**
 * The outcome of reading a unit: a failure is an ordinary value with a message for people, never an
 * exception.
 */
public sealed interface UnitParse {
  /** The text named a unit. */
  record Ok(Unit unit) implements UnitParse {
    public Ok {
      Objects.requireNonNull(unit, "unit");
    }
  }

  /**
   * The text did not name a unit; {@code message} is one plain-English sentence fit for a
   * diagnostic.
   */
  record Failure(String message) implements UnitParse {
    public Failure {
      Objects.requireNonNull(message, "message");
    }
  }
}
