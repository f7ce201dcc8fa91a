package jonquil.resolve;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The names of the built-in material catalog, so that specs can refer to them before any physics
 * runs. The optics layer holds each entry's dispersion data and citation under the same canonical
 * name.
 */
public final class CatalogSpellings {
  private CatalogSpellings() {}

  /** Broad class of a catalog material; decides where it may be used ('metal silver'). */
  public enum MaterialClass {
    GAS,
    LIQUID,
    GLASS,
    CRYSTAL,
    BIREFRINGENT_CRYSTAL,
    METAL
  }

  /** One catalog name with its spellings. */
  public record Entry(String name, MaterialClass materialClass, List<String> aliases) {}

  private static final Map<String, Entry> BY_SPELLING = new LinkedHashMap<>();
  private static final List<Entry> ENTRIES =
      List.of(
          new Entry("vacuum", MaterialClass.GAS, List.of()),
          new Entry("air", MaterialClass.GAS, List.of()),
          new Entry("water", MaterialClass.LIQUID, List.of()),
          new Entry("fused_silica", MaterialClass.GLASS, List.of("silica")),
          new Entry("calcium_fluoride", MaterialClass.CRYSTAL, List.of("caf2")),
          new Entry("magnesium_fluoride", MaterialClass.BIREFRINGENT_CRYSTAL, List.of("mgf2")),
          new Entry("sapphire", MaterialClass.BIREFRINGENT_CRYSTAL, List.of()),
          new Entry("quartz", MaterialClass.BIREFRINGENT_CRYSTAL, List.of("crystalline_quartz")),
          new Entry("calcite", MaterialClass.BIREFRINGENT_CRYSTAL, List.of()),
          new Entry("silver", MaterialClass.METAL, List.of()),
          new Entry("gold", MaterialClass.METAL, List.of()),
          new Entry("aluminium", MaterialClass.METAL, List.of("aluminum")),
          new Entry("copper", MaterialClass.METAL, List.of()));

  static {
    for (Entry e : ENTRIES) {
      BY_SPELLING.put(e.name(), e);
      for (String alias : e.aliases()) {
        BY_SPELLING.put(alias, e);
      }
    }
  }

  public static Optional<Entry> lookup(String spelling) {
    return Optional.ofNullable(BY_SPELLING.get(spelling));
  }

  public static List<Entry> entries() {
    return ENTRIES;
  }

  /** Every accepted spelling, for completion and "did you mean". */
  public static List<String> spellings() {
    return List.copyOf(BY_SPELLING.keySet());
  }
}
