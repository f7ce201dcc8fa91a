package jonquil.optics;

/** Names the sense of rotation of a polarization state, with the viewpoint spelled out. */
public enum Handedness {
  RIGHT("right (clockwise as seen by the receiver, looking back towards the source)"),
  LEFT("left (counter-clockwise as seen by the receiver, looking back towards the source)"),
  NONE("none (linear or unpolarized: no sense of rotation)");

  private final String description;

  Handedness(String description) {
    this.description = description;
  }

  /**
   * A human-readable name that states the viewpoint, because handedness is ambiguous without it.
   */
  public String describe() {
    return description;
  }

  /** The other hand; NONE stays NONE. */
  public Handedness opposite() {
    switch (this) {
      case RIGHT:
        return LEFT;
      case LEFT:
        return RIGHT;
      default:
        return NONE;
    }
  }
}
