package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The safety package's hazard classes map onto the spec's, in the same order of hazard. */
class HazardClassMappingTest {
  @Test
  void everyClassHasItsSpecLabelInTheSameOrder() {
    jonquil.safety.HazardClass[] safety = jonquil.safety.HazardClass.values();
    assertEquals(jonquil.resolve.HazardClass.values().length, safety.length);
    for (int i = 0; i < safety.length; i++) {
      assertEquals(i, SafetyVerdicts.specClass(safety[i]).ordinal(), safety[i].name());
    }
  }
}
