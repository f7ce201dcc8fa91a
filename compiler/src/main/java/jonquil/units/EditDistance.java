package jonquil.units;

/**
 * Edit distance for "did you mean" hints, where a wrong letter case ("mw" for "mW") counts as half
 * an edit: case is the commonest slip with unit symbols, and it must not tie with a real typo.
 */
final class EditDistance {
  /** Cost of inserting, deleting or replacing one character; a case-only change costs 1. */
  static final int EDIT = 2;

  private EditDistance() {}

  static int between(String a, String b) {
    int[] prev = new int[b.length() + 1];
    int[] cur = new int[b.length() + 1];
    for (int j = 0; j <= b.length(); j++) {
      prev[j] = j * EDIT;
    }
    for (int i = 1; i <= a.length(); i++) {
      cur[0] = i * EDIT;
      char ca = a.charAt(i - 1);
      for (int j = 1; j <= b.length(); j++) {
        char cb = b.charAt(j - 1);
        int replace =
            ca == cb ? 0 : Character.toLowerCase(ca) == Character.toLowerCase(cb) ? 1 : EDIT;
        cur[j] = Math.min(prev[j - 1] + replace, Math.min(prev[j], cur[j - 1]) + EDIT);
      }
      int[] t = prev;
      prev = cur;
      cur = t;
    }
    return prev[b.length()];
  }
}
