package jonquil.lsp;

import java.nio.file.Path;
import jonquil.cli.Commands;

/**
 * Entry point of lsp/target/jonquil.jar (`check` and `lsp`), assembled here because lsp sits on top
 * of every module.
 */
public final class Main {
  private Main() {}

  public static void main(String[] args) {
    System.exit(
        Commands.run(args, System.out, System.err, Path.of("").toAbsolutePath(), new LspCommand()));
  }
}
