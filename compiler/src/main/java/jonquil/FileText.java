package jonquil;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Reads a file's UTF-8 text only after checking that it is a regular file within a size limit, and
 * never more than the limit and one byte: a huge file, a device such as /dev/zero or a FIFO must
 * give a plain reason at once, not run out of memory or wait forever for a writer.
 */
public final class FileText {
  /** Specs: the limit J109 states (README, DEVELOPERS.md). */
  public static final long SPEC_LIMIT = 4L * 1024 * 1024;

  /**
   * n,k tables: the specs' limit. A row is about 20 bytes, so this holds some 200 000 rows, a row
   * every 0.1 nm across the whole supported range (150 nm to 20 µm); measured tables have far
   * fewer.
   */
  public static final long TABLE_LIMIT = SPEC_LIMIT;

  private FileText() {}

  /** Why a file was not read, as a plain phrase for a message ("not a regular file"). */
  public static final class Refused extends IOException {
    private final boolean tooLarge;

    Refused(String reason, boolean tooLarge) {
      super(reason);
      this.tooLarge = tooLarge;
    }

    /** True when the file was refused for its size alone. */
    public boolean tooLarge() {
      return tooLarge;
    }
  }

  /**
   * The text of {@code file} (links followed), or {@link Refused} with the reason it was not read.
   */
  public static String read(Path file, long limit) throws IOException {
    BasicFileAttributes attributes = Files.readAttributes(file, BasicFileAttributes.class);
    if (!attributes.isRegularFile()) {
      throw new Refused("not a regular file", false);
    }
    if (attributes.size() > limit) {
      throw tooLarge(limit);
    }
    byte[] bytes;
    try (InputStream in = Files.newInputStream(file)) {
      // The size can grow between the check and the read (or lie, as in /proc): read one byte more.
      bytes = in.readNBytes((int) limit + 1);
    }
    if (bytes.length > limit) {
      throw tooLarge(limit);
    }
    try {
      return StandardCharsets.UTF_8
          .newDecoder()
          .onMalformedInput(CodingErrorAction.REPORT)
          .onUnmappableCharacter(CodingErrorAction.REPORT)
          .decode(ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      throw new Refused("not valid UTF-8", false);
    }
  }

  private static Refused tooLarge(long limit) {
    return new Refused("larger than " + limit / (1024 * 1024) + " MiB", true);
  }
}
