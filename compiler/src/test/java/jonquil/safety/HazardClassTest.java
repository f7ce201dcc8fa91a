package jonquil.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The one hazard class: the labels and order of IEC 60825-1:2014 (Ed. 3) clause 5 (definition: 1,
 * 1M, 2, 2M, 3R, 3B, 4 in increasing hazard), read from text and carried as a rank.
 */
class HazardClassTest {
  @Test
  void labelsInIncreasingOrderOfHazard() {
    assertEquals(List.of("1", "1M", "2", "2M", "3R", "3B", "4"), HazardClass.labels());
    assertTrue(HazardClass.CLASS_3R.compareTo(HazardClass.CLASS_3B) < 0);
  }

  @Test
  void parsesTheLabelInEitherCase() {
    assertEquals(Optional.of(HazardClass.CLASS_3R), HazardClass.parse("3r"));
    assertEquals(Optional.of(HazardClass.CLASS_1M), HazardClass.parse("1M"));
    assertEquals(Optional.empty(), HazardClass.parse("3A"));
    assertEquals(Optional.empty(), HazardClass.parse(""));
  }

  @Test
  void rankReadsBackToItsClassAndNothingElseDoes() {
    for (HazardClass c : HazardClass.values()) {
      assertEquals(Optional.of(c), HazardClass.ofRank(c.rank()));
    }
    assertEquals(6, HazardClass.CLASS_4.rank());
    assertEquals(Optional.empty(), HazardClass.ofRank(7));
    assertEquals(Optional.empty(), HazardClass.ofRank(-1));
    assertEquals(Optional.empty(), HazardClass.ofRank(2.5));
  }
}
