package jonquil.resolve;

/** What role a declaration plays on the bench; decides where its name may be used. */
public enum Category {
  SOURCE("a source"),
  MATERIAL("a material"),
  COATING("a coating"),
  OPTIC("an optical element"),
  PROBE("a probe"),
  TERMINAL("a beam stop (dump or detector)"),
  TRAIN("a train");

  private final String phrase;

  Category(String phrase) {
    this.phrase = phrase;
  }

  public String phrase() {
    return phrase;
  }

  /** Things that can stand in a beam path. */
  public boolean placeable() {
    return this == SOURCE || this == OPTIC || this == PROBE || this == TERMINAL;
  }
}
