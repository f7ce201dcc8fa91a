package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The splice between two token arrays (definition: the part between the common ends). */
class SemanticTokenDeltaTest {

  @Test
  void equalArraysNeedNoSplice() {
    assertEquals(Optional.empty(), SemanticTokenDelta.between(List.of(1, 2, 3), List.of(1, 2, 3)));
    assertEquals(Optional.empty(), SemanticTokenDelta.between(List.of(), List.of()));
  }

  @Test
  void aChangeInTheMiddleKeepsTheCommonPrefixAndSuffix() {
    assertEquals(
        Optional.of(new SemanticTokenDelta(2, 1, List.of(7, 8))),
        SemanticTokenDelta.between(List.of(0, 1, 2, 3, 4), List.of(0, 1, 7, 8, 3, 4)));
    assertEquals(
        Optional.of(new SemanticTokenDelta(1, 2, List.of())),
        SemanticTokenDelta.between(List.of(5, 6, 7, 5), List.of(5, 5)));
  }

  @Test
  void theSpliceRebuildsTheNewArrayAndIsNoLongerThanIt() {
    SplittableRandom random = new SplittableRandom(20240612);
    for (int round = 0; round < 2000; round++) {
      List<Integer> before = randomData(random);
      List<Integer> after = randomData(random);
      Optional<SemanticTokenDelta> delta = SemanticTokenDelta.between(before, after);
      assertEquals(after, delta.map(d -> d.applyTo(before)).orElse(before));
      delta.ifPresent(d -> assertTrue(d.data().size() <= after.size()));
    }
  }

  private static List<Integer> randomData(SplittableRandom random) {
    List<Integer> out = new ArrayList<>();
    int n = random.nextInt(15);
    for (int i = 0; i < n; i++) {
      out.add(random.nextInt(3));
    }
    return out;
  }
}
