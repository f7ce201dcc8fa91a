package jonquil.optics;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/** Measures the hot path of a train: a 50-element Jones chain applied to a coherency matrix. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class ChainBenchmark {
  private Jones[] chain;
  private Coherency input;

  @Setup
  public void setUp() {
    // Seeded so that every run measures the same mix of elements.
    SplittableRandom rnd = new SplittableRandom(42);
    chain = new Jones[50];
    for (int i = 0; i < chain.length; i++) {
      double angle = rnd.nextDouble() * Math.PI;
      // Retarder, polarizer, rotator in turn: the three shapes of matrix a bench is made of.
      chain[i] =
          switch (i % 3) {
            case 0 -> Jones.retarder(rnd.nextDouble() * Math.PI, angle);
            case 1 -> Jones.polarizer(angle, 0.98, 1e4);
            case 2 -> Jones.rotator(angle);
            default -> throw new IllegalStateException("i % 3 is 0, 1 or 2");
          };
    }
    input = Coherency.unpolarized(1e-3);
  }

  /**
   * The floor every other figure is divided by: one element applied once, measured in the same run,
   * so a loaded or slower machine moves the figures and the floor together.
   */
  @Benchmark
  public Coherency floorOneElement() {
    return input.transform(chain[0]);
  }

  /** Element by element, as a checker walking a train would do it. */
  @Benchmark
  public Coherency applyElementByElement() {
    Coherency c = input;
    for (Jones j : chain) {
      c = c.transform(j);
    }
    return c;
  }

  /** Product first, then one transform: the alternative when the chain is reused. */
  @Benchmark
  public Coherency multiplyThenApply() {
    Jones total = Jones.IDENTITY;
    for (Jones j : chain) {
      total = j.times(total);
    }
    return input.transform(total);
  }
}
