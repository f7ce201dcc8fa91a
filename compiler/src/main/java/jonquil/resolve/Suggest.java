package jonquil.resolve;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean ...?" by edit distance, for names, kinds, parameters and units. */
public final class Suggest {
  private Suggest() {}

  /** The closest candidate within a distance that scales with the word's length, if any. */
  public static Optional<String> closest(String word, Collection<String> candidates) {
    String w = word.toLowerCase(Locale.ROOT);
    String best = null;
    int bestDistance = Integer.MAX_VALUE;
    for (String c : candidates) {
      int d = distance(w, c.toLowerCase(Locale.ROOT));
      if (d < bestDistance || (d == bestDistance && best != null && c.compareTo(best) < 0)) {
        best = c;
        bestDistance = d;
      }
    }
    int allowed = Math.max(1, Math.min(3, w.length() / 3));
    return best != null && bestDistance <= allowed && bestDistance > 0
        ? Optional.of(best)
        : Optional.empty();
  }

  /** "; did you mean 'x'?" or nothing. */
  public static String hint(String word, Collection<String> candidates) {
    return hintOr(closest(word, candidates), "");
  }

  /** "; did you mean 'x'?" for the closest name found, else {@code otherwise} (e.g. the list). */
  public static String hintOr(java.util.Optional<String> close, String otherwise) {
    return close.map(s -> "; did you mean '" + s + "'?").orElse(otherwise);
  }

  /** Optimal string alignment distance (Levenshtein plus adjacent transpositions). */
  static int distance(String a, String b) {
    int[][] d = new int[a.length() + 1][b.length() + 1];
    for (int i = 0; i <= a.length(); i++) {
      d[i][0] = i;
    }
    for (int j = 0; j <= b.length(); j++) {
      d[0][j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      for (int j = 1; j <= b.length(); j++) {
        int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
        d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
        if (i > 1
            && j > 1
            && a.charAt(i - 1) == b.charAt(j - 2)
            && a.charAt(i - 2) == b.charAt(j - 1)) {
          d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
        }
      }
    }
    return d[a.length()][b.length()];
  }
}
