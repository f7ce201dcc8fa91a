package jonquil.analysis;

/**
 * The right-handed local frame (x', y', k) a beam carries through the train. Reflections turn it as
 * the bench does (so a periscope whose two folds lie in perpendicular planes turns the
 * polarization); the reported azimuths are then re-expressed against the table frame, whose x axis
 * is horizontal.
 */
public record BeamFrame(Vec3 k, Vec3 x, Vec3 y) {
  /** The first frame of every source: travelling along lab z, x' horizontal, y' up. */
  public static final BeamFrame SOURCE = new BeamFrame(Vec3.Z, Vec3.X, Vec3.Y);

  /**
   * The frame after a reflection at angle of incidence {@code aoi} off a surface whose plane of
   * incidence lies at azimuth {@code plane} in this frame. The beam is deflected towards the
   * plane's azimuth; the s axis is kept and the new frame stays right-handed, with p at azimuth
   * {@code plane} and s at {@code plane + 90°}, matching {@code Jones.reflection(rp, rs, plane)}.
   */
  public BeamFrame reflect(double aoi, double plane) {
    Vec3 p = x.times(Math.cos(plane)).plus(y.times(Math.sin(plane)));
    Vec3 s = x.times(-Math.sin(plane)).plus(y.times(Math.cos(plane)));
    Vec3 kr = k.times(-Math.cos(2 * aoi)).plus(p.times(Math.sin(2 * aoi))).unit();
    Vec3 pr = s.cross(kr).unit();
    Vec3 xr = pr.times(Math.cos(plane)).plus(s.times(-Math.sin(plane)));
    Vec3 yr = pr.times(Math.sin(plane)).plus(s.times(Math.cos(plane)));
    return new BeamFrame(kr, xr.unit(), yr.unit());
  }

  /**
   * The angle of the table frame's x axis measured in this frame (from x' towards y'). The table x
   * axis is horizontal and perpendicular to the beam (up × k); for a beam running vertically there
   * is no such axis and the carried frame is kept (angle 0).
   */
  public double tableAngle() {
    Vec3 horizontal = Vec3.Y.cross(k);
    if (horizontal.norm() < 1e-9) {
      return 0;
    }
    Vec3 xt = horizontal.unit();
    return Math.atan2(xt.dot(y), xt.dot(x));
  }

  /** True when the beam runs (nearly) vertically, so azimuths are not referred to the table. */
  public boolean vertical() {
    return Vec3.Y.cross(k).norm() < 1e-9;
  }

  /**
   * The frame of light running the other way along the same line, seen as a mirror at normal
   * incidence leaves it: (−x, y, −k), still right-handed.
   */
  public BeamFrame mirrored() {
    return new BeamFrame(k.times(-1), x.times(-1), y);
  }
}
