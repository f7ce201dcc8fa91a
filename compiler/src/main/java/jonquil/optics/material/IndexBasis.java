package jonquil.optics.material;

/**
 * Whether a published formula gives the index relative to air or to vacuum, because most crystal
 * data are relative.
 */
public enum IndexBasis {
  /**
   * Index relative to air, with the wavelength in air; {@link CatalogMaterial#absoluteIndex}
   * converts it.
   */
  RELATIVE_TO_AIR,
  /** Absolute index (relative to vacuum), with the vacuum wavelength. */
  ABSOLUTE
}
