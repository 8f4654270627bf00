package org.convgrid.engine.physics.nuclear;

/**
 * Energy deposited in the star per lumped reaction step, net of the neutrino losses, in MeV.
 *
 * <p>Q-values and mean neutrino energies from memory (Q-values from atomic masses, neutrino energies from
 * Bahcall 1989, Neutrino Astrophysics). Per 4He these sum to
 * 26.20 (PP-I), 25.65 (PP-II), 19.75 (PP-III) and 25.03 MeV (CN cycle).
 */
public final class ReactionEnergy {

    /** p(p,e+ nu)d, Q including the positron annihilation. */
    public static final double Q_PP = 1.442;
    /** Mean energy of the pp neutrino. */
    public static final double NU_PP = 0.265;
    /** d(p,g)3He. */
    public static final double Q_DP = 5.494;
    /** 3He(3He,2p)4He. */
    public static final double Q_33 = 12.860;
    /** 3He(4He,g)7Be. */
    public static final double Q_34 = 1.586;
    /** 7Be(e-,nu)7Li and its mean neutrino energy (lines 0.862 MeV 90 %, 0.384 MeV 10 %). */
    public static final double Q_BE7_EC = 0.862;
    public static final double NU_BE7 = 0.814;
    /** 7Li(p,a)4He. */
    public static final double Q_LI7_P = 17.347;
    /** 7Be(p,g)8B. */
    public static final double Q_BE7_P = 0.137;
    /** 8B(e+ nu)8Be*(2 4He) and its mean neutrino energy. */
    public static final double Q_B8 = 18.07;
    public static final double NU_B8 = 6.71;
    /** The CN cycle steps, with the beta decays of 13N and 15O. */
    public static final double Q_C12_P = 1.944;
    public static final double Q_N13 = 2.221;
    public static final double NU_N13 = 0.707;
    public static final double Q_C13_P = 7.551;
    public static final double Q_N14_P = 7.297;
    public static final double Q_O15 = 2.754;
    public static final double NU_O15 = 0.997;
    public static final double Q_N15_PA = 4.966;
    /** The ON branch: 16O(p,g)17F, 17F(e+ nu)17O, 17O(p,a)14N. */
    public static final double Q_O16_P = 0.600;
    public static final double Q_F17 = 2.761;
    public static final double NU_F17 = 0.999;
    public static final double Q_O17_PA = 1.192;

    /** 2 p -&gt; d -&gt; 3He: one 3He made from three protons. */
    public static final double PP_TO_HE3 = Q_PP - NU_PP + Q_DP;
    /** 3He + 3He -&gt; 4He + 2p. */
    public static final double HE3_HE3 = Q_33;
    /** 3He + 4He -&gt; 7Be, then e- capture and 7Li + p -&gt; 2 4He (PP-II). */
    public static final double PP2_BRANCH = Q_34 + Q_BE7_EC - NU_BE7 + Q_LI7_P;
    /** 3He + 4He -&gt; 7Be, then 7Be + p -&gt; 8B -&gt; 2 4He (PP-III). */
    public static final double PP3_BRANCH = Q_34 + Q_BE7_P + Q_B8 - NU_B8;
    /** 12C + 2p -&gt; 14N (via 13N, 13C). */
    public static final double C12_TO_N14 = Q_C12_P + Q_N13 - NU_N13 + Q_C13_P;
    /** 14N + 2p -&gt; 12C + 4He (via 15O, 15N; the 15N(p,g) leak of ~4e-4 is neglected). */
    public static final double N14_TO_C12 = Q_N14_P + Q_O15 - NU_O15 + Q_N15_PA;
    /** 16O + 2p -&gt; 14N + 4He (via 17F, 17O). */
    public static final double O16_TO_N14 = Q_O16_P + Q_F17 - NU_F17 + Q_O17_PA;

    private ReactionEnergy() {
    }
}
