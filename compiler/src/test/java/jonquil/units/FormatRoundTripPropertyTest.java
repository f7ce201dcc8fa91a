package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.List;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

/**
 * Whatever QuantityFormat prints, UnitParser reads back as the same value to four significant
 * digits.
 */
class FormatRoundTripPropertyTest {
  private static final long SEED = 0x554E495453L;
  private static final Pattern PRINTED =
      Pattern.compile("(-?[0-9]+(?:\\.[0-9]+)?(?:e-?[0-9]+)?) ?(.*)");

  private static final List<Dimension> DIMENSIONS =
      List.of(
          Dimension.DIMENSIONLESS,
          Dimension.LENGTH,
          Dimension.AREA,
          Dimension.LENGTH4,
          Dimension.INVERSE_LENGTH,
          Dimension.TIME,
          Dimension.FREQUENCY,
          Dimension.ANGLE,
          Dimension.POWER,
          Dimension.ENERGY,
          Dimension.IRRADIANCE,
          Dimension.FLUENCE,
          Dimension.LINEAR_POWER_DENSITY,
          Dimension.ELECTRIC_FIELD,
          Dimension.TEMPERATURE,
          Dimension.RESPONSIVITY,
          Dimension.MASS,
          Dimension.CURRENT,
          Dimension.VOLTAGE,
          new Dimension(1, 1, -2, 0, 0, 0),
          new Dimension(-2, 0, 1, 0, 0, 1));

  @RepeatedTest(1000)
  void printedValueParsesBack(RepetitionInfo info) {
    SplittableRandom r = new SplittableRandom(SEED + info.getCurrentRepetition());
    Dimension dim = DIMENSIONS.get(r.nextInt(DIMENSIONS.size()));
    double si = UnitPropertyTest.randomValue(r);
    String printed = QuantityFormat.format(si, dim);
    assertRoundTrip(printed, si, dim);
    for (String alt : QuantityFormat.alternatives(si, dim)) {
      if (!alt.startsWith("OD ")) {
        assertRoundTrip(alt, si, dim);
      }
    }
  }

  private static void assertRoundTrip(String printed, double si, Dimension dim) {
    Matcher m = PRINTED.matcher(printed);
    assertTrue(m.matches(), printed);
    BigDecimal written = new BigDecimal(m.group(1));
    double number = written.doubleValue();
    Unit unit =
        m.group(2).isEmpty()
            ? Unit.dimensionless()
            : assertInstanceOf(UnitParse.Ok.class, UnitParser.parse(m.group(2)), printed).unit();
    double back = unit.toSi(number);
    // The printed number is off by at most half of its fourth significant digit; the unit
    // carries that slack into SI.
    int exponent = written.precision() - written.scale() - 1;
    double slack = 0.5 * Math.pow(10, exponent - 3);
    double tolerance =
        unit.scale() == Scale.DECIBEL
            ? Math.abs(si) * (Math.pow(10, slack / 10) - 1)
            : slack * unit.factor();
    tolerance = tolerance * (1 + 1e-9) + 1e-12 * Math.abs(si);
    assertEquals(si, back, tolerance, printed);
    assertEquals(dim, unit.dimension(), printed);
  }
}
