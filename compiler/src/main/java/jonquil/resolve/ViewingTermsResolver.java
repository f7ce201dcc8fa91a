package jonquil.resolve;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import jonquil.diag.DiagnosticCode;
import jonquil.safety.ExposureDuration;
import jonquil.safety.Viewing;
import jonquil.syntax.Arg;
import jonquil.syntax.Requirement;
import jonquil.units.Dimension;

/**
 * Reads the 'for viewing …', 'for duration …', 'for reflectance …', 'for subtense …' and 'for
 * distance …' places of a safety requirement into {@link ViewingTerms}, refusing what its measure
 * or its viewing would not use (nothing accepted is ignored).
 */
final class ViewingTermsResolver {
  static final List<String> WORDS = ViewingTerms.WORDS;

  static final String EXAMPLES =
      "'for viewing diffuse', 'for duration 10 s', 'for reflectance 90 %', 'for subtense 5 mrad',"
          + " 'for distance 20 cm'";

  private final Sink sink;
  private final ValueChecker values;

  ViewingTermsResolver(Sink sink, ValueChecker values) {
    this.sink = sink;
    this.values = values;
  }

  ViewingTerms resolve(List<Requirement.ForLine> written, Optional<Measure> measure) {
    if (written.isEmpty()) {
      return ViewingTerms.NONE;
    }
    Set<String> seen = new HashSet<>();
    Optional<Viewing> viewing = Optional.empty();
    Optional<ExposureDuration> duration = Optional.empty();
    OptionalDouble reflectance = OptionalDouble.empty();
    OptionalDouble subtense = OptionalDouble.empty();
    OptionalDouble distance = OptionalDouble.empty();
    for (Requirement.ForLine f : written) {
      String word = f.word().text();
      if (!seen.add(word)) {
        sink.report(
            DiagnosticCode.UNEXPECTED_PLACE, f.range(), "'for " + word + "' is given twice");
        continue;
      }
      if (measure.isPresent() && !applies(measure.get(), word, f)) {
        continue;
      }
      switch (word) {
        case "viewing" -> viewing = viewing(f);
        case "duration" -> duration = duration(f);
        case "reflectance" -> reflectance = number(f, List.of(Dimension.DIMENSIONLESS), true);
        case "subtense" -> subtense = number(f, List.of(Dimension.ANGLE), false);
        default -> distance = number(f, List.of(Dimension.LENGTH), false);
      }
    }
    Viewing v = viewing.orElse(Viewing.DIRECT);
    if (reflectance.isPresent() && v == Viewing.DIRECT) {
      conflict(
          written,
          "reflectance",
          "a reflectance belongs to 'for viewing specular' or"
              + " 'for viewing diffuse'; the direct beam has none");
      reflectance = OptionalDouble.empty();
    }
    if (distance.isPresent() && v != Viewing.DIFFUSE) {
      conflict(
          written,
          "distance",
          "a viewing distance belongs to 'for viewing diffuse'; the"
              + " direct or specular beam is judged where the requirement places it");
      distance = OptionalDouble.empty();
    }
    if (subtense.isPresent() && v == Viewing.DIFFUSE) {
      conflict(
          written,
          "subtense",
          "with diffuse viewing the apparent source is the illuminated"
              + " spot, computed from the beam and the distance; remove 'for subtense'");
      subtense = OptionalDouble.empty();
    }
    return new ViewingTerms(viewing, duration, reflectance, subtense, distance);
  }

  /** Whether the measure uses this word; reports J420 when not. */
  private boolean applies(Measure m, String word, Requirement.ForLine f) {
    String why;
    if (m == Measure.HAZARD_CLASS) {
      why =
          "a hazard class is fixed by the standard's own time bases and measurement"
              + " conditions, not by how the beam is viewed";
    } else if (!m.viewed()) {
      why = "only 'exposure', 'nohd' and 'eyewear od' depend on how the light is viewed";
    } else if (m == Measure.NOHD && word.equals("subtense")) {
      why =
          "an NOHD is worked out for a point source (C6 = 1), which is never lenient;"
              + " state the subtense on an 'exposure' or 'eyewear od' requirement";
    } else if (m == Measure.NOHD && word.equals("distance")) {
      why =
          "the NOHD is itself the distance; 'for distance' sets where an 'exposure' or"
              + " 'eyewear od' requirement views a diffuse spot";
    } else {
      why = null;
    }
    if (why == null) {
      return true;
    }
    sink.report(
        DiagnosticCode.VIEWING_NOT_APPLICABLE,
        f.range(),
        "'for " + word + "' does not apply to '" + m.word() + "': " + why);
    return false;
  }

  private void conflict(List<Requirement.ForLine> written, String word, String message) {
    written.stream()
        .filter(f -> f.word().text().equals(word))
        .findFirst()
        .ifPresent(f -> sink.report(DiagnosticCode.CONFLICTING_PARAMETERS, f.range(), message));
  }

  private Optional<Viewing> viewing(Requirement.ForLine f) {
    String written =
        f.wavelength() instanceof Arg.RefArg r && r.port().isEmpty() ? r.name().text() : null;
    Optional<Viewing> v = written == null ? Optional.empty() : Viewing.byWord(written);
    if (v.isEmpty()) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          f.wavelength().range(),
          "the viewing is one of "
              + String.join(", ", Viewing.words())
              + (written == null ? "" : "; '" + written + "' is not")
              + Suggest.hint(written == null ? "" : written, Viewing.words()));
    }
    return v;
  }

  private Optional<ExposureDuration> duration(Requirement.ForLine f) {
    if (f.wavelength() instanceof Arg.RefArg r
        && r.port().isEmpty()
        && r.name().text().equals("deliberate")) {
      return Optional.of(ExposureDuration.deliberate());
    }
    if (!(f.wavelength() instanceof Arg.QuantityArg q)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          f.wavelength().range(),
          "an exposure duration is a time such as '10 s', or 'deliberate' for a working day");
      return Optional.empty();
    }
    return values
        .quantity(
            q,
            List.of(Dimension.TIME),
            new Bounds(0, false, ExposureDuration.DELIBERATE, true, false),
            "10 s",
            "duration")
        .map(n -> ExposureDuration.stated(n.si(), "on the requirement"));
  }

  private OptionalDouble number(Requirement.ForLine f, List<Dimension> dims, boolean ratio) {
    String word = f.word().text();
    if (!(f.wavelength() instanceof Arg.QuantityArg q)) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          f.wavelength().range(),
          "'for " + word + "' takes a number, e.g. " + EXAMPLES);
      return OptionalDouble.empty();
    }
    if (q.tolerance().isPresent()) {
      sink.report(
          DiagnosticCode.BAD_ARGUMENT,
          q.tolerance().get().range(),
          "a tolerance has no meaning on 'for " + word + "', which is exact");
      return OptionalDouble.empty();
    }
    Optional<Value.Num> n =
        ratio
            ? values.ratio(q, Bounds.closed(0, 1), word)
            : values.quantity(
                q,
                dims,
                word.equals("subtense") ? Bounds.closed(0, Math.PI) : Bounds.POSITIVE,
                word.equals("subtense") ? "5 mrad" : "20 cm",
                word);
    return n.isPresent() ? OptionalDouble.of(n.get().si()) : OptionalDouble.empty();
  }
}
