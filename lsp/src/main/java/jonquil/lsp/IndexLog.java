package jonquil.lsp;

import java.util.function.BiConsumer;
import org.eclipse.lsp4j.MessageType;

/** The workspace index's log lines: a summary of each pass, and one warning when it is full. */
final class IndexLog {
  private final BiConsumer<MessageType, String> log;
  private boolean fullLogged;

  IndexLog(BiConsumer<MessageType, String> log) {
    this.log = log;
  }

  void pass(int done, int total, int folders, SpecFolderWalk.Budget budget, boolean cancelled) {
    StringBuilder m =
        new StringBuilder(
            "workspace index: "
                + done
                + " of "
                + total
                + " new spec files indexed under "
                + folders
                + " folder(s)");
    if (cancelled) {
      m.append("; stopped by the editor, the rest is indexed when the folders change");
    }
    if (budget.capped) {
      m.append(
          "; stopped at the cap of "
              + SpecFolderWalk.MAX_FILES
              + " files or "
              + (SpecFolderWalk.MAX_TOTAL_BYTES >> 20)
              + " MiB of text");
    }
    if (budget.tooLarge > 0) {
      m.append(
          "; "
              + budget.tooLarge
              + " file(s) over "
              + (SpecFolderWalk.MAX_FILE_BYTES >> 20)
              + " MiB left out");
    }
    log.accept(
        budget.capped || budget.tooLarge > 0 ? MessageType.Warning : MessageType.Log, m.toString());
  }

  /** Once only: the index holds as many files as it may, and leaves new ones out. */
  void full() {
    if (!fullLogged) {
      fullLogged = true;
      log.accept(
          MessageType.Warning,
          "workspace index: "
              + SpecFolderWalk.MAX_FILES
              + " files reached; new files are left out");
    }
  }
}
