package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.ide.EditorFeatures;
import jonquil.source.LineIndex;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.junit.jupiter.api.Test;

/**
 * CLI/LSP parity: for every sample and every broken-corpus case, the diagnostics the server
 * publishes for the opened file are the command line's, code for code, severity, message and range.
 */
class ParityTest {
  static final Path REPO =
      Path.of(System.getProperty("jonquil.repo", "..")).toAbsolutePath().normalize();
  static final Path CORPUS = REPO.resolve("compiler/src/test/resources/diagnostics");

  /**
   * One file to check: its project root and the file itself, as DiagnosticsCorpusTest and
   * SamplesTest root them.
   */
  record Case(String name, Path root, Path main) {}

  static List<Case> cases() throws IOException {
    List<Case> out = new ArrayList<>();
    try (Stream<Path> samples = Files.list(REPO.resolve("samples"))) {
      samples
          .filter(p -> p.toString().endsWith(".jonq"))
          .sorted()
          .forEach(
              p -> out.add(new Case("samples/" + p.getFileName(), REPO.resolve("samples"), p)));
    }
    try (Stream<Path> areas = Files.list(CORPUS)) {
      for (Path area : areas.filter(Files::isDirectory).sorted().toList()) {
        try (Stream<Path> entries = Files.list(area)) {
          for (Path entry : entries.sorted().toList()) {
            String name = area.getFileName() + "/" + entry.getFileName();
            if (Files.isDirectory(entry)) {
              out.add(new Case(name, entry, entry.resolve("main.jonq")));
            } else if (entry.toString().endsWith(".jonq")) {
              out.add(new Case(name, area, entry));
            }
          }
        }
      }
    }
    return out;
  }

  /**
   * A diagnostic as the CLI shows it: code, severity word, 1-based lines and code-point columns,
   * message.
   */
  static String cli(
      String code, String severity, LineIndex lines, int start, int end, String message) {
    return code
        + " "
        + severity
        + " "
        + (lines.line(start) + 1)
        + ":"
        + (lines.codePointColumn(start) + 1)
        + "-"
        + (lines.line(end) + 1)
        + ":"
        + (lines.codePointColumn(end) + 1)
        + " "
        + message;
  }

  /** The LSP severity back in the CLI's words, written apart from the server's mapping. */
  static String word(DiagnosticSeverity s) {
    if (s == DiagnosticSeverity.Error) {
      return "error";
    }
    if (s == DiagnosticSeverity.Warning) {
      return "warning";
    }
    return s == DiagnosticSeverity.Information ? "note" : "hint?";
  }

  static int offset(LineIndex lines, Position p) {
    return lines.offsetOfUtf16(p.getLine(), p.getCharacter());
  }

  /** What the server published, in the command line's words. */
  static List<String> actual(PublishDiagnosticsParams p, LineIndex lines) {
    List<String> out = new ArrayList<>();
    for (Diagnostic d : p.getDiagnostics()) {
      out.add(
          cli(
              d.getCode().getLeft(),
              word(d.getSeverity()),
              lines,
              offset(lines, d.getRange().getStart()),
              offset(lines, d.getRange().getEnd()),
              d.getMessage()));
    }
    return out;
  }

  @Test
  void everySampleAndCorpusCaseGivesTheCliDiagnosticsThroughTheServer() throws Exception {
    List<Case> cases = cases();
    assertTrue(cases.size() >= 43, "only " + cases.size() + " cases");
    // Every root gets its own workspace folder: the server roots a file at its innermost folder.
    Set<Path> folders = new LinkedHashSet<>();
    cases.forEach(c -> folders.add(c.root()));
    List<String> mismatches = new ArrayList<>();
    int compared = 0;
    int withYields = 0;
    String last = null;
    try (LspHarness h = new LspHarness(EditorFeatures.standard(), Duration.ofMillis(10))) {
      h.initialize(List.copyOf(folders), new ClientCapabilities());
      for (Case c : cases) {
        Path main = c.main().toAbsolutePath().normalize();
        String text;
        try {
          text =
              StandardCharsets.UTF_8
                  .newDecoder()
                  .decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(main)))
                  .toString();
        } catch (CharacterCodingException e) {
          continue; // not UTF-8: an editor could not send it as it is on disk (the CLI reports
          // J902)
        }
        Result result = Checker.check(Workspace.onDisk(c.root()), List.of(main));
        boolean yields =
            result.requirements().stream()
                .anyMatch(o -> o.file().equals(main) && o.text().strip().startsWith("yield"));
        withYields += yields ? 1 : 0;
        LineIndex lines = new LineIndex(text);
        List<String> expected = new ArrayList<>();
        for (jonquil.diag.Diagnostic d : result.diagnostics()) {
          if (d.file().equals(main)) {
            expected.add(
                cli(
                    d.code().id(),
                    d.severity().word(),
                    lines,
                    d.range().start(),
                    d.range().end(),
                    d.message()));
          }
        }
        String uri = main.toUri().toString();
        h.open(uri, 1, text);
        // A spec with a yield is published twice: first without the draws, then with them. The
        // editor must end with the command line's diagnostics, so its last publish is compared.
        List<String> actual =
            actual(
                h.client.await(
                    uri,
                    q ->
                        Integer.valueOf(1).equals(q.getVersion())
                            && (!yields || actual(q, lines).equals(expected))),
                lines);
        if (!expected.equals(actual)) {
          mismatches.add(c.name() + "\n  cli: " + expected + "\n  lsp: " + actual);
        }
        h.close(uri);
        compared++;
        last = uri;
      }
      if (last != null) {
        String closed =
            last; // the clearing publish, so that no check is still writing when the pipes close
        h.client.await(closed, q -> q.getVersion() == null && q.getDiagnostics().isEmpty());
      }
    }
    assertEquals(List.of(), mismatches, String.join("\n", mismatches));
    assertTrue(withYields >= 1, "no case has a yield, so the editor's second pass is untested");
    assertEquals(cases.size(), compared, "some cases were not valid UTF-8 and were skipped");
  }
}
