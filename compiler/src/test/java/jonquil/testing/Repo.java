package jonquil.testing;

import java.nio.file.Path;

/** Where the repository is, for tests that read samples/ and the test corpora. */
public final class Repo {
  private Repo() {}

  public static Path root() {
    return Path.of(System.getProperty("jonquil.repo", "..")).toAbsolutePath().normalize();
  }

  public static Path samples() {
    return root().resolve("samples");
  }

  /** Every .jonq file under samples/, sorted. */
  public static java.util.List<Path> sampleFiles() throws java.io.IOException {
    try (java.util.stream.Stream<Path> files = java.nio.file.Files.walk(samples())) {
      return files.filter(p -> p.toString().endsWith(".jonq")).sorted().toList();
    }
  }

  /** Every sample and every broken-spec corpus file, sorted within each. */
  public static java.util.List<Path> specFiles() throws java.io.IOException {
    java.util.List<Path> out = new java.util.ArrayList<>(sampleFiles());
    try (java.util.stream.Stream<Path> corpus =
        java.nio.file.Files.walk(testResources().resolve("diagnostics"))) {
      corpus.filter(p -> p.toString().endsWith(".jonq")).sorted().forEach(out::add);
    }
    return out;
  }

  public static Path testResources() {
    return root().resolve("compiler/src/test/resources");
  }
}
