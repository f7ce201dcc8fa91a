package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.Declaration;
import jonquil.syntax.RequireDecl;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;

/**
 * The foldable spans of a file: declaration blocks, trains and require blocks, block comments over
 * several lines and runs of line comments. Only spans over more than one line fold.
 */
final class Folding {
  private Folding() {}

  static List<FoldingRangeInfo> of(Result r, Path file) {
    SourceFile source = r.files().get(file);
    Optional<SpecFile> tree = OwningModels.tree(r, file);
    if (source == null || tree.isEmpty()) {
      return List.of();
    }
    String text = source.text();
    SpecFile f = tree.get();
    List<FoldingRangeInfo> out = new ArrayList<>();
    for (Declaration d : f.declarations()) {
      if (!d.properties().isEmpty()
          || text.substring(d.range().start(), d.range().end()).contains("{")) {
        region(text, d.range(), "region", out);
      }
    }
    f.trains().stream().map(TrainDecl::range).forEach(range -> region(text, range, "region", out));
    f.requires().stream()
        .map(RequireDecl::range)
        .forEach(range -> region(text, range, "region", out));
    comments(text, f.comments(), out);
    out.sort(
        Comparator.comparingInt(FoldingRangeInfo::startOffset)
            .thenComparingInt(FoldingRangeInfo::endOffset));
    return out;
  }

  private static void region(
      String text, TextRange range, String kind, List<FoldingRangeInfo> out) {
    if (range.end() <= text.length() && multiLine(text, range.start(), range.end())) {
      out.add(new FoldingRangeInfo(range.start(), range.end(), kind));
    }
  }

  /**
   * A block comment folds alone; consecutive line comments, each alone on its line, fold together.
   */
  private static void comments(String text, List<TextRange> comments, List<FoldingRangeInfo> out) {
    TextRange run = null;
    for (TextRange c : comments) {
      boolean line = text.startsWith("//", c.start());
      if (!line) {
        region(text, c, "comment", out);
      }
      if (line
          && run != null
          && onlySpaceAndOneBreak(text, run.end(), c.start())
          && aloneOnLine(text, c.start())) {
        run = new TextRange(run.start(), c.end());
        continue;
      }
      if (run != null) {
        region(text, run, "comment", out);
      }
      run = line && aloneOnLine(text, c.start()) ? c : null;
    }
    if (run != null) {
      region(text, run, "comment", out);
    }
  }

  private static boolean aloneOnLine(String text, int start) {
    int i = start - 1;
    while (i >= 0 && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
      i--;
    }
    return i < 0 || text.charAt(i) == '\n' || text.charAt(i) == '\r';
  }

  private static boolean onlySpaceAndOneBreak(String text, int from, int to) {
    String gap = text.substring(from, to);
    return gap.isBlank()
        && gap.replace("\r\n", "\n").chars().filter(ch -> ch == '\n' || ch == '\r').count() == 1;
  }

  private static boolean multiLine(String text, int start, int end) {
    for (int i = start; i < end; i++) {
      if (text.charAt(i) == '\n' || text.charAt(i) == '\r') {
        return true;
      }
    }
    return false;
  }
}
