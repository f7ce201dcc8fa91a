package jonquil.units;

/**
 * Citations for the facts the unit tests check, so every row names where its number comes from.
 *
 * <p>Checked against retrieved text while writing: the SI Brochure 8th ed. (2006, upd. 2014) Table
 * 6 on bipm.org (minute, hour, day, degree, arc minute, arc second — the same values the 9th ed.
 * gives in Table 8) and its Section 5.4 (prefixed symbol raised to a power: 1 cm³ = 10⁻⁶ m³, 1 V/cm
 * = 10² V/m, 1 cm⁻¹ = 10² m⁻¹); the prefix values as printed from NIST SP 330 (2019). Table numbers
 * of the 9th edition, the eV value and the temperature relations are cited from memory and say so.
 */
final class Sources {
  static final String SI_T7 =
      "BIPM SI Brochure 9th ed. (2019), Table 7, SI prefixes (table number from memory)";
  static final String CGPM_2022 =
      "27th CGPM (2022), Resolution 3, prefixes ronna/quetta/ronto/quecto (from memory)";
  static final String SI_T2 = "BIPM SI Brochure 9th ed. (2019), Table 2, base units (from memory)";
  static final String SI_T4 =
      "BIPM SI Brochure 9th ed. (2019), Table 4, units with special names (from memory)";
  static final String SI_T8 =
      "BIPM SI Brochure 9th ed. (2019), Table 8 = 8th ed. Table 6, non-SI units accepted for use"
          + " with the SI";
  static final String SI_5_4 =
      "BIPM SI Brochure 8th ed., Section 5.4: a prefixed symbol is raised to a power as a whole";
  static final String SI_EV =
      "BIPM SI Brochure 9th ed. (2019), Table 8: 1 eV = 1.602 176 634e-19 J (from memory)";
  static final String SI_CELSIUS =
      "BIPM SI Brochure 9th ed. (2019), Sect. 2.3.1: t/°C = T/K − 273.15 (from memory)";
  static final String NIST_811_F =
      "NIST SP 811 (2008), Appendix B.9: t/°C = (t/°F − 32)/1.8 (from memory)";
  static final String NIST_811_WCM2 =
      "NIST SP 811 (2008), Appendix B.9: 1 W/cm² = 1.0e4 W/m² (from memory)";
  static final String SI_PERCENT =
      "BIPM SI Brochure 9th ed. (2019), Sect. 5.4.7: % = 0.01; ppm = 1e-6 (from memory)";
  static final String DB_DEF =
      "IEC 60027-3: level in dB of a power ratio = 10·log10(ratio) (from memory)";
  static final String OD_DEF =
      "IUPAC Gold Book, 'absorbance'/optical density: OD = −log10(T) (from memory)";
  static final String WAVE =
      "one wave of retardance = one cycle of phase = 2π rad (definition of the cycle, from memory)";

  private Sources() {}
}
