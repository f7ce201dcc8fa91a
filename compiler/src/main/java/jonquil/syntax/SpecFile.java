package jonquil.syntax;

import java.nio.file.Path;
import java.util.List;
import jonquil.source.TextRange;

/** The syntax tree of one .jonq file: an immutable value with source ranges, no meaning yet. */
public record SpecFile(
    Path path,
    List<UseDecl> uses,
    List<Declaration> declarations,
    List<TrainDecl> trains,
    List<RequireDecl> requires,
    List<TextRange> comments) {
  public SpecFile {
    uses = List.copyOf(uses);
    declarations = List.copyOf(declarations);
    trains = List.copyOf(trains);
    requires = List.copyOf(requires);
    comments = List.copyOf(comments);
  }

  public static SpecFile empty(Path path) {
    return new SpecFile(path, List.of(), List.of(), List.of(), List.of(), List.of());
  }
}
