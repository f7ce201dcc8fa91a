package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.format.FormatOptions;
import jonquil.format.Formatter;
import jonquil.ide.EditorFeatures;
import jonquil.ide.HoverInfo;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ten thousand seeded random edits of a real sample, sent as incremental didChange notifications in
 * batches: the server's copy of the text never drifts from the editor's, no request fails, and
 * hover, formatting and the final diagnostics equal what the compiler says about the final text.
 */
class FuzzEditTest {
  static final int EDITS = 10_000;
  static final long SEED = 0x4a6f6e7175696cL;

  /**
   * Snippets an editor might insert: the language's own words and symbols, broken pieces and odd
   * text.
   */
  static final String[] SNIPPETS = {
    "mirror",
    "lens",
    "train t {",
    "}",
    "{",
    " -> ",
    "->",
    " 10 mm",
    "deg",
    "%",
    "\"",
    "/*",
    "*/",
    "//",
    "\n",
    "\n  ",
    ";",
    ",",
    "..",
    "±",
    "é",
    "😀",
    "use \"x.jonq\"\n",
    "require {\n",
    "power at trap_plane > 1 mW\n",
    "trap_laser",
    "pbs_split.",
    "1e400",
    "0.5 wave",
    "  ",
    "x",
    "9",
    "@",
    "\t"
  };

  @TempDir Path dir;

  @Test
  void tenThousandRandomEditsLeaveTheServerCorrectAndAlive() throws Exception {
    Path repo = Path.of(System.getProperty("jonquil.repo", "..")).toAbsolutePath().normalize();
    Path samples = repo.resolve("samples");
    Path file = samples.resolve("optical_trap.jonq");
    String original = Files.readString(file);
    String uri = file.toUri().toString();
    SplittableRandom random = new SplittableRandom(SEED);
    try (LspHarness h = new LspHarness(EditorFeatures.standard(), Duration.ofMillis(10))) {
      h.initialize(
          samples,
          HoverFormatTest.hoverClient("markdown")); // hover compared as the compiler's Markdown
      h.open(uri, 1, original);
      h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion()));
      String text = original;
      int version = 1;
      int sent = 0;
      while (sent < EDITS) {
        int batch = Math.min(EDITS - sent, 1 + random.nextInt(8));
        List<TextDocumentContentChangeEvent> changes = new ArrayList<>();
        for (int i = 0; i < batch; i++) {
          int[] range = randomRange(random, text, text.length() > 2 * original.length());
          String insert =
              range[1] > range[0] && random.nextInt(3) == 0
                  ? ""
                  : SNIPPETS[random.nextInt(SNIPPETS.length)];
          changes.add(
              new TextDocumentContentChangeEvent(
                  new Range(
                      ClientText.position(text, range[0]), ClientText.position(text, range[1])),
                  insert));
          text = text.substring(0, range[0]) + insert + text.substring(range[1]);
        }
        sent += batch;
        version++;
        h.remote
            .getTextDocumentService()
            .didChange(
                new DidChangeTextDocumentParams(
                    new VersionedTextDocumentIdentifier(uri, version), changes));
        if (random.nextInt(60) == 0) {
          int v = version;
          h.client.await(
              uri, p -> Integer.valueOf(v).equals(p.getVersion())); // let a check see this state
          hover(h, uri, text, random.nextInt(text.length() + 1)); // must not fail on broken text
        }
      }
      assertFalse(h.serverListening.isDone(), "the server still reads its input");

      // The server's text is the client's: its diagnostics, hover and formatting equal the
      // compiler's on it.
      int last = version;
      PublishDiagnosticsParams finalDiagnostics =
          h.client.await(uri, p -> Integer.valueOf(last).equals(p.getVersion()));
      Result expected =
          Checker.check(
              Workspace.withOverlay(samples, Map.of(file, text)),
              List.of(file),
              CheckOptions.EDITOR);
      Convert convert = new Convert(Convert.Encoding.UTF_16, p -> null);
      List<String> want =
          expected.diagnostics().stream()
              .filter(d -> d.file().equals(file))
              .map(d -> convert.diagnostic(d, expected.files()::get))
              .map(d -> d.getCode().getLeft() + " " + d.getRange() + " " + d.getMessage())
              .toList();
      List<String> got =
          finalDiagnostics.getDiagnostics().stream()
              .map(d -> d.getCode().getLeft() + " " + d.getRange() + " " + d.getMessage())
              .toList();
      assertEquals(want, got);
      for (int i = 0; i < 50; i++) {
        int offset = random.nextInt(text.length() + 1);
        Optional<HoverInfo> direct =
            EditorFeatures.standard()
                .hover(expected, file, ClientText.offset(text, ClientText.position(text, offset)));
        Hover viaServer = hover(h, uri, text, offset);
        assertEquals(
            direct.map(HoverInfo::markdown).orElse(null),
            viaServer == null ? null : viaServer.getContents().getRight().getValue(),
            "hover at " + offset);
      }
      List<? extends TextEdit> edits = format(h, uri);
      String formatted =
          Formatter.format(expected.files().get(file), FormatOptions.DEFAULT).orElse(text);
      assertEquals(formatted, ClientText.apply(text, edits));

      // Back to the sample: hover answers with computed values, and formatting is idempotent.
      version++;
      h.changeAll(uri, version, original);
      int back = version;
      h.client.await(uri, p -> Integer.valueOf(back).equals(p.getVersion()));
      Hover laser = hover(h, uri, original, original.indexOf("trap_laser ->"));
      assertNotNull(laser);
      assertTrue(
          laser.getContents().getRight().getValue().contains("trap_laser"), laser.toString());
      String once = ClientText.apply(original, format(h, uri));
      version++;
      h.changeAll(uri, version, once);
      assertEquals(List.of(), format(h, uri));

      synchronized (h.responses) {
        assertEquals(
            List.of(),
            h.responses.stream().filter(r -> r.getError() != null).toList(),
            "no error response");
      }
      assertFalse(h.serverListening.isDone(), "the server still reads its input");
    }
  }

  /**
   * A random range that never splits a surrogate pair; deletions are favoured when the text has
   * grown.
   */
  private static int[] randomRange(SplittableRandom random, String text, boolean shrink) {
    int start = safe(text, random.nextInt(text.length() + 1));
    int length =
        random.nextInt(4) == 0 || shrink
            ? random.nextInt(Math.min(40, text.length() - start) + 1)
            : 0;
    int end = safe(text, start + length);
    return new int[] {start, end};
  }

  private static int safe(String text, int offset) {
    return offset > 0 && offset < text.length() && Character.isLowSurrogate(text.charAt(offset))
        ? offset - 1
        : offset;
  }

  private static Hover hover(LspHarness h, String uri, String text, int offset) throws Exception {
    return h.remote
        .getTextDocumentService()
        .hover(new HoverParams(new TextDocumentIdentifier(uri), ClientText.position(text, offset)))
        .get(20, TimeUnit.SECONDS);
  }

  private static List<? extends TextEdit> format(LspHarness h, String uri) throws Exception {
    return h.remote
        .getTextDocumentService()
        .formatting(
            new DocumentFormattingParams(
                new TextDocumentIdentifier(uri), new FormattingOptions(2, true)))
        .get(20, TimeUnit.SECONDS);
  }
}
