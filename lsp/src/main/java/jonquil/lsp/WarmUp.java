package jonquil.lsp;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.format.FormatOptions;
import jonquil.format.Formatter;
import jonquil.ide.EditorFeatures;

/**
 * Checks a small built-in spec once at start-up, because the first check in a fresh JVM is 15-20
 * times slower than the next.
 */
final class WarmUp {
  static final String RESOURCE = "warmup.jonq";

  private WarmUp() {}

  /**
   * Parses, checks, hovers and formats the built-in spec in memory; nothing is published and no
   * file is read.
   */
  static void run() {
    String text = text();
    if (text.isEmpty()) {
      return;
    }
    Path root =
        Path.of(System.getProperty("java.io.tmpdir"), "jonquil-warm-up")
            .toAbsolutePath()
            .normalize();
    Path file = root.resolve(RESOURCE);
    Result result =
        Checker.check(
            Workspace.withOverlay(root, Map.of(file, text)), List.of(file), CheckOptions.EDITOR);
    EditorFeatures.standard().hover(result, file, text.indexOf("warm_lens"));
    EditorFeatures.standard().documentSymbols(result, file);
    if (result.files().containsKey(file)) {
      Formatter.format(result.files().get(file), FormatOptions.DEFAULT);
    }
  }

  static String text() {
    try (InputStream in = WarmUp.class.getResourceAsStream(RESOURCE)) {
      return in == null ? "" : new String(in.readAllBytes(), StandardCharsets.UTF_8);
    } catch (IOException e) {
      return "";
    }
  }
}
