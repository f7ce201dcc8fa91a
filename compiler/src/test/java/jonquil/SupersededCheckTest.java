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

  @Test
  void aYieldStopsDrawingOnceSuperseded() {
    AtomicInteger polls = new AtomicInteger();
    Optional<Result> full =
        Checker.check(
            Workspace.onDisk(Repo.samples()),
            List.of(SAMPLE),
            CheckOptions.FULL,
            () -> {
              polls.incrementAndGet();
              return false;
            });
    assertTrue(full.isPresent());
    // The sample's yield draws 400 builds and asks before each one, so the stages alone cannot
    // account for the polls.
    assertTrue(polls.get() > 400, "the yield does not ask whether it is still wanted: " + polls);
    AtomicInteger seen = new AtomicInteger();
    int midway = polls.get() - 200;
    Optional<Result> stopped =
        Checker.check(
            Workspace.onDisk(Repo.samples()),
            List.of(SAMPLE),
            CheckOptions.FULL,
            () -> seen.incrementAndGet() >= midway);
    assertTrue(stopped.isEmpty(), "a yield superseded half-way still gave a result");
    assertEquals(midway, seen.get(), "drawing went on after the newer edit");
  }
}
