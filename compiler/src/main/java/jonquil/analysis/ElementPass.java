package jonquil.analysis;

import jonquil.optics.Coherency;

/**
 * One pass of light through an element, in the order light takes them: the face it entered by
 * ({@code front} for the first pass's way), whether it ran against the first pass's direction, and
 * the light in and out summed over lines, in the table frame.
 */
public record ElementPass(
    String element, String face, boolean backward, Coherency in, Coherency out) {
  public double powerIn() {
    return in.power();
  }

  public double powerOut() {
    return out.power();
  }
}
