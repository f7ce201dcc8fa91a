package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidChangeWatchedFilesCapabilities;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.FileChangeType;
import org.eclipse.lsp4j.FileEvent;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.WorkspaceClientCapabilities;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A used file changed on disk re-checks the open documents that use it, with or without the editor
 * watching files for us.
 */
class WatchedFilesTest {
  static final String LIB = "material glass = index 1.5\n";
  static final String LIB_RENAMED = "material other_glass = index 1.5\n";
  static final String MAIN = "use \"lib.jonq\"\nwindow w { material glass; thickness 1 mm }\n";

  @TempDir Path dir;

  private String setUp() throws Exception {
    Files.writeString(dir.resolve(".jonquil-root"), "");
    Files.writeString(dir.resolve("lib.jonq"), LIB);
    Path main = dir.resolve("main.jonq");
    Files.writeString(main, MAIN);
    return main.toUri().toString();
  }

  /** J212: 'glass' is neither declared (the library no longer has it) nor in the catalog. */
  private static boolean names(PublishDiagnosticsParams p, String code) {
    return p.getDiagnostics().stream().anyMatch(d -> code.equals(d.getCode().getLeft()));
  }

  @Test
  void withDynamicRegistrationTheServerAsksForWatchersAndReChecksOnTheirEvents() throws Exception {
    String uri = setUp();
    ClientCapabilities caps = new ClientCapabilities();
    WorkspaceClientCapabilities workspace = new WorkspaceClientCapabilities();
    workspace.setDidChangeWatchedFiles(new DidChangeWatchedFilesCapabilities(true));
    caps.setWorkspace(workspace);
    try (LspHarness h = new LspHarness(new StandIn(), java.time.Duration.ofMillis(20))) {
      h.initialize(dir, caps);
      h.open(uri, 1, MAIN);
      PublishDiagnosticsParams before =
          h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion()));
      assertFalse(names(before, "J212"), before.toString());

      String options;
      synchronized (h.client) {
        assertEquals(1, h.client.registrations.size());
        var registration = h.client.registrations.get(0).getRegistrations().get(0);
        assertEquals("workspace/didChangeWatchedFiles", registration.getMethod());
        options = registration.getRegisterOptions().toString();
      }
      assertTrue(options.contains("\"**/*.jonq\""), options);

      Files.writeString(dir.resolve("lib.jonq"), LIB_RENAMED); // e.g. a git checkout
      h.remote
          .getWorkspaceService()
          .didChangeWatchedFiles(
              new DidChangeWatchedFilesParams(
                  List.of(
                      new FileEvent(
                          dir.resolve("lib.jonq").toUri().toString(), FileChangeType.Changed))));
      PublishDiagnosticsParams after = h.client.await(uri, p -> names(p, "J212"));
      assertEquals(1, after.getVersion(), "the buffer did not change, its diagnostics did");
    }
  }

  @Test
  void withoutRegistrationEveryCheckReadsUsedFilesFromDiskAgain() throws Exception {
    String uri = setUp();
    try (LspHarness h = new LspHarness(new StandIn(), java.time.Duration.ofMillis(20))) {
      h.initialize(dir); // no workspace capabilities at all, as Neovim 0.7 sends
      h.open(uri, 1, MAIN);
      assertFalse(
          names(h.client.await(uri, p -> Integer.valueOf(1).equals(p.getVersion())), "J212"));
      synchronized (h.client) {
        assertEquals(
            List.of(), h.client.registrations, "no registration without dynamicRegistration");
      }

      Files.writeString(dir.resolve("lib.jonq"), LIB_RENAMED);
      h.changeAll(uri, 2, MAIN); // any edit re-checks, and the check reads the used file again
      assertTrue(
          names(h.client.await(uri, p -> Integer.valueOf(2).equals(p.getVersion())), "J212"));

      Files.writeString(dir.resolve("lib.jonq"), LIB);
      h.changeAll(uri, 3, MAIN);
      assertFalse(
          names(h.client.await(uri, p -> Integer.valueOf(3).equals(p.getVersion())), "J212"));
    }
  }
}
