package jonquil.cli;

import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;

/** Spells file paths the way reports need them: relative, with '/' on every platform. */
final class PathText {
  private PathText() {}

  /** {@code file} relative to {@code base} with '/' separators; absolute when on another drive. */
  static String relative(Path base, Path file) {
    Path abs = file.toAbsolutePath().normalize();
    Path from = base.toAbsolutePath().normalize();
    if (abs.getRoot() == null || !abs.getRoot().equals(from.getRoot())) {
      return slashes(abs);
    }
    return slashes(from.relativize(abs));
  }

  /**
   * A path for one line of text output: a line break or other control character in a file name
   * would split the 'path:line:col' line, so it is written as a backslash escape (backslash and
   * 'n'; backslash, 'u' and four hex digits), and a backslash is doubled so that no name reads as
   * another's escape.
   */
  static String oneLine(String path) {
    StringBuilder out = new StringBuilder(path.length());
    for (int i = 0; i < path.length(); i++) {
      char c = path.charAt(i);
      switch (c) {
        case '\\' -> out.append("\\\\");
        case '\n' -> out.append("\\n");
        case '\r' -> out.append("\\r");
        case '\t' -> out.append("\\t");
        default -> {
          if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || c == '\u0085') {
            out.append(String.format("\\u%04x", (int) c));
          } else {
            out.append(c);
          }
        }
      }
    }
    return out.toString();
  }

  static String slashes(Path path) {
    return path.toString().replace(path.getFileSystem().getSeparator(), "/");
  }

  /** True when {@code file} lies inside {@code dir}, so that a URI relative to it stays inside. */
  static boolean isInside(Path dir, Path file) {
    return file.toAbsolutePath().normalize().startsWith(dir.toAbsolutePath().normalize());
  }

  /**
   * A relative URI reference for a '/'-separated path: spaces and non-ASCII characters are
   * percent-encoded, and a leading "./" keeps a ':' in the first segment from reading as a scheme.
   */
  static String uriReference(String slashPath) {
    String first =
        slashPath.contains("/") ? slashPath.substring(0, slashPath.indexOf('/')) : slashPath;
    String safe = first.contains(":") ? "./" + slashPath : slashPath;
    try {
      return new URI(null, null, safe, null).toASCIIString();
    } catch (URISyntaxException e) {
      throw new IllegalArgumentException("path cannot be written as a URI: " + slashPath, e);
    }
  }

  /** A directory as a file: URI ending in '/', as SARIF requires of base URIs. */
  static String directoryUri(Path dir) {
    String uri = dir.toAbsolutePath().normalize().toUri().toASCIIString();
    return uri.endsWith("/") ? uri : uri + "/";
  }
}
