package jonquil.resolve;

/** One parameter an element kind accepts: its name, its argument shape, and what it means. */
public record ParamSpec(
    Param param, Shape shape, boolean required, boolean repeatable, String doc) {
  public static ParamSpec optional(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, false, false, doc);
  }

  public static ParamSpec required(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, true, false, doc);
  }

  public static ParamSpec repeatable(Param param, Shape shape, String doc) {
    return new ParamSpec(param, shape, false, true, doc);
  }

  /** The parameter's spelling in a spec. */
  public String name() {
    return param.word();
  }
}
