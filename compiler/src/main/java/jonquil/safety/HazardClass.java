package jonquil.safety;

/**
 * Why it exists: the laser product classes of IEC 60825-1:2014 (Ed. 3), clause 5 / Tables 3–8, as
 * computed by {@link Classifier}; a separate copy from the resolver's enum so that the safety code
 * depends on nothing above it.
 */
public enum HazardClass {
  CLASS_1,
  CLASS_1M,
  CLASS_2,
  CLASS_2M,
  CLASS_3R,
  CLASS_3B,
  CLASS_4
}
