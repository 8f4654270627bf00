package org.convgrid.engine.physics.nuclear;

/**
 * The S-factors of the hydrogen-burning reactions the network uses.
 *
 * <p>S(0) values are the recommendations of Solar Fusion II (Adelberger et al. 2011, RMP 83, 195; the
 * values from memory, not read from the paper).
 * 14N(p,g)15O uses S(0) = 1.66 keV b, the value recalled as Solar Fusion II's; the measurement it rests on, Runkle et
 * al. 2005 (PRL 94, 082503), gives 1.68 +- 0.09 (stat) +- 0.16 (syst) keV b. About half the older NACRE/textbook
 * value. The slopes S'/S and curvatures S''/S are from memory unless
 * stated; they move the rates by at most a few per cent at main-sequence temperatures. The pp slope is
 * consistent with the T9^(2/3) and T9 terms of the Caughlan &amp; Fowler 1988 fit (1.09 and 0.938, from memory;
 * checked in the tests). Reduced masses from atomic masses (amu).
 */
public final class SolarFusionRates {

    /** p(p,e+ nu)d: S = 4.01e-25 MeV b, S'/S = 11.2 MeV^-1 (SF-II; slope from memory). */
    public static final ChargedParticleRate PP =
            new ChargedParticleRate("p(p,e+nu)d", 1, 1, 0.5036, 4.01e-25, 11.2, 0.0);

    /**
     * d(p,g)3He: S = 2.14e-4 keV b, S' = 5.56e-3 keV b/MeV, S'' = 9.3e-3 keV b/MeV^2 (Solar Fusion II, Adelberger
     * et al. 2011, RMP 83, 195, section IV; values from memory). Burns the deuterium a star is born with at
     * T ~ 1e6 K; the deuterium made by p+p is taken as burnt at once (it is part of {@link #PP}'s lumped step).
     */
    public static final ChargedParticleRate D_P =
            new ChargedParticleRate("d(p,g)3He", 1, 1, 0.6716, 2.14e-7, 5.56e-3 / 2.14e-4, 9.3e-3 / 2.14e-4);

    /**
     * 7Li(p,a)4He: S = 59.3 keV b, with no energy dependence (the non-resonant S(0) of the NACRE compilation,
     * Angulo et al. 1999, Nucl. Phys. A 656, 3; from memory). At the 2.5-4e6 K where stars burn their lithium,
     * E_0 ~ 10 keV, far below the 441 keV resonance of 8Be, so S(0) carries the rate; a slope of order
     * 0.2-0.6 MeV^-1 (from memory) would change it by under 1 %.
     */
    public static final ChargedParticleRate LI7_P =
            new ChargedParticleRate("7Li(p,a)4He", 1, 3, 0.8812, 59.3e-3, 0.0, 0.0);

    /** 3He(3He,2p)4He: S = 5.21 MeV b, S' = -4.49 MeV b/MeV, S'' = 22.6 MeV b/MeV^2 (SF-II; S', S'' from memory). */
    public static final ChargedParticleRate HE3_HE3 =
            new ChargedParticleRate("3He(3He,2p)4He", 2, 2, 1.508, 5.21, -4.49 / 5.21, 22.6 / 5.21);

    /** 3He(4He,g)7Be: S = 0.56 keV b, S'/S = -0.58 MeV^-1, S''/S = 0.27 MeV^-2 (SF-II; S'/S, S''/S from memory). */
    public static final ChargedParticleRate HE3_HE4 =
            new ChargedParticleRate("3He(4He,g)7Be", 2, 2, 1.720, 0.56e-3, -0.58, 0.27);

    /** 7Be(p,g)8B: S = 20.8 eV b (SF-II); energy dependence neglected (the 640 keV resonance is far above E_0). */
    public static final ChargedParticleRate BE7_P =
            new ChargedParticleRate("7Be(p,g)8B", 1, 4, 0.8813, 20.8e-6, 0.0, 0.0);

    /** 12C(p,g)13N: S = 1.34 keV b, S' = 2.6 keV b/MeV (Caughlan &amp; Fowler 1988 era values, from memory). */
    public static final ChargedParticleRate C12_P =
            new ChargedParticleRate("12C(p,g)13N", 1, 6, 0.9297, 1.34e-3, 2.6 / 1.34, 0.0);

    /** 14N(p,g)15O: S = 1.66 keV b (Runkle et al. 2005; SF-II), S' = -3.3 keV b/MeV, S'' = 44 keV b/MeV^2 (from memory). */
    public static final ChargedParticleRate N14_P =
            new ChargedParticleRate("14N(p,g)15O", 1, 7, 0.9402, 1.66e-3, -3.3 / 1.66, 44.0 / 1.66);

    /**
     * 16O(p,g)17F: S = 10.6 keV b (SF-II). The S-factor rises towards zero energy (a sub-threshold state); the
     * constant S used here underestimates the rate by up to a few tens of per cent. 16O burning is a small
     * energy source on the main sequence, so this matters only for the slow 16O -&gt; 14N conversion.
     */
    public static final ChargedParticleRate O16_P =
            new ChargedParticleRate("16O(p,g)17F", 1, 8, 0.9481, 10.6e-3, 0.0, 0.0);

    private SolarFusionRates() {
    }
}
