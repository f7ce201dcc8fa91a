package jonquil.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.TreeSet;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.diag.Severity;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.testing.Repo;
import org.junit.jupiter.api.Test;

/**
 * {@link Tokens} is the one tokenizer: it and the parser read every text alike. Over the inputs the
 * old hand-written lexers disagreed on, and over a seeded corpus of sample fragments mixed with
 * random code points: the tokens rebuild the text exactly and cover it without gaps; a character is
 * a bad-character token exactly where the parser reports J107; unterminated strings and comments
 * are error tokens where the parser reports J105 and J106; and every identifier is a name the
 * parser accepts in a declaration.
 */
class OneTokenizerTest {
  private static final long SEED = 0x746F6B656E73L;
  private static final int STRINGS = 3000;
  private static final Path FILE = Path.of("one-tokenizer.jonq");

  /** Code points chosen to sit on the edges of the token rules; any other comes at random. */
  private static final int[] EDGE_CODE_POINTS = {
    '°', '±', '·', 'µ', '²', '³', '¹', '⁴', '₂', 'Ⅻ', '½', '٣', '٠', '０', 0x1D7D8, 'ä', 'ß', 'Ω',
    'λ', 'ж', '中', 0x1D465, 0x0301, 0x00A0, 0x200B, 0x2028, 0xFEFF, '\t', '\f', '\r', '\n', 0x0000,
    0x007F, '−', '≤', '≥', '"', '\\', '/', '*', '#', '$', '@', '!', '?', '`', '~', '|', '&', '[',
    ']', 0x1F600, 0x1F9EA, 0x10FFFF, 0xFFFD, 0xD800, 0xDC00, 'e', 'E', '_', '-', '+', '.', '<', '>',
    '='
  };

  @Test
  void inputsTheOldLexersDisagreedOnReadAsTheGrammarReadsThem() {
    assertTokens("spiegel_ä", "IDENTIFIER spiegel_ä");
    assertTokens("x²", "IDENTIFIER x²");
    assertTokens(
        "w₀ xⅫ ⅫC",
        "IDENTIFIER w₀",
        "WHITESPACE  ",
        "IDENTIFIER xⅫ",
        "WHITESPACE  ",
        "BAD_CHARACTER Ⅻ", // a letter number may continue a name, never start one
        "IDENTIFIER C");
    assertTokens("𝑥1", "IDENTIFIER 𝑥1");
    assertTokens("5°C", "NUMBER 5", "DEGREE °C");
    assertTokens("45°", "NUMBER 45", "DEGREE °");
    assertTokens("٣", "BAD_CHARACTER ٣");
    assertTokens("x٣", "IDENTIFIER x٣");
    assertTokens("²", "BAD_CHARACTER ²");
    assertTokens("a😀b", "IDENTIFIER a", "BAD_CHARACTER 😀", "IDENTIFIER b");
    assertTokens("# $", "BAD_CHARACTER #", "WHITESPACE  ", "BAD_CHARACTER $");
    assertTokens("1..2", "NUMBER 1", "RANGE ..", "NUMBER 2");
    assertTokens("1e", "NUMBER 1", "IDENTIFIER e");
    assertTokens("+-0.5 −3", "PLUS_MINUS +-", "NUMBER 0.5", "WHITESPACE  ", "MINUS −", "NUMBER 3");
    assertTokens("\"open\n", "UNTERMINATED_STRING \"open", "NEWLINE \n");
    assertTokens("/* open", "UNTERMINATED_COMMENT /* open");
    assertTokens("// c  \r\nOD", "LINE_COMMENT // c  ", "NEWLINE \r\n", "KEYWORD OD");
    for (String text :
        List.of(
            "lens spiegel_ä { focal 5°C }",
            "probe x² # 😀 ٣",
            "source s { power 1 W }\n\"unterminated\n/* never closed",
            "\uFEFFmirror m\u00A0{}")) {
      agreeWithTheParser(text);
    }
  }

  @Test
  void theKeywordsAreTheLexersReservedWordsAndNoneIsAName() {
    Set<String> expected =
        new TreeSet<>(
            List.of(
                "use",
                "train",
                "require",
                "yield",
                "at",
                "in",
                "for",
                "over",
                "from",
                "to",
                "is",
                "then",
                "everywhere",
                "linear",
                "circular",
                "elliptical",
                "unpolarized",
                "partial",
                "right",
                "left",
                "OD"));
    assertEquals(expected, Tokens.keywords());
    for (String word : Tokens.keywords()) {
      assertTokens(word, "KEYWORD " + word);
      assertFalse(Tokens.isIdentifier(word), word);
      assertFalse(acceptedAsName(word), word + " is accepted as a declared name");
    }
    for (String name : List.of("spiegel_ä", "x²", "_", "𝑥", "Ω_1", "OD2", "used")) {
      assertTrue(Tokens.isIdentifier(name), name);
      assertTrue(acceptedAsName(name), name);
    }
    for (String notName : List.of("", "2x", "a b", "a-b", "٣", "x\n", " x", "a.b")) {
      assertFalse(Tokens.isIdentifier(notName), notName);
    }
    assertFalse(Tokens.isIdentifier(null));
  }

  @Test
  void blanksAreExactlyWhatTheLexerSkips() {
    for (int unit = 0; unit <= Character.MAX_VALUE; unit++) {
      char c = (char) unit;
      List<Token> tokens = Tokens.scan(String.valueOf(c));
      boolean whitespace = tokens.size() == 1 && tokens.get(0).kind() == TokenKind.WHITESPACE;
      assertEquals(whitespace, Tokens.isBlank(c), () -> String.format("U+%04X", (int) c));
    }
  }

  @Test
  void seededMixturesOfSamplesAndRandomCodePointsTokenizeAsTheParserReadsThem() throws IOException {
    List<String> samples = new ArrayList<>();
    for (Path sample : Repo.sampleFiles()) {
      samples.add(Files.readString(sample));
    }
    SplittableRandom random = new SplittableRandom(SEED);
    int badCharacters = 0;
    int identifiers = 0;
    for (int i = 0; i < STRINGS; i++) {
      String text = mixture(samples, random);
      String name = "string " + i + " of seed " + SEED + ": '" + text + "'";
      List<Token> tokens = agreeWithTheParser(text, name);
      badCharacters += tokens.stream().filter(t -> t.kind() == TokenKind.BAD_CHARACTER).count();
      identifiers += tokens.stream().filter(t -> t.kind() == TokenKind.IDENTIFIER).count();
    }
    // The corpus must reach both sides of the rules, or the agreement above means little.
    assertTrue(badCharacters > STRINGS, "only " + badCharacters + " bad characters");
    assertTrue(identifiers > STRINGS, "only " + identifiers + " identifiers");
  }

  /** Up to eight pieces: fragments of a sample, edge code points and any code point at all. */
  private static String mixture(List<String> samples, SplittableRandom random) {
    StringBuilder text = new StringBuilder();
    int pieces = 1 + random.nextInt(8);
    for (int p = 0; p < pieces; p++) {
      switch (random.nextInt(3)) {
        case 0 -> {
          String sample = samples.get(random.nextInt(samples.size()));
          int start = random.nextInt(sample.length());
          int end = Math.min(sample.length(), start + 1 + random.nextInt(60));
          text.append(sample, start, end);
        }
        case 1 -> text.appendCodePoint(EDGE_CODE_POINTS[random.nextInt(EDGE_CODE_POINTS.length)]);
        default -> text.appendCodePoint(random.nextInt(Character.MAX_CODE_POINT + 1));
      }
    }
    return text.toString();
  }

  private static List<Token> agreeWithTheParser(String text) {
    return agreeWithTheParser(text, "'" + text + "'");
  }

  private static List<Token> agreeWithTheParser(String text, String name) {
    List<Token> tokens = Tokens.scan(text);
    StringBuilder rebuilt = new StringBuilder();
    int at = 0;
    for (Token t : tokens) {
      assertEquals(at, t.start(), () -> name + ": gap or overlap before " + t);
      assertTrue(t.end() > t.start(), () -> name + ": empty token " + t);
      assertEquals(text.substring(t.start(), t.end()), t.text(), name);
      if (t.kind() == TokenKind.WHITESPACE) {
        assertTrue(t.text().chars().allMatch(c -> Tokens.isBlank((char) c)), name);
      }
      rebuilt.append(t.text());
      at = t.end();
    }
    assertEquals(text.length(), at, () -> name + ": tokens stop short");
    assertEquals(text, rebuilt.toString(), name);

    List<Diagnostic> diagnostics = SpecParser.parse(new SourceFile(FILE, text)).diagnostics();
    boolean capped = diagnostics.stream().anyMatch(d -> d.code() == DiagnosticCode.TOO_MANY_ERRORS);
    BitSet reported = covered(diagnostics, DiagnosticCode.BAD_CHARACTER);
    BitSet bad = new BitSet();
    tokens.stream()
        .filter(t -> t.kind() == TokenKind.BAD_CHARACTER)
        .forEach(t -> bad.set(t.start(), t.end()));
    BitSet reportedNotBad = (BitSet) reported.clone();
    reportedNotBad.andNot(bad);
    assertTrue(reportedNotBad.isEmpty(), () -> name + ": J107 on a good character");
    if (!capped) {
      assertEquals(reported, bad, () -> name + ": bad characters the parser did not report");
    }
    for (Diagnostic d : diagnostics) {
      TokenKind expected =
          d.code() == DiagnosticCode.UNTERMINATED_STRING
              ? TokenKind.UNTERMINATED_STRING
              : d.code() == DiagnosticCode.UNTERMINATED_COMMENT
                  ? TokenKind.UNTERMINATED_COMMENT
                  : null;
      if (expected != null) {
        assertEquals(expected, tokenAt(tokens, d.range().start()).kind(), () -> name + ": " + d);
      }
    }
    for (Token t : tokens) {
      if (t.kind() == TokenKind.IDENTIFIER) {
        assertTrue(acceptedAsName(t.text()), () -> name + ": parser refuses the name " + t);
      }
      if (t.kind().isError() && !capped) {
        assertTrue(
            diagnostics.stream().anyMatch(d -> d.range().contains(t.start())),
            () -> name + ": no diagnostic for " + t);
      }
    }
    return tokens;
  }

  private static BitSet covered(List<Diagnostic> diagnostics, DiagnosticCode code) {
    BitSet offsets = new BitSet();
    for (Diagnostic d : diagnostics) {
      if (d.code() == code) {
        TextRange r = d.range();
        offsets.set(r.start(), r.end());
      }
    }
    return offsets;
  }

  private static Token tokenAt(List<Token> tokens, int offset) {
    return tokens.stream().filter(t -> t.start() == offset).findFirst().orElseThrow();
  }

  /** The parser reads {@code name} as the name of a declaration, without a syntax error. */
  private static boolean acceptedAsName(String name) {
    ParseResult parsed = SpecParser.parse(new SourceFile(FILE, "probe " + name + "\n"));
    boolean clean = parsed.diagnostics().stream().noneMatch(d -> d.severity() == Severity.ERROR);
    List<Declaration> declarations = parsed.ast().declarations();
    return clean && declarations.size() == 1 && declarations.get(0).name().text().equals(name);
  }

  private static void assertTokens(String text, String... expected) {
    List<String> actual = Tokens.scan(text).stream().map(t -> t.kind() + " " + t.text()).toList();
    assertEquals(List.of(expected), actual, text);
    agreeWithTheParser(text);
  }
}
