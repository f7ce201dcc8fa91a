package jonquil.format;

import jonquil.source.SourceFile;

/**
 * The formatter's promises on one fuzzed input: a broken file is never formatted; otherwise the
 * layout keeps every token, comment and the syntax tree, and formatting the result again changes
 * nothing. The layout is checked without the safety net, which would hide a layout bug by handing
 * back the text unformatted; passing these checks is what the net itself asks.
 */
public final class LayoutFuzzProbe {
  private LayoutFuzzProbe() {}

  public static void check(String text) {
    SourceFile source = FormatCorpus.source(text);
    if (Formatter.hasSyntaxErrors(source)) {
      if (Formatter.format(source, FormatOptions.DEFAULT).isPresent()) {
        throw new IllegalStateException("a file with syntax errors was formatted");
      }
      return;
    }
    String once = Formatter.render(text, FormatOptions.DEFAULT);
    if (Formatter.hasSyntaxErrors(FormatCorpus.source(once))) {
      throw new IllegalStateException("the formatted text no longer parses:\n" + once);
    }
    if (!Formatter.tokens(text).equals(Formatter.tokens(once))) {
      throw new IllegalStateException("formatting changed the tokens:\n" + once);
    }
    if (!FormatCorpus.tree(text).equals(FormatCorpus.tree(once))) {
      throw new IllegalStateException("formatting changed the syntax tree:\n" + once);
    }
    if (!FormatCorpus.comments(text).equals(FormatCorpus.comments(once))) {
      throw new IllegalStateException("formatting changed the comments:\n" + once);
    }
    String twice = Formatter.render(once, FormatOptions.DEFAULT);
    if (!once.equals(twice)) {
      throw new IllegalStateException("formatting twice changed the text:\n" + once);
    }
  }
}
