package jonquil.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import java.util.function.UnaryOperator;

/**
 * Replaces a file's bytes whole or not at all: they go to a temporary file in the same folder,
 * which is synced to disk and then renamed over the original in one step. Rewriting in place would
 * leave a spec cut off wherever a failing write (a full disk, a size limit) stopped.
 */
final class AtomicFile {
  private AtomicFile() {}

  /** Replaces {@code file}'s content by {@code bytes}, keeping its POSIX permissions. */
  static void replace(Path file, byte[] bytes) throws IOException {
    replace(file, bytes, UnaryOperator.identity());
  }

  /**
   * As above, writing through {@code wrap}: the seam through which a test makes the write fail
   * part-way.
   */
  static void replace(Path written, byte[] bytes, UnaryOperator<OutputStream> wrap)
      throws IOException {
    // Through a link, replace the file it names and keep the link.
    Path file = written.toRealPath();
    PosixFileAttributeView posix = Files.getFileAttributeView(file, PosixFileAttributeView.class);
    if (!Files.isWritable(file) || (posix != null && readOnlyForAll(posix))) {
      // The rename would replace a read-only file anyway; respect what its owner said, also when
      // the one formatting is root, whom the system lets write anything.
      throw new AccessDeniedException(file.toString());
    }
    Path folder = file.getParent();
    Path temp =
        posix == null
            ? Files.createTempFile(folder, ".jonquil-fmt-", ".tmp")
            : Files.createTempFile(
                folder,
                ".jonquil-fmt-",
                ".tmp",
                PosixFilePermissions.asFileAttribute(posix.readAttributes().permissions()));
    try {
      try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
        OutputStream out = wrap.apply(Channels.newOutputStream(channel));
        out.write(bytes);
        out.flush();
        channel.force(true);
      }
      if (posix != null) {
        // Created with them, but the umask may have taken some away.
        Files.setPosixFilePermissions(temp, posix.readAttributes().permissions());
      }
      Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (IOException | RuntimeException e) {
      try {
        Files.deleteIfExists(temp);
      } catch (IOException suppressed) {
        e.addSuppressed(suppressed);
      }
      throw e;
    }
  }

  private static boolean readOnlyForAll(PosixFileAttributeView posix) throws IOException {
    Set<PosixFilePermission> mode = posix.readAttributes().permissions();
    return !mode.contains(PosixFilePermission.OWNER_WRITE)
        && !mode.contains(PosixFilePermission.GROUP_WRITE)
        && !mode.contains(PosixFilePermission.OTHERS_WRITE);
  }
}
