package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ReactionEnergyTest {

    /** 4 m(1H) - m(4He) in MeV from AME 2020 atomic masses (Constants). */
    private static final double Q_FROM_MASSES =
            (4.0 * Constants.MASS_H1_AMU - Constants.MASS_HE4_AMU) * Constants.M_U_C2_MEV;

    @Test
    void hydrogenBurningReleases26point73MeV() {
        // Q = 26.731 MeV (derived from the AME 2020 atomic masses), mass defect 0.712 %; the textbook
        // "26.73 MeV" (e.g. Kippenhahn, Weigert & Weiss 2012, ch. 18).
        assertThat(Q_FROM_MASSES).isCloseTo(26.731, within(0.001));
        assertThat(Q_FROM_MASSES / (4.0 * Constants.MASS_H1_AMU * Constants.M_U_C2_MEV)).isCloseTo(0.00712, within(0.00001));
    }

    @Test
    void stepQValuesAddUpToTheMassDifference() {
        // Sum check (derived): PP-I 2(1.442 + 5.494) + 12.860 and the CN cycle sum both give 26.73 MeV.
        double ppI = 2.0 * (ReactionEnergy.Q_PP + ReactionEnergy.Q_DP) + ReactionEnergy.Q_33;
        double cn = ReactionEnergy.Q_C12_P + ReactionEnergy.Q_N13 + ReactionEnergy.Q_C13_P + ReactionEnergy.Q_N14_P
                + ReactionEnergy.Q_O15 + ReactionEnergy.Q_N15_PA;
        double ppII = ReactionEnergy.Q_PP + ReactionEnergy.Q_DP + ReactionEnergy.Q_34 + ReactionEnergy.Q_BE7_EC
                + ReactionEnergy.Q_LI7_P;
        double ppIII = ReactionEnergy.Q_PP + ReactionEnergy.Q_DP + ReactionEnergy.Q_34 + ReactionEnergy.Q_BE7_P
                + ReactionEnergy.Q_B8;
        for (double q : new double[] {ppI, cn, ppII, ppIII}) {
            assertThat(q).isCloseTo(Q_FROM_MASSES, within(0.01));
        }
        // ON branch 16O + 2p -> 14N + 4He: 4.553 MeV from AME 2020 atomic masses of 16O (15.994914619 u) and
        // 14N (14.003074004 u) (from memory) against 0.600 + 2.761 + 1.192 MeV.
        double onFromMasses = (2.0 * Constants.MASS_H1_AMU + 15.994914619 - 14.003074004 - Constants.MASS_HE4_AMU)
                * Constants.M_U_C2_MEV;
        double on = ReactionEnergy.Q_O16_P + ReactionEnergy.Q_F17 + ReactionEnergy.Q_O17_PA;
        assertThat(on).isCloseTo(onFromMasses, within(0.01));
    }

    @Test
    void energyPerHeliumNetOfNeutrinos() {
        // Derived from the mean neutrino energies of Bahcall 1989, Neutrino Astrophysics (from memory):
        // PP-I 26.20, PP-II 25.65, PP-III 19.7-19.76, CNO 25.03 MeV per 4He.
        assertThat(2.0 * ReactionEnergy.PP_TO_HE3 + ReactionEnergy.HE3_HE3).isCloseTo(26.20, within(0.01));
        assertThat(ReactionEnergy.PP_TO_HE3 + ReactionEnergy.PP2_BRANCH).isCloseTo(25.65, within(0.01));
        assertThat(ReactionEnergy.PP_TO_HE3 + ReactionEnergy.PP3_BRANCH).isCloseTo(19.76, within(0.06));
        assertThat(ReactionEnergy.C12_TO_N14 + ReactionEnergy.N14_TO_C12).isCloseTo(25.03, within(0.01));
        // Lumped steps (derived from the same Q values and losses): 11.01, 14.02, 3.55 MeV; 6.67 MeV per 3He made.
        assertThat(ReactionEnergy.C12_TO_N14).isCloseTo(11.01, within(0.005));
        assertThat(ReactionEnergy.N14_TO_C12).isCloseTo(14.02, within(0.005));
        assertThat(ReactionEnergy.O16_TO_N14).isCloseTo(3.55, within(0.005));
        assertThat(ReactionEnergy.PP_TO_HE3).isCloseTo(6.67, within(0.005));
    }
}
