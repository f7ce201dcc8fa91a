package jonquil.ide;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import jonquil.Result;
import jonquil.diag.Diagnostic;
import jonquil.diag.Edit;
import jonquil.diag.Fix;
import jonquil.source.TextRange;
import jonquil.syntax.SpecFile;
import jonquil.syntax.TrainDecl;

/**
 * Ends a port that no path follows (J510) in a new dump: declares {@code <port>_dump} before the
 * train and adds {@code <element>.<port> -> 50 mm -> <port>_dump} as the train's last line.
 */
final class StrayDumpFix {
  /**
   * The port is named in the message, the only place that says which of an element's ports is
   * unfollowed.
   */
  private static final Pattern PORT = Pattern.compile("light leaving '([^'.]+)\\.([^']+)'");

  private StrayDumpFix() {}

  static Optional<Fix> of(Result r, Diagnostic d) {
    Matcher m = PORT.matcher(d.message());
    Optional<SpecFile> tree = OwningModels.tree(r, d.file());
    if (!m.find() || tree.isEmpty()) {
      return Optional.empty();
    }
    String element = m.group(1);
    String port = m.group(2);
    Optional<TrainDecl> train =
        tree.get().trains().stream().filter(t -> t.range().contains(d.range())).findFirst();
    String text = r.files().get(d.file()).text();
    if (train.isEmpty() || !text.startsWith("}", train.get().range().end() - 1)) {
      return Optional.empty();
    }
    String dump = freeName(r, d, List.of(port + "_dump", element + "_" + port + "_dump"));
    String path = element + "." + port + " -> 50 mm -> " + dump;
    int trainStart = train.get().range().start();
    int close = train.get().range().end() - 1;
    int lineStart = lineStart(text, close);
    Edit declare =
        new Edit(
            d.file(),
            new TextRange(trainStart, trainStart),
            "dump " + dump + "\n\n" + " ".repeat(trainStart - lineStart(text, trainStart)));
    Edit follow =
        text.substring(lineStart, close).isBlank()
            ? new Edit(
                d.file(),
                new TextRange(lineStart, lineStart),
                indent(text, train.get()) + path + "\n")
            : new Edit(
                d.file(),
                new TextRange(close, close),
                "\n" + indent(text, train.get()) + path + "\n");
    return Optional.of(new Fix("add a dump for the stray beam", List.of(declare, follow)));
  }

  /** The first candidate that no file of the result declares, else the last one numbered. */
  private static String freeName(Result r, Diagnostic d, List<String> candidates) {
    Set<String> taken = new HashSet<>();
    SymbolUses.of(r).declarations().forEach(o -> taken.add(o.symbol().name()));
    for (String c : candidates) {
      if (!taken.contains(c)) {
        return c;
      }
    }
    String base = candidates.get(candidates.size() - 1);
    int n = 2;
    while (taken.contains(base + n)) {
      n++;
    }
    return base + n;
  }

  /** The indentation of the train's paths, or two spaces when it has none on lines of their own. */
  private static String indent(String text, TrainDecl train) {
    for (TrainDecl.BeamPath p : train.paths()) {
      int start = lineStart(text, p.range().start());
      String lead = text.substring(start, p.range().start());
      if (lead.isBlank() && !lead.isEmpty()) {
        return lead;
      }
    }
    return "  ";
  }

  private static int lineStart(String text, int offset) {
    int i = offset;
    while (i > 0 && text.charAt(i - 1) != '\n' && text.charAt(i - 1) != '\r') {
      i--;
    }
    return i;
  }
}
