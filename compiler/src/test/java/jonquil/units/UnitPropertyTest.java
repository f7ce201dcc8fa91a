package jonquil.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

/** Laws that must hold for every dimension and every known unit, checked on seeded random cases. */
class UnitPropertyTest {
  private static final long SEED = 0x4A6F6E7175696CL;

  private static final List<String> KNOWN =
      List.of(
          "nm", "µm", "mm", "cm", "m", "km", "W", "mW", "kW", "MW", "GW", "J", "mJ", "uJ", "s",
          "ns", "ps", "fs", "ms", "Hz", "kHz", "MHz", "rad", "mrad", "urad", "deg", "°", "°C",
          "degC", "K", "°F", "%", "ppm", "dB", "dBm", "OD", "wave", "W/cm2", "kW/cm^2", "J/cm²",
          "mJ/cm2", "W/m2", "W/cm", "V/m", "kV/cm", "MV/m", "um2", "um4", "/cm", "m^-1", "A/W",
          "W·m^-2", "A", "mA", "V", "g", "kg", "min", "h", "eV");

  private static SplittableRandom rng(RepetitionInfo info) {
    return new SplittableRandom(SEED + info.getCurrentRepetition());
  }

  private static Dimension randomDimension(SplittableRandom r) {
    return new Dimension(
        r.nextInt(-4, 5),
        r.nextInt(-4, 5),
        r.nextInt(-4, 5),
        r.nextInt(-4, 5),
        r.nextInt(-4, 5),
        r.nextInt(-4, 5));
  }

  /** Log-uniform magnitude over 1e-12..1e12 with random sign: the span optical specs use. */
  static double randomValue(SplittableRandom r) {
    double v = Math.pow(10, r.nextDouble(-12, 12));
    return r.nextBoolean() ? v : -v;
  }

  @RepeatedTest(200)
  void dimensionProductIsAssociativeAndCommutative(RepetitionInfo info) {
    SplittableRandom r = rng(info);
    Dimension a = randomDimension(r);
    Dimension b = randomDimension(r);
    Dimension c = randomDimension(r);
    assertEquals(a.times(b), b.times(a));
    assertEquals(a.times(b).times(c), a.times(b.times(c)));
    assertEquals(a, a.times(Dimension.DIMENSIONLESS));
  }

  @RepeatedTest(200)
  void divideUndoesTimesAndPowRepeatsTimes(RepetitionInfo info) {
    SplittableRandom r = rng(info);
    Dimension a = randomDimension(r);
    Dimension b = randomDimension(r);
    assertEquals(a, a.times(b).divide(b));
    assertEquals(Dimension.DIMENSIONLESS, a.divide(a));
    int n = r.nextInt(-3, 4);
    Dimension repeated = Dimension.DIMENSIONLESS;
    for (int i = 0; i < Math.abs(n); i++) {
      repeated = n > 0 ? repeated.times(a) : repeated.divide(a);
    }
    assertEquals(repeated, a.pow(n));
  }

  @RepeatedTest(500)
  void toSiThenFromSiGivesBackTheValue(RepetitionInfo info) {
    SplittableRandom r = rng(info);
    String symbol = KNOWN.get(r.nextInt(KNOWN.size()));
    Unit u = assertInstanceOf(UnitParse.Ok.class, UnitParser.parse(symbol), symbol).unit();
    double v = randomValue(r);
    if (u.scale() != Scale.LINEAR) {
      // Levels beyond ±300 dB (or OD 30) leave double range; real filters and links stay far
      // inside.
      v = v % 30;
    }
    double back = u.fromSi(u.toSi(v));
    // With an offset (°C, °F) the SI value carries the offset, so precision is relative to it too;
    // on log scales a level near 0 dB is a ratio near 1, whose last bit is worth about 1e-15 dB.
    double floor = u.scale() == Scale.LINEAR ? Math.abs(u.offset() / u.factor()) : 1;
    double scale = Math.max(Math.abs(v), floor);
    assertEquals(v, back, scale * 1e-12, symbol + " at " + v);
  }
}
