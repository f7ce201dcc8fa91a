package jonquil.resolve;

import static jonquil.resolve.ParamSpec.optional;
import static jonquil.resolve.ParamSpec.repeatable;
import static jonquil.resolve.ParamSpec.required;
import static jonquil.resolve.Shape.keyed;
import static jonquil.resolve.Shape.lit;
import static jonquil.resolve.Shape.oneOf;
import static jonquil.resolve.Shape.opt;
import static jonquil.resolve.Shape.q;
import static jonquil.resolve.Shape.ratio;
import static jonquil.resolve.Shape.ref;
import static jonquil.resolve.Shape.seq;
import static jonquil.resolve.Shape.word;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import jonquil.units.Dimension;

/**
 * The parameter table of every element kind: names, argument shapes, physical ranges, and the rules
 * across parameters. This file is the reference for what a spec may say.
 */
final class KindTables {
  private KindTables() {}

  /**
   * Wavelengths Jonquil models: deep UV to mid-infrared. Beyond, materials and limits are not
   * tabulated.
   */
  static final Bounds WAVELENGTH = Bounds.closed(150e-9, 20e-6);

  static final Bounds AOI = Bounds.halfOpen(0, Math.PI / 2);

  static final Shape.Quantity WAVELENGTH_Q =
      q("wavelength", Dimension.LENGTH, WAVELENGTH, "1064 nm");
  static final Shape ANGLE = q("angle", Dimension.ANGLE, Bounds.ANY, "45 deg");
  static final Shape EXTINCTION = new Shape.PowerRatio("ratio", Bounds.atLeast(1));

  /**
   * 'linear 0 deg', 'circular right', 'elliptical 30 deg 0.4 [right|left]', 'unpolarized', 'partial
   * 0.9 linear 0 deg'.
   */
  static final Shape PURE_STATE =
      oneOf(
          "a polarization state such as 'linear 0 deg' or 'circular right'",
          seq(word("form", "linear"), q("azimuth", Dimension.ANGLE, Bounds.ANY, "0 deg")),
          seq(word("form", "circular"), word("handedness", "right", "left")),
          seq(
              word("form", "elliptical"),
              q("azimuth", Dimension.ANGLE, Bounds.ANY, "30 deg"),
              new Shape.Count("axis_ratio", Bounds.closed(0, 1), false),
              opt(word("handedness", "right", "left"))),
          seq(word("form", "unpolarized")));

  static final Shape STATE =
      oneOf(
          "a polarization state such as 'linear 0 deg' or 'circular right'",
          PURE_STATE,
          seq(
              word("form_mix", "partial"),
              new Shape.Ratio("dop", Bounds.closed(0, 1)),
              PURE_STATE));

  /** 'damage 5 kW/cm2', 'damage 50 W/cm', 'damage 10 J/cm2 for 10 ns at 1064 nm'. */
  static final Shape DAMAGE =
      seq(
          q(
              "threshold",
              List.of(Dimension.IRRADIANCE, Dimension.LINEAR_POWER_DENSITY, Dimension.FLUENCE),
              Bounds.POSITIVE,
              "5 kW/cm2"),
          opt(word("regime", "cw", "pulsed")),
          opt(lit("for"), q("duration", Dimension.TIME, Bounds.POSITIVE, "10 ns")),
          opt(lit("at"), WAVELENGTH_Q));

  /** 'coating ar 0.5 %', 'coating hr 99.9 %', or the name of a declared coating. */
  static final Shape COATING =
      oneOf(
          "'ar 0.5 %', 'hr 99.9 %' or the name of a coating",
          seq(word("type", "ar", "hr"), ratio("reflectance")), ref("stack", Category.COATING));

  private static final ParamSpec PLANE =
      optional(
          "plane",
          q("angle", Dimension.ANGLE, Bounds.ANY, "90 deg"),
          "orientation of the plane of incidence about the beam axis, from the lab x axis");
  private static final ParamSpec AOI_PARAM =
      optional("aoi", q("angle", Dimension.ANGLE, AOI, "45 deg"), "angle of incidence");
  private static final ParamSpec DAMAGE_PARAM =
      repeatable(
          "damage",
          DAMAGE,
          "laser-induced damage threshold: cw irradiance or linear power density, or pulsed fluence"
              + " for a pulse duration");
  private static final ParamSpec COATING_PARAM = optional("coating", COATING, "surface coating");

  private static final Map<ElementKind, List<ParamSpec>> PARAMS = new EnumMap<>(ElementKind.class);
  private static final Map<ElementKind, KindRules> RULES = new EnumMap<>(ElementKind.class);

  static {
    put(
        ElementKind.SOURCE,
        rules(
            List.of(List.of("wavelength", "line"), List.of("power", "pulse_energy", "line")),
            List.of(List.of("wavelength", "line"), List.of("power", "line"))),
        optional("wavelength", WAVELENGTH_Q, "emission wavelength"),
        repeatable(
            "line",
            seq(WAVELENGTH_Q, q("power", Dimension.POWER, Bounds.POSITIVE, "1 W")),
            "one laser line of several: wavelength and power (lines add incoherently)"),
        optional(
            "power",
            q("power", Dimension.POWER, Bounds.POSITIVE, "2 W"),
            "optical power (average power when pulsed)"),
        optional(
            "pulse_energy",
            q("energy", Dimension.ENERGY, Bounds.POSITIVE, "10 mJ"),
            "energy per pulse"),
        optional(
            "pulse_duration",
            q("duration", Dimension.TIME, Bounds.POSITIVE, "8 ns"),
            "pulse duration (FWHM)"),
        optional(
            "repetition_rate",
            q("rate", Dimension.FREQUENCY, Bounds.POSITIVE, "1 kHz"),
            "pulse repetition rate"),
        optional("polarization", STATE, "polarization state at the exit"),
        optional(
            "beam",
            keyed(
                seq(lit("waist"), q("waist", Dimension.LENGTH, Bounds.POSITIVE, "1 mm")),
                seq(lit("waist_at"), q("waist_at", Dimension.LENGTH, Bounds.ANY, "0 mm")),
                seq(
                    lit("divergence"),
                    q("divergence", Dimension.ANGLE, Bounds.POSITIVE, "0.5 mrad")),
                seq(lit("m2"), new Shape.Count("m2", Bounds.atLeast(1), false))),
            "Gaussian beam: waist radius (1/e²), waist position from the exit face, half-angle"
                + " divergence, M²"));
    put(
        ElementKind.MATERIAL,
        rules(
            List.of(List.of("catalog", "index", "sellmeier", "cauchy", "table", "ordinary")),
            List.of(List.of("catalog", "index", "sellmeier", "cauchy", "table", "ordinary"))),
        optional("catalog", ref("name", Category.MATERIAL), "a material from the built-in catalog"),
        optional(
            "index", new Shape.Count("n", Bounds.POSITIVE, false), "constant refractive index n"),
        optional(
            "k",
            new Shape.Count("k", Bounds.NON_NEGATIVE, false),
            "constant extinction coefficient k"),
        optional(
            "sellmeier",
            new Shape.ListOf(
                seq(
                    new Shape.Count("b", Bounds.ANY, false),
                    q("c", Dimension.AREA, Bounds.ANY, "0.0060 um2"))),
            "Sellmeier terms B, C: n² = 1 + Σ B λ²/(λ² − C)"),
        optional(
            "cauchy",
            seq(
                new Shape.Count("a", Bounds.POSITIVE, false),
                opt(new Shape.Comma(), q("b", Dimension.AREA, Bounds.ANY, "0.004 um2")),
                opt(new Shape.Comma(), q("c", Dimension.LENGTH4, Bounds.ANY, "0.0001 um4"))),
            "Cauchy terms: n = A + B/λ² + C/λ⁴"),
        optional("table", new Shape.Text("file"), "a file of wavelength, n, k rows"),
        optional(
            "ordinary",
            new Shape.Count("n_o", Bounds.POSITIVE, false),
            "ordinary index of a uniaxial crystal"),
        optional(
            "extraordinary",
            new Shape.Count("n_e", Bounds.POSITIVE, false),
            "extraordinary index of a uniaxial crystal"),
        optional(
            "absorption",
            q("alpha", Dimension.INVERSE_LENGTH, Bounds.NON_NEGATIVE, "0.01 /cm"),
            "bulk absorption coefficient (power)"),
        optional(
            "temperature",
            q("temperature", Dimension.TEMPERATURE, Bounds.POSITIVE, "20 degC"),
            "temperature the data refer to"),
        optional(
            "valid",
            new Shape.Span(
                q("from", Dimension.LENGTH, WAVELENGTH, "400 nm"),
                q("to", Dimension.LENGTH, WAVELENGTH, "2 um")),
            "wavelength range where the data hold"));
    put(
        ElementKind.COATING,
        rules(List.of(List.of("layer")), List.of()),
        repeatable(
            "layer",
            seq(
                ref("material", Category.MATERIAL),
                oneOf(
                    "a thickness such as '120 nm' or 'quarter at 550 nm'",
                    q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "120 nm"),
                    seq(word("quarter", "quarter"), lit("at"), WAVELENGTH_Q))),
            "one thin-film layer, from the incidence side: material and thickness (or quarter-wave"
                + " at a wavelength)"));
    put(
        ElementKind.INTERFACE,
        KindRules.NONE,
        required("from", ref("material", Category.MATERIAL), "medium on the incidence side"),
        required("to", ref("material", Category.MATERIAL), "medium on the far side"),
        AOI_PARAM,
        PLANE,
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.POLARIZER,
        KindRules.NONE,
        required("axis", ANGLE, "transmission axis"),
        optional("extinction", EXTINCTION, "extinction ratio (principal to crossed transmission)"),
        optional("transmission", ratio("t"), "principal transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.WAVEPLATE,
        KindRules.NONE,
        required(
            "retardance",
            seq(
                q("retardance", Dimension.ANGLE, Bounds.NON_NEGATIVE, "0.5 wave"),
                opt(lit("at"), WAVELENGTH_Q)),
            "retardance at the design wavelength"),
        required("fast_axis", ANGLE, "fast axis"),
        optional(
            "order",
            oneOf(
                "'zero' or 'multi 5'",
                word("order", "zero"),
                seq(word("order", "multi"), new Shape.Count("m", Bounds.atLeast(1), true))),
            "zero- or multi-order"),
        optional("material", ref("material", Category.MATERIAL), "birefringent material"),
        optional(
            "thickness",
            q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "1 mm"),
            "plate thickness"),
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.ROTATOR,
        KindRules.NONE,
        required(
            "rotation",
            ANGLE,
            "rotation of the polarization, counter-clockwise seen against the beam"),
        optional(
            "type",
            word("type", "reciprocal", "faraday"),
            "reciprocal (optical activity) or Faraday (non-reciprocal)"),
        optional("transmission", ratio("t"), "transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.SPLITTER,
        rules(
            List.of(List.of("polarizing", "ratio", "reflect_s")),
            List.of(List.of("polarizing", "ratio"))),
        optional("polarizing", Shape.empty(), "a polarizing splitter: p through, s reflected"),
        optional("ratio", ratio("reflected"), "fraction reflected by a non-polarizing splitter"),
        optional("extinction", EXTINCTION, "extinction ratio of the through port"),
        optional("transmit_p", ratio("t"), "transmittance for p"),
        optional("transmit_s", ratio("t"), "transmittance for s"),
        optional("reflect_s", ratio("r"), "reflectance for s"),
        optional("reflect_p", ratio("r"), "reflectance for p"),
        AOI_PARAM,
        PLANE,
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.DEPOLARIZER,
        KindRules.NONE,
        optional(
            "depolarization",
            ratio("d"),
            "fraction of the light that leaves unpolarized (default 100 %)"),
        optional("transmission", ratio("t"), "transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.MIRROR,
        rules(
            List.of(List.of("metal", "reflectance", "coating")),
            List.of(List.of("metal", "reflectance"))),
        optional(
            "metal",
            ref("metal", Category.MATERIAL),
            "bare metal, from the catalog or a declared material"),
        optional("reflectance", ratio("r"), "specified reflectance"),
        COATING_PARAM,
        AOI_PARAM,
        PLANE,
        DAMAGE_PARAM);
    List<ParamSpec> window =
        List.of(
            required("material", ref("material", Category.MATERIAL), "bulk material"),
            required(
                "thickness",
                q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "3 mm"),
                "thickness"),
            optional(
                "then",
                ref("medium", Category.MATERIAL),
                "medium behind the exit face (default: the medium before)"),
            optional(
                "wedge",
                q("wedge", Dimension.ANGLE, Bounds.NON_NEGATIVE, "0.5 deg"),
                "wedge angle"),
            AOI_PARAM,
            PLANE,
            COATING_PARAM,
            DAMAGE_PARAM);
    put(ElementKind.WINDOW, KindRules.NONE, window.toArray(ParamSpec[]::new));
    put(ElementKind.PLATE, KindRules.NONE, window.toArray(ParamSpec[]::new));
    put(
        ElementKind.LENS,
        KindRules.NONE,
        required(
            "focal",
            q("focal", Dimension.LENGTH, Bounds.NON_ZERO, "100 mm"),
            "focal length (negative: diverging)"),
        optional(
            "clear_aperture",
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "25 mm"),
            "clear aperture diameter"),
        optional("material", ref("material", Category.MATERIAL), "lens material"),
        optional(
            "thickness",
            q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "4 mm"),
            "centre thickness"),
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.APERTURE,
        KindRules.NONE,
        required(
            "diameter",
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "5 mm"),
            "diameter of the circular opening"),
        DAMAGE_PARAM);
    put(
        ElementKind.FILTER,
        rules(List.of(List.of("od", "transmission")), List.of(List.of("od", "transmission"))),
        optional("od", new Shape.Density("od"), "optical density, 'OD 3' or '3'"),
        optional("transmission", ratio("t"), "transmittance"),
        optional(
            "band",
            new Shape.Span(
                q("from", Dimension.LENGTH, WAVELENGTH, "400 nm"),
                q("to", Dimension.LENGTH, WAVELENGTH, "700 nm")),
            "wavelength band where the rating holds"),
        DAMAGE_PARAM);
    put(
        ElementKind.RHOMB,
        KindRules.NONE,
        required("material", ref("material", Category.MATERIAL), "prism material"),
        required(
            "aoi",
            q("angle", Dimension.ANGLE, AOI, "54.6 deg"),
            "internal angle of incidence at each reflection"),
        optional(
            "reflections",
            new Shape.Count("n", Bounds.atLeast(1), true),
            "number of total internal reflections (default 2)"),
        optional("axis", ANGLE, "orientation of the plane of incidence about the beam"),
        DAMAGE_PARAM);
    put(
        ElementKind.PROBE,
        KindRules.NONE,
        optional(
            "aperture",
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "7 mm"),
            "measurement aperture diameter"),
        optional(
            "exposure_time",
            q("time", Dimension.TIME, Bounds.POSITIVE, "0.25 s"),
            "exposure duration to assess"));
    put(
        ElementKind.DETECTOR,
        KindRules.NONE,
        optional(
            "aperture",
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "10 mm"),
            "active area diameter"),
        optional(
            "responsivity",
            q("r", Dimension.RESPONSIVITY, Bounds.POSITIVE, "0.6 A/W"),
            "responsivity"),
        DAMAGE_PARAM);
    put(
        ElementKind.DUMP,
        KindRules.NONE,
        optional(
            "rating",
            q("power", Dimension.POWER, Bounds.POSITIVE, "10 W"),
            "maximum power the dump takes"),
        DAMAGE_PARAM);
  }

  private static KindRules rules(List<List<String>> atLeastOne, List<List<String>> exclusive) {
    return new KindRules(atLeastOne, exclusive);
  }

  private static void put(ElementKind kind, KindRules rules, ParamSpec... params) {
    PARAMS.put(kind, List.copyOf(new ArrayList<>(List.of(params))));
    RULES.put(kind, rules);
  }

  static List<ParamSpec> params(ElementKind kind) {
    return PARAMS.get(kind);
  }

  static KindRules rules(ElementKind kind) {
    return RULES.get(kind);
  }
}
