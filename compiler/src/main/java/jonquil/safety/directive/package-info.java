/**
 * The exposure limit values for laser radiation of Directive 2006/25/EC (artificial optical
 * radiation), Annex II, so that Jonquil can gate a bench by them or show them beside the IEC
 * 60825-1:2014 figures of {@code jonquil.safety}: eye and skin, 180 nm to 1 mm, 10⁻¹³ s to 3×10⁴ s,
 * point-source viewing (C_E = 1), SI units. The numbers live in {@code AnnexII}, each naming its
 * table, row and the public text it was read in (Table 2.3 could not be read: its rows are marked
 * "from memory"), and every result is a {@link jonquil.safety.Outcome} that carries {@link
 * jonquil.safety.Outcome#CAUTION}.
 */
package jonquil.safety.directive;
