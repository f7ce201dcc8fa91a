package jonquil.optics.material;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The built-in materials under their canonical names, each with its published dispersion data and
 * citation, so a spec can say 'fused_silica' and every analysis gets the same, traceable index.
 *
 * <p>Names are the canonical names of {@code jonquil.resolve.CatalogSpellings}; aliases are
 * resolved there. All data are embedded below next to their source; nothing is read at run time.
 * Coefficients are copied as printed in the cited source (checked against a public-domain
 * restatement of each source); the sources' wavelengths are in µm and are converted to metres here.
 * Where a comment says "from memory", that detail (not the coefficients) was recalled rather than
 * confirmed in the source.
 */
public final class MaterialCatalog {
  private MaterialCatalog() {}

  /** Nominal temperature for sources that say only "room temperature". */
  private static final double ROOM = 293.15;

  private static final Map<String, CatalogMaterial> BY_NAME = new LinkedHashMap<>();

  static {
    add(
        new CatalogMaterial(
            "vacuum",
            ConstantIndex.VACUUM,
            new Reference(
                "Definition: the refractive index of vacuum is exactly 1 (the SI fixes c; "
                    + "BIPM, The International System of Units, 9th ed., 2019, Table 1);"
                    + " absolute"),
            IndexBasis.ABSOLUTE,
            ROOM,
            Optional.of(WavelengthRange.ALL)));

    // Dry laboratory air at 20 °C: the same air the relative-to-air entries are converted with.
    CiddorAir air = CiddorAir.dryAt(293.15);
    add(
        new CatalogMaterial(
            "air",
            air,
            new Reference(
                "P. E. Ciddor, \"Refractive index of air: new equations for the visible and near"
                    + " infrared\", Applied Optics 35(9), 1566-1573 (1996),"
                    + " doi:10.1364/AO.35.001566; eqs. (1)-(2) standard-air dispersion and CO2"
                    + " term, with the appendix's density steps (equation numbers from memory); dry"
                    + " air, 20 °C, 101 325 Pa, 450 ppm CO2; absolute, vacuum wavelengths"),
            IndexBasis.ABSOLUTE,
            293.15,
            air.validRange()));

    // Daimon & Masumura 2007, coefficients of their fit for 20.0 °C, n² − 1 = Σ B λ²/(λ² − C), C in
    // µm². Absolute: the paper converts its prism-in-air measurements to indices relative to
    // vacuum (from memory; the public restatement of this fit says "refractive index is absolute
    // (relative to vacuum)"). Until this basis was checked the entry was marked relative to air,
    // which multiplied it by n_air once more (+3.6e-4 at 633 nm).
    Sellmeier water =
        Sellmeier.fromMicrometres(
            0,
            new double[] {5.684027565e-1, 1.726177391e-1, 2.086189578e-2, 1.130748688e-1},
            new double[] {5.101829712e-3, 1.821153936e-2, 2.620722293e-2, 1.069792721e1},
            WavelengthRange.ofMicrometres(0.182, 1.129));
    add(
        new CatalogMaterial(
            "water",
            water,
            new Reference(
                "M. Daimon and A. Masumura, \"Measurement of the refractive index of distilled"
                    + " water from the near-infrared region to the ultraviolet region\", Applied"
                    + " Optics 46(18), 3811-3820 (2007), doi:10.1364/AO.46.003811; four-term"
                    + " Sellmeier fit for 20.0 °C, Table 3 (table number from memory); absolute"),
            IndexBasis.ABSOLUTE,
            293.15,
            water.validRange()));

    // Malitson 1965, n² − 1 = Σ B λ²/(λ² − λ₀²), λ₀ in µm; relative to air at 20 °C.
    Sellmeier silica =
        Sellmeier.fromResonancesMicrometres(
            new double[] {0.6961663, 0.4079426, 0.8974794},
            new double[] {0.0684043, 0.1162414, 9.896161},
            WavelengthRange.ofMicrometres(0.21, 3.71));
    add(
        new CatalogMaterial(
            "fused_silica",
            silica,
            new Reference(
                "I. H. Malitson, \"Interspecimen comparison of the refractive index of fused"
                    + " silica\", Journal of the Optical Society of America 55(10), 1205-1208"
                    + " (1965), doi:10.1364/JOSA.55.001205; dispersion equation of the abstract, p."
                    + " 1205; 20 °C; relative to air (prism measured in air)"),
            IndexBasis.RELATIVE_TO_AIR,
            293.15,
            silica.validRange()));

    // Malitson 1963, same form, 24 °C. Relative to air (prism in air): from memory.
    Sellmeier caf2 =
        Sellmeier.fromResonancesMicrometres(
            new double[] {0.5675888, 0.4710914, 3.8484723},
            new double[] {0.050263605, 0.1003909, 34.649040},
            WavelengthRange.ofMicrometres(0.23, 9.7));
    add(
        new CatalogMaterial(
            "calcium_fluoride",
            caf2,
            new Reference(
                "I. H. Malitson, \"A redetermination of some optical properties of calcium"
                    + " fluoride\", Applied Optics 2(11), 1103-1107 (1963),"
                    + " doi:10.1364/AO.2.001103; dispersion equation of the abstract, p. 1103 (page"
                    + " from memory); 24 °C; relative to air"),
            IndexBasis.RELATIVE_TO_AIR,
            297.15,
            caf2.validRange()));

    // Dodge 1984, same form, 19 °C, ordinary and extraordinary rays. Relative to air: from memory.
    WavelengthRange mgf2Range = WavelengthRange.ofMicrometres(0.2, 7.0);
    uniaxial(
        "magnesium_fluoride",
        Sellmeier.fromResonancesMicrometres(
            new double[] {0.48755108, 0.39875031, 2.3120353},
            new double[] {0.04338408, 0.09461442, 23.793604},
            mgf2Range),
        Sellmeier.fromResonancesMicrometres(
            new double[] {0.41344023, 0.50497499, 2.4904862},
            new double[] {0.03684262, 0.09076162, 23.771995},
            mgf2Range),
        new Reference(
            "M. J. Dodge, \"Refractive properties of magnesium fluoride\", Applied Optics 23(12), "
                + "1980-1985 (1984), doi:10.1364/AO.23.001980; Sellmeier coefficients of Table 2"
                + " (table number from memory); 19 °C; relative to air"),
        292.15,
        mgf2Range);

    // Malitson & Dodge 1972 (conference abstract); the Sellmeier coefficients are printed in Dodge
    // 1986. 20 °C.
    // Relative to air: from memory.
    WavelengthRange sapphireRange = WavelengthRange.ofMicrometres(0.2, 5.0);
    uniaxial(
        "sapphire",
        Sellmeier.fromResonancesMicrometres(
            new double[] {1.4313493, 0.65054713, 5.3414021},
            new double[] {0.0726631, 0.1193242, 18.028251},
            sapphireRange),
        Sellmeier.fromResonancesMicrometres(
            new double[] {1.5039759, 0.55069141, 6.5927379},
            new double[] {0.0740288, 0.1216529, 20.072248},
            sapphireRange),
        new Reference(
            "I. H. Malitson and M. J. Dodge, \"Refractive index and birefringence of synthetic"
                + " sapphire\", Journal of the Optical Society of America 62, 1405 (1972)"
                + " (abstract); Sellmeier coefficients as given in M. J. Dodge, \"Refractive"
                + " index\", in Handbook of Laser Science and Technology, Vol. IV, Optical"
                + " Materials, Part 2, CRC Press, Boca Raton (1986), p. 30; 20 °C; relative to"
                + " air"),
        293.15,
        sapphireRange);

    // Ghosh 1999: n² = A + B λ²/(λ² − C) + D λ²/(λ² − E), λ in µm; here A − 1 is the Sellmeier
    // constant.
    // Fitted to compiled room-temperature data; relative to air: from memory.
    WavelengthRange quartzRange = WavelengthRange.ofMicrometres(0.198, 2.0531);
    Reference ghosh =
        new Reference(
            "G. Ghosh, \"Dispersion-equation coefficients for the refractive index and"
                + " birefringence of calcite and quartz crystals\", Optics Communications 163(1-3),"
                + " 95-102 (1999), doi:10.1016/S0030-4018(99)00091-7; eq. (1) with the coefficients"
                + " of Table 1 (numbers from memory); room temperature; relative to air");
    uniaxial(
        "quartz",
        Sellmeier.fromMicrometres(
            1.28604141 - 1,
            new double[] {1.07044083, 1.10202242},
            new double[] {1.00585997e-2, 100},
            quartzRange),
        Sellmeier.fromMicrometres(
            1.28851804 - 1,
            new double[] {1.09509924, 1.15662475},
            new double[] {1.02101864e-2, 100},
            quartzRange),
        ghosh,
        ROOM,
        quartzRange);

    WavelengthRange calciteRange = WavelengthRange.ofMicrometres(0.204, 2.172);
    uniaxial(
        "calcite",
        Sellmeier.fromMicrometres(
            1.73358749 - 1,
            new double[] {0.96464345, 1.82831454},
            new double[] {1.94325203e-2, 120},
            calciteRange),
        Sellmeier.fromMicrometres(
            1.35859695 - 1,
            new double[] {0.82427830, 0.14429128},
            new double[] {1.06689543e-2, 120},
            calciteRange),
        ghosh,
        ROOM,
        calciteRange);

    Reference johnsonChristy =
        new Reference(
            "P. B. Johnson and R. W. Christy, \"Optical constants of the noble metals\", Physical"
                + " Review B 6(12), 4370-4379 (1972), doi:10.1103/PhysRevB.6.4370; Table I; room"
                + " temperature; rows are the paper's photon energies expressed as wavelengths;"
                + " absolute");
    metal("silver", TabulatedIndex.ofMicrometreRows(JohnsonChristy.SILVER), johnsonChristy);
    metal("gold", TabulatedIndex.ofMicrometreRows(JohnsonChristy.GOLD), johnsonChristy);
    metal("copper", TabulatedIndex.ofMicrometreRows(JohnsonChristy.COPPER), johnsonChristy);

    // Rakić et al. 1998, Lorentz–Drude parameters for Al; energies in eV; fitted from 0.1 to 6 eV.
    LorentzDrude aluminium =
        new LorentzDrude(
            14.98,
            0.523,
            0.047,
            new double[] {0.227, 0.050, 0.166, 0.030},
            new double[] {0.333, 0.312, 1.351, 3.382},
            new double[] {0.162, 1.544, 1.808, 3.473},
            Optional.of(
                new WavelengthRange(LorentzDrude.EV_METRE / 6, LorentzDrude.EV_METRE / 0.1)));
    metal(
        "aluminium",
        aluminium,
        new Reference(
            "A. D. Rakić, A. B. Djurišić, J. M. Elazar and M. L. Majewski, \"Optical properties of"
                + " metallic films for vertical-cavity optoelectronic devices\", Applied Optics"
                + " 37(22), 5271-5283 (1998), doi:10.1364/AO.37.005271; Lorentz-Drude model, eq."
                + " (3) with the Al parameters of Table 1 (numbers from memory), fitted from 0.1 eV"
                + " to 6 eV; absolute"));
  }

  /** The entry with this canonical name (aliases are resolved by the caller). */
  public static Optional<CatalogMaterial> lookup(String name) {
    return Optional.ofNullable(BY_NAME.get(name));
  }

  /** Every entry, in catalog order. */
  public static List<CatalogMaterial> all() {
    return List.copyOf(BY_NAME.values());
  }

  private static void add(CatalogMaterial m) {
    if (BY_NAME.putIfAbsent(m.name(), m) != null) {
      throw new IllegalStateException("duplicate catalog name " + m.name());
    }
  }

  private static void uniaxial(
      String name,
      Dispersion ordinary,
      Dispersion extraordinary,
      Reference reference,
      double temperatureKelvin,
      WavelengthRange range) {
    add(
        new CatalogMaterial(
            name,
            ordinary,
            reference,
            IndexBasis.RELATIVE_TO_AIR,
            temperatureKelvin,
            Optional.of(range),
            Optional.of(new Uniaxial(ordinary, extraordinary))));
  }

  private static void metal(String name, Dispersion dispersion, Reference reference) {
    add(
        new CatalogMaterial(
            name, dispersion, reference, IndexBasis.ABSOLUTE, ROOM, dispersion.validRange()));
  }
}
