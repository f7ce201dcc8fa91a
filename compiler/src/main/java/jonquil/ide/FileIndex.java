package jonquil.ide;

import java.nio.file.Path;
import java.util.List;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;

/**
 * What a workspace index keeps of one spec file, so that workspace-wide answers (symbol search,
 * references, rename) reach files that no check of the open documents has read: the text the ranges
 * refer to, the names it declares, every name written in it with the file that declares it, the
 * files its 'use' lines name (found or not) and the files its check read. Computed from a check of
 * the file as a root, never by a parser of its own.
 */
public record FileIndex(
    SourceFile source,
    List<SymbolInfo> declarations,
    List<NameUse> names,
    List<Path> uses,
    List<Path> reads) {

  /**
   * A name written at {@code range}: its declaration ({@code declaration} true) or a use that
   * resolves to the declaration of {@code name} in {@code declaredIn}.
   */
  public record NameUse(String name, TextRange range, Path declaredIn, boolean declaration) {}

  public FileIndex {
    declarations = List.copyOf(declarations);
    names = List.copyOf(names);
    uses = List.copyOf(uses);
    reads = List.copyOf(reads);
  }

  public Path file() {
    return source.path();
  }
}
