package jonquil.resolve;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.safety.ExposureDuration;
import jonquil.safety.Viewing;

/**
 * How a safety requirement says the light meets the eye: 'for viewing diffuse', 'for duration 10
 * s', 'for reflectance 90 %', 'for subtense 5 mrad', 'for distance 20 cm'. What is not written
 * stays empty and the analysis takes the standard's default, saying which.
 *
 * @param viewing direct, specular or diffuse; empty means direct
 * @param duration the stated exposure duration, with where it was stated
 * @param reflectance ρ of the specular or diffuse reflector, 0 to 1
 * @param subtense the apparent source's angular subtense α, rad (direct or specular viewing)
 * @param distance the eye's distance from a diffuse spot, m
 */
public record ViewingTerms(
    Optional<Viewing> viewing,
    Optional<ExposureDuration> duration,
    OptionalDouble reflectance,
    OptionalDouble subtense,
    OptionalDouble distance) {

  /** The words after 'for' that state how the light is viewed, in the order messages list them. */
  public static final List<String> WORDS =
      List.of("viewing", "duration", "reflectance", "subtense", "distance");

  /** What each word of {@link #WORDS} states, with an example, for messages and completion. */
  public static String example(String word) {
    return switch (word) {
      case "viewing" -> "how the light meets the eye: for viewing direct | specular | diffuse";
      case "duration" -> "the exposure duration: for duration 10 s, or for duration deliberate";
      case "reflectance" ->
          "the reflector's reflectance (specular or diffuse): for reflectance 90 %";
      case "subtense" -> "the apparent source's angular subtense: for subtense 5 mrad";
      case "distance" -> "the eye's distance from a diffuse spot: for distance 20 cm";
      default -> throw new IllegalArgumentException("not a viewing word: " + word);
    };
  }

  /** Nothing stated. */
  public static final ViewingTerms NONE =
      new ViewingTerms(
          Optional.empty(),
          Optional.empty(),
          OptionalDouble.empty(),
          OptionalDouble.empty(),
          OptionalDouble.empty());

  /** The viewing, direct when none is written. */
  public Viewing viewingOrDirect() {
    return viewing.orElse(Viewing.DIRECT);
  }
}
