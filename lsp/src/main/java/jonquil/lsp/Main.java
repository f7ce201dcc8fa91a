package jonquil.lsp;

import java.nio.file.Path;
import jonquil.cli.Cli;

/**
 * Entry point of the distribution jar, which the lsp module assembles because it sits on
 * top of every other module (lsp/target/jonquil.jar, built by `mvn -q -DskipTests package`).
 */
public final class Main {
  private Main() {}

  public static void main(String[] args) {
    System.exit(Cli.run(args, System.out, System.err, Path.of("").toAbsolutePath()));
  }
}
