package dev.sheaf.tests;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The module graph is the architecture: these rules fail when a layer reaches the wrong way. */
class ArchitectureTest {
    private static JavaClasses sheaf;

    @BeforeAll
    static void importClasses() {
        sheaf = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.sheaf");
    }

    @Test
    void importsEveryModule() {
        // Guard: a rule over an empty import passes vacuously.
        for (String pkg : new String[] {"dev.sheaf.vocab", "dev.sheaf.miner.cli", "dev.sheaf.curator", "dev.sheaf.samples"}) {
            assertTrue(sheaf.containPackage(pkg), "no classes imported from " + pkg);
        }
    }

    @Test
    void vocabularyDependsOnNothingElseOfOurs() {
        noClasses().that().resideInAPackage("dev.sheaf.vocab..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.sheaf.miner..", "dev.sheaf.curator..", "dev.sheaf.samples..")
                .check(sheaf);
    }

    @Test
    void minerDoesNotReachTheDesktopOrTheGenerator() {
        noClasses().that().resideInAPackage("dev.sheaf.miner..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.sheaf.curator..", "dev.sheaf.samples..")
                .check(sheaf);
    }

    @Test
    void nothingBelowTheDesktopImportsJavaFx() {
        noClasses().that().resideOutsideOfPackage("dev.sheaf.curator..")
                .should().dependOnClassesThat().resideInAPackage("javafx..")
                .check(sheaf);
    }

    @Test
    void nothingBelowTheCommandLineImportsPicocli() {
        noClasses().that().resideOutsideOfPackages("dev.sheaf.miner.cli..", "dev.sheaf.curator..", "dev.sheaf.samples..")
                .should().dependOnClassesThat().resideInAPackage("picocli..")
                .check(sheaf);
    }

    @Test
    void viewModelsNeverTouchTheSceneGraph() {
        noClasses().that().resideInAPackage("dev.sheaf.curator..").and().haveSimpleNameEndingWith("ViewModel")
                .should().dependOnClassesThat().resideInAPackage("javafx.scene..")
                .check(sheaf);
    }

    @Test
    void theCuratorSessionNeverTouchesTheSceneGraph() {
        noClasses().that().resideInAPackage("dev.sheaf.curator.session..")
                .should().dependOnClassesThat().resideInAPackage("javafx.scene..")
                .check(sheaf);
    }

    @Test
    void theGeneratorIsIndependent() {
        noClasses().that().resideInAPackage("dev.sheaf.samples..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.sheaf.miner..", "dev.sheaf.vocab..", "dev.sheaf.curator..")
                .check(sheaf);
    }
}
