package jonquil.ide;

/**
 * A computed figure shown inline after a train step (the power leaving it), with more in the
 * tooltip.
 */
public record InlayHint(int offset, String label, String tooltip) {}
