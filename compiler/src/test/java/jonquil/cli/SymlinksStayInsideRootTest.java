package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A 'use' or 'table' path is judged by where it really leads, links followed: a link that leaves
 * the project root is refused, and nothing of the file behind it (not even a word quoted in a
 * diagnostic) reaches the output. A link that stays inside the root is an ordinary file.
 */
class SymlinksStayInsideRootTest {
  /** Text that would be quoted in a diagnostic if the file behind a link were read. */
  private static final String SECRET = "TOPSECRET";

  @TempDir Path base;
  private Path root;
  private Path outside;

  @BeforeEach
  void layout() throws IOException {
    root = Files.createDirectories(base.resolve("project"));
    outside = Files.createDirectories(base.resolve("elsewhere"));
    Files.createFile(root.resolve(".jonquil-root"));
    Files.writeString(outside.resolve("secret.jonq"), SECRET + " words here\n");
    Files.writeString(outside.resolve("secret_nk.txt"), SECRET + " nm 1.5 0\n" + SECRET + "\n");
  }

  private void link(String name, Path target) throws IOException {
    try {
      Files.createSymbolicLink(root.resolve(name), target);
    } catch (UnsupportedOperationException e) {
      Assumptions.abort("this file system has no symbolic links");
    }
  }

  private CliRun check(String spec) throws IOException {
    Files.writeString(root.resolve("main.jonq"), spec, StandardCharsets.UTF_8);
    return assertTimeoutPreemptively(
        Duration.ofSeconds(10), () -> CliRun.of(root, "check", "--format", "json", "main.jonq"));
  }

  private static void assertNothingLeaked(CliRun run) {
    assertFalse(run.out().contains(SECRET), run.out());
    assertFalse(run.err().contains(SECRET), run.err());
  }

  @Test
  void aUsedLinkToAFileOutsideIsRefused() throws IOException {
    link("lib.jonq", outside.resolve("secret.jonq"));
    CliRun run = check("use \"lib.jonq\"\n");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("\"code\": \"J205\""), run.out());
    assertTrue(
        run.out()
            .contains(
                "'lib.jonq' leads outside the project root 'project' through a link; keep used"
                    + " files inside the project"),
        run.out());
    assertFalse(run.out().contains("secret.jonq"), "not even the target's name:\n" + run.out());
    assertNothingLeaked(run);
  }

  @Test
  void aUsedPathThroughALinkedFolderOutsideIsRefused() throws IOException {
    link("lib", outside);
    CliRun run = check("use \"lib/secret.jonq\"\n");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("\"code\": \"J205\""), run.out());
    assertNothingLeaked(run);
  }

  @Test
  void aTableLinkToAFileOutsideIsRefused() throws IOException {
    link("glass_nk.txt", outside.resolve("secret_nk.txt"));
    CliRun run = check("material glass { table \"glass_nk.txt\" }\n");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("\"code\": \"J213\""), run.out());
    assertTrue(
        run.out()
            .contains(
                "table file 'glass_nk.txt' cannot be read: it leads out of the project through a"
                    + " link"),
        run.out());
    assertNothingLeaked(run);
  }

  @Test
  void linksToDevicesAreRefused() throws IOException {
    Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")), "this system has no /dev");
    link("null.jonq", Path.of("/dev/null"));
    link("zero_nk.txt", Path.of("/dev/zero"));
    CliRun run = check("use \"null.jonq\"\nmaterial glass { table \"zero_nk.txt\" }\n");
    assertEquals(1, run.exitCode(), run.err());
    assertTrue(run.out().contains("\"code\": \"J205\""), run.out());
    assertTrue(run.out().contains("\"code\": \"J213\""), run.out());
  }

  @Test
  void aLinkThatStaysInsideTheRootIsFollowed() throws IOException {
    Path parts = Files.createDirectories(root.resolve("parts"));
    Files.writeString(parts.resolve("real.jonq"), "material crown = index 1.5\n");
    Files.writeString(parts.resolve("real_nk.txt"), "500 nm 1.5 0\n600 nm 1.49 0\n");
    link("alias.jonq", parts.resolve("real.jonq"));
    link("alias_nk.txt", Path.of("parts/real_nk.txt"));
    CliRun run =
        check(
            "use \"alias.jonq\"\nmaterial flint { table \"alias_nk.txt\" }\n"
                + "window w { material crown thickness 1 mm }\n"
                + "window v { material flint thickness 1 mm }\n");
    assertFalse(run.out().contains("\"code\": \"J205\""), run.out());
    assertFalse(run.out().contains("\"code\": \"J213\""), run.out());
    assertFalse(run.out().contains("\"code\": \"J202\""), "crown is found:\n" + run.out());
  }
}
