package jonquil.safety;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * How the eye meets the beam, which decides how the exposure, the NOHD and the eyewear are worked
 * out: the beam itself, its mirror image, or the light a rough surface scatters.
 */
public enum Viewing {
  /** Intrabeam viewing of the beam itself (a point source unless a subtense is stated). */
  DIRECT("direct", "intrabeam viewing of the direct beam"),
  /** Intrabeam viewing of a mirror-like reflection: the beam, scaled by the reflectance. */
  SPECULAR("specular", "intrabeam viewing of a specular (mirror-like) reflection"),
  /** Viewing a spot on a rough surface that scatters as a Lambertian reflector. */
  DIFFUSE("diffuse", "viewing a diffuse (Lambertian) reflection of the beam");

  private final String word;
  private final String description;

  Viewing(String word, String description) {
    this.word = word;
    this.description = description;
  }

  /** The word a requirement writes after 'for viewing'. */
  public String word() {
    return word;
  }

  /** What the finding says the figure assumed. */
  public String description() {
    return description;
  }

  /** The viewing a word names. */
  public static Optional<Viewing> byWord(String word) {
    return Arrays.stream(values()).filter(v -> v.word.equals(word)).findFirst();
  }

  /** Every word, in declaration order, for messages. */
  public static List<String> words() {
    return Arrays.stream(values()).map(Viewing::word).toList();
  }
}
