package jonquil;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.format.LayoutFuzzProbe;
import jonquil.testing.Repo;

/**
 * The coverage-guided fuzz target (Jazzer): one input is one spec file, checked in full (parse,
 * resolve, analyses and yields) and formatted. A finding is anything the checker promises never to
 * do: an escaping exception, an internal error (J901), a check slower than {@link #SLOW_MS} on an
 * input of at most a few kilobytes, or a layout that changes the parse or is not idempotent.
 */
public final class CheckFuzzTarget {
  /** Generous for inputs capped at 4 KiB: a real check of a sample takes milliseconds. */
  private static final long SLOW_MS = 5_000;

  /** Where the input lives; a folder no disk has, so the check never reads outside memory. */
  private static final Path ROOT = Path.of("/jonquil-fuzz").toAbsolutePath().normalize();

  private static final Path MAIN = ROOT.resolve("main.jonq");

  /** The samples' shared parts, so a fuzzed 'use' or 'table' can reach a real library. */
  private static final Map<Path, String> FILES = new LinkedHashMap<>();

  private CheckFuzzTarget() {}

  public static void fuzzerInitialize() throws IOException {
    Path parts = Repo.samples().resolve("parts");
    try (Stream<Path> files = Files.list(parts)) {
      for (Path file : files.sorted().toList()) {
        FILES.put(
            ROOT.resolve("parts").resolve(file.getFileName().toString()),
            Files.readString(file, StandardCharsets.UTF_8));
      }
    }
    // Loading and instrumenting the checker's classes takes seconds: do it before any clock runs.
    for (Path sample : Repo.sampleFiles()) {
      if (sample.getParent().equals(Repo.samples())) {
        Checker.check(
            workspace(Files.readString(sample, StandardCharsets.UTF_8)),
            List.of(MAIN),
            CheckOptions.FULL);
      }
    }
  }

  public static void fuzzerTestOneInput(byte[] data) {
    String text = new String(data, StandardCharsets.UTF_8);
    long start = System.nanoTime();
    Result result = Checker.check(workspace(text), List.of(MAIN), CheckOptions.FULL);
    long millis = (System.nanoTime() - start) / 1_000_000;
    for (Diagnostic d : result.diagnostics()) {
      if (d.code() == DiagnosticCode.INTERNAL_ERROR) {
        throw new IllegalStateException("internal error (J901): " + d.message());
      }
    }
    if (millis > SLOW_MS) {
      throw new IllegalStateException(
          "a check of " + text.length() + " characters took " + millis + " ms");
    }
    LayoutFuzzProbe.check(text);
  }

  private static Workspace workspace(String text) {
    Map<Path, String> files = new LinkedHashMap<>(FILES);
    files.put(MAIN, text);
    return new Workspace(
        ROOT,
        new Workspace.Reader() {
          @Override
          public String read(Path file, long limit) throws IOException {
            String found = files.get(file.toAbsolutePath().normalize());
            if (found == null) {
              throw new NoSuchFileException(file.toString());
            }
            return found;
          }

          @Override
          public boolean exists(Path file) {
            return files.containsKey(file.toAbsolutePath().normalize());
          }

          @Override
          public List<Path> specsIn(Path folder) {
            return files.keySet().stream()
                .filter(p -> folder.equals(p.getParent()) && p.toString().endsWith(".jonq"))
                .toList();
          }
        });
  }
}
