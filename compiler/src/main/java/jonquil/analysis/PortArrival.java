package jonquil.analysis;

import java.util.Optional;
import jonquil.resolve.Symbol;

/**
 * One beam of one source line arriving at a port where another beam of the same line arrives too (a
 * recombining splitter, light back through a face): its line, its Jones field (Ex, Ey as re, im
 * pairs, √W, in the table frame; empty when the light is not fully polarized) and the optical path
 * it ran from its source (metres). Kept so that interference can be judged from them; today such
 * beams add as powers.
 */
public record PortArrival(
    String port,
    Symbol source,
    int line,
    double wavelength,
    Optional<double[]> jonesField,
    double opticalPath) {}
