package jonquil.analysis;

/** Outcome of one requirement. */
public enum RequirementStatus {
  PASS("pass"),
  FAIL("fail"),
  /**
   * The checker cannot compute the quantity yet, or the spec has errors that prevent it. Not met:
   * the gate fails closed (J613, or the errors themselves).
   */
  NOT_EVALUATED("not-evaluated");

  private final String word;

  RequirementStatus(String word) {
    this.word = word;
  }

  public String word() {
    return word;
  }
}
