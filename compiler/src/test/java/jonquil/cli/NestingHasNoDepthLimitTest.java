package jonquil.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Branches nest as deep as a spec writes them: the beam graph is walked with an explicit worklist,
 * so 5 000 splitters, each on the reflected branch of the one before, are checked on a thread with
 * the JVM's ordinary 1 MiB stack (a recursive walk overflowed at about 2 500).
 */
class NestingHasNoDepthLimitTest {
  static final int DEPTH = 5_000;

  /** A source, then b1 .. bN, each bK+1 on the reflected branch of bK, every branch dumped. */
  static String nested(int depth) {
    StringBuilder s = new StringBuilder("source laser {\n  wavelength 633 nm\n  power 1 mW\n}\n");
    for (int i = 1; i <= depth; i++) {
      s.append("splitter b").append(i).append(" {\n  ratio 50 %\n  aoi 45 deg\n}\n");
      s.append("dump d").append(i).append('\n');
    }
    s.append("dump d0\ntrain deep {\n  laser -> 10 mm -> b1.through -> 10 mm -> d0\n");
    for (int i = 1; i < depth; i++) {
      s.append("  b").append(i).append(".reflected -> 10 mm -> b").append(i + 1);
      s.append(".through -> 10 mm -> d").append(i).append('\n');
    }
    s.append("  b").append(depth).append(".reflected -> 10 mm -> d").append(depth).append("\n}\n");
    // d1 gets a quarter of the source (two halvings); d{depth} gets 2^-depth of it, nothing.
    s.append("require {\n  power at d1 > 0.2 mW\n  power at d").append(depth);
    s.append(" < 1 fW\n}\n");
    return s.toString();
  }

  @Test
  void fiveThousandNestedBranchesAreCheckedInEveryFormatOnAnOrdinaryStack(@TempDir Path dir)
      throws Exception {
    Files.writeString(dir.resolve("deep.jonq"), nested(DEPTH));
    for (String format : new String[] {"text", "json", "sarif"}) {
      CliRun run = onOrdinaryStack(() -> CliRun.of(dir, "check", "--format", format, "deep.jonq"));
      // The J901 message as emitted; SARIF lists every rule with its summary, so not the code.
      assertFalse(run.out().contains("failed internally ("), format + ": " + head(run.out()));
      assertEquals(0, run.exitCode(), format + ": " + head(run.out()) + run.err());
      if (format.equals("text")) {
        assertTrue(run.out().contains("requirements: 2 pass, 0 fail"), head(run.out()));
      }
    }
  }

  @Test
  void aMissingDistanceIsFoundAHundredBranchesFromASizedSource(@TempDir Path dir) throws Exception {
    String spec =
        nested(100)
            .replace("power 1 mW\n", "power 1 mW\n  beam waist 1 mm\n")
            .replace("b99.reflected -> 10 mm -> b100.through", "b99.reflected -> b100.through");
    Files.writeString(dir.resolve("deep.jonq"), spec);
    CliRun run = CliRun.of(dir, "check", "deep.jonq");
    assertTrue(run.out().contains("no distance between 'b99' and 'b100'"), head(run.out()));
  }

  private static String head(String s) {
    return s.length() > 2000 ? s.substring(0, 2000) : s;
  }

  /** Runs on a new thread with the stack size HotSpot gives a thread by default on 64-bit. */
  private static CliRun onOrdinaryStack(java.util.concurrent.Callable<CliRun> work)
      throws Exception {
    AtomicReference<Object> done = new AtomicReference<>();
    Thread t =
        new Thread(
            null,
            () -> {
              try {
                done.set(work.call());
              } catch (Throwable e) {
                done.set(e);
              }
            },
            "ordinary-stack",
            1024 * 1024);
    t.start();
    t.join();
    if (done.get() instanceof Throwable e) {
      throw new AssertionError("the check threw", e);
    }
    return (CliRun) done.get();
  }
}
