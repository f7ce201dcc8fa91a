package jonquil.resolve;

/** One parameter an element kind accepts: its name, its argument shape, and what it means. */
public record ParamSpec(
    String name, Shape shape, boolean required, boolean repeatable, String doc) {
  public static ParamSpec optional(String name, Shape shape, String doc) {
    return new ParamSpec(name, shape, false, false, doc);
  }

  public static ParamSpec required(String name, Shape shape, String doc) {
    return new ParamSpec(name, shape, true, false, doc);
  }

  public static ParamSpec repeatable(String name, Shape shape, String doc) {
    return new ParamSpec(name, shape, false, true, doc);
  }
}
