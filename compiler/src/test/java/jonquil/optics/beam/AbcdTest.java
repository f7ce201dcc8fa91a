package jonquil.optics.beam;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** Ray-transfer matrices against published forms; each check names its source. */
class AbcdTest {

  @Test
  void elementaryMatricesAndTheirDeterminants() {
    // Kogelnik & Li, Appl. Opt. 5, 1550 (1966), Table I (table number from memory); Siegman 1986,
    // ch. 15: free space [[1, d], [0, 1]], thin lens [[1, 0], [−1/f, 1]], and a flat interface
    // [[1, 0], [0, n1/n2]] when angles are not multiplied by n; det = n1/n2.
    assertEquals(new Abcd(1, 0.25, 0, 1), Abcd.freeSpace(0.25));
    assertEquals(new Abcd(1, 0, -10, 1), Abcd.thinLens(0.1));
    assertEquals(new Abcd(1, 0, 0, 1 / 1.5), Abcd.flatInterface(1, 1.5));
    assertEquals(1, Abcd.freeSpace(3).determinant());
    assertEquals(1, Abcd.thinLens(-0.2).determinant());
    assertEquals(1 / 1.5, Abcd.flatInterface(1, 1.5).determinant(), 1e-16);
    assertEquals(1.5 / 1.2, Abcd.curvedInterface(1.5, 1.2, -0.1).determinant(), 1e-15);
  }

  @Test
  void compositionIsInBeamOrder() {
    // Saleh & Teich 2007, §1.4 (from memory): a cascade M1 then M2 has matrix M2·M1. Lens then
    // gap d is F(d)·L(f) = [[1 − d/f, d], [−1/f, 1]]; gap then lens is L(f)·F(d) = [[1, d], [−1/f,
    // 1 − d/f]].
    double f = 0.2;
    double d = 0.05;
    Abcd lensThenGap = Abcd.thinLens(f).then(Abcd.freeSpace(d));
    assertEquals(new Abcd(1 - d / f, d, -1 / f, 1), lensThenGap);
    Abcd gapThenLens = Abcd.freeSpace(d).then(Abcd.thinLens(f));
    assertEquals(new Abcd(1, d, -1 / f, 1 - d / f), gapThenLens);
  }

  @Test
  void twoThinLensesInContactAddTheirPowers() {
    // Saleh & Teich 2007, §1.4: lenses in contact have 1/f = 1/f1 + 1/f2.
    Abcd pair = Abcd.thinLens(0.1).then(Abcd.thinLens(0.4));
    assertEquals(-(1 / 0.1 + 1 / 0.4), pair.c(), 1e-12);
  }

  @Test
  void theSystemMatrixActsOnQLikeTheStepsInTurn() {
    // Kogelnik & Li 1966: the ABCD law q2 = (A q1 + B)/(C q1 + D) composes with the matrices.
    // Free space gives q + d and a thin lens 1/q − 1/f (same paper).
    Complex q = new Complex(-0.3, 0.12);
    double d1 = 0.2;
    double f = 0.15;
    double d2 = 0.4;
    Complex stepwise = q.add(d1).reciprocal().subtract(1 / f).reciprocal().add(d2);
    Abcd system = Abcd.freeSpace(d1).then(Abcd.thinLens(f)).then(Abcd.freeSpace(d2));
    Complex whole = system.transform(q);
    assertEquals(stepwise.getReal(), whole.getReal(), 1e-12);
    assertEquals(stepwise.getImaginary(), whole.getImaginary(), 1e-12);
  }

  @Test
  void aTelescopeImagesTheFocalPlanesWithMagnificationMinusF2OverF1() {
    // Siegman 1986, ch. 15 (from memory): a telescope of two lenses f1 + f2 apart is afocal, C = 0,
    // with magnification A = −f2/f1 and angular magnification D = −f1/f2.
    double f1 = 0.05;
    double f2 = 0.2;
    Abcd t = Abcd.thinLens(f1).then(Abcd.freeSpace(f1 + f2)).then(Abcd.thinLens(f2));
    assertEquals(-f2 / f1, t.a(), 1e-12);
    assertEquals(f1 + f2, t.b(), 1e-12);
    assertEquals(0, t.c(), 1e-12);
    assertEquals(-f1 / f2, t.d(), 1e-12);
  }
}
