package jonquil.ide;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;

/** Checks inline specs as files of an in-memory project, with the cursor marked {@code $0}. */
final class Specs {
  static final Path ROOT = Path.of("/virtual/ide").toAbsolutePath();
  static final Path MAIN = ROOT.resolve("main.jonq");

  /** A checked project and, when one file held {@code $0}, the cursor's file and offset. */
  record Checked(Result result, Path file, int offset) {}

  private Specs() {}

  /** One file, main.jonq. */
  static Checked check(String spec) {
    return check(Map.of("main.jonq", spec));
  }

  /** Several files by relative name; main.jonq is the root that is checked. */
  static Checked check(Map<String, String> files) {
    Map<Path, String> buffers = new LinkedHashMap<>();
    Path cursorFile = MAIN;
    int offset = -1;
    for (Map.Entry<String, String> e : files.entrySet()) {
      Path p = ROOT.resolve(e.getKey());
      String text = e.getValue();
      int at = text.indexOf("$0");
      if (at >= 0) {
        cursorFile = p;
        offset = at;
        text = text.substring(0, at) + text.substring(at + 2);
      }
      buffers.put(p, text);
    }
    Result r = Checker.check(Workspace.withOverlay(ROOT, buffers), List.of(MAIN));
    return new Checked(r, cursorFile, offset);
  }

  /** The offset of the n-th (0-based) occurrence of a word in a file of the result. */
  static int offsetOf(Result r, Path file, String word, int nth) {
    String text = r.files().get(file).text();
    int at = -1;
    for (int i = 0; i <= nth; i++) {
      at = text.indexOf(word, at + 1);
    }
    if (at < 0) {
      throw new AssertionError("'" + word + "' not found " + (nth + 1) + " times in " + file);
    }
    return at;
  }

  /**
   * The bench most editor tests use; a file, so that the language server's own hover test ({@code
   * HoverGoldenTest} in lsp/) hovers on the very same text and compares with the same goldens.
   */
  static final String BENCH = read("bench.jonq");

  /** A spec under compiler/src/test/resources/ide/. */
  static String read(String name) {
    try {
      return java.nio.file.Files.readString(
          jonquil.testing.Repo.testResources().resolve("ide").resolve(name));
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
  }
}
