package jonquil.analysis;

import java.util.Optional;
import jonquil.analysis.RequirementEvaluator.Verdict;
import jonquil.optics.Coherency;
import jonquil.resolve.ResolvedRequirement.Criterion;

/**
 * A bound on ellipticity: without a handedness on the size of the ellipticity angle, with one
 * ({@code >= 40 deg right}) on the size and the sense of rotation both.
 */
final class EllipticityBound {
  private EllipticityBound() {}

  static Verdict judge(Criterion c, Coherency light) {
    double chi = light.ellipticityAngle();
    Verdict size = RequirementEvaluator.compare(c, Math.abs(chi), "rad", "");
    Optional<String> hand = c.state().flatMap(g -> g.word("handedness"));
    if (hand.isEmpty()) {
      return size.withText("magnitude of the ellipticity angle");
    }
    // The angle counted positive in the stated sense: light of the other hand (or none) has
    // broken the bound by that much, whatever its size.
    double signed = hand.get().equals("left") ? -chi : chi;
    return RequirementEvaluator.verdict(
        size.pass() && signed > 0,
        signed,
        size.bound(),
        Math.min(size.margin(), signed),
        "rad",
        "ellipticity angle counted positive when "
            + hand.get()
            + "-handed; "
            + light.handedness().describe());
  }
}
