package jonquil.ide;

import java.nio.file.Path;

/**
 * A declaration found by a workspace-wide search, with the file that declares it (a {@link
 * SymbolInfo} carries none).
 */
public record FoundSymbol(Path file, SymbolInfo symbol) {}
