package jonquil.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.RandomAccessFile;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;

/**
 * Report text of each checked file, put aside as soon as the file is checked and read back in path
 * order at the end, so a check of a thousand files keeps none of their models in memory while the
 * report still lists them as it always has (sorted by path, whatever the order of the arguments).
 * The text waits in a temporary file that is deleted on close; where none can be made it waits in
 * memory.
 */
final class PathOrderedSpool implements Iterable<String>, AutoCloseable {
  /** Where one file's text lies in the spool. */
  private record Piece(Path file, long offset, int length, String held) {}

  private final List<Piece> pieces = new ArrayList<>();
  private Path spool;
  private OutputStream writer;
  private RandomAccessFile reader;
  private long written;
  private boolean inMemory;

  /** Puts {@code text} aside for {@code file}; one piece per file. */
  void put(Path file, String text) {
    byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
    if (!inMemory && writer == null) {
      try {
        spool = Files.createTempFile("jonquil-check", ".spool");
        writer = new java.io.BufferedOutputStream(Files.newOutputStream(spool));
      } catch (IOException | UnsupportedOperationException | SecurityException e) {
        inMemory = true; // no temporary folder: the report is still right, only larger in memory
      }
    }
    if (inMemory) {
      pieces.add(new Piece(file, 0, bytes.length, text));
      return;
    }
    try {
      writer.write(bytes);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the report's temporary file", e);
    }
    pieces.add(new Piece(file, written, bytes.length, null));
    written += bytes.length;
  }

  /** The pieces' texts in path order, read back one at a time. */
  @Override
  public Iterator<String> iterator() {
    List<Piece> ordered = new ArrayList<>(pieces);
    ordered.sort(Comparator.comparing(Piece::file));
    RandomAccessFile reader = openForReading();
    return new Iterator<>() {
      private int next;

      @Override
      public boolean hasNext() {
        return next < ordered.size();
      }

      @Override
      public String next() {
        if (!hasNext()) {
          throw new NoSuchElementException();
        }
        Piece p = ordered.get(next++);
        if (p.held() != null) {
          return p.held();
        }
        try {
          byte[] bytes = new byte[p.length()];
          reader.seek(p.offset());
          reader.readFully(bytes);
          return new String(bytes, StandardCharsets.UTF_8);
        } catch (IOException e) {
          throw new UncheckedIOException("cannot read the report's temporary file", e);
        }
      }
    };
  }

  private RandomAccessFile openForReading() {
    if (writer == null) {
      return null;
    }
    try {
      writer.flush();
      if (reader == null) {
        reader = new RandomAccessFile(spool.toFile(), "r");
      }
      return reader;
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read the report's temporary file", e);
    }
  }

  @Override
  public void close() {
    try {
      if (reader != null) {
        reader.close();
      }
      if (writer != null) {
        writer.close();
        Files.deleteIfExists(spool);
      }
    } catch (IOException e) {
      throw new UncheckedIOException("cannot remove the report's temporary file", e);
    }
  }
}
