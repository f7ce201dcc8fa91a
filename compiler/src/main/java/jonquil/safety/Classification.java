package jonquil.safety;

/**
 * Why it exists: a computed hazard class together with the measurement geometry it rests on, so a
 * reader can check how the accessible emission was obtained.
 *
 * @param hazardClass the class
 * @param fractionCondition1 fraction of the beam through 50 mm at 2 m (condition 1, optically
 *     aided)
 * @param fractionCondition3 fraction of the beam through 7 mm at 100 mm (condition 3, naked eye)
 * @param basis which limits decided, in words
 */
public record Classification(
    HazardClass hazardClass, double fractionCondition1, double fractionCondition3, String basis) {

  /** The caution that goes with every computed class. */
  public String caution() {
    return Outcome.CAUTION;
  }
}
