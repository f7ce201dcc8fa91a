package jonquil.diag;

/** How much a finding matters: errors and failed requirements fail the CI gate. */
public enum Severity {
  ERROR("error"),
  WARNING("warning"),
  NOTE("note");

  private final String word;

  Severity(String word) {
    this.word = word;
  }

  /** The lower-case word used in text output, JSON and golden files. */
  public String word() {
    return word;
  }
}
