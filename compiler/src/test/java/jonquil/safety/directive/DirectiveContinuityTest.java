package jonquil.safety.directive;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.DoubleBinaryOperator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The rows of Tables 2.2–2.4 of Directive 2006/25/EC join at every duration breakpoint: ICNIRP
 * built them to be continuous in time, so a jump larger than the tables' rounding (8 %; the largest
 * is 7 %, 5×10⁻² C_C against 90 t^0.75 C_C at 50 µs in 1050–1400 nm) means a row was mistyped. The
 * rows of Table 2.3, which could not be read (from memory), are thereby checked against the rows of
 * Tables 2.2 and 2.4 that were (see {@link AnnexII}).
 */
class DirectiveContinuityTest {
  private static final double[] BREAKS = {1e-11, 1e-9, 1e-7, 1.8e-5, 5e-5, 1e-3, 10, 100, 1e3};

  @ParameterizedTest(name = "eye at {0} nm")
  @CsvSource({
    "193", "266", "302.7", "304", "308", "314", "355", "450", "532", "650", "808", "1064", "1180",
    "1300", "1450", "1550", "2000", "3000", "10600", "500000"
  })
  void eyeRowsJoin(double nm) {
    joins(AnnexII::eye, nm);
  }

  @ParameterizedTest(name = "skin at {0} nm")
  @CsvSource({"193", "355", "532", "808", "1064", "1300", "1550", "10600"})
  void skinRowsJoin(double nm) {
    joins(AnnexII::skin, nm);
  }

  private static void joins(DoubleBinaryOperator limit, double nm) {
    for (double t : BREAKS) {
      double before = limit.applyAsDouble(nm * 1e-9, t * (1 - 1e-9));
      double after = limit.applyAsDouble(nm * 1e-9, t);
      // Tables 2.2 and 2.4 (read) and 2.3 (from memory): continuous within rounding.
      assertEquals(1, after / before, 0.08, nm + " nm at " + t + " s");
    }
  }
}
