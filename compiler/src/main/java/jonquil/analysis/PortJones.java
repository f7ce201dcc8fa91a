package jonquil.analysis;

import jonquil.optics.Jones;

/**
 * The Jones matrix an element applied to the light leaving one port, in the beam's own transverse
 * frame, at the wavelength of the line it was computed for; amplitudes are scaled so that |J·E|² is
 * the power out (a scalar element shows √T times the identity).
 */
public record PortJones(String element, String port, double wavelength, Jones matrix) {}
