package jonquil.lsp;

import java.io.ByteArrayOutputStream;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.UnaryOperator;

/**
 * The open documents keyed by normalised path, so every spelling of one file's URI finds the same
 * text and version.
 */
final class Documents {

  /** One open document as the editor last sent it; {@code uri} is the client's own spelling. */
  record Doc(String uri, Path path, int version, String text) {}

  private final Map<Path, Doc> open = new ConcurrentHashMap<>();

  /** The path a {@code file:} URI names, or empty for other schemes and unreadable URIs. */
  static Optional<Path> pathOf(String uri) {
    if (uri == null || uri.length() < 5 || !uri.regionMatches(true, 0, "file:", 0, 5)) {
      return Optional.empty();
    }
    String rest = uri.substring(5);
    int cut = indexOfAny(rest, '?', '#');
    if (cut >= 0) {
      rest = rest.substring(0, cut);
    }
    String authority = "";
    if (rest.startsWith("//")) {
      int slash = rest.indexOf('/', 2);
      authority = slash < 0 ? rest.substring(2) : rest.substring(2, slash);
      rest = slash < 0 ? "/" : rest.substring(slash);
    }
    String path = decode(rest);
    if (path == null) {
      return Optional.empty();
    }
    if (path.length() >= 3
        && path.charAt(0) == '/'
        && Character.isLetter(path.charAt(1))
        && path.charAt(2) == ':') {
      // "/c:/x", "/C:/x" and "/c%3A/x" are one Windows drive path.
      path = "/" + Character.toUpperCase(path.charAt(1)) + path.substring(2);
      if (File.separatorChar == '\\') {
        path = path.substring(1);
      }
    }
    if (!authority.isEmpty() && !authority.toLowerCase(Locale.ROOT).equals("localhost")) {
      path = "//" + authority + path;
    }
    try {
      return Optional.of(Path.of(path).toAbsolutePath().normalize());
    } catch (InvalidPathException e) {
      return Optional.empty();
    }
  }

  void open(String uri, int version, String text) {
    pathOf(uri).ifPresent(p -> open.put(p, new Doc(uri, p, version, text)));
  }

  /**
   * Applies an edit to an open document's text and records its new version; empty when not open.
   */
  Optional<Doc> change(String uri, int version, UnaryOperator<String> edit) {
    Optional<Path> path = pathOf(uri);
    if (path.isEmpty()) {
      return Optional.empty();
    }
    return Optional.ofNullable(
        open.computeIfPresent(
            path.get(), (p, doc) -> new Doc(doc.uri(), p, version, edit.apply(doc.text()))));
  }

  Optional<Doc> close(String uri) {
    return pathOf(uri).map(open::remove);
  }

  Optional<Doc> get(Path path) {
    return Optional.ofNullable(open.get(path));
  }

  Optional<Doc> get(String uri) {
    return pathOf(uri).map(open::get);
  }

  /** The client's spelling of an open file's URI, or null when the file is not open. */
  String uriOf(Path path) {
    Doc doc = open.get(path);
    return doc == null ? null : doc.uri();
  }

  /** An immutable copy of what is open now. */
  Map<Path, Doc> snapshot() {
    return Map.copyOf(open);
  }

  private static int indexOfAny(String s, char a, char b) {
    for (int i = 0; i < s.length(); i++) {
      if (s.charAt(i) == a || s.charAt(i) == b) {
        return i;
      }
    }
    return -1;
  }

  /** Percent-decoding as UTF-8 (not form decoding: '+' stays '+'); null for a broken escape. */
  private static String decode(String s) {
    if (s.indexOf('%') < 0) {
      return s;
    }
    ByteArrayOutputStream bytes = new ByteArrayOutputStream(s.length());
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (c == '%') {
        if (i + 2 >= s.length()) {
          return null;
        }
        int hi = Character.digit(s.charAt(i + 1), 16);
        int lo = Character.digit(s.charAt(i + 2), 16);
        if (hi < 0 || lo < 0) {
          return null;
        }
        bytes.write(hi * 16 + lo);
        i += 2;
      } else {
        byte[] b = String.valueOf(c).getBytes(StandardCharsets.UTF_8);
        if (Character.isHighSurrogate(c) && i + 1 < s.length()) {
          b = s.substring(i, i + 2).getBytes(StandardCharsets.UTF_8);
          i++;
        }
        bytes.write(b, 0, b.length);
      }
    }
    return bytes.toString(StandardCharsets.UTF_8);
  }
}
