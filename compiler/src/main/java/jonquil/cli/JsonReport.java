package jonquil.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import com.google.gson.stream.JsonWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.Map;
import java.util.OptionalDouble;
import jonquil.Result;
import jonquil.analysis.RequirementOutcome;
import jonquil.analysis.RequirementStatus;
import jonquil.analysis.VerdictText;
import jonquil.analysis.YieldEstimate;
import jonquil.diag.Diagnostic;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.diag.Related;
import jonquil.diag.Severity;
import jonquil.source.TextRange;

/**
 * The machine-readable report described by check-result.schema.json. Its "schema" field changes
 * whenever a field changes meaning or disappears, so consumers can refuse what they do not
 * understand; adding fields does not change it.
 */
final class JsonReport {
  static final String SCHEMA_ID = "jonquil.check/2";

  private static final Gson GSON =
      new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create();

  private JsonReport() {}

  static String render(CheckRun run) {
    return GSON.toJson(build(run)) + "\n";
  }

  /**
   * Writes the report with the "values" of each checked file given as already rendered {@link
   * #valuesEntry entries}, in the order listed: the same bytes as {@link #render}, without holding
   * every file's values at once.
   */
  static void write(CheckRun run, Iterable<String> valuesEntries, Writer out) throws IOException {
    JsonWriter w = GSON.newJsonWriter(out);
    w.beginObject();
    for (Map.Entry<String, JsonElement> member : build(run).entrySet()) {
      w.name(member.getKey());
      if (member.getKey().equals("values")) {
        w.beginArray();
        for (String entry : valuesEntries) {
          w.jsonValue(entry);
        }
        w.endArray();
      } else {
        GSON.toJson(member.getValue(), w);
      }
    }
    w.endObject();
    w.flush();
    out.write("\n");
    out.flush();
  }

  /** One checked file's values as an entry of {@link #write}: pretty-printed at its depth. */
  static String valuesEntry(JsonObject values) {
    // Strings never hold a raw line break (JSON escapes it), so each break starts a nested line.
    return GSON.toJson(values).replace("\n", "\n    ");
  }

  static JsonObject build(CheckRun run) {
    Result result = run.result();
    JsonObject root = new JsonObject();
    root.addProperty("schema", SCHEMA_ID);
    JsonObject tool = new JsonObject();
    tool.addProperty("name", ToolVersion.NAME);
    tool.addProperty("version", ToolVersion.current());
    root.add("tool", tool);

    JsonArray files = new JsonArray();
    result.files().keySet().stream()
        .map(p -> path(run, p))
        .sorted()
        .forEach(
            p -> {
              JsonObject f = new JsonObject();
              f.addProperty("path", p);
              files.add(f);
            });
    root.add("files", files);

    JsonArray diagnostics = new JsonArray();
    for (Diagnostic d : result.diagnostics()) {
      diagnostics.add(diagnostic(run, d));
    }
    root.add("diagnostics", diagnostics);

    JsonArray requirements = new JsonArray();
    for (RequirementOutcome r : result.requirements()) {
      requirements.add(requirement(run, r));
    }
    root.add("requirements", requirements);
    root.add("values", ValuesJson.build(run));
    root.add("summary", summary(result));
    return root;
  }

  private static JsonObject diagnostic(CheckRun run, Diagnostic d) {
    JsonObject o = new JsonObject();
    o.addProperty("path", path(run, d.file()));
    o.addProperty("code", d.code().id());
    o.addProperty("rule", d.code().ruleName());
    o.addProperty("severity", d.severity().word());
    o.addProperty("message", d.message());
    o.add("range", range(run, d.file(), d.range()));
    JsonArray fixes = new JsonArray();
    for (Fix fix : d.fixes()) {
      JsonObject f = new JsonObject();
      f.addProperty("title", fix.title());
      JsonArray edits = new JsonArray();
      for (Edit e : fix.edits()) {
        JsonObject edit = new JsonObject();
        edit.addProperty("path", path(run, e.file()));
        edit.add("range", range(run, e.file(), e.range()));
        edit.addProperty("newText", e.newText());
        edits.add(edit);
      }
      f.add("edits", edits);
      fixes.add(f);
    }
    o.add("fixes", fixes);
    JsonArray related = new JsonArray();
    for (Related r : d.related()) {
      JsonObject rel = new JsonObject();
      rel.addProperty("path", path(run, r.file()));
      rel.add("range", range(run, r.file(), r.range()));
      rel.addProperty("message", r.message());
      related.add(rel);
    }
    o.add("related", related);
    return o;
  }

  private static JsonObject requirement(CheckRun run, RequirementOutcome r) {
    JsonObject o = new JsonObject();
    o.addProperty("path", path(run, r.file()));
    o.add("range", range(run, r.file(), r.range()));
    o.addProperty("text", r.text());
    o.addProperty("status", r.status().word());
    boolean hazardClass = r.siUnit().equals("class");
    o.add("value", hazardClass ? label(r.value()) : number(r.value()));
    o.add("bound", hazardClass ? label(r.bound()) : number(r.bound()));
    o.add("margin", hazardClass ? JsonNull.INSTANCE : number(r.margin()));
    o.add("unit", textOrNull(r.siUnit()));
    o.add("reason", textOrNull(r.reason()));
    JsonObject shown = new JsonObject();
    shown.add("unit", textOrNull(r.shownUnit()));
    o.addProperty("value_is_lower_bound", r.valueIsLowerBound());
    shown.add(
        "value",
        r.valueIsLowerBound() && r.value().isPresent()
            ? new JsonPrimitive(
                "at least " + VerdictText.format(r.value().getAsDouble(), r.shownUnit()))
            : shownText(r.value(), r.shownUnit()));
    shown.add("bound", shownText(r.bound(), r.shownUnit()));
    shown.add(
        "margin",
        r.margin().isPresent() && r.value().isPresent() && r.bound().isPresent()
            ? new JsonPrimitive(
                VerdictText.margin(
                    r.value().getAsDouble(),
                    r.bound().getAsDouble(),
                    r.margin().getAsDouble(),
                    r.shownUnit()))
            : JsonNull.INSTANCE);
    o.add("shown", shown);
    r.yield().ifPresent(y -> o.add("yield", yieldEstimate(y)));
    return o;
  }

  /** Only on a yield requirement whose builds were drawn. */
  private static JsonObject yieldEstimate(YieldEstimate y) {
    JsonObject o = new JsonObject();
    o.addProperty("builds", y.builds());
    o.addProperty("passes", y.passes());
    JsonObject interval = new JsonObject();
    interval.addProperty("method", "wilson");
    interval.addProperty("confidence", 0.95);
    interval.addProperty("low", y.interval().low());
    interval.addProperty("high", y.interval().high());
    o.add("interval", interval);
    o.addProperty("settled", y.settled());
    o.addProperty("seed", y.seedHex());
    return o;
  }

  /** A hazard class as the standard writes it ("3R"); the rank it is compared by is internal. */
  private static JsonElement label(OptionalDouble rank) {
    return rank.isPresent()
        ? jonquil.safety.HazardClass.ofRank(rank.getAsDouble())
            .<JsonElement>map(c -> new JsonPrimitive(c.label()))
            .orElse(JsonNull.INSTANCE)
        : JsonNull.INSTANCE;
  }

  private static JsonElement shownText(OptionalDouble value, String unit) {
    return value.isPresent()
        ? new JsonPrimitive(VerdictText.format(value.getAsDouble(), unit))
        : JsonNull.INSTANCE;
  }

  private static JsonObject summary(Result result) {
    JsonObject s = new JsonObject();
    s.addProperty("files", result.files().size());
    s.addProperty("errors", result.count(Severity.ERROR));
    s.addProperty("warnings", result.count(Severity.WARNING));
    s.addProperty("notes", result.count(Severity.NOTE));
    JsonObject req = new JsonObject();
    req.addProperty("pass", result.count(RequirementStatus.PASS));
    req.addProperty("fail", result.count(RequirementStatus.FAIL));
    req.addProperty("not_evaluated", result.count(RequirementStatus.NOT_EVALUATED));
    s.add("requirements", req);
    return s;
  }

  private static JsonObject range(CheckRun run, Path file, TextRange range) {
    JsonObject o = new JsonObject();
    o.add("start", position(Position.of(run.result().files(), file, range.start())));
    o.add("end", position(Position.of(run.result().files(), file, range.end())));
    return o;
  }

  private static JsonObject position(Position p) {
    JsonObject o = new JsonObject();
    o.addProperty("line", p.line());
    o.addProperty("column", p.column());
    o.addProperty("offset", p.offset());
    return o;
  }

  /** Paths are relative to the project root so reports from different machines compare equal. */
  private static String path(CheckRun run, Path file) {
    return PathText.relative(run.root(), file);
  }

  /** JSON has no NaN or infinity; a value that is not a finite number is reported as unknown. */
  private static JsonElement number(OptionalDouble value) {
    return value.isPresent() && Double.isFinite(value.getAsDouble())
        ? new JsonPrimitive(value.getAsDouble())
        : JsonNull.INSTANCE;
  }

  private static JsonElement textOrNull(String text) {
    return text == null || text.isEmpty() ? JsonNull.INSTANCE : new JsonPrimitive(text);
  }
}
