/**
 * Polarization optics for the checker: Jones matrices, coherency matrices, Fresnel coefficients and
 * thin-film stacks, under one fixed set of sign conventions.
 *
 * <p>The conventions below are decided; every class and test in this package follows them.
 *
 * <ul>
 *   <li><b>Time phase.</b> Fields are Re{E e^{i(kz − ωt)}}. A complex index is n = n' + iκ with κ ≥
 *       0 for absorbing media, so a wave decays as e^{−κ k₀ z}.
 *   <li><b>Local frame.</b> Every beam carries a right-handed frame (x', y', k̂). Transverse angles
 *       (azimuths, axes of polarizers and retarders, the plane of incidence) run from x' towards
 *       y'.
 *   <li><b>Retarder.</b> Fast axis along x': J = diag(1, e^{iδ}); the slow component gets the phase
 *       +δ, which under e^{−iωt} is a lag. At angle θ: J(θ) = R(θ) J₀ R(−θ) with R(θ) = [[cos θ,
 *       −sin θ], [sin θ, cos θ]].
 *   <li><b>Coherency matrix.</b> Φ = ⟨E E†⟩ in watts; Φxx, Φyy real, Φxy = ⟨Ex Ey*⟩. Stokes: S0 =
 *       Φxx + Φyy, S1 = Φxx − Φyy, S2 = 2 Re Φxy, S3 = 2 Im Φxy.
 *   <li><b>Handedness.</b> (1, −i)/√2 has S3 = +1 and is RIGHT-handed: the field turns clockwise as
 *       seen by a receiver looking back towards the source. (1, i)/√2 is LEFT. Horizontal light
 *       through a quarter-wave plate with its fast axis at +45° becomes RIGHT circular (S3 &gt; 0).
 *   <li><b>Derived quantities.</b> Azimuth ψ = ½ atan2(S2, S1) in (−90°, 90°]; ellipticity angle χ
 *       = ½ atan2(S3, √(S1² + S2²)), positive for right; DOP = √(S1² + S2² + S3²)/S0, defined as 0
 *       when S0 = 0; extinction ratio = λmax/λmin of Φ, infinite for fully polarized light.
 *   <li><b>Fresnel coefficients</b> (the form of Hecht, Optics, 5th ed. 2017, eqs. 4.32–4.35): rs =
 *       (n1 cos θi − n2 cos θt)/(n1 cos θi + n2 cos θt), rp = (n2 cos θi − n1 cos θt)/(n2 cos θi +
 *       n1 cos θt), ts = 2 n1 cos θi/(n1 cos θi + n2 cos θt), tp = 2 n1 cos θi/(n2 cos θi + n1 cos
 *       θt), with complex Snell n1 sin θi = n2 sin θt and the branch of cos θt on which the
 *       transmitted wave leaves the interface: Re(n2 cos θt) ≥ 0 when it propagates, Im(n2 cos θt)
 *       ≥ 0 when it is evanescent; this gives the total-internal-reflection phases. Rs = |rs|², Rp
 *       = |rp|², Ts = Re(n2 cos θt)/Re(n1 cos θi)·|ts|², and Tp = Re(n2* cos θt)/Re(n1* cos
 *       θi)·|tp|² (the normal Poynting flux of a p wave; for a real n2 this is the same factor as
 *       for s). The incidence medium is taken as lossless.
 *   <li><b>Reflected frame.</b> A reflection keeps the s axis and keeps the frame right-handed, so
 *       in the (p, s) basis its Jones matrix is diag(rp, rs). With this rp sign a perfect mirror at
 *       normal incidence is diag(1, −1) and turns right circular into left: that is the intended
 *       physics, not an artefact.
 *   <li><b>Interference.</b> A beam that travelled the optical path L carries e^{ik₀L} on top of
 *       its Jones vector, so two beams of one line meeting after ΔL have the cross term 2 Re(E1†E2
 *       e^{ik₀ΔL})|γ(ΔL)|. The phase k₀ΔL is unknown unless stated (distances are not known to a
 *       wavelength): powers are then ranges, and the fringe visibility is their contrast ({@link
 *       jonquil.optics.Interference}, {@link jonquil.optics.TemporalCoherence}).
 * </ul>
 *
 * <p>Units are SI throughout: metres, radians, watts. Values are immutable; nothing here does I/O
 * or keeps global state.
 */
package jonquil.optics;
