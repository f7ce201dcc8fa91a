package jonquil.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

/**
 * Which index entries a change makes stale: a library's users when what they depend on changed,
 * never when only its body did.
 */
class IndexRebuildTest {
  static final Path LIB = Path.of("/w/lib.jonq");
  static final Path MID = Path.of("/w/mid.jonq");
  static final Path TOP = Path.of("/w/top.jonq");
  static final Path ALONE = Path.of("/w/alone.jonq");

  /** An entry declaring {@code names}, using {@code uses} and reading them too. */
  private static FileIndex entry(Path file, String text, List<String> names, List<Path> uses) {
    List<FileIndex.NameUse> declared =
        names.stream().map(n -> new FileIndex.NameUse(n, TextRange.of(0, 1), file, true)).toList();
    return new FileIndex(new SourceFile(file, text), List.of(), declared, uses, uses);
  }

  private static Map<Path, FileIndex> index(FileIndex... entries) {
    Map<Path, FileIndex> out = new LinkedHashMap<>();
    for (FileIndex e : entries) {
      out.put(e.file(), e);
    }
    return out;
  }

  private static final FileIndex MID_ENTRY = entry(MID, "mid", List.of("m"), List.of(LIB));
  private static final FileIndex TOP_ENTRY = entry(TOP, "top", List.of("t"), List.of(MID));
  private static final FileIndex ALONE_ENTRY = entry(ALONE, "alone", List.of("a"), List.of());

  @Test
  void aBodyEditOfTheLibraryReindexesNothingElse() {
    FileIndex was = entry(LIB, "fold v1", List.of("fold"), List.of());
    FileIndex now = entry(LIB, "fold v2", List.of("fold"), List.of());
    assertEquals(
        Set.of(),
        IndexRebuild.dependents(
            Set.of(LIB), Map.of(LIB, was), index(now, MID_ENTRY, TOP_ENTRY, ALONE_ENTRY)));
  }

  @Test
  void aRenamedDeclarationReindexesEveryDirectAndIndirectUser() {
    FileIndex was = entry(LIB, "fold", List.of("fold"), List.of());
    FileIndex now = entry(LIB, "bend", List.of("bend"), List.of());
    assertEquals(
        Set.of(MID, TOP),
        IndexRebuild.dependents(
            Set.of(LIB), Map.of(LIB, was), index(now, MID_ENTRY, TOP_ENTRY, ALONE_ENTRY)));
  }

  @Test
  void aFileThatCameOrWentReindexesItsUsers() {
    FileIndex lib = entry(LIB, "fold", List.of("fold"), List.of());
    assertEquals(
        Set.of(MID, TOP),
        IndexRebuild.dependents(Set.of(LIB), Map.of(), index(lib, MID_ENTRY, TOP_ENTRY)));
    assertEquals(
        Set.of(MID, TOP),
        IndexRebuild.dependents(Set.of(LIB), Map.of(LIB, lib), index(MID_ENTRY, TOP_ENTRY)));
  }

  @Test
  void aChangedUseLineCountsAsAChangeForTheUsersOfThatFile() {
    FileIndex was = entry(MID, "mid", List.of("m"), List.of(LIB));
    FileIndex now = entry(MID, "mid", List.of("m"), List.of());
    assertEquals(
        Set.of(TOP), IndexRebuild.dependents(Set.of(MID), Map.of(MID, was), index(now, TOP_ENTRY)));
  }
}
