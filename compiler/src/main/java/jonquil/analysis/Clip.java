package jonquil.analysis;

import java.nio.file.Path;
import jonquil.source.TextRange;

/** An aperture (or a lens's clear aperture) cutting off part of a beam. */
public record Clip(String element, double fraction, Path file, TextRange range) {}
