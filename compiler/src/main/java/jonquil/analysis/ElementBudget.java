package jonquil.analysis;

import java.util.Map;

/** Where the power that reached one element went: out of each port, absorbed, or as ghosts. */
public record ElementBudget(
    String element, double in, Map<String, Double> out, double absorbed, double ghosts) {
  public ElementBudget {
    out = jonquil.source.InOrder.copyOf(out);
  }
}
