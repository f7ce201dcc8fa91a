package jonquil.cli;

import jonquil.Result;

/**
 * The process exit codes of the CLI and the one policy that picks them, kept pure so CI behaviour
 * can be specified without running the checker.
 */
public enum ExitCode {
  /** Nothing that should stop a build. */
  CLEAN(0),
  /** An error, a failed requirement, or (with --strict) a warning. */
  FINDINGS(1),
  /** The tool could not do its job: bad usage, unreadable input, or an internal failure. */
  TROUBLE(2);

  private final int code;

  ExitCode(int code) {
    this.code = code;
  }

  public int code() {
    return code;
  }

  /**
   * An internal failure outranks everything, '--exit-zero' included: the checker did not do its
   * job, so no flag may make the run look clean or merely "with findings". Findings outrank
   * unreadable input because they are real news about the specs; but a partly unread check must
   * never look clean, and --exit-zero must not hide that either.
   */
  public static ExitCode of(
      Result result, boolean strict, boolean exitZero, boolean someInputUnreadable) {
    if (result.diagnostics().stream()
        .anyMatch(d -> d.code() == jonquil.diag.DiagnosticCode.INTERNAL_ERROR)) {
      return TROUBLE;
    }
    boolean fails = result.fails(strict);
    if (someInputUnreadable) {
      return fails && !exitZero ? FINDINGS : TROUBLE;
    }
    return fails && !exitZero ? FINDINGS : CLEAN;
  }
}
