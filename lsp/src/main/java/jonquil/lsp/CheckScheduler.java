package jonquil.lsp;

import java.time.Duration;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

/**
 * Runs checks off LSP4J's reader thread, on one 16 MB-stack worker that outlives any Throwable.
 * Debounced on both edges: an edit after a pause in typing is checked at once (the user is
 * looking), while edits in quick succession are coalesced into one check a debounce after the last
 * of them. A running check that a newer edit has made stale may give up between stages, so the
 * check for the newer text starts sooner; once the oldest unserved edit has waited {@code
 * maxDelay}, the check runs to the end regardless, so steady typing still gets diagnostics.
 */
final class CheckScheduler implements AutoCloseable {
  static final long STACK_BYTES = 16L << 20;

  /**
   * One check; returns false when it gave up because {@code superseded} said a newer edit made it
   * stale.
   */
  interface Task {
    boolean run(BooleanSupplier superseded);
  }

  private final Task task;
  private final Consumer<Throwable> onFailure;
  private final long debounceNanos;
  private final long maxDelayNanos;
  private final Object lock = new Object();
  private final Thread worker;
  private final Runnable warmUp;
  private final boolean runAfterPause;

  /** A request is waiting that the running check (if any) has not seen. */
  private boolean dirty;

  /** The waiting requests began after a pause: run them without waiting for the debounce. */
  private boolean leading;

  /** When the oldest request not yet served by a finished check came. */
  private long firstRequest;

  private long lastRequest;
  private boolean anyRequest;

  /** {@link #firstRequest} of the batch the running check serves. */
  private long servingSince;

  private boolean stopped;

  CheckScheduler(
      Runnable task, Consumer<Throwable> onFailure, Duration debounce, Duration maxDelay) {
    this(
        superseded -> {
          task.run();
          return true;
        },
        onFailure,
        debounce,
        maxDelay,
        () -> {},
        true);
  }

  /**
   * As above, running {@code warmUp} once on the worker before the first check (a failure there is
   * ignored). With {@code runAfterPause} false every run waits for the debounce (tests use it to
   * hold checks back).
   */
  CheckScheduler(
      Task task,
      Consumer<Throwable> onFailure,
      Duration debounce,
      Duration maxDelay,
      Runnable warmUp,
      boolean runAfterPause) {
    this.task = task;
    this.runAfterPause = runAfterPause;
    this.warmUp = warmUp;
    this.onFailure = onFailure;
    this.debounceNanos = debounce.toNanos();
    this.maxDelayNanos = Math.max(maxDelay.toNanos(), debounceNanos);
    ThreadGroup group = new ThreadGroup("jonquil-check");
    this.worker = new Thread(group, this::loop, "jonquil-check", STACK_BYTES);
    worker.setDaemon(true);
    worker.start();
  }

  /** Asks for a run with the latest state; never blocks. */
  void request() {
    synchronized (lock) {
      long now = System.nanoTime();
      boolean afterPause = !anyRequest || now - lastRequest >= debounceNanos;
      if (!dirty) {
        firstRequest = now;
        leading = afterPause && runAfterPause;
      }
      dirty = true;
      anyRequest = true;
      lastRequest = now;
      lock.notifyAll();
    }
  }

  /** A check is running on the worker. */
  private boolean running;

  /** True when no check is running or waiting to run: what a memory measurement waits for. */
  boolean idle() {
    synchronized (lock) {
      return !dirty && !running;
    }
  }

  /** True while a requested run has not started yet. */
  boolean pending() {
    synchronized (lock) {
      return dirty;
    }
  }

  @Override
  public void close() {
    synchronized (lock) {
      stopped = true;
      lock.notifyAll();
    }
  }

  /**
   * Asked by the running check: a newer request is waiting, and the oldest unserved one has not
   * waited too long.
   */
  private boolean superseded() {
    synchronized (lock) {
      return stopped || dirty && System.nanoTime() - servingSince < maxDelayNanos;
    }
  }

  private void loop() {
    try {
      warmUp.run();
    } catch (Throwable t) {
      // Warming up only saves time; the first real check reports whatever is wrong.
    }
    while (true) {
      long since;
      synchronized (lock) {
        try {
          while (!stopped) {
            if (dirty) {
              long due =
                  leading ? 0 : Math.min(lastRequest + debounceNanos, firstRequest + maxDelayNanos);
              long wait = due - System.nanoTime();
              if (wait <= 0) {
                break;
              }
              lock.wait(Math.max(1, wait / 1_000_000), 0);
            } else {
              lock.wait();
            }
          }
        } catch (InterruptedException e) {
          if (stopped) {
            return;
          }
          continue;
        }
        if (stopped) {
          return;
        }
        dirty = false;
        leading = false;
        since = firstRequest;
        servingSince = since;
        running = true;
      }
      boolean finished = true;
      try {
        finished = task.run(this::superseded);
      } catch (Throwable t) {
        try {
          onFailure.accept(t);
        } catch (Throwable ignored) {
          // Reporting the failure failed too; the worker still lives for the next edit.
        }
      }
      synchronized (lock) {
        running = false;
        if (!finished) {
          // The edits that run served are still unserved: they keep their age for the maxDelay
          // bound.
          firstRequest = Math.min(firstRequest, since);
        }
      }
    }
  }
}
