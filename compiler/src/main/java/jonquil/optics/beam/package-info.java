/**
 * Paraxial propagation of laser beams along a train: real beams of quality M² as embedded
 * Gaussians, ABCD matrices, foci and aperture clipping.
 *
 * <p>Conventions, fixed for every class and test here:
 *
 * <ul>
 *   <li><b>Units.</b> SI throughout: metres and radians. Wavelengths are vacuum wavelengths; the
 *       medium enters through its refractive index n.
 *   <li><b>Real beam and embedded Gaussian.</b> A beam is described by its 1/e² intensity radius W
 *       (for a Gaussian profile the same as the second-moment radius of ISO 11146-1:2005) and its
 *       beam propagation ratio M² ≥ 1. Following the embedded Gaussian of Siegman, the beam
 *       propagates like a TEM00 beam with λ replaced by M²λ: z_R = π n W0²/(M² λ), W(z) = W0 √(1 +
 *       (z/z_R)²), θ = M² λ/(π n W0).
 *   <li><b>Complex beam parameter.</b> q = z + i z_R, with z the distance travelled past the waist
 *       (negative while the waist still lies ahead), so that 1/q = 1/R − i M² λ/(π n W²) = 1/R − i
 *       λ/(π n w²) for the embedded Gaussian of radius w = W/M. R &gt; 0 for a diverging wavefront,
 *       R &lt; 0 for a converging one.
 *   <li><b>Ray matrices.</b> Ray vectors are (height, angle) with the plain angle, not n times the
 *       angle, so a flat interface from n1 to n2 is [[1, 0], [0, n1/n2]] with determinant n1/n2 and
 *       q → (Aq + B)/(Cq + D) carries the medium in q itself (Siegman 1986, ch. 20).
 *   <li><b>Positions.</b> The waist position is measured from the current plane along the beam;
 *       positive means the waist lies ahead.
 * </ul>
 *
 * <p>Values are immutable; nothing here does I/O or keeps global state.
 */
package jonquil.optics.beam;
