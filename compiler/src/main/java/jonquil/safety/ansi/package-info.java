/**
 * Ocular and skin MPE after ANSI Z136.1-2014, so that Jonquil can show it next to the IEC
 * 60825-1:2014 (Ed. 3) figures of {@code jonquil.safety}. Point-source (intrabeam) viewing, skin
 * 400–1400 nm, eye 180–1200 nm and 1400 nm–1 mm, SI units; every result is a {@link
 * jonquil.safety.Outcome} (value with its table, or "not evaluated" with a reason) and carries
 * {@link jonquil.safety.Outcome#CAUTION}. Formulas and constants live in {@code Z136}; values not
 * confirmed against a published source are marked "from memory" there and in the tests.
 */
package jonquil.safety.ansi;
