package jonquil.safety;

/**
 * Why it exists: the scale number of laser eyewear under a European eyewear standard, with the
 * laser's working mode and the test the filter must pass, so a finding can print the marking to
 * look for (e.g. "D 532 LB5") and what it was tested against.
 *
 * @param standard the standard and its table ("EN 207:2017, Annex B Table B.1")
 * @param mode working mode letter: D, I, R or M (EN 207), or "cw"/"pulsed" (EN 208)
 * @param level the scale number (LB or RB), at least 1
 * @param marking the marking to look for, e.g. "D 532 LB5" or "532 RB2"
 * @param exposure the power or energy (density) the level was chosen from, in SI
 * @param basis how that exposure was formed (aperture, corrections), for findings
 * @param testConditions the test the scale number certifies
 */
public record ProtectionLevel(
    String standard,
    String mode,
    int level,
    String marking,
    double exposure,
    String basis,
    String testConditions) {

  /** "EN 207 D 532 LB5 (...)": the level with its basis and test, for findings. */
  public String text() {
    return standard.substring(
            0, standard.indexOf(':') < 0 ? standard.length() : standard.indexOf(':'))
        + " "
        + marking
        + " ("
        + basis
        + "; test: "
        + testConditions
        + "; "
        + standard
        + ")";
  }
}
