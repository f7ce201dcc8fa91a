package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import jonquil.Result;
import org.junit.jupiter.api.Test;

/** Semantic tokens classify every meaningful span of a spec, in order and without overlap. */
class SemanticTokensTest {
  static final String FIXTURE =
      """
      use "parts.jonq"  // the library
      /* two
         lines */
      source seed { wavelength 1064 nm; power 2 W ± 1 %; polarization linear 0 deg }
      mirror m1 { metal silver; damage 5 kW/cm2 }
      dump d1
      train main {
        seed -> 100 mm in water -> m1 -> 20 mm -> d1
      }
      require {
        power at d1 in 1 W .. 2.5 W
      }
      """;

  /** One token per line: its text, its type, and '*' for a declaration. */
  static String render(String text, List<SemanticToken> tokens) {
    StringBuilder out = new StringBuilder();
    for (SemanticToken t : tokens) {
      out.append(text, t.start(), t.start() + t.length())
          .append("  ")
          .append(t.type().word())
          .append(t.declaration() ? " *" : "")
          .append('\n');
    }
    return out.toString();
  }

  @Test
  void theFixtureIsClassifiedExactly() throws IOException {
    Specs.Checked c =
        Specs.check(java.util.Map.of("main.jonq", FIXTURE, "parts.jonq", "probe spare\n"));
    List<SemanticToken> tokens = EditorFeatures.standard().semanticTokens(c.result(), Specs.MAIN);
    Path golden = Path.of("src/test/resources/ide/tokens/fixture.txt");
    String actual = render(FIXTURE, tokens);
    if (!Files.exists(golden) || Boolean.getBoolean("golden.update")) {
      Files.createDirectories(golden.getParent());
      Files.writeString(golden, actual, StandardCharsets.UTF_8);
      org.junit.jupiter.api.Assertions.fail("wrote " + golden + "; review it and run again");
    }
    assertEquals(Files.readString(golden, StandardCharsets.UTF_8), actual);
  }

  @Test
  void tokensAreReadAsTheLexerReadsThem() {
    // A superscript continues a name; a non-ASCII digit is a stray character, never a number.
    String spec = "probe w²\nlens l { focal ٣ mm }\n";
    String rendered =
        render(
            spec, EditorFeatures.standard().semanticTokens(Specs.check(spec).result(), Specs.MAIN));
    assertTrue(rendered.contains("w²  variable *\n"), rendered);
    assertFalse(rendered.contains("٣"), rendered);
  }

  @Test
  void sortedAndNeverOverlapping() {
    for (String spec :
        List.of(FIXTURE, Specs.BENCH, "lens { focal 3 mm\n/* open", "train { a -> -> 3 }")) {
      Result r = Specs.check(spec).result();
      List<SemanticToken> tokens = EditorFeatures.standard().semanticTokens(r, Specs.MAIN);
      for (int i = 1; i < tokens.size(); i++) {
        SemanticToken a = tokens.get(i - 1);
        assertTrue(
            a.start() + a.length() <= tokens.get(i).start(),
            spec + ": " + a + " overlaps " + tokens.get(i));
      }
      assertTrue(
          tokens.stream().allMatch(t -> t.length() > 0 && t.start() + t.length() <= spec.length()));
    }
  }

  @Test
  void offsetsAreUtf16AndCommentsNeverSpanALine() {
    String spec = "// 🔆 beam\nprobe spot /* x\ny */\n";
    Result r = Specs.check(spec).result();
    assertEquals(
        """
        // 🔆 beam  comment
        probe  type
        spot  variable *
        /* x  comment
        y */  comment
        """,
        render(spec, EditorFeatures.standard().semanticTokens(r, Specs.MAIN)));
  }
}
