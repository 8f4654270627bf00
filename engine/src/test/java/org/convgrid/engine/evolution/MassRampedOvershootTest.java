package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.overshoot.MassRampedStepOvershoot;
import org.convgrid.engine.overshoot.StepOvershoot;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.junit.jupiter.api.Test;

/**
 * The mass-ramped step overshoot on fixed zero-age profiles: none up to 1.2 Msun, the full alpha_ov from 2 Msun,
 * linear between (the shape of the mass dependence of Claret &amp; Torres 2016, A&amp;A 592, A15, arXiv:1606.00834,
 * and 2018, ApJ 859, 100, arXiv:1804.03148; the linear rise is our choice), and otherwise the step overshoot itself.
 */
class MassRampedOvershootTest {

    @Test
    void theLengthRampsFromNoneAt1point2ToTheFullValueAt2Msun() {
        MassRampedStepOvershoot ramped = new MassRampedStepOvershoot(0.2);
        assertThat(ramped.alphaAt(0.8)).isZero();
        assertThat(ramped.alphaAt(1.2)).isZero();
        assertThat(ramped.alphaAt(1.6)).isCloseTo(0.1, within(1e-15));
        assertThat(ramped.alphaAt(2.0)).isCloseTo(0.2, within(1e-15));
        assertThat(ramped.alphaAt(5.0)).isEqualTo(0.2);
        assertThat(new MassRampedStepOvershoot(0.0).alphaAt(3.0)).isZero();
        // what a profile's header reports as the overshoot applied; the other schemes apply their parameter as given
        assertThat(OvershootScheme.MASS_RAMPED_STEP.model(0.2).parameterAt(1.6)).isCloseTo(0.1, within(1e-15));
        assertThat(OvershootScheme.STEP.model(0.2).parameterAt(0.8)).isEqualTo(0.2);
        assertThat(OvershootScheme.EXPONENTIAL.model(0.016).parameterAt(0.8)).isEqualTo(0.016);
    }

    @Test
    void itMixesWhatStepOvershootMixesWithTheStarsOwnLength() {
        // 1.6 Msun: alpha_ov 0.1 of the asked 0.2; 2.0 Msun: all of it. Both have convective cores (KWW 2012, ch. 22)
        assertMixesLikeStep(1.6, 0.1);
        assertMixesLikeStep(2.0, 0.2);
    }

    private static void assertMixesLikeStep(double massMsun, double alphaUsed) {
        StellarModel zams = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, massMsun).model();
        StellarProfile p = zams.profile();
        MassMesh mesh = zams.state().mesh();
        boolean[] convective = new boolean[mesh.size()];
        for (int k = 0; k < convective.length; k++) {
            convective[k] = p.convective(k);
        }
        assertThat(convective[0]).isTrue();
        boolean[] ramped = new MassRampedStepOvershoot(0.2).mixedPoints(mesh::mass, convective, p);
        assertThat(ramped).isEqualTo(new StepOvershoot(alphaUsed).mixedPoints(mesh::mass, convective, p));
        assertThat(ramped).isNotEqualTo(convective);
    }
}
