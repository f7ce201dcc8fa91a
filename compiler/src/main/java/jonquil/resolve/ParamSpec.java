package jonquil.resolve;

import java.util.Optional;

/**
 * One parameter of an element kind's table: its name, its argument shape, and what it means; or a
 * parameter the language knows but refuses wherever it is written, with the reason (J410), since
 * Jonquil does not model its effect and a value accepted and ignored would mislead.
 */
public record ParamSpec(
    Param param,
    Shape shape,
    boolean required,
    boolean repeatable,
    String doc,
    Optional<String> refusal) {
  public static ParamSpec optional(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, false, false, doc, Optional.empty());
  }

  public static ParamSpec required(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, true, false, doc, Optional.empty());
  }

  public static ParamSpec repeatable(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, false, true, doc, Optional.empty());
  }

  /** A parameter refused wherever written, {@code why} saying what is not modelled. */
  public static ParamSpec refused(Param param, Shape shape, String doc, String why) {
    return new ParamSpec(param, shape, false, false, doc, Optional.of(why));
  }

  /** Whether the kind takes this parameter (it is not refused). */
  public boolean taken() {
    return refusal.isEmpty();
  }

  /** The parameter's spelling in a spec. */
  public String name() {
    return param.word();
  }
}
