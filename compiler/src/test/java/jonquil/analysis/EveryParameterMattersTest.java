package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Severity;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.ParamSpec;
import org.junit.jupiter.api.Test;

/**
 * Nothing accepted is ignored: every parameter of every kind in the kind tables, changed from one
 * value to another in a small spec, changes something the checker computes (its findings, its
 * requirement verdicts or its train solution); or it is refused with J410 wherever it is written;
 * or it is listed as a label with the reason it computes nothing. A parameter added to a table
 * without a line here fails {@link #everyParameterOfEveryKindIsListed()}.
 */
class EveryParameterMattersTest {
  /** One change: the declaration of the element under test before and after. */
  record Change(String kind, String param, String before, String after) {}

  /**
   * Parameters that compute nothing in the one-way train used here, each with its reason. A reason
   * is required, so an entry says why a value that changes nothing here is accepted.
   */
  static final Map<String, String> LABELS =
      Map.of(
          "rotator.type",
          "acts only on light that passes back through the rotator, which the one-way train here"
              + " has none of; LightAsANetworkTest shows a Faraday and a reciprocal double pass"
              + " differ");

  /**
   * A valid declaration of each kind whose table refuses a parameter (the refused one is added to
   * it); the refused parameters themselves, and why, are read from the kind tables.
   */
  static final Map<String, String> REFUSAL_BASES =
      Map.of("window", "material glass; thickness 3 mm", "plate", "material glass; thickness 3 mm");

  /** Parameters refused wherever written (J410), from the kind tables, each written once. */
  static final List<Change> REFUSED = new ArrayList<>();

  static {
    for (ElementKind kind : ElementKind.values()) {
      for (ParamSpec p : kind.params()) {
        if (p.refusal().isPresent()) {
          String base = REFUSAL_BASES.getOrDefault(kind.word(), "");
          String line = p.name() + " " + AdditionRecipeTest.example(p.shape());
          REFUSED.add(
              new Change(kind.word(), p.name(), base, base.isEmpty() ? line : base + "; " + line));
        }
      }
    }
  }

  static final List<Change> CHANGES = new ArrayList<>();

  static {
    String src = "wavelength 1064 nm; power 1 W; beam waist 1 mm; polarization linear 0 deg";
    String pulsed =
        "wavelength 1064 nm; beam waist 1 mm; pulse_energy 1 mJ; pulse_duration 8 ns;"
            + " repetition_rate 1 kHz";
    change("source", "wavelength", src, "wavelength 1030 nm");
    change("source", "power", src, "power 2 W");
    change("source", "polarization", src, "polarization linear 45 deg");
    // Where no beams of one line meet (this single path) a coherence figure warns that it
    // changes nothing (J626); where they meet it sets the visibility
    // (InterferenceRequirementsTest).
    change("source", "linewidth", src, "linewidth 1 MHz");
    change("source", "coherence_length", src, "coherence_length 30 cm");
    change("source", "beam", src, "beam waist 2 mm");
    change("source", "beam", src, "beam waist 1 mm, waist_at 500 mm");
    change("source", "beam", src, "beam waist 1 mm, m2 1.5");
    change("source", "beam", src, "beam waist 1 mm, divergence 1 mrad");
    change("source", "beam", src, "beam divergence 1 mrad");
    CHANGES.add(
        new Change(
            "source",
            "line",
            "line 1064 nm 1 W; beam waist 1 mm",
            "line 1064 nm 1 W; line 1030 nm 1 W; beam waist 1 mm"));
    change("source", "pulse_energy", pulsed, "pulse_energy 2 mJ");
    change("source", "pulse_duration", pulsed, "pulse_duration 20 ns");
    change("source", "repetition_rate", pulsed, "repetition_rate 2 kHz");
    CHANGES.add(
        new Change(
            "source",
            "pulse_energy",
            "wavelength 1064 nm; beam waist 1 mm; pulse_energy 1 mJ; pulse_duration 8 ns",
            "wavelength 1064 nm; beam waist 1 mm; pulse_energy 2 mJ; pulse_duration 8 ns"));

    change("material", "catalog", "catalog fused_silica", "catalog sapphire");
    change("material", "index", "index 1.5", "index 1.6");
    change("material", "k", "index 1.5; k 0", "k 0.0001");
    change("material", "sellmeier", "sellmeier 1.1 0.01 um2", "sellmeier 1.3 0.01 um2");
    change("material", "cauchy", "cauchy 1.5", "cauchy 1.6");
    change("material", "table", "table \"a.txt\"", "table \"b.txt\"");
    change("material", "ordinary", "ordinary 1.54; extraordinary 1.55", "ordinary 1.53");
    change("material", "extraordinary", "ordinary 1.54; extraordinary 1.55", "extraordinary 1.56");
    change("material", "absorption", "index 1.5; absorption 0.1 /cm", "absorption 1 /cm");
    change(
        "material",
        "temperature",
        "catalog fused_silica; temperature 20 degC",
        "temperature 35 degC");
    change("material", "valid", "index 1.5; valid 400 nm .. 2 um", "valid 400 nm .. 700 nm");

    change("coating", "layer", "layer glass 100 nm", "layer glass 200 nm");

    String iface = "from air; to glass; aoi 30 deg";
    change("interface", "from", iface, "from water");
    change("interface", "to", iface, "to dense");
    change("interface", "aoi", iface, "aoi 50 deg");
    change("interface", "plane", iface + "; plane 0 deg", "plane 45 deg");
    change("interface", "coating", iface + "; coating ar 0.5 %", "coating ar_coat");
    damage("interface", iface);

    change("polarizer", "axis", "axis 30 deg", "axis 60 deg");
    change("polarizer", "extinction", "axis 90 deg; extinction 100", "extinction 1000");
    change("polarizer", "transmission", "axis 30 deg; transmission 90 %", "transmission 80 %");
    damage("polarizer", "axis 30 deg");

    String plate = "retardance 0.5 wave at 1030 nm; fast_axis 30 deg";
    change("waveplate", "retardance", plate, "retardance 0.25 wave at 1030 nm");
    change("waveplate", "fast_axis", plate, "fast_axis 40 deg");
    change("waveplate", "order", plate + "; order zero", "order multi 5");
    // With no thickness the plate is made to its design retardance, whatever its birefringence.
    change(
        "waveplate", "material", plate + "; material crystal; thickness 1 mm", "material crystal2");
    change(
        "waveplate", "thickness", plate + "; material crystal; thickness 1 mm", "thickness 2 mm");
    change("waveplate", "coating", plate + "; coating ar 0.5 %", "coating ar 2 %");
    damage("waveplate", plate);

    change("rotator", "rotation", "rotation 30 deg", "rotation 40 deg");
    String iso = "isolation 30 dB; type dependent; axis 30 deg";
    change("isolator", "isolation", iso, "isolation 10 dB");
    change("isolator", "insertion_loss", iso + "; insertion_loss 0.5 dB", "insertion_loss 1 dB");
    change("isolator", "type", "isolation 30 dB; axis 30 deg", "type dependent");
    change("isolator", "axis", iso, "axis 40 deg");
    damage("isolator", "isolation 30 dB");
    change("rotator", "transmission", "rotation 30 deg; transmission 90 %", "transmission 80 %");
    damage("rotator", "rotation 30 deg");

    change("splitter", "polarizing", "ratio 50 %", "polarizing");
    change("splitter", "ratio", "ratio 50 %", "ratio 30 %");
    change("splitter", "band", "ratio 90 %; band 400 nm .. 700 nm", "band 1000 nm .. 1100 nm");
    change("splitter", "extinction", "polarizing; extinction 100", "extinction 1000");
    change("splitter", "transmit_p", "polarizing; transmit_p 90 %", "transmit_p 80 %");
    change(
        "splitter",
        "transmit_s",
        "reflect_s 50 %; reflect_p 50 %; transmit_s 40 %",
        "transmit_s 30 %");
    change("splitter", "reflect_s", "polarizing; reflect_s 90 %", "reflect_s 80 %");
    change("splitter", "reflect_p", "polarizing; reflect_p 1 %", "reflect_p 5 %");
    // The angle sets where the reflected beam goes: straight up at 45 deg in a vertical plane.
    change("splitter", "aoi", "ratio 50 %; plane 90 deg; aoi 45 deg", "aoi 30 deg");
    change("splitter", "plane", "polarizing; plane 0 deg", "plane 45 deg");
    change("splitter", "coating", "ratio 50 %; coating ar 0.5 %", "coating ar 2 %");
    damage("splitter", "ratio 50 %");

    change("depolarizer", "depolarization", "depolarization 50 %", "depolarization 100 %");
    change("depolarizer", "transmission", "transmission 90 %", "transmission 80 %");
    damage("depolarizer", "");

    change("mirror", "metal", "metal silver; aoi 45 deg", "metal gold");
    change("mirror", "reflectance", "reflectance 99 %", "reflectance 90 %");
    change("mirror", "coating", "metal silver; coating ar_coat", "coating hr 90 %");
    change("mirror", "aoi", "metal silver; aoi 45 deg", "aoi 30 deg");
    change("mirror", "plane", "metal silver; aoi 45 deg; plane 0 deg", "plane 45 deg");
    damage("mirror", "metal silver");

    for (String kind : List.of("window", "plate")) {
      String w = "material glass; thickness 3 mm; aoi 30 deg";
      change(kind, "material", w, "material dense");
      change(kind, "thickness", "material lossy; thickness 3 mm", "thickness 5 mm");
      change(kind, "then", w + "; then glass", "then dense");
      change(kind, "aoi", w, "aoi 50 deg");
      change(kind, "plane", w + "; plane 0 deg", "plane 45 deg");
      change(kind, "coating", w + "; coating ar 0.5 %", "coating ar 2 %");
      damage(kind, w);
    }

    change("lens", "focal", "focal 100 mm", "focal 50 mm");
    change("lens", "clear_aperture", "focal 100 mm; clear_aperture 25 mm", "clear_aperture 1 mm");
    change("lens", "material", "focal 100 mm; material glass", "material dense");
    change("lens", "thickness", "focal 100 mm; material lossy; thickness 4 mm", "thickness 8 mm");
    change("lens", "coating", "focal 100 mm; coating ar 0.5 %", "coating ar 2 %");
    damage("lens", "focal 100 mm");

    change("aperture", "diameter", "diameter 5 mm", "diameter 1 mm");
    damage("aperture", "diameter 5 mm");

    change("filter", "od", "od 2", "od 3");
    change("filter", "transmission", "transmission 50 %", "transmission 40 %");
    change("filter", "band", "od 2; blocking 1; band 400 nm .. 700 nm", "band 1000 nm .. 1100 nm");
    change("filter", "blocking", "od 2; band 400 nm .. 700 nm; blocking 1", "blocking 2");
    damage("filter", "od 2");

    String rhomb = "material glass; aoi 54.6 deg";
    change("rhomb", "material", rhomb, "material dense");
    change("rhomb", "aoi", rhomb, "aoi 60 deg");
    change("rhomb", "reflections", rhomb + "; reflections 2", "reflections 4");
    change("rhomb", "axis", rhomb + "; axis 0 deg", "axis 30 deg");
    damage("rhomb", rhomb);

    change("probe", "exposure_time", "exposure_time 0.25 s", "exposure_time 100 s");
    // Averaged over a smaller aperture, the 1 mm-waist beam's mean irradiance is higher.
    change("probe", "aperture", "aperture 7 mm", "aperture 1 mm");

    damage("detector", "");

    change("dump", "rating", "rating 10 W", "rating 0.5 W");
    damage("dump", "");
  }

  /** The declaration with one parameter's line replaced (or added). */
  private static void change(String kind, String param, String before, String line) {
    List<String> lines = new ArrayList<>();
    for (String l : before.split(";")) {
      String t = l.trim();
      if (!t.isEmpty() && !t.startsWith(param + " ")) {
        lines.add(t);
      }
    }
    lines.add(line);
    CHANGES.add(new Change(kind, param, before, String.join("; ", lines)));
  }

  /** A damage threshold far above the exposure against one below it (1 W, 1 mm waist). */
  private static void damage(String kind, String base) {
    String b = base.isEmpty() ? "" : base + "; ";
    CHANGES.add(new Change(kind, "damage", b + "damage 1 MW/cm2", b + "damage 1 W/cm2"));
  }

  @Test
  void everyParameterOfEveryKindIsListed() {
    Set<String> listed = new LinkedHashSet<>();
    CHANGES.forEach(c -> listed.add(c.kind() + "." + c.param()));
    REFUSED.forEach(c -> listed.add(c.kind() + "." + c.param()));
    listed.addAll(LABELS.keySet());
    List<String> missing = new ArrayList<>();
    for (ElementKind kind : ElementKind.values()) {
      for (ParamSpec p : kind.params()) {
        if (!listed.contains(kind.word() + "." + p.name())) {
          missing.add(kind.word() + "." + p.name());
        }
      }
    }
    assertEquals(List.of(), missing, "parameters with no change, refusal or label here");
    LABELS.forEach((k, why) -> assertTrue(why.length() > 20, k + " needs a reason"));
  }

  @Test
  void changingAnyParameterChangesWhatIsComputed() {
    List<String> ignored = new ArrayList<>();
    for (Change c : CHANGES) {
      String before = computed(c.kind(), c.before());
      String after = computed(c.kind(), c.after());
      if (before.equals(after)) {
        ignored.add(c.kind() + "." + c.param() + " (" + c.before() + " -> " + c.after() + ")");
      }
    }
    assertEquals(List.of(), ignored, "parameters whose value changes nothing computed");
  }

  @Test
  void aParameterThatIsNotModelledIsRefusedWhereverWrittenWithTheReasonInItsTable() {
    assertTrue(
        REFUSED.size() >= 4,
        "the tables refuse window/plate 'wedge', detector 'aperture' and more");
    for (Change c : REFUSED) {
      String why = kind(c.kind()).param(c.param()).orElseThrow().refusal().orElseThrow();
      Result r = run(c.kind(), c.after());
      assertTrue(
          r.diagnostics().stream()
              .anyMatch(
                  d ->
                      d.code().id().equals("J410")
                          && d.message()
                              .equals(
                                  "'"
                                      + c.param()
                                      + "' in "
                                      + c.kind()
                                      + " 'x' is not modelled: "
                                      + why)),
          c.kind() + "." + c.param() + " is not refused with its reason: " + r.diagnostics());
      assertNotEquals(computed(c.kind(), c.before()), computed(c.kind(), c.after()));
    }
  }

  @Test
  void anUnknownParameterListsWhatTheKindTakesAndNotWhatItRefuses() {
    for (String kind : List.of("detector", "window")) {
      String base = REFUSAL_BASES.getOrDefault(kind, "");
      Result r = run(kind, base.isEmpty() ? "zzz 1" : base + "; zzz 1");
      String message =
          r.diagnostics().stream()
              .filter(d -> d.code().id().equals("J401"))
              .findFirst()
              .orElseThrow(() -> new AssertionError(kind + ": no J401 " + r.diagnostics()))
              .message();
      assertTrue(message.contains("; it takes "), message);
      for (ParamSpec p : kind(kind).params()) {
        assertEquals(
            p.taken(),
            message.contains("'" + p.name() + "'"),
            kind + "." + p.name() + (p.taken() ? " is not listed: " : " is listed: ") + message);
      }
    }
  }

  private static ElementKind kind(String word) {
    return ElementKind.byWord(word).orElseThrow();
  }

  @Test
  void theBaseOfEveryChangeIsAValidSpec() {
    for (Change c : CHANGES) {
      Result r = run(c.kind(), c.before());
      assertEquals(0, r.count(Severity.ERROR) - failedRequirements(r), c + ": " + r.diagnostics());
    }
  }

  private static long failedRequirements(Result r) {
    return r.diagnostics().stream()
        // A requirement left unevaluated (J613, e.g. no damage threshold in reach) is a finding
        // about the bench, not a fault in the spec's text.
        .filter(d -> List.of("J609", "J613", "J616").contains(d.code().id()))
        .count();
  }

  /**
   * Everything the checker computes, without positions (a longer declaration moves the ranges of
   * what follows it, which is why the element under test is declared last).
   */
  static String computed(String kind, String declaration) {
    Result r = run(kind, declaration);
    StringBuilder out = new StringBuilder();
    r.diagnostics()
        .forEach(d -> out.append(d.code().id()).append(' ').append(d.message()).append('\n'));
    r.requirements()
        .forEach(
            o ->
                out.append(o.status())
                    .append(' ')
                    .append(o.value())
                    .append(' ')
                    .append(o.reason())
                    .append('\n'));
    r.solutions().values().forEach(s -> out.append(s).append('\n'));
    return out.toString();
  }

  static final Path ROOT = Path.of("/virtual/every-parameter").toAbsolutePath();

  static Result run(String kindWord, String declaration) {
    ElementKind kind =
        java.util.Arrays.stream(ElementKind.values())
            .filter(k -> k.word().equals(kindWord))
            .findFirst()
            .orElseThrow();
    String at = kind == ElementKind.PROBE || kind.category() == Category.TERMINAL ? "x" : "p";
    String source = kind == ElementKind.SOURCE ? "x" : "s";
    String placed =
        switch (kind) {
          case SOURCE -> "x -> 100 mm -> p";
          case MATERIAL ->
              "s -> 100 mm -> w.through -> 100 mm -> q -> 100 mm -> p\n"
                  + "  w.reflected -> 10 mm -> d2";
          case COATING -> "s -> 100 mm -> i.through -> 100 mm -> p\n  i.reflected -> 10 mm -> d2";
          case PROBE -> "s -> 100 mm -> x";
          case DETECTOR, DUMP -> "s -> 100 mm -> x";
          default ->
              kind.ports().size() > 1
                  ? "s -> 100 mm -> x."
                      + kind.ports().get(0)
                      + " -> 100 mm -> p\n  x."
                      + kind.ports().get(1)
                      + " -> 10 mm -> d2"
                  : "s -> 100 mm -> x -> 100 mm -> p";
        };
    StringBuilder spec = new StringBuilder();
    spec.append(
        """
        material glass { index 1.5 }
        material dense { index 1.7 }
        material lossy { index 1.5; absorption 1 /cm }
        material crystal { ordinary 1.54; extraordinary 1.55 }
        material crystal2 { ordinary 1.54; extraordinary 1.56 }
        coating ar_coat { layer glass 100 nm }
        dump d2
        """);
    if (kind != ElementKind.SOURCE) {
      spec.append(
          "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm; polarization linear 0"
              + " deg }\n");
    }
    if (!at.equals("x")) {
      spec.append("probe p\n");
    }
    if (kind == ElementKind.MATERIAL) {
      spec.append("window w { material x; thickness 5 mm; aoi 50 deg }\n");
      spec.append(
          "waveplate q { retardance 0.5 wave at 1064 nm; fast_axis 30 deg; material x;"
              + " thickness 1 mm }\n");
    } else if (kind == ElementKind.COATING) {
      spec.append("interface i { from air; to glass; aoi 30 deg; coating x }\n");
    }
    spec.append("train t {\n  ").append(placed).append("\n}\n");
    spec.append("require {\n");
    for (String r :
        List.of(
            "power at " + at + " >= 1 uW",
            "polarization at " + at + " is linear 0 deg",
            "margin damage >= 1 everywhere",
            "back reflection < 10 W",
            "stray < 10 W",
            "hazard class <= 4 at " + source,
            "nohd < 1 m at " + source,
            "exposure at " + at + " < 100 %")) {
      spec.append("  ").append(r).append('\n');
    }
    spec.append("}\n");
    spec.append(kind.word()).append(" x { ").append(declaration).append(" }\n");
    Path file = ROOT.resolve("test.jonq");
    Map<Path, String> files = new LinkedHashMap<>();
    files.put(file, spec.toString());
    files.put(ROOT.resolve("a.txt"), "600 nm 1.50 0\n1100 nm 1.49 0\n");
    files.put(ROOT.resolve("b.txt"), "600 nm 1.60 0\n1100 nm 1.59 0\n");
    return Checker.check(Workspace.withOverlay(ROOT, files), List.of(file));
  }

  @Test
  void theHarnessReachesTheElementUnderTest() {
    Set<String> kinds =
        CHANGES.stream().map(Change::kind).collect(Collectors.toCollection(LinkedHashSet::new));
    for (String kind : kinds) {
      Change c = CHANGES.stream().filter(x -> x.kind().equals(kind)).findFirst().orElseThrow();
      Result r = run(kind, c.before());
      assertEquals(1, r.solutions().size(), kind + ": " + r.diagnostics());
    }
  }
}
