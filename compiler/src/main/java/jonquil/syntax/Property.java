package jonquil.syntax;

import java.util.List;
import jonquil.source.TextRange;

/** One line of a declaration block: a key followed by its arguments ({@code thickness 0.17 mm}). */
public record Property(Name key, List<Arg> args, TextRange range) {
  public Property {
    args = List.copyOf(args);
  }
}
