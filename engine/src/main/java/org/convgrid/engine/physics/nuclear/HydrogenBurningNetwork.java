package org.convgrid.engine.physics.nuclear;

import java.util.Optional;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;

/**
 * The default {@link NuclearNetwork}: pp chains with explicit 3He and the PP-I/II/III branches, and the CN cycle
 * plus the 16O leak as lumped steps, with electron screening.
 *
 * <p>Sources, as each component cites them: S-factors of Solar Fusion II (Adelberger et al. 2011, Rev. Mod. Phys.
 * 83, 195; for 14N(p,g) its value, near the 1.68 keV b Runkle et al. 2005 measured, PRL 94, 082503; 7Li(p,a) from
 * NACRE, Angulo et al. 1999, Nucl. Phys. A 656, 3) in the non-resonant rate form with the corrections of Fowler,
 * Caughlan &amp; Zimmerman 1967 (ARA&amp;A 5, 525); energies net of neutrinos from Bahcall 1989 (Neutrino
 * Astrophysics); the 7Be electron capture of Bahcall &amp; Moeller 1969; screening of Salpeter 1954 (Aust. J. Phys.
 * 7, 373). Values recalled from memory where those classes say so.
 *
 * <p>Reactions (rates from {@link SolarFusionRates}, energies from {@link ReactionEnergy}):
 * <pre>
 *   p + p (+ p)      -&gt; 3He               6.671 MeV  (d(p,g) instantaneous)
 *   3He + 3He        -&gt; 4He + 2p          12.860 MeV (PP-I)
 *   3He + 4He (+ p)  -&gt; 2 4He             18.981 MeV via 7Be(e-,nu) (PP-II) or 13.083 MeV via 7Be(p,g) (PP-III)
 *   12C + 2p         -&gt; 14N               11.009 MeV
 *   14N + 2p         -&gt; 12C + 4He         14.020 MeV
 *   16O + 2p         -&gt; 14N + 4He          3.554 MeV
 *   d + p            -&gt; 3He                5.494 MeV  (the deuterium a star is born with)
 *   7Li + p          -&gt; 2 4He             17.347 MeV  (the lithium a star is born with)
 * </pre>
 * Energies are net of the neutrino losses ({@link ReactionEnergy}). The 7Be branch fraction is
 * {@code lambda_ec/(lambda_ec + rho Y_p N_A<sv>_17)}. Abundances are counted with mass numbers, so the
 * composition rates conserve mass exactly. Derivatives of eps are analytic, at fixed composition.
 *
 * <p>{@link #burn} is instantaneous: with X(3He) = 0 the pp chains release only the 6.67 MeV of the first step
 * per p+p reaction, about half of the equilibrium value, which is the physically correct rate for such a
 * composition. Structure models of a given age should therefore pass the evolved 3He, and zero-age models the
 * output of {@link #equilibrium}. A reaction is evaluated in one place ({@link #reaction}: the screening and the
 * S-factor rate at the point; {@link #screened} where the slopes are not needed), and {@link #burnAndFactors} takes
 * the {@link RateFactors} from the rates its burn evaluated. Allocation: one {@link PlasmaState}, a three-element work array and the result record per call, which
 * the JIT compiler keeps off the heap but for the result (the point's rates stay local variables for that reason: an
 * object holding them, passed from where they are evaluated to where they are used, doubled a microphysics point's
 * allocation); {@link #energy} makes no result record.
 */
public final class HydrogenBurningNetwork implements NuclearNetwork {

    /**
     * Default time over which {@link #equilibrium} lets 3He and the CN pair relax: 1e9 yr. A zero-age model has
     * 3He and CN "at their equilibrium abundances where they burn": over 1e9 yr every layer whose burning matters
     * on the main sequence reaches it, while layers too cool to burn keep their initial abundances. A shorter
     * time (1e8 yr, about the pre-main-sequence contraction of 0.5-1 Msun stars, from memory) leaves 3He at
     * equilibrium only at the very centre of K and early-M dwarfs, and the steep central energy release that
     * results gives 3He-driven convective cores of several per cent of the mass at 0.45-0.6 Msun, which
     * zero-age models of such stars do not have (the 3He-driven cores near the fully convective limit develop
     * over Gyr: van Saders &amp; Pinsonneault 2012, ApJ 751, 98).
     */
    public static final double DEFAULT_EQUILIBRATION_TIME = 1.0e9 * Constants.YEAR;
    /** Highest temperature accepted, K: beyond it the non-resonant S-factor expansions are meaningless. */
    public static final double MAX_TEMPERATURE = 1.0e9;

    private static final double MEV_PER_MOLE = Constants.N_A * Constants.MEV;
    /** The species whose changes {@link #equilibriumEnergy} follows, per direction: h1, 3He, 4He, 12C, 14N. */
    private static final int SLOPE_SPECIES = 5;

    private final Screening screening;
    private final MetalCharges metals;
    private final double equilibrationTime;
    /** Whether {@link #burn} includes d(p,g)3He and 7Li(p,a)4He ({@link #withoutLightElementCaptures}). */
    private final boolean lightElementCaptures;

    /** Salpeter screening, GS98 metals, {@link #DEFAULT_EQUILIBRATION_TIME}. */
    public HydrogenBurningNetwork() {
        this(SalpeterScreening.INSTANCE, MetalMixture.GS98, DEFAULT_EQUILIBRATION_TIME);
    }

    /**
     * @param screening electron screening
     * @param mixture metal mixture, for the charges of the metals other than C, N, O
     * @param equilibrationTime time over which {@link #equilibrium} relaxes 3He and CN, s
     */
    public HydrogenBurningNetwork(Screening screening, MetalMixture mixture, double equilibrationTime) {
        this.screening = screening;
        this.metals = MetalCharges.of(mixture);
        this.equilibrationTime = ConvgridException.requireInRange("equilibration time", equilibrationTime,
                0.0, 1.0e20, "s");
        this.lightElementCaptures = true;
    }

    private HydrogenBurningNetwork(HydrogenBurningNetwork full) {
        this.screening = full.screening;
        this.metals = full.metals;
        this.equilibrationTime = full.equilibrationTime;
        this.lightElementCaptures = false;
    }

    /**
     * The same network without d(p,g)3He and 7Li(p,a)4He in {@link #burn}: for the composition update, which burns
     * them in their own exact step, they were two of up to nine screened reactions at every point holding deuterium
     * or 7Li, evaluated only to be taken out of the rates again.
     */
    @Override
    public NuclearNetwork withoutLightElementCaptures() {
        return lightElementCaptures ? new HydrogenBurningNetwork(this) : this;
    }

    @Override
    public BurningRate burn(double density, double temperature, Composition composition) {
        return burn(density, temperature, composition, null, null, null);
    }

    /**
     * {@link #burn}'s eps and slopes without its result record: burn is too large for the JIT to inline into a
     * caller, so the record it returns is always allocated (36 MB of the 325 MB a 1 Msun zero-age track allocated,
     * one per point of every structure evaluation). Zero, without evaluating the reactions, where the gas is too cool
     * for any of them to matter ({@link NegligibleBurning}: eps below {@link NegligibleBurning#EPS_BOUND} there, a
     * bound that holds for this network's reactions).
     */
    @Override
    public void energy(double density, double temperature, Composition composition, double[] into) {
        if (NegligibleBurning.at(density, temperature, composition)) {
            into[0] = 0.0;
            into[1] = 0.0;
            into[2] = 0.0;
            return;
        }
        burn(density, temperature, composition, null, into, null);
    }

    /**
     * {@link NegligibleBurning#RATE_BOUND} where the gas is too cool for any reaction to matter ({@link
     * NegligibleBurning#at}, the same test as {@link #energy}'s), no bound elsewhere.
     */
    @Override
    public double rateBound(double density, double temperature, Composition composition) {
        return NegligibleBurning.at(density, temperature, composition) ? NegligibleBurning.RATE_BOUND
                : Double.POSITIVE_INFINITY;
    }

    /** {@link #burn} with the six screened {@code rho N_A<sigma v>} its rates are made of. */
    @Override
    public BurningAndFactors burnAndFactors(double density, double temperature, Composition composition) {
        double[] k = new double[RateFactors.SPECIES];
        BurningRate rate = burn(density, temperature, composition, k, null, null);
        return new BurningAndFactors(rate, Optional.of(new RateFactors(k[0], k[1], k[2], k[3], k[4], k[5])));
    }

    /**
     * @param factors null, or {@link RateFactors#SPECIES} elements that receive the factors of pp, 3He+3He, 3He+4He,
     *                12C+p, 14N+p and 16O+p (the order of the {@link RateFactors} components)
     * @param energy null for the whole rate; or three elements that receive eps, dln eps/dln rho and dln eps/dln T,
     *               and then no rate is made (null is returned): {@link #energy}
     * @param along null; or, with {@code energy}, the changes of the composition with ln rho and with ln T
     *              ({@link #SLOPE_SPECIES} each, in that order: h1, 3He, 4He, 12C, 14N), and then energy's slopes are
     *              taken with the composition following them: {@link #equilibriumEnergy}
     */
    private BurningRate burn(double density, double temperature, Composition composition, double[] factors,
                             double[] energy, double[] along) {
        checkState(density, temperature);
        PlasmaState plasma = plasma(density, temperature, composition);
        double t9 = temperature * 1.0e-9;
        double cbrtT9 = Math.cbrt(t9);
        double y1 = composition.h1();
        double y3 = composition.he3() / 3.0;
        double y4 = composition.he4() / 4.0;
        double y12 = composition.c12() / 12.0;
        double y14 = composition.n14() / 14.0;
        double y16 = composition.o16() / 16.0;

        // Each reaction once: its screened rate, d ln/d ln T and the screening's d ln/d ln rho (the unscreened
        // rate does not depend on density), so that the screening and the S-factor bracket are evaluated once.
        double[] work = new double[3];
        reaction(SolarFusionRates.PP, t9, cbrtT9, plasma, work);
        double l11 = work[0];
        double t11 = work[1];
        double d11 = work[2];
        // 3He+3He and 3He+4He have the same charges, hence the same screening: taken once for both
        screening.exponentAndSlopes(SolarFusionRates.HE3_HE3.z1(), SolarFusionRates.HE3_HE3.z2(), plasma, work);
        double heliumScreening = work[0];
        double heliumScreeningT = work[1];
        double d33 = work[2];
        SolarFusionRates.HE3_HE3.rateAndSlope(t9, cbrtT9, heliumScreening, work);
        double l33 = work[0];
        double t33 = work[1] + heliumScreeningT;
        SolarFusionRates.HE3_HE4.rateAndSlope(t9, cbrtT9, heliumScreening, work);
        double l34 = work[0];
        double t34 = work[1] + heliumScreeningT;
        double d34 = d33;
        reaction(SolarFusionRates.C12_P, t9, cbrtT9, plasma, work);
        double l12 = work[0];
        double t12 = work[1];
        double d12 = work[2];
        reaction(SolarFusionRates.N14_P, t9, cbrtT9, plasma, work);
        double l14 = work[0];
        double t14 = work[1];
        double d14 = work[2];
        reaction(SolarFusionRates.O16_P, t9, cbrtT9, plasma, work);
        double l16 = work[0];
        double t16 = work[1];
        double d16 = work[2];
        reaction(SolarFusionRates.BE7_P, t9, cbrtT9, plasma, work);
        double l17 = work[0];
        double t17 = work[1];
        double d17 = work[2];
        if (factors != null) {
            factors[0] = density * l11;
            factors[1] = density * l33;
            factors[2] = density * l34;
            factors[3] = density * l12;
            factors[4] = density * l14;
            factors[5] = density * l16;
        }

        // Reactions per gram per second, in moles: rho Y_j Y_k N_A<sv> / (1 + delta_jk).
        double r11 = 0.5 * density * y1 * y1 * l11;
        double r33 = 0.5 * density * y3 * y3 * l33;
        double r34 = density * y3 * y4 * l34;
        double r12 = density * y1 * y12 * l12;
        double r14 = density * y1 * y14 * l14;
        double r16 = density * y1 * y16 * l16;
        // initial deuterium and 7Li; skipped when absent (main-sequence compositions) to keep those burns as cheap
        double y2 = composition.h2() / 2.0;
        double y7 = composition.li7() / 7.0;
        double r2 = 0.0;
        double t2 = 0.0;
        double d2 = 0.0;
        double l2 = 0.0;
        if (y2 > 0.0 && lightElementCaptures) {
            reaction(SolarFusionRates.D_P, t9, cbrtT9, plasma, work);
            l2 = work[0];
            r2 = density * y1 * y2 * l2;
            t2 = work[1];
            d2 = work[2];
        }
        double r7 = 0.0;
        double t7 = 0.0;
        double d7 = 0.0;
        double l7 = 0.0;
        if (y7 > 0.0 && lightElementCaptures) {
            reaction(SolarFusionRates.LI7_P, t9, cbrtT9, plasma, work);
            l7 = work[0];
            r7 = density * y1 * y7 * l7;
            t7 = work[1];
            d7 = work[2];
        }

        // 7Be: electron capture (PP-II) against proton capture (PP-III).
        double t6 = temperature * 1.0e-6;
        double electrons = electronsPerBaryon(composition);
        double capture = BerylliumCapture.rate(density, electrons, t6);
        double protonCapture = density * y1 * l17;
        double sum7 = capture + protonCapture;
        double pp2 = sum7 > 0.0 ? capture / sum7 : 1.0;
        double q34 = pp2 * ReactionEnergy.PP2_BRANCH + (1.0 - pp2) * ReactionEnergy.PP3_BRANCH;

        double e11 = MEV_PER_MOLE * r11 * ReactionEnergy.PP_TO_HE3;
        double e33 = MEV_PER_MOLE * r33 * ReactionEnergy.HE3_HE3;
        double e34 = MEV_PER_MOLE * r34 * q34;
        double e12 = MEV_PER_MOLE * r12 * ReactionEnergy.C12_TO_N14;
        double e14 = MEV_PER_MOLE * r14 * ReactionEnergy.N14_TO_C12;
        double e16 = MEV_PER_MOLE * r16 * ReactionEnergy.O16_TO_N14;
        double e2 = MEV_PER_MOLE * r2 * ReactionEnergy.Q_DP;
        double e7 = MEV_PER_MOLE * r7 * ReactionEnergy.Q_LI7_P;
        double epsPp = e11 + e33 + e34 + e2 + e7;
        double epsCno = e12 + e14 + e16;
        double eps = epsPp + epsCno;

        // d eps/d ln x = sum e_k dln r_k/dln x + (energy of the 7Be branch shift).
        double branchWeight = MEV_PER_MOLE * r34 * (ReactionEnergy.PP2_BRANCH - ReactionEnergy.PP3_BRANCH)
                * pp2 * (1.0 - pp2);
        double dEpsDlnT = e11 * t11 + e33 * t33 + e34 * t34 + e12 * t12 + e14 * t14 + e16 * t16
                + branchWeight * (BerylliumCapture.dlnRateDlnT(t6) - t17)
                + (r2 > 0.0 ? e2 * t2 : 0.0)
                + (r7 > 0.0 ? e7 * t7 : 0.0);
        double dEpsDlnRho = e11 * (1.0 + d11) + e33 * (1.0 + d33) + e34 * (1.0 + d34) + e12 * (1.0 + d12)
                + e14 * (1.0 + d14) + e16 * (1.0 + d16)
                - branchWeight * d17
                + e2 * (1.0 + d2)
                + e7 * (1.0 + d7);

        if (along != null) {
            // the composition follows the state: add sum_i d eps/d X_i dX_i/d ln x
            double[] rates = {l11, l33, l34, l12, l14, l16, l2, l7};
            double[] reactions = {r11, r33, r34, r12, r14, r16, r2, r7};
            double[] abundances = {y1, y3, y4, y12, y14, y16, y2, y7};
            // each reaction's screening slopes in the two couplings, in the same order, then 7Be+p's
            double[] couplings = new double[2 * 9];
            couplingSlopes(SolarFusionRates.PP, plasma, work, couplings, 0);
            couplingSlopes(SolarFusionRates.HE3_HE3, plasma, work, couplings, 1);
            couplings[4] = couplings[2];
            couplings[5] = couplings[3];
            couplingSlopes(SolarFusionRates.C12_P, plasma, work, couplings, 3);
            couplingSlopes(SolarFusionRates.N14_P, plasma, work, couplings, 4);
            couplingSlopes(SolarFusionRates.O16_P, plasma, work, couplings, 5);
            if (r2 > 0.0) {
                couplingSlopes(SolarFusionRates.D_P, plasma, work, couplings, 6);
            }
            if (r7 > 0.0) {
                couplingSlopes(SolarFusionRates.LI7_P, plasma, work, couplings, 7);
            }
            couplingSlopes(SolarFusionRates.BE7_P, plasma, work, couplings, 8);
            double zetaSquared = zetaSquared(composition);
            dEpsDlnRho += compositionSlope(density, rates, reactions, abundances, couplings, zetaSquared, electrons,
                    q34, pp2, along, 0);
            dEpsDlnT += compositionSlope(density, rates, reactions, abundances, couplings, zetaSquared, electrons,
                    q34, pp2, along, SLOPE_SPECIES);
        }
        double dlnEpsDlnRho = eps > 0.0 ? dEpsDlnRho / eps : 0.0;
        double dlnEpsDlnT = eps > 0.0 ? dEpsDlnT / eps : 0.0;
        if (energy != null) {
            energy[0] = eps;
            energy[1] = dlnEpsDlnRho;
            energy[2] = dlnEpsDlnT;
            return null;
        }
        double cno = r12 + r14 + r16;
        double dy1 = -3.0 * r11 + 2.0 * r33 - r34 - 2.0 * cno - r2 - r7;
        double dy3 = r11 - 2.0 * r33 - r34 + r2;
        double dy4 = r33 + r34 + r14 + r16 + 2.0 * r7;
        return new BurningRate(eps, epsPp, epsCno, dlnEpsDlnRho, dlnEpsDlnT, dy1, 3.0 * dy3, 4.0 * dy4,
                12.0 * (r14 - r12), 14.0 * (r12 - r14 + r16), -16.0 * r16, -2.0 * r2, -7.0 * r7);
    }

    /**
     * d eps/d ln x from the composition's change alone, its changes with ln x at {@code along[offset...]} (h1, 3He,
     * 4He, 12C, 14N mass fractions): each rate r = rho Y_j Y_k lambda_jk/(1 + delta_jk) differentiated in its
     * abundances and in its screening (through zeta^2 and 1/mu_e, {@link Screening#couplingSlopes}), and the PP-II
     * share of 3He+4He through the 7Be capture rates (Y_p, 1/mu_e and the 7Be+p screening).
     *
     * @param rates the screened N_A&lt;sigma v&gt; of pp, 3He+3He, 3He+4He, 12C+p, 14N+p, 16O+p, d+p, 7Li+p
     * @param reactions the reaction rates r of the same, mol g^-1 s^-1
     * @param abundances Y of h1, 3He, 4He, 12C, 14N, 16O, d, 7Li (mol g^-1)
     * @param couplings the screening's two coupling slopes of each of the same reactions, then of 7Be+p
     */
    private static double compositionSlope(double density, double[] rates, double[] reactions, double[] abundances,
                                           double[] couplings, double zetaSquared, double electrons, double q34,
                                           double pp2, double[] along, int offset) {
        double dx1 = along[offset];
        double dx3 = along[offset + 1];
        double dx4 = along[offset + 2];
        double dx12 = along[offset + 3];
        double dx14 = along[offset + 4];
        double y1 = abundances[0];
        double dy3 = dx3 / 3.0;
        double dy4 = dx4 / 4.0;
        double dy12 = dx12 / 12.0;
        double dy14 = dx14 / 14.0;
        // the couplings' changes (PlasmaState): Debye ~ zeta, Gamma_e ~ (1/mu_e)^(1/3), with the coefficients of
        // zetaSquared and electronsPerBaryon
        double dElectrons = dx1 + (2.0 / 3.0) * dx3 + 0.5 * (dx4 + dx12 + dx14);
        double dLnDebye = 0.5 * (2.0 * dx1 + 2.0 * dx3 + 1.5 * dx4 + 3.5 * dx12 + 4.0 * dx14) / zetaSquared;
        double dLnElectron = dElectrons / (3.0 * electrons);
        double[] dr = new double[8];
        for (int i = 0; i < dr.length; i++) {
            dr[i] = reactions[i] * (couplings[2 * i] * dLnDebye + couplings[2 * i + 1] * dLnElectron);
        }
        dr[0] += density * y1 * dx1 * rates[0];
        dr[1] += density * abundances[1] * dy3 * rates[1];
        dr[2] += density * (dy3 * abundances[2] + abundances[1] * dy4) * rates[2];
        dr[3] += density * (dx1 * abundances[3] + y1 * dy12) * rates[3];
        dr[4] += density * (dx1 * abundances[4] + y1 * dy14) * rates[4];
        dr[5] += density * dx1 * abundances[5] * rates[5];
        dr[6] += density * dx1 * abundances[6] * rates[6];
        dr[7] += density * dx1 * abundances[7] * rates[7];
        // pp2 = capture/(capture + rho Y_p lambda_17), capture ~ 1/mu_e:
        // dpp2 = pp2 (1 - pp2) dln(capture/(Y_p lambda_17))
        double h17 = couplings[16] * dLnDebye + couplings[17] * dLnElectron;
        double dPp2 = y1 > 0.0 ? pp2 * (1.0 - pp2) * (dElectrons / electrons - dx1 / y1 - h17) : 0.0;
        return MEV_PER_MOLE * (dr[0] * ReactionEnergy.PP_TO_HE3 + dr[1] * ReactionEnergy.HE3_HE3 + dr[2] * q34
                + reactions[2] * (ReactionEnergy.PP2_BRANCH - ReactionEnergy.PP3_BRANCH) * dPp2
                + dr[3] * ReactionEnergy.C12_TO_N14 + dr[4] * ReactionEnergy.N14_TO_C12
                + dr[5] * ReactionEnergy.O16_TO_N14 + dr[6] * ReactionEnergy.Q_DP + dr[7] * ReactionEnergy.Q_LI7_P);
    }

    /** {@link Screening#couplingSlopes} of one reaction's pair into {@code couplings[2 index]} and the next. */
    private void couplingSlopes(ChargedParticleRate rate, PlasmaState plasma, double[] work, double[] couplings,
                                int index) {
        screening.couplingSlopes(rate.z1(), rate.z2(), plasma, work);
        couplings[2 * index] = work[0];
        couplings[2 * index + 1] = work[1];
    }

    /**
     * The two captures alone: lambda_i = rho Y_p N_A&lt;sigma v&gt;_i with the screening {@link #burn} applies at
     * this point ({@link #screened}, the same value as its rate), Y_p = X_H (the proton's mass number is one); equal
     * to {@link #burn}'s -dh2Dt/X_D and -dli7Dt/X_Li to rounding at a fraction of its cost (at most two reactions
     * instead of up to nine, no 7Be captures).
     */
    @Override
    public LightElementCaptures lightElementCaptures(double density, double temperature, Composition composition) {
        boolean deuterium = composition.h2() > 0.0;
        boolean lithium = composition.li7() > 0.0;
        if (!deuterium && !lithium) {
            return LightElementCaptures.NONE;
        }
        checkState(density, temperature);
        PlasmaState plasma = plasma(density, temperature, composition);
        double t9 = temperature * 1.0e-9;
        double cbrtT9 = Math.cbrt(t9);
        double protons = density * composition.h1();
        double[] work = new double[3];
        return new LightElementCaptures(
                deuterium ? protons * screened(SolarFusionRates.D_P, t9, cbrtT9, plasma, work) : 0.0,
                lithium ? protons * screened(SolarFusionRates.LI7_P, t9, cbrtT9, plasma, work) : 0.0);
    }

    /**
     * One reaction at this point into work: [0] the screened N_A&lt;sigma v&gt;, [1] its d ln/d ln T (rate and
     * screening), [2] its d ln/d ln rho (the screening's alone).
     */
    private void reaction(ChargedParticleRate rate, double t9, double cbrtT9, PlasmaState plasma, double[] work) {
        screening.exponentAndSlopes(rate.z1(), rate.z2(), plasma, work);
        double screeningT = work[1];
        rate.rateAndSlope(t9, cbrtT9, work[0], work);
        work[1] += screeningT;
    }

    /**
     * 3He and the CN pair after {@code equilibrationTime} of burning at this density and temperature, starting
     * from the given abundances: the local equilibrium wherever it is reached within that time, the given
     * abundances wherever the equilibration time is much longer, and the exact intermediate solution between
     * ({@link AbundanceRelaxation}). Hydrogen pays (or receives) the mass moved; 4He, 16O and the other metals
     * are unchanged. Call it on the initial composition, not on its own output (each call adds the time again).
     */
    @Override
    public Composition equilibrium(double density, double temperature, Composition composition) {
        return equilibrium(density, temperature, composition, null);
    }

    /**
     * {@link #burn}'s eps at {@link #equilibrium}'s composition, with slopes that include that composition's change
     * with the state: the abundances' derivatives from the closed forms of {@link AbundanceRelaxation}
     * differentiated through the rates' own analytic slopes, and eps's through its rates' abundance factors
     * ({@link #compositionSlope}). The same eps and composition as {@link #energy} and {@link #equilibrium}.
     */
    @Override
    public Composition equilibriumEnergy(double density, double temperature, Composition initial, double[] into) {
        if (NegligibleBurning.at(density, temperature, initial)) {
            // the same test as energy's (the equilibrium keeps deuterium): no burning, no slopes to follow
            into[0] = 0.0;
            into[1] = 0.0;
            into[2] = 0.0;
            return equilibrium(density, temperature, initial, null);
        }
        double[] along = new double[2 * SLOPE_SPECIES];
        Composition c = equilibrium(density, temperature, initial, along);
        burn(density, temperature, c, null, into, along);
        return c;
    }

    /**
     * @param slopes null; or {@code 2 SLOPE_SPECIES} elements that receive the changes of the h1, 3He, 4He, 12C
     *               and 14N mass fractions with ln rho, then with ln T
     */
    private Composition equilibrium(double density, double temperature, Composition composition, double[] slopes) {
        checkState(density, temperature);
        PlasmaState plasma = plasma(density, temperature, composition);
        double t9 = temperature * 1.0e-9;
        double cbrtT9 = Math.cbrt(t9);
        double y1 = composition.h1();
        double y4 = composition.he4() / 4.0;
        // when slopes are asked for, the five rates' d ln(rho lambda)/d ln rho, then their d ln lambda/d ln T
        double[] rateSlopes = slopes == null ? null : new double[2 * 5];
        double[] work = new double[3];

        // dY3/dt = rho Y1^2 <11>/2 - rho <33> Y3^2 - rho <34> Y4 Y3.
        double a = 0.5 * density * y1 * y1 * rate(SolarFusionRates.PP, t9, cbrtT9, plasma, work, rateSlopes, 0);
        double b = density * rate(SolarFusionRates.HE3_HE3, t9, cbrtT9, plasma, work, rateSlopes, 1);
        double c = density * y4 * rate(SolarFusionRates.HE3_HE4, t9, cbrtT9, plasma, work, rateSlopes, 2);
        double y3 = composition.he3() / 3.0;
        double he3 = 3.0 * AbundanceRelaxation.quadratic(a, b, c, y3, equilibrationTime);

        double k12 = density * y1 * rate(SolarFusionRates.C12_P, t9, cbrtT9, plasma, work, rateSlopes, 3);
        double k14 = density * y1 * rate(SolarFusionRates.N14_P, t9, cbrtT9, plasma, work, rateSlopes, 4);
        double y12 = composition.c12() / 12.0;
        double y14 = composition.n14() / 14.0;
        double newY12 = AbundanceRelaxation.linearPair(k12, k14, y12, y14, equilibrationTime);
        double c12 = 12.0 * newY12;
        double n14 = 14.0 * (y12 + y14 - newY12);

        double moved = (he3 - composition.he3()) + (c12 - composition.c12()) + (n14 - composition.n14());
        double h1 = composition.h1() - moved;
        double he4 = composition.he4();
        boolean hydrogenFree = h1 < 0.0;
        if (hydrogenFree) {
            // Only for hydrogen-free matter with 3He or C to process; helium absorbs the deficit.
            he4 += h1;
            h1 = 0.0;
        }
        if (slopes != null) {
            for (int x = 0; x < 2; x++) {
                // x = 0: ln rho (rateSlopes[0..4]), x = 1: ln T (rateSlopes[5..9])
                double dHe3 = 3.0 * AbundanceRelaxation.quadraticSlope(a, b, c, y3, equilibrationTime,
                        a * rateSlopes[5 * x], b * rateSlopes[5 * x + 1], c * rateSlopes[5 * x + 2]);
                double dY12 = AbundanceRelaxation.linearPairSlope(k12, k14, y12, y14, equilibrationTime,
                        k12 * rateSlopes[5 * x + 3], k14 * rateSlopes[5 * x + 4]);
                double dC12 = 12.0 * dY12;
                double dN14 = -14.0 * dY12;
                double dH1 = -(dHe3 + dC12 + dN14);
                slopes[SLOPE_SPECIES * x] = hydrogenFree ? 0.0 : dH1;
                slopes[SLOPE_SPECIES * x + 1] = dHe3;
                slopes[SLOPE_SPECIES * x + 2] = hydrogenFree ? dH1 : 0.0;
                slopes[SLOPE_SPECIES * x + 3] = dC12;
                slopes[SLOPE_SPECIES * x + 4] = dN14;
            }
        }

        return new Composition(h1, he3, he4, c12, n14, composition.o16(), composition.otherMetals(),
                composition.h2(), composition.li7());
    }

    /**
     * The classical 3He equilibrium {@code X_3 = 3 X [<sv>_11/(2<sv>_33)]^(1/2)}, 3He+4He neglected
     * (derived from the 3He balance), with screening; mass fraction.
     */
    public double helium3Equilibrium(double density, double temperature, Composition composition) {
        checkState(density, temperature);
        PlasmaState plasma = plasma(density, temperature, composition);
        double t9 = temperature * 1.0e-9;
        double cbrtT9 = Math.cbrt(t9);
        double[] work = new double[3];
        double l11 = screened(SolarFusionRates.PP, t9, cbrtT9, plasma, work);
        double l33 = screened(SolarFusionRates.HE3_HE3, t9, cbrtT9, plasma, work);
        return l33 > 0.0 ? 3.0 * composition.h1() * Math.sqrt(l11 / (2.0 * l33)) : 0.0;
    }

    /** The screening and ionization state used for the rates at this point. */
    public PlasmaState plasma(double density, double temperature, Composition composition) {
        return PlasmaState.of(density, temperature, zetaSquared(composition), electronsPerBaryon(composition));
    }

    /** zeta^2 = sum_i (Z_i^2 + Z_i) X_i/A_i ({@link PlasmaState}), mol g^-1. */
    private double zetaSquared(Composition composition) {
        return 2.0 * composition.h1() + 2.0 * composition.he3() + 1.5 * composition.he4()
                + 3.5 * composition.c12() + 4.0 * composition.n14() + 4.5 * composition.o16()
                + metals.chargeSquaredPlusChargePerMass() * composition.otherMetals();
    }

    private double electronsPerBaryon(Composition composition) {
        return composition.h1() + (2.0 / 3.0) * composition.he3() + 0.5 * composition.he4()
                + 0.5 * (composition.c12() + composition.n14() + composition.o16())
                + metals.chargePerMass() * composition.otherMetals();
    }

    /**
     * {@link #screened}'s value; with {@code slopes}, also the d ln/d ln rho of rho times it (1 + the screening's:
     * every rate coefficient of {@link #equilibrium} carries the factor rho) at {@code slopes[index]} and its
     * d ln/d ln T at {@code slopes[5 + index]} (from {@link #reaction}, the same value).
     */
    private double rate(ChargedParticleRate rate, double t9, double cbrtT9, PlasmaState plasma, double[] work,
                        double[] slopes, int index) {
        if (slopes == null) {
            return screened(rate, t9, cbrtT9, plasma, work);
        }
        reaction(rate, t9, cbrtT9, plasma, work);
        slopes[index] = 1.0 + work[2];
        slopes[5 + index] = work[1];
        return work[0];
    }

    /** {@link #reaction}'s screened N_A&lt;sigma v&gt; alone, where the slopes are not needed (the same value). */
    private double screened(ChargedParticleRate rate, double t9, double cbrtT9, PlasmaState plasma, double[] work) {
        screening.exponentAndSlopes(rate.z1(), rate.z2(), plasma, work);
        return rate.rate(t9, cbrtT9, work[0]);
    }

    private static void checkState(double density, double temperature) {
        ConvgridException.requireInRange("density", density, Double.MIN_NORMAL, Double.MAX_VALUE, "g cm^-3");
        ConvgridException.requireInRange("temperature", temperature, Double.MIN_NORMAL, MAX_TEMPERATURE, "K");
    }
}
