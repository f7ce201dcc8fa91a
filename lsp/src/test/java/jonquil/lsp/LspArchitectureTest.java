package jonquil.lsp;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.base.DescribedPredicate.or;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.core.domain.properties.HasName.Predicates.nameMatching;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The language server only translates protocol (DEVELOPERS.md): it reaches the compiler through the
 * check façade and the editor features, formatter, diagnostics, source text and command line, and
 * never through parsing, resolution, physics or analyses; `jonquil lsp` is a picocli subcommand.
 */
class LspArchitectureTest {
  /**
   * The parse memo an editor hands the checker through {@code Workspace.withMemo}: an opaque
   * handle, the one type of jonquil.syntax the server holds.
   */
  static final String PARSE_MEMO = "jonquil\\.syntax\\.ParseMemo(\\$.*)?";

  static JavaClasses server;

  @BeforeAll
  static void importClasses() {
    server =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("jonquil.lsp");
  }

  @Test
  void theServerUsesOnlyTheCompilersEditorFacingParts() {
    classes()
        .should()
        .onlyDependOnClassesThat(
            or(
                resideInAnyPackage(
                    "jonquil.lsp..",
                    "jonquil.ide..",
                    "jonquil.format..",
                    "jonquil.diag..",
                    "jonquil.source..",
                    "jonquil.cli..",
                    "org.eclipse.lsp4j..",
                    "com.google.gson..",
                    "picocli..",
                    "java.."),
                nameMatching("jonquil\\.(Result|Checker|CheckOptions|Workspace)(\\$.*)?"),
                nameMatching(PARSE_MEMO)))
        .check(server);
  }

  @Test
  void noParsingResolutionPhysicsOrAnalysisAndNoAntlr() {
    noClasses()
        .should()
        .dependOnClassesThat(
            or(
                resideInAnyPackage(
                    "jonquil.analysis..",
                    "jonquil.optics..",
                    "jonquil.safety..",
                    "jonquil.resolve..",
                    "jonquil.units..",
                    "jonquil.grammar..",
                    "org.antlr.."),
                resideInAnyPackage("jonquil.syntax..").and(not(nameMatching(PARSE_MEMO)))))
        .check(server);
  }
}
