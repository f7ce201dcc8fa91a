package jonquil;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import jonquil.analysis.TrainSolution;
import jonquil.resolve.ResolvedModel;

/**
 * One root file as soon as it is checked: its resolved model and solved train (and each line's own,
 * where its sources carry several), handed over once so a caller can report them and let them go
 * before the next file is read.
 */
public record CheckedRoot(
    Path file,
    Optional<ResolvedModel> model,
    Optional<TrainSolution> solution,
    Map<Double, TrainSolution> lines) {}
