package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * An editor's check gives up when a newer edit supersedes it, and otherwise is the ordinary check.
 */
class SupersededCheckTest {
  private static final Path SAMPLE = Repo.samples().resolve("optical_trap.jonq");

  @Test
  void aCheckNeverSupersededGivesTheOrdinaryResult() throws IOException {
    Result plain =
        Checker.check(Workspace.onDisk(Repo.samples()), List.of(SAMPLE), CheckOptions.EDITOR);
    Optional<Result> asked =
        Checker.check(
            Workspace.onDisk(Repo.samples()), List.of(SAMPLE), CheckOptions.EDITOR, () -> false);
    assertTrue(asked.isPresent());
    assertEquals(plain.diagnostics(), asked.get().diagnostics());
    assertEquals(plain.requirements(), asked.get().requirements());
  }

  @Test
  void aCheckSupersededAtAnyStageGivesNoResult() {
    AtomicInteger polls = new AtomicInteger();
    Checker.check(
        Workspace.onDisk(Repo.samples()),
        List.of(SAMPLE),
        CheckOptions.EDITOR,
        () -> {
          polls.incrementAndGet();
          return false;
        });
    assertTrue(
        polls.get() >= 3,
        "polled before loading, after parsing and after resolving: " + polls.get());
    for (int stage = 1; stage <= polls.get(); stage++) {
      AtomicInteger seen = new AtomicInteger();
      int at = stage;
      Optional<Result> r =
          Checker.check(
              Workspace.onDisk(Repo.samples()),
              List.of(SAMPLE),
              CheckOptions.EDITOR,
              () -> seen.incrementAndGet() >= at);
      assertTrue(r.isEmpty(), "superseded at poll " + stage);
    }
  }
}
