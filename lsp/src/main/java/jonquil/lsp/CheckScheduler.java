package jonquil.lsp;

import java.time.Duration;
import java.util.function.Consumer;

/** Runs checks off LSP4J's reader thread: debounced, coalesced, on one 16 MB-stack worker that outlives any Throwable. */
final class CheckScheduler implements AutoCloseable {
  static final long STACK_BYTES = 16L << 20;

  private final Runnable task;
  private final Consumer<Throwable> onFailure;
  private final long debounceNanos;
  private final long maxDelayNanos;
  private final Object lock = new Object();
  private final Thread worker;
  private boolean dirty;
  private long firstRequest;
  private long lastRequest;
  private boolean stopped;
  private final Runnable warmUp;

  /**
   * A run starts {@code debounce} after the last request, or at most {@code maxDelay}
   * after the first unserved one, so that steady typing still gets diagnostics.
   */
  CheckScheduler(Runnable task, Consumer<Throwable> onFailure, Duration debounce, Duration maxDelay) {
    this(task, onFailure, debounce, maxDelay, () -> {});
  }

  /** As above, running {@code warmUp} once on the worker before the first check (a failure there is ignored). */
  CheckScheduler(Runnable task, Consumer<Throwable> onFailure, Duration debounce, Duration maxDelay, Runnable warmUp) {
    this.task = task;
    this.warmUp = warmUp;
    this.onFailure = onFailure;
    this.debounceNanos = debounce.toNanos();
    this.maxDelayNanos = maxDelay.toNanos();
    ThreadGroup group = new ThreadGroup("jonquil-check");
    this.worker = new Thread(group, this::loop, "jonquil-check", STACK_BYTES);
    worker.setDaemon(true);
    worker.start();
  }

  /** Asks for a run with the latest state; never blocks. */
  void request() {
    synchronized (lock) {
      long now = System.nanoTime();
      if (!dirty) {
        firstRequest = now;
      }
      dirty = true;
      lastRequest = now;
      lock.notifyAll();
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

  private void loop() {
    try {
      warmUp.run();
    } catch (Throwable t) {
      // Warming up only saves time; the first real check reports whatever is wrong.
    }
    while (true) {
      synchronized (lock) {
        try {
          while (!stopped) {
            if (dirty) {
              long due = Math.min(lastRequest + debounceNanos, firstRequest + maxDelayNanos);
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
      }
      try {
        task.run();
      } catch (Throwable t) {
        try {
          onFailure.accept(t);
        } catch (Throwable ignored) {
          // Reporting the failure failed too; the worker still lives for the next edit.
        }
      }
    }
  }
}
