package jonquil.lsp;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.function.Consumer;

/**
 * Splits the client's byte stream into message bodies, resynchronising at the next Content-Length
 * header after a frame it cannot trust, so one bad frame costs one message.
 */
final class FrameReader {
  /** A body larger than this is refused: a spec is at most 4 MiB, even escaped six times over. */
  static final long MAX_BODY = 64L << 20;

  private static final String LENGTH = "content-length:";

  /** Header lines are short; a longer line is stray bytes, of which only the tail matters. */
  private static final int LINE_KEEP = 1024;

  private final InputStream in;
  private final Consumer<String> log;
  private final byte[] buf = new byte[1 << 16];
  private int pos;
  private int lim;
  private final byte[] line = new byte[2 * LINE_KEEP];
  private int lineLength;

  FrameReader(InputStream in, Consumer<String> log) {
    this.in = in;
    this.log = log;
  }

  /** The next message body, or null when the input has ended. */
  byte[] next() throws IOException {
    while (true) {
      long length = header();
      if (length == END) {
        return null;
      }
      if (length >= 0) {
        return body(length);
      }
    }
  }

  private static final long END = -2;
  private static final long SKIPPED = -1;

  /**
   * Reads one header block and gives its Content-Length, SKIPPED after a block that has none usable
   * (logged), or END. Stray lines are skipped; a Content-Length may start mid-line after the tail
   * of a body whose declared length was too short.
   */
  private long header() throws IOException {
    long length = SKIPPED;
    boolean fields = false;
    boolean stray = false;
    String problem = "a message header without Content-Length";
    while (true) {
      if (!readLine()) {
        if (fields) {
          log.accept("the input ended inside a message header");
        }
        return END;
      }
      String text = new String(line, 0, lineLength, StandardCharsets.ISO_8859_1).strip();
      if (text.isEmpty()) {
        if (!fields) {
          continue; // blank lines or padding before a header
        }
        if (problem != null) {
          log.accept(problem + "; skipped to the next header");
          return SKIPPED;
        }
        return length;
      }
      int colon = text.indexOf(':');
      if (colon <= 0 || !text.substring(0, colon).matches("[A-Za-z][A-Za-z0-9-]*")) {
        if (!stray) {
          log.accept("skipped bytes that are no message header");
          stray = true;
        }
        int at = text.toLowerCase(Locale.ROOT).lastIndexOf(LENGTH);
        fields = false;
        length = SKIPPED;
        problem = "a message header without Content-Length";
        if (at < 0) {
          continue;
        }
        text = text.substring(at);
        colon = LENGTH.length() - 1;
      }
      fields = true;
      if (text.substring(0, colon + 1).equalsIgnoreCase(LENGTH)) {
        String value = text.substring(colon + 1).strip();
        length = SKIPPED;
        if (!value.matches("[0-9]{1,12}")) {
          problem = "Content-Length \"" + shorten(value) + "\" is no length";
        } else if (Long.parseLong(value) > MAX_BODY) {
          problem = "Content-Length " + value + " is over the limit of " + MAX_BODY + " bytes";
        } else {
          length = Long.parseLong(value);
          problem = null;
        }
      }
    }
  }

  /**
   * Reads up to {@code length} bytes; a body that is one JSON object or array ends where that value
   * closes, so a Content-Length longer than its body costs no more than that message.
   */
  private byte[] body(long length) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream((int) Math.min(length, 1 << 16));
    long left = length;
    int depth = 0;
    boolean inString = false;
    boolean escaped = false;
    boolean started = false;
    while (left > 0) {
      if (pos == lim && !fill()) {
        log.accept("the input ended inside a message body");
        return null;
      }
      int from = pos;
      int end = (int) Math.min(lim, pos + left);
      boolean closed = false;
      for (; pos < end && !closed; pos++) {
        byte b = buf[pos];
        if (inString) {
          if (escaped) {
            escaped = false;
          } else if (b == '\\') {
            escaped = true;
          } else if (b == '"') {
            inString = false;
          }
        } else if (b == '"') {
          inString = true;
        } else if (b == '{' || b == '[') {
          depth++;
          started = true;
        } else if (b == '}' || b == ']') {
          depth--;
          closed = started && depth == 0;
        } else if (!started && b != ' ' && b != '\t' && b != '\r' && b != '\n') {
          started = true; // not an object or array: read exactly the declared length
          depth = Integer.MIN_VALUE / 2;
        }
      }
      out.write(buf, from, pos - from);
      left -= pos - from;
      if (closed) {
        break;
      }
    }
    return out.toByteArray();
  }

  /** Reads one line into {@code line} (its tail when long), without the line end; false at end. */
  private boolean readLine() throws IOException {
    lineLength = 0;
    boolean any = false;
    while (true) {
      if (pos == lim && !fill()) {
        return any;
      }
      any = true;
      byte b = buf[pos++];
      if (b == '\n') {
        return true;
      }
      if (lineLength == line.length) {
        System.arraycopy(line, LINE_KEEP, line, 0, LINE_KEEP);
        lineLength = LINE_KEEP;
      }
      line[lineLength++] = b;
    }
  }

  private boolean fill() throws IOException {
    int n = in.read(buf);
    if (n <= 0) {
      return false;
    }
    pos = 0;
    lim = n;
    return true;
  }

  private static String shorten(String s) {
    return s.length() > 40 ? s.substring(0, 40) + "…" : s;
  }
}
