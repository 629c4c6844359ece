package dev.dwellwise;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The numerical packages know nothing of HTTP or JSON, and only the HTTP layer and the command line
 * know the web framework. Packages that do not exist yet pass (allowEmptyShould), so the rules hold
 * from the day they appear.
 */
class ArchitectureTest {

    private static final String[] NUMERICAL = {"dev.dwellwise.thermal..", "dev.dwellwise.cure..",
            "dev.dwellwise.trace..", "dev.dwellwise.design.."};

    private static JavaClasses main;

    @BeforeAll
    static void importMainClasses() {
        main = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.dwellwise");
    }

    @Test
    void theNumericalPackagesDependOnNeitherJavalinNorJackson() {
        ArchRule rule = noClasses().that().resideInAnyPackage(NUMERICAL)
                .should().dependOnClassesThat().resideInAnyPackage("io.javalin..", "com.fasterxml.jackson..")
                .allowEmptyShould(true);
        rule.check(main);
    }

    @Test
    void onlyTheHttpLayerAndMainDependOnJavalin() {
        ArchRule rule = noClasses().that().resideOutsideOfPackage("dev.dwellwise.http..")
                .and().doNotHaveFullyQualifiedName(Main.class.getName())
                .should().dependOnClassesThat().resideInAPackage("io.javalin..")
                .allowEmptyShould(true);
        rule.check(main);
    }

    @Test
    void theImportFoundTheThermalCore() {
        // guards the rules above against an import that silently found nothing
        org.junit.jupiter.api.Assertions.assertTrue(main.contain("dev.dwellwise.thermal.StageRunner"));
    }
}
