package org.convgrid.engine;

import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.library.Architectures.LayeredArchitecture;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Keeps the engine's packages layered along the data flow, each layer using only the layers below it: constants
 * and errors, composition, microphysics, convection and overshoot, the plain request values, the physics bundle,
 * the structure solver, zero-age models, evolution, evolution from birth, calibration and refinement, and the grid's batch solver on
 * top, which nothing in the engine uses. No package cycles anywhere.
 */
class EngineArchitectureTest {

    private static final JavaClasses ENGINE = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.convgrid.engine");

    /** Each layer with its packages, bottom first. */
    private static final List<String[]> LAYERS = List.of(
            new String[] {"units", "org.convgrid.engine.units.."},
            new String[] {"error", "org.convgrid.engine.error.."},
            new String[] {"state", "org.convgrid.engine.state.."},
            new String[] {"interpolation", "org.convgrid.engine.physics.interpolation.."},
            new String[] {"microphysics", "org.convgrid.engine.physics.eos..", "org.convgrid.engine.physics.opacity..",
                    "org.convgrid.engine.physics.nuclear..", "org.convgrid.engine.physics.atmosphere.."},
            new String[] {"convection", "org.convgrid.engine.convection.."},
            new String[] {"overshoot", "org.convgrid.engine.overshoot.."},
            new String[] {"request", "org.convgrid.engine.request.."},
            new String[] {"physics bundle", "org.convgrid.engine.physics"},
            new String[] {"structure", "org.convgrid.engine.structure.."},
            new String[] {"zams", "org.convgrid.engine.zams.."},
            new String[] {"evolution", "org.convgrid.engine.evolution.."},
            new String[] {"birth", "org.convgrid.engine.birth.."},
            new String[] {"calibration", "org.convgrid.engine.calibration.."},
            new String[] {"refine", "org.convgrid.engine.refine.."},
            new String[] {"batch", "org.convgrid.engine.batch.."});

    @Test
    void everyLayerUsesOnlyTheLayersBelowIt() {
        LayeredArchitecture rule = layeredArchitecture().consideringOnlyDependenciesInLayers();
        for (String[] layer : LAYERS) {
            rule = rule.layer(layer[0]).definedBy(Arrays.copyOfRange(layer, 1, layer.length));
        }
        for (int i = 0; i < LAYERS.size(); i++) {
            String[] above = LAYERS.subList(i + 1, LAYERS.size()).stream().map(l -> l[0]).toArray(String[]::new);
            rule = above.length == 0 ? rule.whereLayer(LAYERS.get(i)[0]).mayNotBeAccessedByAnyLayer()
                    : rule.whereLayer(LAYERS.get(i)[0]).mayOnlyBeAccessedByLayers(above);
        }
        rule.check(ENGINE);
    }

    @Test
    void noPackageCycles() {
        slices().matching("org.convgrid.engine.(**)").should().beFreeOfCycles().check(ENGINE);
    }

    @Test
    void everyEnginePackageBelongsToALayer() {
        com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes()
                .should().resideInAnyPackage(LAYERS.stream().flatMap(l -> Arrays.stream(l, 1, l.length))
                        .toArray(String[]::new))
                .check(ENGINE);
    }
}
