package jonquil.optics;

import java.util.Collection;
import java.util.Locale;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.CommandLineOptionException;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs {@link ChainBenchmark} and prints each figure as a ratio to its floor measured in the same
 * run; absolute microseconds differ from machine to machine, the ratio is what a change compares.
 */
public final class ChainRatios {
  private static final String FLOOR = "floorOneElement";

  private ChainRatios() {}

  public static void main(String[] args) throws RunnerException, CommandLineOptionException {
    Collection<RunResult> results =
        new Runner(
                new OptionsBuilder()
                    .parent(new CommandLineOptions(args))
                    .include(ChainBenchmark.class.getName())
                    .build())
            .run();
    double floor = Double.NaN;
    for (RunResult r : results) {
      if (r.getParams().getBenchmark().endsWith("." + FLOOR)) {
        floor = r.getPrimaryResult().getScore();
      }
    }
    System.out.println();
    System.out.println("ratios to the floor (one element applied once, same run):");
    for (RunResult r : results) {
      String name = r.getParams().getBenchmark();
      double score = r.getPrimaryResult().getScore();
      System.out.printf(
          Locale.ROOT,
          "  %-24s %10.4f %s  %8.1f x floor%n",
          name.substring(name.lastIndexOf('.') + 1),
          score,
          r.getPrimaryResult().getScoreUnit(),
          score / floor);
    }
  }
}
