package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;

/**
 * Uniform overshoot on evolved stars at or below 1.2 Msun gets a warning that names the mass-ramped profile (the
 * reason is measured in StarOvershootTest), decaying overshoot a warning above the lengths that were tried; nothing
 * else does.
 */
class OvershootAdviceTest {

    private static final String GRID = """
            mass: {values: MASSES}
            metallicity: {z: [0.02], y: [0.28]}
            age: AGES
            physics: {overshoot: OVERSHOOT}
            """;

    private static GridSpec grid(String masses, String ages, String overshoot) {
        return new GridFileReader().parse("g.yaml", GRID.replace("MASSES", masses).replace("AGES", ages)
                .replace("OVERSHOOT", overshoot));
    }

    @Test
    void aGridWithUniformOvershootOnEvolvedLowMassStarsIsWarned() {
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.0, 1.5]", "{gyr: [1]}", "[0.0, 0.2]")))
                .singleElement().asString()
                .startsWith("convgrid: warning: uniform overshoot reaches stars of 0.8-1 Msun")
                .contains("overshoot: {profile: uniform-ramped, length_hp: L}");
    }

    @Test
    void rampedOrNoOvershootHigherMassesAndZeroAgeGridsAreNot() {
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.5]", "{gyr: [1]}",
                "{profile: uniform-ramped, length_hp: 0.2}"))).isEmpty();
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.5]", "{gyr: [1]}", "0.0"))).isEmpty();
        assertThat(OvershootAdvice.warnings(grid("[1.3, 1.5]", "{gyr: [1]}", "0.2"))).isEmpty();
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.5]", "{gyr: [0], origin: zams}", "0.2"))).isEmpty();
    }

    @Test
    void aDecayingLengthBeyondWhatWasTriedIsWarned() {
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.5]", "{gyr: [1]}", "{profile: decaying, length_hp: 0.2}")))
                .singleElement().asString().contains("decaying overshoot with overshoot length_hp 0.2: above 0.03");
        assertThat(OvershootAdvice.warnings(grid("[0.8, 1.5]", "{gyr: [1]}", "{profile: decaying, length_hp: 0.016}")))
                .isEmpty();
        PhysicsOptions decaying = new PhysicsOptions(1.8, 0.05, StabilityCriterion.SCHWARZSCHILD, 1.0,
                OpacityChoice.BUILT_IN, AtmosphereChoice.DEFAULT, OvershootScheme.EXPONENTIAL);
        assertThat(OvershootAdvice.warnings(1.0, new Age.SinceBirth(Constants.GYR), decaying)).singleElement()
                .asString().contains("--overshoot-hp 0.05");
        assertThat(OvershootAdvice.warnings(1.0, Age.ZERO_AGE, decaying)).isEmpty();
    }

    @Test
    void aStarIsWarnedAlike() {
        PhysicsOptions uniform = new PhysicsOptions(1.8, 0.2, StabilityCriterion.SCHWARZSCHILD, 1.0,
                OpacityChoice.BUILT_IN, AtmosphereChoice.DEFAULT, OvershootScheme.STEP);
        PhysicsOptions ramped = new PhysicsOptions(1.8, 0.2, StabilityCriterion.SCHWARZSCHILD, 1.0,
                OpacityChoice.BUILT_IN, AtmosphereChoice.DEFAULT, OvershootScheme.MASS_RAMPED_STEP);
        Age gyr = new Age.SinceBirth(Constants.GYR);
        assertThat(OvershootAdvice.warnings(1.0, gyr, uniform)).singleElement().asString()
                .contains("uniform overshoot on a 1 Msun star").contains("--overshoot-profile uniform-ramped");
        assertThat(OvershootAdvice.warnings(1.0, gyr, ramped)).isEmpty();
        assertThat(OvershootAdvice.warnings(1.5, gyr, uniform)).isEmpty();
        assertThat(OvershootAdvice.warnings(1.0, Age.ZERO_AGE, uniform)).isEmpty();
    }
}
