package org.convgrid.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.library.dependencies.Slice;
import org.junit.jupiter.api.Test;

/**
 * Keeps the dependencies pointing one way, along the data flow: engine at the bottom; grids and output (side by side,
 * neither knowing the other) above it; plotting above output; survey (the run directory) above those; cli on top.
 */
class ArchitectureTest {

    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.convgrid");

    @Test
    void modulesAreLayeredAlongTheDataFlow() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("engine").definedBy("org.convgrid.engine..")
                .layer("grids").definedBy("org.convgrid.grids..")
                .layer("output").definedBy("org.convgrid.output..")
                .layer("plotting").definedBy("org.convgrid.plotting..")
                .layer("survey").definedBy("org.convgrid.survey..")
                .layer("cli").definedBy("org.convgrid.cli..")
                .whereLayer("cli").mayNotBeAccessedByAnyLayer()
                .whereLayer("survey").mayOnlyBeAccessedByLayers("cli")
                .whereLayer("plotting").mayOnlyBeAccessedByLayers("survey", "cli")
                .whereLayer("grids").mayOnlyBeAccessedByLayers("survey", "cli")
                .whereLayer("output").mayOnlyBeAccessedByLayers("plotting", "survey", "cli")
                .whereLayer("engine").mayOnlyBeAccessedByLayers("grids", "output", "plotting", "survey", "cli")
                .check(CLASSES);
    }

    @Test
    void modulesAreFreeOfCycles() {
        slices().matching("org.convgrid.(*)..").should().beFreeOfCycles().check(CLASSES);
    }

    /**
     * Inside the modules above the engine, no two packages need each other. (The engine's own packages are left to
     * the engine's layering.)
     */
    @Test
    void packagesAboveTheEngineAreFreeOfCycles() {
        slices().matching("org.convgrid.(**)").namingSlices("$1")
                .that(DescribedPredicate.describe("outside the engine",
                        (Slice s) -> !s.getDescription().startsWith("engine")))
                .should().beFreeOfCycles().check(CLASSES);
    }

    @Test
    void engineKnowsNothingOfFormatsChartsOrTheConsole() {
        noClasses().that().resideInAPackage("org.convgrid.engine..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.snakeyaml..", "org.apache.commons.csv..", "org.knowm..", "picocli..", "java.awt..",
                        "org.convgrid.grids..", "org.convgrid.output..", "org.convgrid.plotting..",
                        "org.convgrid.survey..", "org.convgrid.cli..")
                .check(CLASSES);
    }

    @Test
    void onlyTheCommandLinePrintsOrExits() {
        noClasses().that().resideOutsideOfPackage("org.convgrid.cli..")
                .should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .orShould().callMethod(System.class, "exit", int.class)
                .check(CLASSES);
    }

    @Test
    void onlyTheCommandLineKnowsTheConsoleLibrary() {
        noClasses().that().resideOutsideOfPackage("org.convgrid.cli..")
                .should().dependOnClassesThat().resideInAPackage("picocli..")
                .check(CLASSES);
    }
}
