package jonquil.ide;

import static jonquil.ide.SemanticToken.Type.COMMENT;
import static jonquil.ide.SemanticToken.Type.KEYWORD;
import static jonquil.ide.SemanticToken.Type.NUMBER;
import static jonquil.ide.SemanticToken.Type.OPERATOR;
import static jonquil.ide.SemanticToken.Type.PROPERTY;
import static jonquil.ide.SemanticToken.Type.STRING;
import static jonquil.ide.SemanticToken.Type.TYPE;
import static jonquil.ide.SemanticToken.Type.UNIT;
import static jonquil.ide.SemanticToken.Type.VARIABLE;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import jonquil.Result;
import jonquil.resolve.CatalogSpellings;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.Arg;
import jonquil.syntax.Declaration;
import jonquil.syntax.Name;
import jonquil.syntax.Property;
import jonquil.syntax.RequireDecl;
import jonquil.syntax.Requirement;
import jonquil.syntax.SpecFile;
import jonquil.syntax.Token;
import jonquil.syntax.Tokens;
import jonquil.syntax.TrainDecl;

/**
 * Classifies a file's text for highlighting: the syntax tree says what each name, key, number and
 * unit is; keywords and operators, which the tree does not keep, come from a scan of the text
 * around them. Comments spanning lines are split per line, as most editors require.
 */
final class SemanticTokens {
  private final String text;
  private final SymbolUses names;
  private final Path file;
  private final List<SemanticToken> out = new ArrayList<>();

  private SemanticTokens(String text, SymbolUses names, Path file) {
    this.text = text;
    this.names = names;
    this.file = file;
  }

  static List<SemanticToken> of(Result r, Path file) {
    SourceFile source = r.files().get(file);
    SpecFile tree = OwningModels.tree(r, file).orElse(null);
    if (source == null || tree == null) {
      return List.of();
    }
    SemanticTokens t = new SemanticTokens(source.text(), SymbolUses.of(r), file);
    tree.comments().forEach(t::comment);
    t.tree(tree);
    t.lexical();
    return t.sorted();
  }

  private void tree(SpecFile f) {
    for (Declaration d : f.declarations()) {
      add(d.kind().range(), TYPE, false);
      add(d.name().range(), VARIABLE, true);
      d.shorthand().ifPresent(args -> args.forEach(this::arg));
      for (Property p : d.properties()) {
        add(p.key().range(), PROPERTY, false);
        p.args().forEach(this::arg);
      }
    }
    f.uses().forEach(u -> add(u.targetRange(), STRING, false));
    for (TrainDecl t : f.trains()) {
      t.name().ifPresent(n -> add(n.range(), VARIABLE, true));
      for (TrainDecl.BeamPath path : t.paths()) {
        for (TrainDecl.Step step : path.steps()) {
          if (step instanceof TrainDecl.Place place) {
            ref(place.ref(), true);
          } else if (step instanceof TrainDecl.Distance distance) {
            arg(distance.length());
            distance.medium().ifPresent(m -> ref(m, true));
          }
        }
      }
    }
    for (RequireDecl block : f.requires()) {
      block.requirements().forEach(this::requirement);
    }
  }

  private void requirement(Requirement q) {
    q.yield().ifPresent(y -> arg(y.bound()));
    q.yield()
        .flatMap(Requirement.Yield::builds)
        .ifPresent(
            b -> {
              add(b.count().range(), NUMBER, false);
              add(b.word().range(), KEYWORD, false);
            });
    Requirement.Check c = q.check();
    c.measure().words().forEach(w -> add(w.range(), PROPERTY, false));
    for (Requirement.Place p : c.places()) {
      if (p instanceof Requirement.At at) {
        ref(at.target(), true);
      } else if (p instanceof Requirement.Between b) {
        ref(b.from(), true);
        ref(b.to(), true);
      } else if (p instanceof Requirement.ForLine l) {
        add(l.word().range(), PROPERTY, false);
        arg(l.wavelength());
      }
    }
    c.condition().ifPresent(this::condition);
    for (Requirement.Extra e : c.extras()) {
      e.measure().ifPresent(m -> m.words().forEach(w -> add(w.range(), PROPERTY, false)));
      condition(e.condition());
    }
    c.band()
        .ifPresent(
            b -> {
              add(b.quantity().range(), PROPERTY, false);
              arg(b.low());
              arg(b.high());
            });
  }

  private void condition(Requirement.Condition c) {
    if (c instanceof Requirement.Compare cmp) {
      arg(cmp.value());
    } else if (c instanceof Requirement.Within w) {
      arg(w.low());
      arg(w.high());
    } else if (c instanceof Requirement.Is is) {
      is.state().forEach(this::arg);
    }
  }

  private void arg(Arg a) {
    if (a instanceof Arg.QuantityArg q) {
      add(q.number().range(), NUMBER, false);
      q.unit().ifPresent(u -> add(u.range(), UNIT, false));
      q.tolerance()
          .ifPresent(
              t -> {
                add(t.number().range(), NUMBER, false);
                t.unit().ifPresent(u -> add(u.range(), UNIT, false));
              });
    } else if (a instanceof Arg.RefArg ref) {
      ref(ref, false);
    } else if (a instanceof Arg.StringArg s) {
      add(s.range(), STRING, false);
    } else if (a instanceof Arg.RangeArg range) {
      arg(range.low());
      arg(range.high());
    }
  }

  /**
   * A name in a path or place is always a name; in a parameter it may be one of the parameter's
   * fixed words.
   */
  private void ref(Arg.RefArg ref, boolean alwaysName) {
    Name n = ref.name();
    boolean isName =
        alwaysName
            || names
                .at(file, n.range().start())
                .filter(o -> o.range().equals(n.range()))
                .isPresent()
            || CatalogSpellings.lookup(n.text()).isPresent();
    add(n.range(), isName && !Tokens.isKeyword(n.text()) ? VARIABLE : KEYWORD, false);
    ref.port().ifPresent(p -> add(p.range(), PROPERTY, false));
  }

  /**
   * Reserved words, operators, and literals the tree lost to recovery, wherever nothing else
   * claimed them.
   */
  private void lexical() {
    for (Token l : Tokens.scan(text)) {
      SemanticToken.Type type =
          switch (l.kind().role()) {
            case KEYWORD -> KEYWORD;
            case OPERATOR -> OPERATOR;
            case NUMBER -> NUMBER;
            case STRING -> STRING;
            case NAME, COMMENT -> null; // the tree's names and comments were added first
            case BLANK, LINE_BREAK, STATEMENT_END, BLOCK_OPEN, BLOCK_CLOSE -> null;
            case UNIT_OPERATOR, SIGN, PUNCTUATION, BAD -> null;
          };
      if (type != null) {
        add(l.range(), type, false);
      }
    }
  }

  private void comment(TextRange range) {
    int start = range.start();
    for (int i = range.start(); i < range.end(); i++) {
      char c = text.charAt(i);
      if (c == '\n' || c == '\r') {
        add(new TextRange(start, i), COMMENT, false);
        start = i + 1;
      }
    }
    add(new TextRange(start, range.end()), COMMENT, false);
  }

  private void add(TextRange range, SemanticToken.Type type, boolean declaration) {
    if (range.length() > 0 && range.end() <= text.length()) {
      out.add(new SemanticToken(range.start(), range.length(), type, declaration));
    }
  }

  /**
   * In start order; a later claim on text already classified loses, so comments and the tree win
   * over the scan.
   */
  private List<SemanticToken> sorted() {
    java.util.BitSet claimed = new java.util.BitSet(text.length());
    List<SemanticToken> kept = new ArrayList<>();
    for (SemanticToken t : out) {
      int end = t.start() + t.length();
      int taken = claimed.nextSetBit(t.start());
      if (taken < 0 || taken >= end) {
        claimed.set(t.start(), end);
        kept.add(t);
      }
    }
    kept.sort(Comparator.comparingInt(SemanticToken::start));
    return kept;
  }
}
