package jonquil.safety;

/**
 * One standard's ocular limit: its MPE for an emission seen for an exposure duration. NOHD and
 * eyewear formulas take it as a parameter, so each is written once whichever standard gates.
 */
@FunctionalInterface
public interface OcularLimit {
  /** IEC 60825-1:2014 (Ed. 3), Annex A, Table A.1, for a point source. */
  OcularLimit IEC = OcularMpe::at;

  Outcome<MaximumPermissibleExposure> at(Emission e, double exposureDuration);
}
