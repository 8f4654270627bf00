package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.evolution.FullyConvectiveMesh;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.NuclearLuminosity;
import org.convgrid.engine.evolution.RadiativeContractionMesh;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The mesh of a young star: the start model and the steps while the star has no radiative interior on
 * {@link FullyConvectiveMesh#POINTS} points, the steps from the one after the radiative core's appearance on
 * {@link RadiativeContractionMesh#POINTS} while nuclear burning supplies under
 * {@link RadiativeContractionMesh#NUCLEAR_FRACTION} of L, every later step on the evolver's
 * {@link MeshPlanner#DEFAULT_POINTS}.
 */
class FullyConvectiveMeshTest {

    @Test
    void theSolarMassStarGrowsItsMeshOneStepAfterItsRadiativeCoreAppearsAndAgainWhenItBurns() {
        PhysicsSet physics = BirthTracks.physics(0.02);
        StartModel start = new StartModelBuilder(physics).build(Constants.M_SUN, BirthTracks.birth(0.02));
        assertThat(start.model().state().size()).isEqualTo(FullyConvectiveMesh.POINTS);
        assertThat(FullyConvectiveMesh.holds(start.model())).isTrue();
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        // to 30 Myr: a 1 Msun star grows its radiative core at ~1.7 Myr (PreMainSequenceTest) and burns a tenth of
        // its luminosity from ~26 Myr (BirthStepLimitProbe)
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, new MainSequenceEvolver.Settings(
                d.maxCentralHydrogenChange(), d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(),
                d.endCentralHydrogen(), 30.0 * BirthTracks.MYR, d.stepBudget(), d.retryBudget()));
        List<StellarModel> models = new ArrayList<>();
        evolver.evolve(start.model(), new double[0], (age, step, model) -> models.add(model));
        int firstWithCore = -1;
        for (int i = 0; i < models.size() && firstWithCore < 0; i++) {
            if (!FullyConvectiveMesh.holds(models.get(i))) {
                firstWithCore = i;
            }
        }
        assertThat(firstWithCore).as("a model with a radiative core by 30 Myr").isPositive();
        assertThat(models.get(firstWithCore).convection().zones().get(0).innerMassFraction()).isPositive();
        int firstBurning = -1;
        for (int i = firstWithCore; i < models.size() && firstBurning < 0; i++) {
            if (NuclearLuminosity.fraction(models.get(i)) >= RadiativeContractionMesh.NUCLEAR_FRACTION) {
                firstBurning = i;
            }
        }
        assertThat(firstBurning).as("L_nuc/L at 0.1 after the radiative core, by 30 Myr")
                .isGreaterThan(firstWithCore + 1);
        for (int i = 0; i < models.size(); i++) {
            int expected = i <= firstWithCore ? FullyConvectiveMesh.POINTS
                    : i <= firstBurning ? RadiativeContractionMesh.POINTS : MeshPlanner.DEFAULT_POINTS;
            assertThat(models.get(i).state().size()).as("mesh of model %d", i).isEqualTo(expected);
        }
        assertThat(models.size()).isGreaterThan(firstBurning + 1);
    }
}
