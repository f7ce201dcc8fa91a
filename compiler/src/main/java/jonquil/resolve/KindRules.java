package jonquil.resolve;

import java.util.List;

/**
 * Rules that span several parameters of one kind: at least one of a group must be given, and some
 * parameters exclude each other.
 */
public record KindRules(List<List<String>> atLeastOneOf, List<List<String>> mutuallyExclusive) {
  public static final KindRules NONE = new KindRules(List.of(), List.of());

  public KindRules {
    atLeastOneOf = List.copyOf(atLeastOneOf);
    mutuallyExclusive = List.copyOf(mutuallyExclusive);
  }
}
