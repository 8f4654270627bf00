package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.structure.StellarModel;
import org.junit.jupiter.api.Test;

/**
 * A star's model at one age does not depend on the other ages its grid asks for. Before the arrival step was tied
 * to the star's age ({@link org.convgrid.engine.evolution.MainSequenceEvolver#ARRIVAL_STEP_AGE_FRACTION}) the first
 * main-sequence step was capped at 0.01 x the oldest requested age, and the 0.8 Msun model at 150 Myr (Z = 0.02)
 * had a central convective zone up to m/M 0.0066 when 150 Myr was the oldest age and 0.0120 when 600 Myr was
 * (AgeRequestDependenceProbe). Our own requirement: a grid is a set of independent questions.
 */
class AgeRequestIndependenceTest {

    @Test
    void theModelAt150MyrIsTheSameWhateverTheOldestAge() {
        StellarModel alone = BirthTracks.track(0.8, 0.02, 150, 1.0, 150).models().get(0).model();
        StellarModel withLater = BirthTracks.track(0.8, 0.02, 600, 1.0, 150, 600).models().get(0).model();
        assertThat(withLater.global().luminosity()).isEqualTo(alone.global().luminosity());
        assertThat(withLater.global().radius()).isEqualTo(alone.global().radius());
        assertThat(withLater.global().centralHydrogen()).isEqualTo(alone.global().centralHydrogen());
        assertThat(withLater.convection().zones()).isEqualTo(alone.convection().zones());
    }
}
