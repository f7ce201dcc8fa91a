package jonquil.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import jonquil.diag.Edit;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import org.junit.jupiter.api.Test;

/**
 * The API's small promises: broken files are left alone, edits are minimal, options are honoured.
 */
class FormatterTest {
  private static String format(String text, FormatOptions options) {
    return Formatter.format(FormatCorpus.source(text), options).orElseThrow();
  }

  @Test
  void aFileWithSyntaxErrorsIsNeverFormatted() {
    SourceFile broken = FormatCorpus.source("lens l {  focal 3 mm\nprobe   p\n");
    assertTrue(Formatter.format(broken, FormatOptions.DEFAULT).isEmpty());
    assertEquals(List.of(), Formatter.edits(broken, FormatOptions.DEFAULT));
  }

  @Test
  void aHazardClassStaysOneLabel() {
    // Found trying a bench: 'hazard class <= 3R' came back as '3 R'.
    String text = "require {\n  hazard class <= 3R at s\n  hazard class >= 1 M at s\n}\n";
    assertEquals(
        "require {\n  hazard class <= 3R at s\n  hazard class >= 1M at s\n}\n",
        format(text, FormatOptions.DEFAULT));
  }

  @Test
  void everyLetteredHazardClassStaysOneLabel() {
    // Found in a sample: 'hazard class <= 3B' came back as '3 B'. Labels: IEC 60825-1:2014, 5.
    for (String label : List.of("1M", "2M", "3R", "3B")) {
      String glued = "require {\n  hazard class <= " + label + " at s\n}\n";
      String spaced = glued.replace(label, label.charAt(0) + " " + label.charAt(1));
      assertEquals(glued, format(glued, FormatOptions.DEFAULT), label + " stays");
      assertEquals(glued, format(spaced, FormatOptions.DEFAULT), label + " is joined");
    }
  }

  @Test
  void aCanonicalFileNeedsNoEdit() {
    assertEquals(
        List.of(), Formatter.edits(FormatCorpus.source("probe p\n"), FormatOptions.DEFAULT));
  }

  @Test
  void aChangedFileIsOneReplacementOfTheWholeText() {
    SourceFile file = FormatCorpus.source("probe   p");
    assertEquals(
        List.of(new Edit(file.path(), new TextRange(0, 9), "probe p\n")),
        Formatter.edits(file, FormatOptions.DEFAULT));
  }

  @Test
  void tabsAndWiderIndentsAreOptions() {
    String text = "lens l { focal 3 mm }";
    assertEquals("lens l {\n\tfocal 3 mm\n}\n", format(text, new FormatOptions(4, false)));
    assertEquals("lens l {\n    focal 3 mm\n}\n", format(text, new FormatOptions(4, true)));
    assertThrows(IllegalArgumentException.class, () -> new FormatOptions(-1, true));
  }

  @Test
  void unitsSignsAndReferencesAreWrittenTogether() {
    assertEquals(
        "mirror m {\n  damage 10 J/cm^2 for 10 ns at 1064 nm\n  aoi -45 deg\n}\n",
        format(
            "mirror m{damage 10 J / cm ^ 2 for 10ns at 1064nm;aoi - 45deg}",
            FormatOptions.DEFAULT));
    assertEquals(
        "train t {\n  a -> pbs.reflected -> 5 mm in saline -> d\n}\n",
        format("train t { a->pbs . reflected->5mm in saline->d }", FormatOptions.DEFAULT));
  }

  @Test
  void tolerancesKeepTheirSpellingAndPercentAndDegreeKeepTheirSpacing() {
    assertEquals(
        "waveplate w {\n  fast_axis 45° +- 1°\n  retardance 0.5 wave ± 2 %\n}\n",
        format(
            "waveplate w { fast_axis 45°+-1°; retardance 0.5 wave±2 % }", FormatOptions.DEFAULT));
  }

  @Test
  void aByteOrderMarkStaysAndABlankFileBecomesEmpty() {
    assertEquals("\uFEFFprobe p\n", format("\uFEFF probe p  \n\n", FormatOptions.DEFAULT));
    assertEquals("", format(" \n\t\n", FormatOptions.DEFAULT));
  }

  @Test
  void crOnlyFilesStayCrOnly() {
    assertEquals("probe p\r\rprobe q\r", format("probe p\r\r\r\rprobe  q", FormatOptions.DEFAULT));
  }
}
