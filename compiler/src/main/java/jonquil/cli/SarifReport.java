package jonquil.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.diag.Related;
import jonquil.diag.Severity;
import jonquil.source.TextRange;

/** The SARIF 2.1.0 report, for code-scanning services that annotate pull requests. */
final class SarifReport {
  static final String SCHEMA_URI = "https://json.schemastore.org/sarif-2.1.0.json";
  static final String INFORMATION_URI = "https://example.invalid/jonquil";
  static final String ROOT_BASE_ID = "SRCROOT";

  /** Versioned so that a future change of the recipe does not silently re-open every alert. */
  static final String FINGERPRINT_KEY = "jonquilFindingHash/v1";

  private static final Gson GSON =
      new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create();

  private SarifReport() {}

  static String render(CheckRun run) {
    return GSON.toJson(build(run)) + "\n";
  }

  static JsonObject build(CheckRun run) {
    JsonObject log = new JsonObject();
    log.addProperty("$schema", SCHEMA_URI);
    log.addProperty("version", "2.1.0");
    JsonObject sarifRun = new JsonObject();
    sarifRun.add("tool", tool());

    JsonObject baseIds = new JsonObject();
    JsonObject rootLocation = new JsonObject();
    rootLocation.addProperty("uri", PathText.directoryUri(run.root()));
    baseIds.add(ROOT_BASE_ID, rootLocation);
    sarifRun.add("originalUriBaseIds", baseIds);

    JsonArray results = new JsonArray();
    Map<String, Integer> seen = new HashMap<>();
    for (Diagnostic d : run.result().diagnostics()) {
      results.add(result(run, d, seen));
    }
    sarifRun.add("results", results);
    sarifRun.add("invocations", invocations(run));
    // Our columns count code points, not the UTF-16 units SARIF assumes by default.
    sarifRun.addProperty("columnKind", "unicodeCodePoints");

    JsonArray runs = new JsonArray();
    runs.add(sarifRun);
    log.add("runs", runs);
    return log;
  }

  private static JsonObject tool() {
    JsonObject driver = new JsonObject();
    driver.addProperty("name", ToolVersion.NAME);
    driver.addProperty("version", ToolVersion.current());
    driver.addProperty("informationUri", INFORMATION_URI);
    JsonArray rules = new JsonArray();
    for (DiagnosticCode code : DiagnosticCode.values()) {
      JsonObject rule = new JsonObject();
      rule.addProperty("id", code.id());
      rule.addProperty("name", code.ruleName());
      rule.add("shortDescription", text(code.summary()));
      JsonObject config = new JsonObject();
      config.addProperty("level", level(code.severity()));
      rule.add("defaultConfiguration", config);
      rules.add(rule);
    }
    driver.add("rules", rules);
    JsonObject tool = new JsonObject();
    tool.add("driver", driver);
    return tool;
  }

  private static JsonObject result(CheckRun run, Diagnostic d, Map<String, Integer> seen) {
    JsonObject r = new JsonObject();
    r.addProperty("ruleId", d.code().id());
    // Rules are emitted in declaration order, so the ordinal is the index into them.
    r.addProperty("ruleIndex", d.code().ordinal());
    r.addProperty("level", level(d.severity()));
    r.add("message", text(d.message()));
    JsonArray locations = new JsonArray();
    JsonObject location = new JsonObject();
    location.add("physicalLocation", physicalLocation(run, d.file(), d.range()));
    locations.add(location);
    r.add("locations", locations);

    JsonObject fingerprints = new JsonObject();
    fingerprints.addProperty(FINGERPRINT_KEY, fingerprint(run, d, seen));
    r.add("partialFingerprints", fingerprints);

    if (!d.related().isEmpty()) {
      JsonArray related = new JsonArray();
      int id = 0;
      for (Related rel : d.related()) {
        JsonObject loc = new JsonObject();
        loc.addProperty("id", id++);
        loc.add("physicalLocation", physicalLocation(run, rel.file(), rel.range()));
        loc.add("message", text(rel.message()));
        related.add(loc);
      }
      r.add("relatedLocations", related);
    }
    if (!d.fixes().isEmpty()) {
      JsonArray fixes = new JsonArray();
      for (Fix fix : d.fixes()) {
        fixes.add(fix(run, fix));
      }
      r.add("fixes", fixes);
    }
    return r;
  }

  private static JsonObject fix(CheckRun run, Fix fix) {
    // SARIF groups replacements by file, in the order the fix lists them.
    Map<Path, List<Edit>> byFile = new LinkedHashMap<>();
    for (Edit e : fix.edits()) {
      byFile
          .computeIfAbsent(e.file().toAbsolutePath().normalize(), k -> new java.util.ArrayList<>())
          .add(e);
    }
    JsonArray changes = new JsonArray();
    byFile.forEach(
        (file, edits) -> {
          JsonArray replacements = new JsonArray();
          for (Edit e : edits) {
            JsonObject replacement = new JsonObject();
            replacement.add("deletedRegion", region(run, file, e.range()));
            JsonObject inserted = new JsonObject();
            inserted.addProperty("text", e.newText());
            replacement.add("insertedContent", inserted);
            replacements.add(replacement);
          }
          JsonObject change = new JsonObject();
          change.add("artifactLocation", artifactLocation(run, file));
          change.add("replacements", replacements);
          changes.add(change);
        });
    JsonObject f = new JsonObject();
    f.add("description", text(fix.title()));
    f.add("artifactChanges", changes);
    return f;
  }

  private static JsonArray invocations(CheckRun run) {
    JsonObject invocation = new JsonObject();
    invocation.addProperty("executionSuccessful", run.complete());
    if (!run.complete()) {
      JsonArray notifications = new JsonArray();
      for (String problem : run.inputProblems()) {
        JsonObject n = new JsonObject();
        n.addProperty("level", "error");
        n.add("message", text(problem));
        notifications.add(n);
      }
      invocation.add("toolExecutionNotifications", notifications);
    }
    JsonArray invocations = new JsonArray();
    invocations.add(invocation);
    return invocations;
  }

  private static JsonObject physicalLocation(CheckRun run, Path file, TextRange range) {
    JsonObject loc = new JsonObject();
    loc.add("artifactLocation", artifactLocation(run, file));
    loc.add("region", region(run, file, range));
    return loc;
  }

  /** Inside the root a path is relative to SRCROOT; outside it only an absolute URI is honest. */
  private static JsonObject artifactLocation(CheckRun run, Path file) {
    JsonObject a = new JsonObject();
    if (PathText.isInside(run.root(), file)) {
      a.addProperty("uri", PathText.uriReference(PathText.relative(run.root(), file)));
      a.addProperty("uriBaseId", ROOT_BASE_ID);
    } else {
      a.addProperty("uri", file.toAbsolutePath().normalize().toUri().toASCIIString());
    }
    return a;
  }

  /** SARIF regions are 1-based and their end column is exclusive, like our half-open ranges. */
  private static JsonObject region(CheckRun run, Path file, TextRange range) {
    Position start = Position.of(run.result().files(), file, range.start());
    Position end = Position.of(run.result().files(), file, range.end());
    JsonObject region = new JsonObject();
    region.addProperty("startLine", start.line());
    region.addProperty("startColumn", start.column());
    region.addProperty("endLine", end.line());
    region.addProperty("endColumn", end.column());
    return region;
  }

  /**
   * Leaves the line out so an alert survives edits above it; the running count keeps two identical
   * findings in one file apart.
   */
  private static String fingerprint(CheckRun run, Diagnostic d, Map<String, Integer> seen) {
    String key =
        d.code().id() + "\u0000" + PathText.relative(run.root(), d.file()) + "\u0000" + d.message();
    int occurrence = seen.merge(key, 1, Integer::sum);
    try {
      MessageDigest sha = MessageDigest.getInstance("SHA-256");
      byte[] hash = sha.digest((key + "\u0000" + occurrence).getBytes(StandardCharsets.UTF_8));
      return HexFormat.of().formatHex(hash, 0, 16);
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
    }
  }

  private static String level(Severity severity) {
    return switch (severity) {
      case ERROR -> "error";
      case WARNING -> "warning";
      case NOTE -> "note";
    };
  }

  private static JsonObject text(String message) {
    JsonObject m = new JsonObject();
    m.addProperty("text", message);
    return m;
  }
}
