package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import jonquil.CheckOptions;
import jonquil.Checker;
import jonquil.Result;
import jonquil.Workspace;
import jonquil.diag.Edit;
import org.junit.jupiter.api.Test;

/**
 * A workspace index entry is a translation of a names-only check, and it lets references and rename
 * reach a file that the check of the open document never read.
 */
class FileIndexTest {
  static final Path ROOT = Path.of("/virtual/index").toAbsolutePath();
  static final Path LIB = ROOT.resolve("parts/lib.jonq");
  static final Path MAIN = ROOT.resolve("main.jonq");
  static final Path OTHER = ROOT.resolve("far/away/other.jonq");
  static final String LIB_TEXT =
      "mirror fold { metal silver; aoi 45 deg }\nmirror spare { metal silver; aoi 45 deg }\n";
  static final String MAIN_TEXT =
      """
      use "parts/lib.jonq"
      source seed { wavelength 1064 nm; power 2 W }
      probe spot
      train main {
        seed -> 100 mm -> fold -> 20 mm -> spot
      }
      """;
  static final String OTHER_TEXT =
      """
      use "../../parts/lib.jonq"
      source lamp { wavelength 633 nm; power 1 mW }
      probe eye
      train side {
        lamp -> 10 mm -> fold -> 5 mm -> eye
      }
      """;
  static final Map<Path, String> FILES = Map.of(LIB, LIB_TEXT, MAIN, MAIN_TEXT, OTHER, OTHER_TEXT);

  private static Result check(List<Path> roots, Map<Path, String> files, CheckOptions options) {
    return Checker.check(Workspace.withOverlay(ROOT, files), roots, options);
  }

  private static FileIndex indexed(Path file, Map<Path, String> files) {
    return EditorFeatures.standard()
        .index(check(List.of(file), files, CheckOptions.NAMES), file)
        .orElseThrow();
  }

  @Test
  void anEntryHoldsTheDeclarationsTheNamesWithTheirDeclaringFileAndTheUsedFiles() {
    FileIndex other = indexed(OTHER, FILES);
    assertEquals(
        List.of("lamp", "eye", "side"),
        other.declarations().stream().map(SymbolInfo::name).toList());
    assertTrue(other.declarations().stream().allMatch(s -> s.children().isEmpty()), "a flat list");
    int fold = OTHER_TEXT.indexOf("fold");
    FileIndex.NameUse use =
        other.names().stream().filter(n -> n.range().start() == fold).findFirst().orElseThrow();
    assertEquals(new FileIndex.NameUse("fold", use.range(), LIB, false), use);
    assertEquals(fold + 4, use.range().end());
    assertTrue(
        other.names().stream()
            .anyMatch(
                n -> n.declaration() && n.name().equals("lamp") && n.declaredIn().equals(OTHER)));
    assertTrue(
        other.names().stream().noneMatch(n -> n.name().equals("silver")),
        "catalog names are not indexed");
    assertEquals(List.of(LIB), other.uses());
    assertEquals(List.of(OTHER, LIB), other.reads());
  }

  @Test
  void aNamesOnlyCheckComputesNoPhysics() {
    Result names = check(List.of(MAIN), FILES, CheckOptions.NAMES);
    Result full = check(List.of(MAIN), FILES, CheckOptions.EDITOR);
    assertTrue(names.solutions().isEmpty());
    assertTrue(names.requirements().isEmpty());
    assertEquals(1, full.solutions().size());
    assertEquals(full.models().keySet(), names.models().keySet());
  }

  @Test
  void referencesAndRenameReachAnIndexedFileTheResultNeverRead() {
    Result main = check(List.of(MAIN), Map.of(LIB, LIB_TEXT, MAIN, MAIN_TEXT), CheckOptions.EDITOR);
    assertNull(main.files().get(OTHER), "the open document's check does not read the other user");
    List<FileIndex> index =
        List.of(indexed(OTHER, FILES), indexed(LIB, FILES), indexed(MAIN, FILES));
    int onFold = MAIN_TEXT.indexOf("fold") + 1;

    List<Location> refs = EditorFeatures.standard().references(main, MAIN, onFold, true, index);
    int libFold = LIB_TEXT.indexOf("fold");
    int otherFold = OTHER_TEXT.indexOf("fold");
    int mainFold = MAIN_TEXT.indexOf("fold");
    assertEquals(
        List.of(
                new Location(LIB, jonquil.source.TextRange.of(libFold, libFold + 4)),
                new Location(OTHER, jonquil.source.TextRange.of(otherFold, otherFold + 4)),
                new Location(MAIN, jonquil.source.TextRange.of(mainFold, mainFold + 4)))
            .stream()
            .sorted(
                java.util.Comparator.comparing((Location l) -> l.file().equals(LIB) ? 0 : 1)
                    .thenComparing(l -> l.file().toString()))
            .toList(),
        refs);
    assertEquals(
        refs.subList(1, 3), EditorFeatures.standard().references(main, MAIN, onFold, false, index));
    assertEquals(
        EditorFeatures.standard().references(main, MAIN, onFold, true),
        EditorFeatures.standard().references(main, MAIN, onFold, true, List.of()),
        "with an empty index, the answer is the result's");

    RenameResult rename = EditorFeatures.standard().rename(main, MAIN, onFold, "steer", index);
    assertNull(rename.error());
    assertEquals(
        List.of(new Edit(OTHER, jonquil.source.TextRange.of(otherFold, otherFold + 4), "steer")),
        rename.edits().get(OTHER));
    assertNotNull(rename.edits().get(LIB));
    assertNotNull(rename.edits().get(MAIN));
  }

  @Test
  void renameIsRefusedWhenTheNewNameIsDeclaredInAnIndexedFileThatUsesTheOldOne() {
    Result main = check(List.of(MAIN), Map.of(LIB, LIB_TEXT, MAIN, MAIN_TEXT), CheckOptions.EDITOR);
    List<FileIndex> index = List.of(indexed(OTHER, FILES));
    RenameResult rename =
        EditorFeatures.standard().rename(main, MAIN, MAIN_TEXT.indexOf("fold") + 1, "lamp", index);
    assertEquals(
        "'lamp' is already declared in 'other.jonq', where 'fold' is used; names must be unique",
        rename.error());
    assertTrue(rename.edits().isEmpty());
    assertNull(
        EditorFeatures.standard()
            .rename(main, MAIN, MAIN_TEXT.indexOf("fold") + 1, "lamp", List.of())
            .error(),
        "the open document's check alone sees no clash");
  }

  @Test
  void workspaceSymbolsOverTheIndexMatchIgnoringCaseInPathOrder() {
    List<FileIndex> index = List.of(indexed(OTHER, FILES), indexed(LIB, FILES));
    List<FoundSymbol> found = EditorFeatures.standard().workspaceSymbols(index, "A");
    assertEquals(List.of("lamp", "spare"), found.stream().map(s -> s.symbol().name()).toList());
    assertEquals(List.of(OTHER, LIB), found.stream().map(FoundSymbol::file).toList());
  }
}
