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
    List<TextRange> comments,
    List<TextRange> damaged) {
  public SpecFile {
    uses = List.copyOf(uses);
    declarations = List.copyOf(declarations);
    trains = List.copyOf(trains);
    requires = List.copyOf(requires);
    comments = List.copyOf(comments);
    damaged = List.copyOf(damaged);
  }

  public static SpecFile empty(Path path) {
    return new SpecFile(path, List.of(), List.of(), List.of(), List.of(), List.of(), List.of());
  }

  /** The same tree, marked with where syntax errors were found. */
  public SpecFile withDamage(List<TextRange> ranges) {
    return new SpecFile(path, uses, declarations, trains, requires, comments, ranges);
  }

  /**
   * True when a syntax error touches this range: error recovery may have left the construct
   * incomplete, so checks for what is "missing" in it would only add noise.
   */
  public boolean damaged(TextRange range) {
    return damaged.stream().anyMatch(d -> d.start() <= range.end() && d.end() >= range.start());
  }
}
