package jonquil;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layering of DEVELOPERS.md, enforced: text → syntax → resolved model → physics → analyses →
 * findings, one direction; ANTLR only in syntax; no protocol types anywhere.
 */
class ArchitectureTest {
  static JavaClasses classes;

  @BeforeAll
  static void importClasses() {
    classes =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("jonquil");
  }

  @Test
  void onlySyntaxTouchesAntlr() {
    noClasses()
        .that()
        .resideOutsideOfPackages("jonquil.syntax..", "jonquil.grammar..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("org.antlr..", "jonquil.grammar..")
        .check(classes);
  }

  @Test
  void noProtocolTypesInTheCompiler() {
    noClasses()
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("org.eclipse.lsp4j..")
        .check(classes);
  }

  @Test
  void unitsAndSourceKnowNothingAbove() {
    noClasses()
        .that()
        .resideInAnyPackage("jonquil.units..", "jonquil.source..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "jonquil.syntax..",
            "jonquil.resolve..",
            "jonquil.analysis..",
            "jonquil.cli..",
            "jonquil.diag..")
        .check(classes);
  }

  @Test
  void syntaxDoesNotKnowResolutionOrLater() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.syntax..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("jonquil.resolve..", "jonquil.analysis..", "jonquil.cli..")
        .check(classes);
  }

  @Test
  void resolutionDoesNotKnowAnalysesOrTheCli() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.resolve..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("jonquil.analysis..", "jonquil.cli..")
        .check(classes);
  }

  @Test
  void diagnosticsDependOnlyOnSourceRanges() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.diag..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "jonquil.syntax..", "jonquil.resolve..", "jonquil.analysis..", "jonquil.cli..")
        .check(classes);
  }

  @Test
  void theOpticsAndSafetyCoresAreLibrariesThatKnowNoSpecs() {
    noClasses()
        .that()
        .resideInAnyPackage("jonquil.optics..", "jonquil.safety..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "jonquil.syntax..",
            "jonquil.resolve..",
            "jonquil.analysis..",
            "jonquil.cli..",
            "jonquil.diag..",
            "jonquil.source..")
        .check(classes);
  }

  @Test
  void analysesDoNotKnowTheCli() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.analysis..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("jonquil.cli..")
        .check(classes);
  }

  @Test
  void onlyTheCliDoesConsoleOutput() {
    noClasses()
        .that()
        .resideOutsideOfPackage("jonquil.cli..")
        .should()
        .accessField(System.class, "out")
        .check(classes);
  }

  @Test
  void theFormatterKnowsOnlySyntax() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.format..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "jonquil.resolve..",
            "jonquil.analysis..",
            "jonquil.optics..",
            "jonquil.safety..",
            "jonquil.ide..",
            "jonquil.cli..")
        .check(classes);
  }

  @Test
  void nothingBelowTheEditorFeaturesKnowsThem() {
    noClasses()
        .that()
        .resideOutsideOfPackages("jonquil.ide..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("jonquil.ide..")
        .check(classes);
  }

  /**
   * The editor features read what the checker computed: they compute no physics (no Fresnel, thin
   * films, beam transfer, irradiance or safety limits; a source's Gaussian beam is read as a value)
   * and never parse again what the checker parsed.
   */
  @Test
  void theEditorFeaturesComputeNoPhysicsAndParseNothing() {
    noClasses()
        .that()
        .resideInAPackage("jonquil.ide..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("jonquil.cli..", "jonquil.format..")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.optics.beam.Abcd")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.optics.beam.Clipping")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.optics.beam.Irradiance")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.optics.Fresnel")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.optics.ThinFilm")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.syntax.SpecParser")
        .orShould()
        .dependOnClassesThat()
        .haveFullyQualifiedName("jonquil.safety.MpeCalculator")
        .check(classes);
  }
}
