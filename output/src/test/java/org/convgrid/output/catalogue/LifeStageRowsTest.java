package org.convgrid.output.catalogue;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** The catalogue's {@code phase}, {@code surface_li_rel} and {@code age_gyr} read off the outcome and its age. */
class LifeStageRowsTest {

    private static final ConvectiveStructure WHOLE = new ConvectiveStructure(
            List.of(new ConvectiveZone(0.0, 1.0, 0.0, 1.0)), StructureClass.FULLY_CONVECTIVE, 1.0, 0.0, 0.0,
            0.5 * Constants.M_SUN, 50 * Constants.DAY, 80 * Constants.DAY);
    private static final GlobalProperties GLOBAL = new GlobalProperties(0.1 * Constants.L_SUN, Constants.R_SUN,
            4000.0, 1e4, 5e6, 10.0, 0.7);

    private static ModelRequest request(Age age) {
        return new ModelRequest("m", 0.5 * Constants.M_SUN, 0.02, 0.28, age, PhysicsOptions.DEFAULT);
    }

    @Test
    void aYoungStarFromBirthIsPreMainSequenceWithItsLithiumAndItsAgeFromBirth() {
        ModelOutcome young = new ModelOutcome.Solved(request(new Age.SinceBirth(0.02 * Constants.GYR)), GLOBAL, WHOLE,
                100, new LifeStage(true, 0.42));
        CatalogueRow row = OutcomeRows.toRow(young);
        assertThat(row.phase()).isEqualTo("pre_main_sequence");
        assertThat(row.surfaceLiRel()).isEqualTo(0.42);
        assertThat(row.ageGyr()).isEqualTo(0.02);
        assertThat(String.join(",", CatalogueWriter.cells(row))).contains(",0.02,pre_main_sequence,ok,");
    }

    @Test
    void aMainSequenceStarFromBirthKeepsItsLithiumAndAZeroAgeOneLeavesItEmpty() {
        CatalogueRow fromBirth = OutcomeRows.toRow(new ModelOutcome.Solved(
                request(new Age.SinceBirth(0.6 * Constants.GYR)), GLOBAL, WHOLE, 100, new LifeStage(false, 0.0)));
        assertThat(fromBirth.phase()).isEqualTo("main_sequence");
        assertThat(fromBirth.surfaceLiRel()).isEqualTo(0.0);
        CatalogueRow fromZams = OutcomeRows.toRow(new ModelOutcome.Solved(
                request(new Age.SinceZeroAge(0.6 * Constants.GYR)), GLOBAL, WHOLE, 100));
        assertThat(fromZams.phase()).isEqualTo("main_sequence");
        assertThat(fromZams.surfaceLiRel()).isNaN();
        assertThat(fromZams.ageGyr()).isEqualTo(0.6);
    }

    @Test
    void aFailedModelHasNoPhaseNoLithiumAndAnUnresolvedFractionNoAge() {
        CatalogueRow failed = OutcomeRows.toRow(new ModelOutcome.Failed(
                request(new Age.MainSequenceFraction(0.5, AgeOrigin.BIRTH)), ModelStatus.NOT_CONVERGED, "why", 0));
        assertThat(failed.phase()).isEmpty();
        assertThat(failed.surfaceLiRel()).isNaN();
        assertThat(failed.ageGyr()).isNaN();
        CatalogueRow past = OutcomeRows.toRow(new ModelOutcome.Failed(
                request(new Age.SinceBirth(3 * Constants.GYR)), ModelStatus.PAST_MAIN_SEQUENCE, "exhausted", 0));
        assertThat(past.phase()).isEmpty();
        assertThat(past.ageGyr()).isEqualTo(3.0);
    }
}
