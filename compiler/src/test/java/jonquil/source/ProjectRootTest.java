package jonquil.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The one root rule of the command line and the language server. */
class ProjectRootTest {
  @TempDir Path dir;

  @Test
  void theNearestMarkerAboveTheFileWins() throws IOException {
    Files.createDirectories(dir.resolve("outer/.git"));
    Files.createDirectories(dir.resolve("outer/inner/specs"));
    Files.writeString(dir.resolve("outer/inner/" + ProjectRoot.MARKER), "");
    Path file = Files.writeString(dir.resolve("outer/inner/specs/a.jonq"), "");
    assertEquals(dir.resolve("outer/inner"), ProjectRoot.discover(file, dir));
  }

  @Test
  void aGitFileCountsLikeAGitDirectoryAsInWorktrees() throws IOException {
    Files.createDirectories(dir.resolve("wt/specs"));
    Files.writeString(dir.resolve("wt/.git"), "gitdir: /elsewhere\n");
    assertEquals(
        dir.resolve("wt"), ProjectRoot.discover(dir.resolve("wt/specs"), dir.resolve("wt/specs")));
  }

  @Test
  void withoutAnyMarkerTheFallbackIsUsed() throws IOException {
    Path isolated = Files.createDirectories(dir.resolve("plain"));
    boolean markerAbove = false;
    for (Path d = isolated; d != null; d = d.getParent()) {
      markerAbove |= Files.exists(d.resolve(".git")) || Files.exists(d.resolve(ProjectRoot.MARKER));
    }
    assumeFalse(markerAbove, "the temporary directory lies inside a project");
    assertEquals(dir, ProjectRoot.discover(isolated, dir));
  }

  @Test
  void anEditorsFileBelongsToItsInnermostFolderElseToTheMarkerAboveIt() throws IOException {
    Files.createDirectories(dir.resolve("a/b/specs"));
    Files.writeString(dir.resolve("a/" + ProjectRoot.MARKER), "");
    Path file = dir.resolve("a/b/specs/x.jonq");
    assertEquals(
        dir.resolve("a/b"),
        ProjectRoot.owning(file, List.of(dir, dir.resolve("a/b"), Path.of("/x"))));
    assertEquals(dir.resolve("a"), ProjectRoot.owning(file, List.of(Path.of("/elsewhere"))));
  }
}
