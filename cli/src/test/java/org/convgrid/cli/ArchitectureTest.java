package org.convgrid.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** Keeps the module dependencies pointing one way: cli -> plotting -> output -> engine, grids -> engine. */
class ArchitectureTest {

    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.convgrid");

    @Test
    void engineKnowsNothingOfFormatsChartsOrTheConsole() {
        noClasses().that().resideInAPackage("org.convgrid.engine..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.snakeyaml..", "org.apache.commons.csv..", "org.knowm..", "picocli..", "java.awt..",
                        "org.convgrid.grids..", "org.convgrid.output..", "org.convgrid.plotting..",
                        "org.convgrid.cli..")
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
    void gridsAndOutputStayBelowPlottingAndTheCommandLine() {
        noClasses().that().resideInAnyPackage("org.convgrid.grids..", "org.convgrid.output..")
                .should().dependOnClassesThat().resideInAnyPackage("org.convgrid.plotting..", "org.convgrid.cli..")
                .check(CLASSES);
        noClasses().that().resideInAPackage("org.convgrid.plotting..")
                .should().dependOnClassesThat().resideInAnyPackage("org.convgrid.cli..", "org.convgrid.grids..")
                .check(CLASSES);
    }
}
