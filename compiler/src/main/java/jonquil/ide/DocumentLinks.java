package jonquil.ide;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import jonquil.Result;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.syntax.SpecFile;
import jonquil.syntax.UseDecl;

/**
 * Links the files a spec names to those files, when they exist: the check read them, or they are on
 * disk.
 */
final class DocumentLinks {
  private DocumentLinks() {}

  static List<DocumentLinkInfo> of(Result r, Path file) {
    SpecFile f = OwningModels.tree(r, file).orElse(null);
    if (f == null) {
      return List.of();
    }
    List<DocumentLinkInfo> out = new ArrayList<>();
    for (UseDecl u : f.uses()) {
      link(r, file, u.target(), u.targetRange(), out);
    }
    for (Declaration d : f.declarations()) {
      for (Property p : d.properties()) {
        if (p.key().text().equals("table")) {
          p.args().stream()
              .filter(a -> a instanceof Arg.StringArg)
              .map(a -> (Arg.StringArg) a)
              .forEach(s -> link(r, file, s.value(), s.range(), out));
        }
      }
    }
    out.sort(Comparator.comparing(DocumentLinkInfo::range));
    return out;
  }

  private static void link(
      Result r, Path file, String written, TextRange quoted, List<DocumentLinkInfo> out) {
    Path target;
    try {
      target = UseTarget.of(file, written);
    } catch (RuntimeException e) {
      return; // a path the platform cannot represent links nowhere
    }
    if (written.isBlank() || !(r.files().containsKey(target) || Files.isRegularFile(target))) {
      return;
    }
    TextRange inside =
        quoted.length() >= 2 ? new TextRange(quoted.start() + 1, quoted.end() - 1) : quoted;
    out.add(new DocumentLinkInfo(inside, target));
  }
}
