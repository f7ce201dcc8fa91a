package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import jonquil.Result;
import jonquil.diag.Severity;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import jonquil.resolve.Param;
import jonquil.resolve.ParamSpec;
import jonquil.resolve.Shape;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The recipes of DEVELOPERS.md ("How to add an element kind", "How to add a requirement measure")
 * hold for every kind and measure: a step left out fails here, if the compiler has not already
 * refused it (the switch expressions over ElementKind, Measure and Measure.Bound have no default).
 */
class AdditionRecipeTest {
  /** Things a declaration of any kind may refer to. */
  static final String PARTS =
      """
      material glass { index 1.5 }
      coating ar_coat { layer glass 100 nm }
      """;

  @ParameterizedTest
  @EnumSource(ElementKind.class)
  void everyKindHasAParameterTableAndRules(ElementKind kind) {
    assertNotNull(kind.params(), "no parameter table in KindTables for " + kind);
    assertNotNull(kind.rules(), "no KindRules in KindTables for " + kind);
    for (List<String> group : kind.rules().atLeastOneOf()) {
      for (String name : group) {
        assertTrue(kind.param(name).isPresent(), kind + " rule names unknown '" + name + "'");
      }
    }
  }

  @Test
  void everyParamIsInSomeKindTableAndEveryTableEntryIsAParam() {
    List<Param> unused = new ArrayList<>(Arrays.asList(Param.values()));
    for (ElementKind kind : ElementKind.values()) {
      for (ParamSpec p : kind.params()) {
        unused.remove(p.param());
        assertEquals(p.param().word(), p.name());
      }
    }
    assertTrue(unused.isEmpty(), "Param constants no kind table uses: " + unused);
  }

  @Test
  void readingASlotThatTheParameterDoesNotHaveFails() {
    var e =
        Bench.check(PARTS + "source s { wavelength 1064 nm; power 1 W }\n")
            .models()
            .values()
            .iterator()
            .next()
            .element("s")
            .orElseThrow();
    // 1064 nm in SI: the nano prefix is 1e-9 by definition (SI Brochure, 9th ed. 2019, Table 7).
    assertEquals(1064e-9, e.number(Param.WAVELENGTH, "wavelength").orElseThrow(), 1e-18);
    org.junit.jupiter.api.Assertions.assertThrows(
        IllegalArgumentException.class, () -> e.number(Param.WAVELENGTH, "wavelenght"));
  }

  /**
   * A minimal declaration of the kind, from its own table (required parameters and the first of
   * each at-least-one group, each with the example its shape gives), placed in a train: the
   * analysis must give it an optical response that closes the power budget.
   */
  @ParameterizedTest
  @EnumSource(ElementKind.class)
  void everyPlaceableKindRespondsToLight(ElementKind kind) {
    if (!kind.category().placeable() || kind.category() == Category.SOURCE) {
      return;
    }
    String train =
        kind.category() == Category.TERMINAL ? "s -> 10 mm -> x" : "s -> 10 mm -> x -> 10 mm -> d";
    Result r =
        Bench.check(
            PARTS
                + "source s { wavelength 1064 nm; power 1 W; beam waist 1 mm }\n"
                + declaration(kind)
                + "dump d\n"
                + "train t { "
                + train
                + " }\n");
    assertEquals(0, r.count(Severity.ERROR), kind + ": " + r.diagnostics());
    TrainSolution s = r.solutions().values().iterator().next();
    assertTrue(s.incidentAt("x").isPresent(), kind + " is not reached");
    assertTrue(s.budgets().stream().anyMatch(b -> b.element().equals("x")), kind + " budget");
    // Zero by definition of the budget (DEVELOPERS.md, Invariants: Budget).
    assertEquals(0, s.conservationError(), 1e-9, kind + " does not close the budget");
  }

  static String declaration(ElementKind kind) {
    List<String> lines = new ArrayList<>();
    List<String> first =
        kind.rules().atLeastOneOf().stream().map(g -> g.get(0)).collect(Collectors.toList());
    for (ParamSpec p : kind.params()) {
      if (p.required() || first.contains(p.name())) {
        lines.add((p.name() + " " + example(p.shape())).trim());
      }
    }
    return kind.word() + " x { " + String.join("; ", lines) + " }\n";
  }

  /** Text that the shape accepts: its first alternative, with each value's example. */
  static String example(Shape shape) {
    if (shape instanceof Shape.Seq s) {
      return s.parts().stream().map(AdditionRecipeTest::example).collect(Collectors.joining(" "));
    } else if (shape instanceof Shape.Opt) {
      return "";
    } else if (shape instanceof Shape.OneOf o) {
      return example(o.alternatives().get(0));
    } else if (shape instanceof Shape.Keyed k) {
      return example(k.clauses().get(0));
    } else if (shape instanceof Shape.ListOf l) {
      return example(l.item());
    } else if (shape instanceof Shape.Span s) {
      return s.low().example() + " .. " + s.high().example();
    } else if (shape instanceof Shape.Quantity q) {
      return q.example();
    } else if (shape instanceof Shape.Ratio) {
      return "50 %";
    } else if (shape instanceof Shape.PowerRatio) {
      return "1000";
    } else if (shape instanceof Shape.Density || shape instanceof Shape.Count) {
      return "1";
    } else if (shape instanceof Shape.Word w) {
      return w.choices().get(0);
    } else if (shape instanceof Shape.Literal l) {
      return l.word();
    } else if (shape instanceof Shape.Reference r) {
      return r.categories().contains(Category.COATING) ? "ar_coat" : "glass";
    } else if (shape instanceof Shape.Text) {
      return "\"n.csv\"";
    }
    return ",";
  }

  /**
   * Each measure, bounded by its own example on a pulsed source with a stated beam, resolves
   * without a diagnostic and is evaluated: it has a case in RequirementEvaluator, and its bound
   * form a case in RequirementResolver.
   */
  @ParameterizedTest
  @EnumSource(Measure.class)
  void everyMeasureIsResolvedAndEvaluated(Measure m) {
    String place =
        switch (m.where()) {
          case AT, AT_OR_EVERYWHERE -> "at " + placeFor(m) + " ";
          case BETWEEN -> "from s to p ";
          case NONE, OPTIONAL_AT -> "";
        };
    String bound = m.example().split("' or '")[0].replace("'", "");
    Result r = Bench.check(benchFor(m) + "  " + m.word() + " " + place + bound + "\n}\n");
    assertEquals(1, r.requirements().size(), m + ": " + r.diagnostics());
    RequirementOutcome o = r.requirements().get(0);
    assertFalse(
        r.diagnostics().stream()
            .anyMatch(
                d -> d.code().id().startsWith("J6") && !d.code().id().matches("J609|J610|J611")),
        m + ": " + r.diagnostics());
    assertTrue(o.status() != RequirementStatus.NOT_EVALUATED, m + ": " + o.reason());
  }

  /** A pulsed source with a stated beam on one path; its two arms meet again for a visibility. */
  private static String benchFor(Measure m) {
    String source =
        """
        source s { wavelength 1064 nm; pulse_energy 1 mJ; pulse_duration 10 ns
                   repetition_rate 1 kHz; beam waist 1 mm; polarization linear 0 deg }
        """;
    return switch (m) {
      case VISIBILITY ->
          source
              + """
              splitter bs1 { ratio 50 %; aoi 45 deg }
              splitter bs2 { ratio 50 %; aoi 45 deg }
              probe p { aperture 7 mm; exposure_time 0.25 s }
              dump d
              train t {
                s -> 10 mm -> bs1.through -> 20 mm -> bs2.through -> 10 mm -> p
                bs1.reflected -> 20 mm -> bs2.side -> 10 mm -> d
              }
              require {
              """;
      case POWER,
          TRANSMISSION,
          STRAY,
          BACK_REFLECTION,
          AZIMUTH,
          ELLIPTICITY,
          POLARIZATION,
          HANDEDNESS,
          IRRADIANCE,
          PEAK_IRRADIANCE,
          AVERAGE_PEAK_IRRADIANCE,
          FLUENCE,
          PEAK_FIELD,
          PEAK_POWER,
          PULSE_ENERGY,
          BEAM_RADIUS,
          DAMAGE_MARGIN,
          HAZARD_CLASS,
          NOHD,
          EXPOSURE,
          EYEWEAR_OD,
          EXTINCTION,
          DOP ->
          source
              + """
              polarizer pol { axis 0 deg; damage 5 J/cm2 for 10 ns at 1064 nm }
              probe p { aperture 7 mm; exposure_time 0.25 s }
              train t { s -> 10 mm -> pol -> 10 mm -> p }
              require {
              """;
    };
  }

  /** Where no two beams of one line meet, a visibility is not evaluated, so not met. */
  @Test
  void aVisibilityOnOnePathFailsClosed() {
    Result r = Bench.check(benchFor(Measure.POWER) + "  visibility at p >= 0.9\n}\n");
    RequirementOutcome o = r.requirements().get(0);
    assertEquals(RequirementStatus.NOT_EVALUATED, o.status(), o.reason());
    assertEquals(PortInterference.NONE_MEET, o.reason());
  }

  private static String placeFor(Measure m) {
    // The safety figures of a laser are judged at the laser; damage at a part that states it.
    return m == Measure.HAZARD_CLASS || m == Measure.NOHD
        ? "s"
        : m == Measure.DAMAGE_MARGIN ? "pol" : "p";
  }

  @Test
  void everyBoundFormBoundsSomeMeasure() {
    for (Measure.Bound b : Measure.Bound.values()) {
      assertTrue(
          Arrays.stream(Measure.values()).anyMatch(m -> m.bound() == b), b + " bounds nothing");
    }
  }
}
