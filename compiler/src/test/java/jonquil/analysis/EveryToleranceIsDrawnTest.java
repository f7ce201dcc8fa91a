package jonquil.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import jonquil.Result;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every '±' the language accepts is drawn in a yield's builds: on a fraction, a plain ratio, a
 * count such as an index or M², a density. Each case puts one toleranced number in a train whose
 * measured value rises or falls steadily with it, and bounds that value at its nominal: about half
 * the builds must then pass (definition: a uniform draw lies below its centre half the time).
 * Before, such a tolerance was dropped and the yield said the spec stated none.
 */
class EveryToleranceIsDrawnTest {
  static final String PROBE = "probe mid\n";

  @ParameterizedTest(name = "{0}")
  @CsvSource(
      delimiter = '|',
      value = {
        "reflectance 99 % ± 1 %|mirror m { reflectance 99 % ± 1 %; aoi 45 deg }|power",
        "index 1.5 ± 0.002|material g = index 1.5 ± 0.002; "
            + "window m { material g; thickness 3 mm }|power",
        "index 1.5 ± 0.2 % (of the value)|material g = index 1.5 ± 0.2 %; "
            + "window m { material g; thickness 3 mm }|power",
        "extinction 100 ± 50|polarizer m { axis 90 deg; extinction 100 ± 50 }|power",
        "od 0.3 ± 0.1|filter m { od 0.3 ± 0.1 }|power",
        "transmission 0.9 ± 0.05|filter m { transmission 0.9 ± 0.05 }|power",
        "m2 1.5 ± 0.4|aperture m { diameter 50 mm }|beam radius",
      })
  void aToleranceOnAPlainNumberIsDrawn(String name, String part, String measure) {
    String source =
        measure.equals("beam radius")
            ? "source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg;"
                + " beam waist 0.5 mm, m2 1.5 ± 0.4 }\n"
            : "source s { wavelength 633 nm; power 10 mW; polarization linear 0 deg;"
                + " beam waist 0.5 mm }\n";
    String train = "train t { s -> 10 mm -> m -> 10 m -> mid }\n";
    String spec = source + part + "\n" + PROBE + train;
    String unit = measure.equals("power") ? "W" : "m";
    RequirementOutcome plain =
        Bench.check(spec + "require {\n " + measure + " at mid >= 0 " + unit + "\n}\n")
            .requirements()
            .get(0);
    assertEquals(RequirementStatus.PASS, plain.status(), name + ": " + plain);
    double nominal = plain.value().getAsDouble();
    String bound = String.format(Locale.ROOT, "%.12e %s", nominal, unit);
    Result r =
        Bench.check(
            spec
                + "require {\n yield >= 30 % for "
                + measure
                + " at mid >= "
                + bound
                + "\n yield <= 70 % for "
                + measure
                + " at mid >= "
                + bound
                + "\n}\n");
    for (RequirementOutcome o : r.requirements()) {
      assertEquals(RequirementStatus.PASS, o.status(), name + ": " + o);
      YieldEstimate y = o.yield().orElseThrow();
      assertTrue(y.interval().low() < 0.5 && y.interval().high() > 0.5, name + ": " + y);
    }
  }
}
