package jonquil.resolve;

import java.util.Arrays;

/**
 * The forms a written polarization state takes ('linear 0 deg', 'circular right', ...), so that
 * code reading a state dispatches over a closed list rather than over strings.
 */
public enum StateForm {
  LINEAR("linear"),
  CIRCULAR("circular"),
  ELLIPTICAL("elliptical"),
  UNPOLARIZED("unpolarized");

  private final String word;

  StateForm(String word) {
    this.word = word;
  }

  public String word() {
    return word;
  }

  /** The form of a checked state ('form' slot of {@code KindTables.STATE}). */
  public static StateForm of(Value.Group state) {
    String written = state.word("form").orElse(UNPOLARIZED.word);
    return Arrays.stream(values())
        .filter(f -> f.word.equals(written))
        .findFirst()
        .orElseThrow(() -> new IllegalArgumentException("no polarization form '" + written + "'"));
  }
}
