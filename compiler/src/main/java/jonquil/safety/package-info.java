/**
 * Laser-safety estimates after IEC 60825-1:2014 (Edition 3), 180 nm to 1 mm and 100 fs to 3×10⁴ s,
 * point and extended sources: ocular and skin MPE, hazard class, NOHD, eyewear OD, and
 * common-practice damage-threshold scaling. SI units throughout; every result is an {@link
 * jonquil.safety.Outcome} that is either a value with its standard/table or "not evaluated" with a
 * reason, and carries {@link jonquil.safety.Outcome#CAUTION}. Formulas and constants live in {@code
 * Ed3}; values not confirmed against a published source are marked "from memory" there.
 */
package jonquil.safety;
