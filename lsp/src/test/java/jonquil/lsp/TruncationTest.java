package jonquil.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.ide.EditorFeatures;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolCapabilities;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Test;

/**
 * Incomplete input through the server: every sample and every corpus file, cut at seeded random
 * points and at the places typing most often leaves text (right after a '{', inside a string,
 * inside a number with its unit, in the middle of an arrow). On every cut text, hover, completion
 * and document symbols at the end of the text, inside it and past it all answer without an error,
 * and at the end the server still checks the whole sample as the compiler does.
 */
class TruncationTest {
  static final long SEED = 0x7472756e63L;
  static final int RANDOM_CUTS = 3;
  static final Pattern QUANTITY = Pattern.compile("\\d+(?:\\.\\d+)?( ?)([a-zA-Zµ°%/]+)");

  /**
   * A client that takes hierarchical symbols, so the tree's ranges can be checked against the text.
   */
  static ClientCapabilities client() {
    ClientCapabilities caps = HoverFormatTest.hoverClient("markdown");
    DocumentSymbolCapabilities symbols = new DocumentSymbolCapabilities();
    symbols.setHierarchicalDocumentSymbolSupport(true);
    caps.getTextDocument().setDocumentSymbol(symbols);
    return caps;
  }

  /** Every .jonq file of the samples and of the broken-spec corpus, multi-file cases included. */
  static List<Path> examples() throws Exception {
    List<Path> out = new ArrayList<>();
    for (Path top : List.of(ParityTest.REPO.resolve("samples"), ParityTest.CORPUS)) {
      try (Stream<Path> files = Files.walk(top)) {
        files
            .filter(p -> p.toString().endsWith(".jonq"))
            .sorted()
            .forEach(p -> out.add(p.toAbsolutePath().normalize()));
      }
    }
    return out;
  }

  /**
   * Where to cut: seeded random points, and the typical places of unfinished typing that the text
   * has.
   */
  static List<Integer> cuts(String text, SplittableRandom random) {
    Set<Integer> out = new LinkedHashSet<>();
    for (int i = 0; i < RANDOM_CUTS; i++) {
      out.add(random.nextInt(text.length() + 1));
    }
    int brace = text.indexOf('{');
    if (brace >= 0) {
      out.add(brace + 1);
    }
    int quote = text.indexOf('"');
    if (quote >= 0 && quote + 2 <= text.length()) {
      out.add(quote + 2);
    }
    Matcher quantity = QUANTITY.matcher(text);
    if (quantity.find()) {
      out.add(quantity.start() + 1); // in the digits
      out.add(quantity.start(2) + 1); // in the unit
    }
    int arrow = text.indexOf("->");
    if (arrow >= 0) {
      out.add(arrow + 1);
    }
    List<Integer> safe = new ArrayList<>();
    for (int cut : out) {
      int at =
          cut > 0 && cut < text.length() && Character.isLowSurrogate(text.charAt(cut))
              ? cut - 1
              : cut;
      if (at < text.length() && !safe.contains(at)) {
        safe.add(at);
      }
    }
    return safe;
  }

  /** The positions asked about in a text: its end, its start, one inside, and three past it. */
  static List<Position> positions(String text, SplittableRandom random) {
    Position end = ClientText.position(text, text.length());
    return List.of(
        end,
        new Position(0, 0),
        ClientText.position(text, random.nextInt(text.length() + 1)),
        new Position(end.getLine() + 5, 0),
        new Position(end.getLine(), end.getCharacter() + 40),
        new Position(0, 100_000));
  }

  private static boolean before(Position a, Position b) {
    return a.getLine() < b.getLine()
        || (a.getLine() == b.getLine() && a.getCharacter() < b.getCharacter());
  }

  /**
   * A symbol tree whose every range lies within the text and whose selection lies within its range.
   */
  private static void checkSymbol(
      DocumentSymbol s, Position end, List<String> problems, String where) {
    Range r = s.getRange();
    Range sel = s.getSelectionRange();
    if (before(end, r.getEnd())
        || before(sel.getStart(), r.getStart())
        || before(r.getEnd(), sel.getEnd())) {
      problems.add(
          where
              + ": symbol '"
              + s.getName()
              + "' at "
              + r
              + " / "
              + sel
              + " past the text's end "
              + end);
    }
    for (DocumentSymbol child :
        s.getChildren() == null ? List.<DocumentSymbol>of() : s.getChildren()) {
      checkSymbol(child, end, problems, where);
    }
  }

  private static String brief(org.eclipse.lsp4j.Diagnostic d) {
    return d.getCode().getLeft()
        + " "
        + d.getSeverity()
        + " "
        + d.getRange()
        + " "
        + d.getMessage();
  }

  /**
   * Waits for an answer; an error response becomes a problem named with the request and the state.
   */
  private static <T> T answer(CompletableFuture<T> future, List<String> problems, String what)
      throws Exception {
    try {
      return future.get(20, TimeUnit.SECONDS);
    } catch (ExecutionException e) {
      problems.add(what + ": " + e.getCause());
      return null;
    }
  }

  @Test
  void truncationsOfEveryExampleGetAnswersWithoutErrorAndLeaveTheServerCorrect() throws Exception {
    List<Path> examples = examples();
    assertTrue(examples.size() >= 120, "only " + examples.size() + " examples");
    Set<Path> folders = new LinkedHashSet<>();
    ParityTest.cases().forEach(c -> folders.add(c.root().toAbsolutePath().normalize()));
    SplittableRandom random = new SplittableRandom(SEED);
    List<String> problems = new ArrayList<>();
    int states = 0;
    int notUtf8 = 0;
    try (LspHarness h = new LspHarness(EditorFeatures.standard(), Duration.ofMillis(10))) {
      h.initialize(List.copyOf(folders), client());
      var service = h.remote.getTextDocumentService();
      for (Path file : examples) {
        String whole;
        try {
          whole =
              StandardCharsets.UTF_8
                  .newDecoder()
                  .decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file)))
                  .toString();
        } catch (CharacterCodingException e) {
          notUtf8++; // an editor could not send it as it is on disk
          continue;
        }
        String uri = file.toUri().toString();
        String name = ParityTest.REPO.relativize(file).toString();
        int version = 0;
        for (int cut : cuts(whole, random)) {
          String text = whole.substring(0, cut);
          version++;
          if (version == 1) {
            h.open(uri, version, text);
          } else {
            h.changeAll(uri, version, text);
          }
          states++;
          String state = name + " cut at " + cut;
          TextDocumentIdentifier doc = new TextDocumentIdentifier(uri);
          List<Position> at = positions(text, random);
          // Sent together, as an editor does while the user types; each waits for the check of this
          // version.
          List<CompletableFuture<?>> asked = new ArrayList<>();
          for (Position p : at) {
            asked.add(service.hover(new HoverParams(doc, p)));
            asked.add(service.completion(new CompletionParams(doc, p)));
          }
          var symbols = service.documentSymbol(new DocumentSymbolParams(doc));
          for (int i = 0; i < asked.size(); i++) {
            String what =
                state + ", " + (i % 2 == 0 ? "hover" : "completion") + " at " + at.get(i / 2);
            int before = problems.size();
            Object reply = answer(asked.get(i), problems, what);
            if (i % 2 == 1 && reply == null && problems.size() == before) {
              problems.add(what + ": null instead of a list");
            }
          }
          var tree = answer(symbols, problems, state + ", documentSymbol");
          if (tree != null) {
            Position end = ClientText.position(text, text.length());
            tree.forEach(s -> checkSymbol(s.getRight(), end, problems, state));
          }
        }
        h.close(uri);
      }
      assertEquals(List.of(), problems, String.join("\n", problems));
      synchronized (h.responses) {
        assertEquals(
            List.of(),
            h.responses.stream().filter(r -> r.getError() != null).toList(),
            "no error response");
      }
      synchronized (h.client) {
        assertEquals(
            List.of(),
            h.client.logs.stream().filter(m -> m.getType() == MessageType.Error).toList(),
            "nothing logged as an error");
        assertEquals(
            List.of(),
            h.client.published.stream()
                .flatMap(p -> p.getDiagnostics().stream())
                .filter(d -> "J901".equals(d.getCode().getLeft()))
                .toList(),
            "no check failed");
      }
      assertFalse(h.serverListening.isDone(), "the server still reads its input");

      // Still correct: the whole sample gets the compiler's diagnostics and a hover with its
      // computed values.
      Path sample =
          ParityTest.REPO.resolve("samples/optical_trap.jonq").toAbsolutePath().normalize();
      String text = Files.readString(sample);
      String uri = sample.toUri().toString();
      h.open(uri, 100, text);
      PublishDiagnosticsParams published =
          h.client.await(uri, p -> Integer.valueOf(100).equals(p.getVersion()));
      Result expected =
          Checker.check(
              jonquil.Workspace.onDisk(sample.getParent()), List.of(sample), CheckOptions.EDITOR);
      Convert convert = new Convert(Convert.Encoding.UTF_16, p -> null);
      assertEquals(
          expected.diagnostics().stream()
              .filter(d -> d.file().equals(sample))
              .map(d -> convert.diagnostic(d, expected.files()::get))
              .map(TruncationTest::brief)
              .toList(),
          published.getDiagnostics().stream().map(TruncationTest::brief).toList());
      Hover hover =
          service
              .hover(
                  new HoverParams(
                      new TextDocumentIdentifier(uri),
                      ClientText.position(text, text.indexOf("trap_laser ->") + 2)))
              .get(20, TimeUnit.SECONDS);
      assertNotNull(hover);
      assertTrue(hover.getContents().getRight().getValue().contains("1.2 W"), hover.toString());
    }
    assertEquals(0, notUtf8, "every example was sent");
    assertTrue(states >= examples.size() * 4, states + " states");
  }
}
