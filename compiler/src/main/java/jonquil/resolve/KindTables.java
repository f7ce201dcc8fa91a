package jonquil.resolve;

import static jonquil.resolve.ParamSpec.optional;
import static jonquil.resolve.ParamSpec.refused;
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
          seq(
              word("form", StateForm.LINEAR.word()),
              q("azimuth", Dimension.ANGLE, Bounds.ANY, "0 deg")),
          seq(word("form", StateForm.CIRCULAR.word()), word("handedness", "right", "left")),
          seq(
              word("form", StateForm.ELLIPTICAL.word()),
              q("azimuth", Dimension.ANGLE, Bounds.ANY, "30 deg"),
              new Shape.Count("axis_ratio", Bounds.closed(0, 1), false),
              opt(word("handedness", "right", "left"))),
          seq(word("form", StateForm.UNPOLARIZED.word())));

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
          Param.PLANE,
          q("angle", Dimension.ANGLE, Bounds.ANY, "90 deg"),
          "orientation of the plane of incidence about the beam axis, from the lab x axis");
  private static final ParamSpec AOI_PARAM =
      optional(Param.AOI, q("angle", Dimension.ANGLE, AOI, "45 deg"), "angle of incidence");
  private static final ParamSpec DAMAGE_PARAM =
      repeatable(
          Param.DAMAGE,
          DAMAGE,
          "laser-induced damage threshold: cw irradiance or linear power density, or pulsed fluence"
              + " for a pulse duration");
  private static final ParamSpec COATING_PARAM =
      optional(Param.COATING, COATING, "surface coating");

  private static final Map<ElementKind, List<ParamSpec>> PARAMS = new EnumMap<>(ElementKind.class);
  private static final Map<ElementKind, KindRules> RULES = new EnumMap<>(ElementKind.class);

  static {
    put(
        ElementKind.SOURCE,
        rules(
            List.of(
                List.of(Param.WAVELENGTH, Param.LINE),
                List.of(Param.POWER, Param.PULSE_ENERGY, Param.LINE)),
            List.of(
                List.of(Param.WAVELENGTH, Param.LINE),
                List.of(Param.POWER, Param.LINE),
                List.of(Param.LINEWIDTH, Param.COHERENCE_LENGTH))),
        optional(Param.WAVELENGTH, WAVELENGTH_Q, "emission wavelength"),
        repeatable(
            Param.LINE,
            seq(WAVELENGTH_Q, q("power", Dimension.POWER, Bounds.POSITIVE, "1 W")),
            "one laser line of several: wavelength and power (lines add incoherently)"),
        optional(
            Param.POWER,
            q("power", Dimension.POWER, Bounds.POSITIVE, "2 W"),
            "optical power (average power when pulsed)"),
        optional(
            Param.PULSE_ENERGY,
            q("energy", Dimension.ENERGY, Bounds.POSITIVE, "10 mJ"),
            "energy per pulse"),
        optional(
            Param.PULSE_DURATION,
            q("duration", Dimension.TIME, Bounds.POSITIVE, "8 ns"),
            "pulse duration (FWHM)"),
        optional(
            Param.REPETITION_RATE,
            q("rate", Dimension.FREQUENCY, Bounds.POSITIVE, "1 kHz"),
            "pulse repetition rate"),
        optional(Param.POLARIZATION, STATE, "polarization state at the exit"),
        optional(
            Param.LINEWIDTH,
            q("linewidth", Dimension.FREQUENCY, Bounds.POSITIVE, "1 MHz"),
            "spectral width (FWHM) of each line, taken as Lorentzian: coherence length c/(πΔν),"
                + " which sets how beams of one line interfere where they meet again"),
        optional(
            Param.COHERENCE_LENGTH,
            q("length", Dimension.LENGTH, Bounds.POSITIVE, "30 cm"),
            "coherence length Lc of each line: beams of one line meeting after path difference ΔL"
                + " interfere with |γ| = exp(−ΔL/Lc)"),
        optional(
            Param.BEAM,
            keyed(
                seq(lit("waist"), q("waist", Dimension.LENGTH, Bounds.POSITIVE, "1 mm")),
                seq(lit("waist_at"), q("waist_at", Dimension.LENGTH, Bounds.ANY, "0 mm")),
                seq(
                    lit("divergence"),
                    q("divergence", Dimension.ANGLE, Bounds.POSITIVE, "0.5 mrad")),
                seq(lit("m2"), new Shape.Count("m2", Bounds.atLeast(1), false))),
            "Gaussian beam: waist radius (1/e²), waist position from the exit face, half-angle"
                + " divergence, M²"));
    // A material gives exactly one model of its index.
    List<Param> indexModels =
        List.of(
            Param.CATALOG, Param.INDEX, Param.SELLMEIER, Param.CAUCHY, Param.TABLE, Param.ORDINARY);
    put(
        ElementKind.MATERIAL,
        rules(List.of(indexModels), List.of(indexModels)),
        optional(
            Param.CATALOG, ref("name", Category.MATERIAL), "a material from the built-in catalog"),
        optional(
            Param.INDEX,
            new Shape.Count("n", Bounds.POSITIVE, false),
            "constant refractive index n"),
        optional(
            Param.K,
            new Shape.Count("k", Bounds.NON_NEGATIVE, false),
            "constant extinction coefficient k"),
        optional(
            Param.SELLMEIER,
            new Shape.ListOf(
                seq(
                    new Shape.Count("b", Bounds.ANY, false),
                    q("c", Dimension.AREA, Bounds.ANY, "0.0060 um2"))),
            "Sellmeier terms B, C: n² = 1 + Σ B λ²/(λ² − C)"),
        optional(
            Param.CAUCHY,
            seq(
                new Shape.Count("a", Bounds.POSITIVE, false),
                opt(new Shape.Comma(), q("b", Dimension.AREA, Bounds.ANY, "0.004 um2")),
                opt(new Shape.Comma(), q("c", Dimension.LENGTH4, Bounds.ANY, "0.0001 um4"))),
            "Cauchy terms: n = A + B/λ² + C/λ⁴"),
        optional(Param.TABLE, new Shape.Text("file"), "a file of wavelength, n, k rows"),
        optional(
            Param.ORDINARY,
            new Shape.Count("n_o", Bounds.POSITIVE, false),
            "ordinary index of a uniaxial crystal"),
        optional(
            Param.EXTRAORDINARY,
            new Shape.Count("n_e", Bounds.POSITIVE, false),
            "extraordinary index of a uniaxial crystal"),
        optional(
            Param.ABSORPTION,
            q("alpha", Dimension.INVERSE_LENGTH, Bounds.NON_NEGATIVE, "0.01 /cm"),
            "bulk absorption coefficient (power)"),
        optional(
            Param.TEMPERATURE,
            q("temperature", Dimension.TEMPERATURE, Bounds.POSITIVE, "20 degC"),
            "temperature the data refer to"),
        optional(
            Param.VALID,
            new Shape.Span(
                q("from", Dimension.LENGTH, WAVELENGTH, "400 nm"),
                q("to", Dimension.LENGTH, WAVELENGTH, "2 um")),
            "wavelength range where the data hold"));
    put(
        ElementKind.COATING,
        rules(List.of(List.of(Param.LAYER)), List.of()),
        repeatable(
            Param.LAYER,
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
        required(Param.FROM, ref("material", Category.MATERIAL), "medium on the incidence side"),
        required(Param.TO, ref("material", Category.MATERIAL), "medium on the far side"),
        AOI_PARAM,
        PLANE,
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.POLARIZER,
        KindRules.NONE,
        required(Param.AXIS, ANGLE, "transmission axis"),
        optional(
            Param.EXTINCTION, EXTINCTION, "extinction ratio (principal to crossed transmission)"),
        optional(Param.TRANSMISSION, ratio("t"), "principal transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.WAVEPLATE,
        KindRules.NONE,
        required(
            Param.RETARDANCE,
            seq(
                q("retardance", Dimension.ANGLE, Bounds.NON_NEGATIVE, "0.5 wave"),
                opt(lit("at"), WAVELENGTH_Q)),
            "retardance at the design wavelength"),
        required(Param.FAST_AXIS, ANGLE, "fast axis"),
        optional(
            Param.ORDER,
            oneOf(
                "'zero' or 'multi 5'",
                word("order", "zero"),
                seq(word("order", "multi"), new Shape.Count("m", Bounds.atLeast(1), true))),
            "zero- or multi-order"),
        optional(Param.MATERIAL, ref("material", Category.MATERIAL), "birefringent material"),
        optional(
            Param.THICKNESS,
            q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "1 mm"),
            "plate thickness"),
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.ROTATOR,
        KindRules.NONE,
        required(
            Param.ROTATION,
            ANGLE,
            "rotation of the polarization, counter-clockwise seen against the beam"),
        optional(
            Param.TYPE,
            word("type", "reciprocal", "faraday"),
            "reciprocal (optical activity) or Faraday (non-reciprocal)"),
        optional(Param.TRANSMISSION, ratio("t"), "transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.SPLITTER,
        rules(
            List.of(List.of(Param.POLARIZING, Param.RATIO, Param.REFLECT_S)),
            List.of(List.of(Param.POLARIZING, Param.RATIO))),
        optional(Param.POLARIZING, Shape.empty(), "a polarizing splitter: p through, s reflected"),
        optional(
            Param.RATIO, ratio("reflected"), "fraction reflected by a non-polarizing splitter"),
        optional(Param.EXTINCTION, EXTINCTION, "extinction ratio of the through port"),
        optional(Param.TRANSMIT_P, ratio("t"), "transmittance for p"),
        optional(Param.TRANSMIT_S, ratio("t"), "transmittance for s"),
        optional(Param.REFLECT_S, ratio("r"), "reflectance for s"),
        optional(Param.REFLECT_P, ratio("r"), "reflectance for p"),
        optional(
            Param.BAND,
            new Shape.Span(
                q("from", Dimension.LENGTH, WAVELENGTH, "400 nm"),
                q("to", Dimension.LENGTH, WAVELENGTH, "500 nm")),
            "a dichroic: the split holds inside the band; outside it, reflection and transmission"
                + " swap"),
        AOI_PARAM,
        PLANE,
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.DEPOLARIZER,
        KindRules.NONE,
        optional(
            Param.DEPOLARIZATION,
            ratio("d"),
            "fraction of the light that leaves unpolarized (default 100 %)"),
        optional(Param.TRANSMISSION, ratio("t"), "transmittance"),
        DAMAGE_PARAM);
    put(
        ElementKind.MIRROR,
        rules(
            List.of(List.of(Param.METAL, Param.REFLECTANCE, Param.COATING)),
            List.of(List.of(Param.METAL, Param.REFLECTANCE))),
        optional(
            Param.METAL,
            ref("metal", Category.MATERIAL),
            "bare metal, from the catalog or a declared material"),
        optional(Param.REFLECTANCE, ratio("r"), "specified reflectance"),
        COATING_PARAM,
        AOI_PARAM,
        PLANE,
        DAMAGE_PARAM);
    List<ParamSpec> window =
        List.of(
            required(Param.MATERIAL, ref("material", Category.MATERIAL), "bulk material"),
            required(
                Param.THICKNESS,
                q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "3 mm"),
                "thickness"),
            optional(
                Param.THEN,
                ref("medium", Category.MATERIAL),
                "medium behind the exit face (default: the medium before)"),
            refused(
                Param.WEDGE,
                q("wedge", Dimension.ANGLE, Bounds.NON_NEGATIVE, "0.5 deg"),
                "wedge angle",
                "Jonquil does not model a wedge (the deviation of the beam and of its ghosts);"
                    + " give the faces' tilt with 'aoi'"),
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
            Param.FOCAL,
            q("focal", Dimension.LENGTH, Bounds.NON_ZERO, "100 mm"),
            "focal length (negative: diverging)"),
        optional(
            Param.CLEAR_APERTURE,
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "25 mm"),
            "clear aperture diameter"),
        optional(Param.MATERIAL, ref("material", Category.MATERIAL), "lens material"),
        optional(
            Param.THICKNESS,
            q("thickness", Dimension.LENGTH, Bounds.POSITIVE, "4 mm"),
            "centre thickness"),
        COATING_PARAM,
        DAMAGE_PARAM);
    put(
        ElementKind.APERTURE,
        KindRules.NONE,
        required(
            Param.DIAMETER,
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "5 mm"),
            "diameter of the circular opening"),
        DAMAGE_PARAM);
    put(
        ElementKind.FILTER,
        rules(
            List.of(List.of(Param.OD, Param.TRANSMISSION)),
            List.of(List.of(Param.OD, Param.TRANSMISSION))),
        optional(Param.OD, new Shape.Density("od"), "optical density, 'OD 3' or '3'"),
        optional(Param.TRANSMISSION, ratio("t"), "transmittance"),
        optional(
            Param.BAND,
            new Shape.Span(
                q("from", Dimension.LENGTH, WAVELENGTH, "400 nm"),
                q("to", Dimension.LENGTH, WAVELENGTH, "700 nm")),
            "wavelength band where the rating holds (needs 'blocking')"),
        optional(
            Param.BLOCKING,
            new Shape.Density("od"),
            "optical density outside the band, 'OD 0' for none (needs 'band')"),
        DAMAGE_PARAM);
    put(
        ElementKind.ISOLATOR,
        KindRules.NONE,
        required(
            Param.ISOLATION,
            EXTINCTION,
            "how much less light passes backward than forward, '35 dB' or '3000'"),
        optional(
            Param.INSERTION_LOSS,
            new Shape.PowerRatio("loss", Bounds.atLeast(1)),
            "forward loss, '0.5 dB' or '1.12' (default none)"),
        optional(
            Param.TYPE,
            word("type", "independent", "dependent"),
            "polarization 'independent' (default), or 'dependent': a polarizer at 'axis', a 45°"
                + " Faraday rotator and a polarizer at 'axis' + 45°"),
        optional(Param.AXIS, ANGLE, "entry polarizer's axis of a polarization-dependent isolator"),
        DAMAGE_PARAM);
    put(
        ElementKind.RHOMB,
        KindRules.NONE,
        required(Param.MATERIAL, ref("material", Category.MATERIAL), "prism material"),
        required(
            Param.AOI,
            q("angle", Dimension.ANGLE, AOI, "54.6 deg"),
            "internal angle of incidence at each reflection"),
        optional(
            Param.REFLECTIONS,
            new Shape.Count("n", Bounds.atLeast(1), true),
            "number of total internal reflections (default 2)"),
        optional(Param.AXIS, ANGLE, "orientation of the plane of incidence about the beam"),
        DAMAGE_PARAM);
    put(
        ElementKind.PROBE,
        KindRules.NONE,
        optional(
            Param.APERTURE,
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "7 mm"),
            "measurement aperture diameter: exposure is averaged over it where it is smaller than"
                + " the standard's limiting aperture"),
        optional(
            Param.EXPOSURE_TIME,
            q("time", Dimension.TIME, Bounds.POSITIVE, "0.25 s"),
            "exposure duration to assess"));
    put(
        ElementKind.DETECTOR,
        KindRules.NONE,
        refused(
            Param.APERTURE,
            q("diameter", Dimension.LENGTH, Bounds.POSITIVE, "10 mm"),
            "active area diameter",
            "a detector takes the whole beam; clipping at its active area is not modelled (place"
                + " an 'aperture' before it)"),
        refused(
            Param.RESPONSIVITY,
            q("r", Dimension.RESPONSIVITY, Bounds.POSITIVE, "0.6 A/W"),
            "responsivity",
            "no figure Jonquil computes uses it (there is no photocurrent measure)"),
        DAMAGE_PARAM);
    put(
        ElementKind.DUMP,
        KindRules.NONE,
        optional(
            Param.RATING,
            q("power", Dimension.POWER, Bounds.POSITIVE, "10 W"),
            "maximum power the dump takes"),
        DAMAGE_PARAM);
  }

  private static KindRules rules(List<List<Param>> atLeastOne, List<List<Param>> exclusive) {
    return new KindRules(words(atLeastOne), words(exclusive));
  }

  private static List<List<String>> words(List<List<Param>> groups) {
    return groups.stream().map(g -> g.stream().map(Param::word).toList()).toList();
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
