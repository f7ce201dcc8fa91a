package jonquil.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import java.nio.file.Path;
import java.util.Map;
import jonquil.analysis.ElementBudget;
import jonquil.analysis.PortInterference;
import jonquil.analysis.PortValue;
import jonquil.analysis.SafetySummary;
import jonquil.analysis.StrayBeam;
import jonquil.analysis.TrainSolution;
import jonquil.optics.Coherency;
import jonquil.optics.Handedness;
import jonquil.resolve.ResolvedModel;

/**
 * The computed values of the JSON report: light at every port, the power budget of every element,
 * the stray beams and the conservation check, per checked root file. SI units; angles in degrees as
 * the field names say; azimuths against the table frame.
 */
final class ValuesJson {
  static final String HANDEDNESS_VIEWPOINT =
      "as seen by the receiver, looking back towards the source";

  private ValuesJson() {}

  static JsonArray build(CheckRun run) {
    JsonArray out = new JsonArray();
    for (Map.Entry<Path, TrainSolution> e : run.result().solutions().entrySet()) {
      out.add(of(run.root(), e.getKey(), run.result().models().get(e.getKey()), e.getValue()));
    }
    return out;
  }

  /** The values of one checked root file ({@code model} null when it has none). */
  static JsonObject of(Path root, Path file, ResolvedModel model, TrainSolution s) {
    return of(root, file, model, s, java.util.Map.of());
  }

  /** As above, with each line's own solution where the sources carry several lines. */
  static JsonObject of(
      Path root,
      Path file,
      ResolvedModel model,
      TrainSolution s,
      java.util.Map<Double, TrainSolution> lines) {
    JsonObject o = new JsonObject();
    o.addProperty("path", PathText.relative(root, file));
    JsonArray ports = new JsonArray();
    s.ports()
        .forEach(
            (key, value) -> {
              if (!key.equals(value.key())) {
                return; // aliases ("element" for its exit port) are not repeated
              }
              JsonObject j = port(value);
              if (model != null) {
                interference(j, PortInterference.at(model, s, key));
              }
              ports.add(j);
            });
    o.add("ports", ports);
    JsonArray incident = new JsonArray();
    s.incident().values().forEach(v -> incident.add(port(v)));
    o.add("incident", incident);
    java.util.Map<String, Double> margins =
        model == null ? java.util.Map.of() : SafetySummary.damageMargins(model, s);
    JsonArray budget = new JsonArray();
    for (ElementBudget b : s.budgets()) {
      JsonObject j = new JsonObject();
      j.addProperty("element", b.element());
      j.add("in_W", number(b.in()));
      JsonObject outs = new JsonObject();
      b.out().forEach((port, w) -> outs.add(port, number(w)));
      j.add("out_W", outs);
      j.add("absorbed_W", number(b.absorbed()));
      j.add("ghosts_W", number(b.ghosts()));
      j.add(
          "damage_margin",
          margins.containsKey(b.element()) ? number(margins.get(b.element())) : JsonNull.INSTANCE);
      budget.add(j);
    }
    o.add("budget", budget);
    JsonArray stray = new JsonArray();
    for (StrayBeam b : s.stray()) {
      JsonObject j = new JsonObject();
      j.addProperty("origin", b.origin());
      j.addProperty("description", b.description());
      j.add("power_W", number(b.power()));
      j.addProperty("towards_source", b.backward());
      stray.add(j);
    }
    o.add("stray", stray);
    if (!s.passes().isEmpty()) {
      // Only where light meets an element more than once, so one-way benches read as before.
      JsonArray passes = new JsonArray();
      for (jonquil.analysis.ElementPass p : s.passes()) {
        JsonObject j = new JsonObject();
        j.addProperty("element", p.element());
        j.addProperty("face", p.face());
        j.addProperty("direction", p.backward() ? "backward" : "forward");
        j.add("in_W", number(p.powerIn()));
        j.add("out_W", number(p.powerOut()));
        JsonArray stokes = new JsonArray();
        for (double x : p.out().stokes()) {
          stokes.add(number(x));
        }
        j.add("stokes_out_W", stokes);
        passes.add(j);
      }
      o.add("passes", passes);
    }
    if (!s.returned().isEmpty()) {
      // Light traced back along its paths to a source's output: what 'back reflection' means
      // there, with its polarization.
      JsonArray returned = new JsonArray();
      s.returned()
          .forEach(
              (source, light) -> {
                JsonObject j = new JsonObject();
                j.addProperty("source", source);
                j.add("power_W", number(light.power()));
                JsonArray stokes = new JsonArray();
                for (double x : light.stokes()) {
                  stokes.add(number(x));
                }
                j.add("stokes_W", stokes);
                returned.add(j);
              });
      o.add("returned_to_sources", returned);
    }
    JsonObject conservation = new JsonObject();
    conservation.add("source_W", number(s.sourcePower()));
    conservation.add("absorbed_W", number(s.absorbed()));
    conservation.add("stopped_W", number(s.stopped()));
    conservation.add("observed_at_path_ends_W", number(s.observedAtPathEnds()));
    conservation.add("stray_W", number(s.strayPower()));
    conservation.add("relative_error", number(s.conservationError()));
    o.add("conservation", conservation);
    JsonArray safety = new JsonArray();
    if (model != null) {
      for (SafetySummary.SourceSafety src : SafetySummary.sources(model, s, lines)) {
        safety.add(safety(src));
      }
    }
    o.add("safety", safety);
    return o;
  }

  private static JsonObject safety(SafetySummary.SourceSafety s) {
    JsonObject j = new JsonObject();
    j.addProperty("source", s.source());
    j.add("wavelength_m", number(s.wavelength()));
    j.add("exposure_time_s", number(s.exposureTime()));
    j.addProperty("exposure_time_reason", s.exposureTimeReason());
    j.add("hazard_class", outcome(s.hazardClass(), c -> new JsonPrimitive(c.label())));
    j.add("mpe", outcome(s.mpe(), ValuesJson::mpe));
    j.add("mpe_ansi_z136_1", outcome(s.ansiMpe(), ValuesJson::mpe));
    j.add("mpe_directive_2006_25", outcome(s.directiveMpe(), ValuesJson::mpe));
    j.add("skin_mpe", outcome(s.skinMpe(), ValuesJson::mpe));
    j.add("nohd_m", outcome(s.nohd(), ValuesJson::number));
    j.add(
        "eyewear_od_at_exit",
        outcome(
            s.eyewear(),
            od -> {
              JsonObject o = new JsonObject();
              o.add("averaged_over_limiting_aperture", number(od.atAperture()));
              o.add("at_beam_peak", number(od.atPeak()));
              return o;
            }));
    if (!s.lines().isEmpty()) {
      JsonArray lines = new JsonArray();
      s.lines().forEach(l -> lines.add(safety(l)));
      j.add("lines", lines);
    }
    j.addProperty("caution", jonquil.safety.Outcome.CAUTION);
    return j;
  }

  private static JsonElement mpe(jonquil.safety.MaximumPermissibleExposure m) {
    JsonObject o = new JsonObject();
    o.add("irradiance_W_m2", number(m.irradiance()));
    o.add("radiant_exposure_J_m2", number(m.radiantExposure()));
    o.add("limiting_aperture_m", number(m.apertureDiameter()));
    o.addProperty("limited_by", m.limitingCriterion());
    return o;
  }

  /** A safety figure with its standard, or null with the reason it was not evaluated. */
  private static <T> JsonObject outcome(
      jonquil.safety.Outcome<T> o, java.util.function.Function<T, JsonElement> value) {
    JsonObject j = new JsonObject();
    j.add("value", o.evaluated() ? value.apply(o.get()) : JsonNull.INSTANCE);
    j.addProperty("standard", o.standard());
    if (!o.evaluated()) {
      j.addProperty("not_evaluated", o.reason());
    }
    return j;
  }

  /** Each line whose beams meet at the port: its visibility and the power range over phase. */
  private static void interference(JsonObject port, java.util.List<PortInterference> lines) {
    if (lines.isEmpty()) {
      return;
    }
    JsonArray out = new JsonArray();
    for (PortInterference i : lines) {
      JsonObject j = new JsonObject();
      j.addProperty("line", i.line());
      j.add("wavelength_m", number(i.wavelength()));
      j.addProperty("beams", i.beams());
      j.add(
          "visibility",
          i.visibility().isPresent() ? number(i.visibility().getAsDouble()) : JsonNull.INSTANCE);
      if (i.visibility().isEmpty()) {
        j.addProperty("visibility_unknown", i.unknownReason());
      }
      j.add("power_min_W", number(i.range().min()));
      j.add("power_max_W", number(i.range().max()));
      j.addProperty("range_exact", i.range().exact());
      out.add(j);
    }
    port.add("interference", out);
  }

  private static JsonObject port(PortValue v) {
    Coherency c = v.light();
    JsonObject j = new JsonObject();
    j.addProperty("element", v.element());
    j.addProperty("port", v.port());
    j.add("power_W", number(c.power()));
    JsonArray stokes = new JsonArray();
    for (double s : c.stokes()) {
      stokes.add(number(s));
    }
    j.add("stokes_W", stokes);
    j.add("dop", number(c.dop()));
    j.add("azimuth_deg", number(Math.toDegrees(c.azimuth())));
    j.add("ellipticity_deg", number(Math.toDegrees(c.ellipticityAngle())));
    Handedness h = c.handedness();
    j.addProperty("handedness", h.name().toLowerCase(java.util.Locale.ROOT));
    j.addProperty("handedness_viewpoint", HANDEDNESS_VIEWPOINT);
    j.add("extinction_ratio", number(c.extinctionRatio()));
    j.addProperty("azimuth_frame", v.vertical() ? "carried (the beam runs vertically)" : "table");
    v.exposure()
        .ifPresent(
            e -> {
              j.add("beam_radius_m", number(e.beamRadius()));
              JsonObject irradiance = new JsonObject();
              irradiance.add("average", number(e.averageIrradiance()));
              irradiance.add("average_peak", number(e.peakIrradiance()));
              // 'peak' is the peak in time and space, as in the requirement 'peak irradiance'.
              irradiance.add("peak", number(e.timeAndSpacePeakIrradiance()));
              j.add("irradiance_W_m2", irradiance);
              e.pulseEnergy().ifPresent(x -> j.add("pulse_energy_J", number(x)));
              e.peakPower().ifPresent(x -> j.add("peak_power_W", number(x)));
              e.peakFluence().ifPresent(x -> j.add("fluence_J_m2", number(x)));
              j.add("peak_field_V_m", number(e.peakField()));
            });
    v.mode()
        .flatMap(m -> m.nextFocus())
        .ifPresent(
            f -> {
              JsonObject focus = new JsonObject();
              focus.add("distance_m", number(f.distance()));
              focus.add("radius_m", number(f.radius()));
              j.add("next_focus", focus);
            });
    return j;
  }

  private static JsonElement number(double v) {
    return Double.isFinite(v) ? new JsonPrimitive(v) : JsonNull.INSTANCE;
  }
}
