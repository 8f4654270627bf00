package org.convgrid.engine.structure;

import org.convgrid.engine.convection.ConvectiveGradient;
import org.convgrid.engine.convection.LedouxGradient;
import org.convgrid.engine.convection.LocalConvectionState;
import org.convgrid.engine.convection.MixingLengthSolution;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.atmosphere.SurfaceCondition;
import org.convgrid.engine.physics.eos.EosAtComposition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.opacity.OpacityAtComposition;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

import java.util.List;

/**
 * The four stellar-structure equations in mass (Kippenhahn, Weigert &amp; Weiss 2012, ch. 10-12) as a
 * {@link DifferenceSystem}; unknowns per point: ln r, ln rho, ln T and L / L_scale. Density rather than pressure
 * is the unknown so the equation of state is only called in its cheap direction (rho, T) -&gt; P.
 *
 * <p>On interval (a, b) = (k, k + 1), with Dm its mass, bars meaning the mean of ln quantities (Henyey
 * relaxation, Henyey, Forbes &amp; Gould 1964, ApJ 139, 306; Kippenhahn, Weigert &amp; Weiss 2012, ch. 12):
 * <ol>
 * <li>mass: (r_b^3 - r_a^3) 4 pi rho_bar / (3 Dm) - 1 = 0</li>
 * <li>hydrostatic: ln P_b - ln P_a + G m_bar Dm / (4 pi r_a^2 r_b^2 P_bar) = 0</li>
 * <li>energy: (L_b - L_a - Dm (eps_a + eps_b)/2) / L_scale = 0, eps = eps_nuc + extra (e.g. eps_grav)</li>
 * <li>transport: ln T_b - ln T_a - (nabla_a + nabla_b)/2 (ln P_b - ln P_a) = 0</li>
 * </ol>
 * Centre (point 0 at a small mass m_0): 4 pi r_0^3 rho_0 / (3 m_0) = 1 and L_0 = eps_0 m_0 (the leading terms
 * of the series expansion about the centre, derived; cf. Kippenhahn, Weigert &amp; Weiss 2012). Surface: ln P
 * and ln T equal the {@link
 * org.convgrid.engine.physics.atmosphere.SurfaceBoundary} values at Teff = (L/(4 pi R^2 sigma))^(1/4) and
 * g = G M/R^2.
 *
 * <p>nabla = nabla_rad = 3 kappa L P/(16 pi a c G m T^4) where stable; where nabla_rad exceeds nabla_ad
 * (Schwarzschild) or nabla_ad + nabla_mu/delta (Ledoux, ideal-gas phi = 1) the convection model gives nabla.
 * Jacobians: analytic in radiative points (from the EOS chi's, the opacity/rate logarithmic derivatives and
 * {@link ExtraEnergy#withSlopes}); in convective points the chain rule through the convection model's slopes
 * ({@link org.convgrid.engine.convection.ConvectiveTransport#withSlopes}) with the changes of nabla_ad, c_P and
 * delta taken as one-sided differences of the equation of state (one-sided differences of the whole local
 * evaluation for a convection model without slopes); one-sided differences of an extra source without analytic
 * slopes, everywhere; eps through the slaved abundances (so the iteration stays quadratic) analytically where
 * the composition rule and network give it ({@link ShellComposition#atWithBurning}), else by one-sided differences
 * where burning matters. The equation of state starts each point's solve from that point's previous state. Not thread-safe
 * (scratch space).
 */
public final class StructureEquations implements DifferenceSystem {

    /** The unknowns of a point, in their order in the solution vector. */
    private static final List<String> UNKNOWN_NAMES = List.of("ln r", "ln rho", "ln T", "L / L_scale");

    /** Relative step of the one-sided differences in ln rho, ln T and ln r. */
    static final double DIFFERENCE_STEP = 1.0e-6;
    /**
     * Where eps M / L_scale exceeds this, the derivatives of eps include the change of slaved abundances
     * (one-sided differences, for a rule without analytic slopes); elsewhere burning is too weak for it to matter.
     */
    static final double SLAVED_BURNING_THRESHOLD = 1.0e-4;
    private static final double FOUR_PI = 4.0 * Math.PI;

    private final MassMesh mesh;
    private final Composition[] composition;
    private final PhysicsSet physics;
    private final double luminosityScale;
    private final double[] nablaMu;
    private final ExtraEnergy extra;
    private final double burningFactor;
    private final ShellComposition compositionRule;
    private final int n;

    private final EosState[] eos;
    /** The equation of state at each point's composition (made again when the composition changes). */
    private final EosAtComposition[] eosAtComposition;
    /** The opacity at each point's composition (made again when the composition changes). */
    private final OpacityAtComposition[] opacityAtComposition;
    private final OpacityValue[] opacity;
    private final ConvectiveGradient[] convection;
    /** The convection model's slopes at each convective point, null where it gives none or the point is stable. */
    private final MixingLengthSolution[] convectionSlopes;
    private final double[] nablaRad;
    private final double[] nablaStability;
    private final double[] epsNuclear;
    private final double[] eps;
    private final double[] dEps;
    private final double[] nabla;
    private final double[] dNabla;
    /**
     * r and ln P per point of the evaluation, for the interval equations: each point's exp and log were taken twice
     * there (as the outer end of one interval and the inner end of the next), and r once more in the point's own
     * evaluation. The same values, taken once.
     */
    private final double[] radius;
    private final double[] lnPressure;
    /**
     * Per point, the equation of state's differenced second derivatives last taken there (this solve's, or the
     * previous model's), null when none. Why: the two equation-of-state calls they cost at every convective point
     * and derivative evaluation were 41 % of all calls of the 1 Msun, Z = 0.02 track from birth (~21 % of its CPU);
     * reused while the point stays near ({@link EosCurvature#servesAt}) they are 13 % fewer calls for 5 more Newton
     * iterations out of 645 (figures there).
     */
    private final EosCurvature[] curvature;
    /** Scratch of {@link org.convgrid.engine.physics.nuclear.NuclearNetwork#energy}: eps and its two slopes. */
    private final double[] burning = new double[3];

    /**
     * @param mesh mass coordinates
     * @param composition per point (fixed during the solve)
     * @param physics microphysics, convection and surface boundary
     * @param luminosityScale L_scale, erg s^-1: a typical luminosity (e.g. the guess's surface value)
     * @param nablaMu dln mu/dln P per point for the Ledoux criterion, or null for zero (homogeneous star)
     * @param extra energy source besides burning, {@link ExtraEnergy#NONE} for thermal equilibrium
     */
    public StructureEquations(MassMesh mesh, Composition[] composition, PhysicsSet physics, double luminosityScale,
                              double[] nablaMu, ExtraEnergy extra) {
        this(mesh, composition, physics, luminosityScale, nablaMu, extra, 1.0);
    }

    /**
     * As above, with the nuclear energy generation multiplied by {@code burningFactor}: a homotopy parameter for
     * cold starts (a guess is first relaxed with the burning rescaled to match its luminosity, then the factor is
     * walked back to one). Models are only physical with the factor one.
     */
    public StructureEquations(MassMesh mesh, Composition[] composition, PhysicsSet physics, double luminosityScale,
                              double[] nablaMu, ExtraEnergy extra, double burningFactor) {
        this(mesh, composition, physics, luminosityScale, nablaMu, extra, burningFactor, null);
    }

    /**
     * As above, with the composition of every shell recomputed from its trial state at each evaluation
     * ({@code compositionRule}, e.g. 3He and CN at local equilibrium for a zero-age model), or kept fixed when
     * the rule is null. The Jacobian follows the composition's dependence on the state through eps alone (the
     * opacity and equation of state change little with the equilibrium abundances), so the Newton iteration
     * converges to the self-consistent model.
     */
    public StructureEquations(MassMesh mesh, Composition[] composition, PhysicsSet physics, double luminosityScale,
                              double[] nablaMu, ExtraEnergy extra, double burningFactor,
                              ShellComposition compositionRule) {
        this.compositionRule = compositionRule;
        this.burningFactor = burningFactor;
        this.mesh = mesh;
        this.composition = composition.clone();
        this.physics = physics;
        this.luminosityScale = luminosityScale;
        this.n = mesh.size();
        this.nablaMu = nablaMu == null ? new double[n] : nablaMu.clone();
        this.extra = extra;
        this.eos = new EosState[n];
        this.eosAtComposition = new EosAtComposition[n];
        this.opacityAtComposition = new OpacityAtComposition[n];
        this.opacity = new OpacityValue[n];
        this.convection = new ConvectiveGradient[n];
        this.convectionSlopes = new MixingLengthSolution[n];
        this.nablaRad = new double[n];
        this.nablaStability = new double[n];
        this.epsNuclear = new double[n];
        this.eps = new double[n];
        this.dEps = new double[2 * n];
        this.nabla = new double[n];
        this.dNabla = new double[4 * n];
        this.radius = new double[n];
        this.lnPressure = new double[n];
        this.curvature = new EosCurvature[n];
    }

    /**
     * Starts the first evaluation's equation-of-state solve at every point from {@code nearby[k]} (e.g. the
     * previous model's state there) instead of from the fully ionised guess, as later evaluations start from the
     * one before; null entries (or a null array) leave the cold start.
     */
    void startEquationOfStateNear(EosState[] nearby) {
        startNear(nearby, eos, "states");
    }

    /**
     * Starts every point's equation-of-state second derivatives from {@code nearby[k]} (e.g. the previous model's
     * on the same mesh), used while the point stays near where they were taken; null entries (or a null array)
     * leave them to be differenced at the first derivative evaluation.
     */
    void startCurvatureNear(EosCurvature[] nearby) {
        startNear(nearby, curvature, "curvature");
    }

    /** Copies one value per point (null: nothing) into this system's per-point array {@code into}. */
    private <T> void startNear(T[] nearby, T[] into, String what) {
        if (nearby == null) {
            return;
        }
        if (nearby.length != n) {
            throw new IllegalArgumentException("nearby " + what + " for " + nearby.length + " points, expected " + n);
        }
        System.arraycopy(nearby, 0, into, 0, n);
    }

    /** The unknown vector of a model state, L scaled by this system's L_scale. */
    public double[] unknowns(ModelState state) {
        double[] y = new double[4 * n];
        for (int k = 0; k < n; k++) {
            y[4 * k] = state.lnRadius(k);
            y[4 * k + 1] = state.lnDensity(k);
            y[4 * k + 2] = state.lnTemperature(k);
            y[4 * k + 3] = state.luminosity(k) / luminosityScale;
        }
        return y;
    }

    /** The model state of an unknown vector. */
    public ModelState state(double[] y) {
        double[] lnR = new double[n];
        double[] lnRho = new double[n];
        double[] lnT = new double[n];
        double[] lum = new double[n];
        for (int k = 0; k < n; k++) {
            lnR[k] = y[4 * k];
            lnRho[k] = y[4 * k + 1];
            lnT[k] = y[4 * k + 2];
            lum[k] = y[4 * k + 3] * luminosityScale;
        }
        return new ModelState(mesh, composition, lnR, lnRho, lnT, lum);
    }

    @Override
    public int points() {
        return n;
    }

    @Override
    public int variables() {
        return 4;
    }

    @Override
    public String unknownName(int j) {
        return UNKNOWN_NAMES.get(j);
    }

    @Override
    public int centralConditions() {
        return 2;
    }

    @Override
    public double correctionSize(double[] y, int index, double delta) {
        if (index % 4 != 3) {
            return Math.abs(delta);
        }
        // L is linear (it may be ~0 near the centre): relative change, floored at a tenth of the surface value
        double floor = 0.1 * Math.max(Math.abs(y[4 * n - 1]), 1.0e-3);
        return Math.abs(delta) / Math.max(Math.abs(y[index]), floor);
    }

    @Override
    public void evaluate(double[] y, double[] f, BandMatrix jac) {
        for (int k = 0; k < n; k++) {
            evaluatePoint(k, y, jac != null);
        }
        central(y, f, jac);
        for (int k = 0; k < n - 1; k++) {
            interval(k, y, f, jac);
        }
        surface(y, f, jac);
    }

    private void evaluatePoint(int k, double[] y, boolean derivatives) {
        double lnR = y[4 * k];
        double lnRho = y[4 * k + 1];
        double lnT = y[4 * k + 2];
        double lum = y[4 * k + 3] * luminosityScale;
        double rho = Math.exp(lnRho);
        double t = Math.exp(lnT);
        // where the rule and network give them, the composition with eps and its slopes along the slaved
        // abundances in one call (null: the rule alone, eps below, its slopes through the abundances differenced)
        Composition slaved = derivatives && compositionRule != null
                ? compositionRule.atWithBurning(k, rho, t, physics.nuclear(), burning) : null;
        Composition c = slaved != null ? slaved
                : compositionRule == null ? composition[k] : compositionRule.at(k, rho, t);
        // a recomputed composition equal to the last one keeps its opacity and equation of state: the rule gives
        // the same abundances again wherever burning is too slow to move them below round-off (57 % of the point
        // evaluations of a seeded 1 or 1.5 Msun zero-age model), and both are functions of the composition alone
        if (c != composition[k] && !c.equals(composition[k])) {
            composition[k] = c;
            opacityAtComposition[k] = null;
            eosAtComposition[k] = null;
        }
        if (opacityAtComposition[k] == null || eosAtComposition[k] == null) {
            bind(k, c);
        }
        EosAtComposition equationOfState = eosAtComposition[k];
        // the previous iteration's state of this point starts the equation of state's own solve (none: cold start)
        EosState s = equationOfState.atDensity(rho, t, eos[k]);
        OpacityValue op = opacityAtComposition[k].rosselandMean(rho, t);
        if (slaved == null) {
            physics.nuclear().energy(rho, t, c, burning);
        }
        double epsBurning = burning[0];
        eos[k] = s;
        opacity[k] = op;
        epsNuclear[k] = epsBurning;
        double r = Math.exp(lnR);
        radius[k] = r;
        lnPressure[k] = Math.log(s.pressure());
        nabla[k] = localNabla(k, r, lum, s, op.kappa(), true);
        // the extra source with its analytic derivatives when it has them (null: differentiated numerically below)
        ExtraEnergy.Rate extraRate = derivatives ? extra.withSlopes(k, s) : null;
        double ex = extraRate != null ? extraRate.value() : extra.at(k, s);
        double nuclear = burningFactor * epsBurning;
        eps[k] = nuclear + ex;
        if (!derivatives) {
            return;
        }
        dEps[2 * k] = nuclear * burning[1];
        dEps[2 * k + 1] = nuclear * burning[2];
        if (compositionRule != null && slaved == null
                && nuclear * mesh.totalMass() > SLAVED_BURNING_THRESHOLD * luminosityScale) {
            // the slaved abundances (e.g. equilibrium 3He) change eps with the state: differentiate through them
            double h = DIFFERENCE_STEP;
            double rhoUp = rho * Math.exp(h);
            double tUp = t * Math.exp(h);
            dEps[2 * k] = (burningFactor * physics.nuclear().burn(rhoUp, t, compositionRule.at(k, rhoUp, t)).eps()
                    - nuclear) / h;
            dEps[2 * k + 1] = (burningFactor * physics.nuclear().burn(rho, tUp, compositionRule.at(k, rho, tUp)).eps()
                    - nuclear) / h;
        }
        if (extraRate != null) {
            dEps[2 * k] += extraRate.dLnRho();
            dEps[2 * k + 1] += extraRate.dLnT();
        }
        boolean convective = convection[k] != null && convection[k].convective();
        // d nabla_rad/d(L/L_scale): nabla_rad = C kappa L P/(m T^4) is linear in L
        double radPerLuminosity = LayerGradient.radiative(op.kappa(), luminosityScale, s.pressure(), mesh.mass(k), t);
        if (!convective && extraRate != null) {
            // radiative: nabla = C kappa L P / (m T^4), differentiated analytically
            double nr = nabla[k];
            dNabla[4 * k] = 0.0;
            dNabla[4 * k + 1] = nr * (op.dlnKappaDlnRho() + s.chiRho());
            dNabla[4 * k + 2] = nr * (op.dlnKappaDlnT() + s.chiT() - 4.0);
            dNabla[4 * k + 3] = radPerLuminosity;
            return;
        }
        double h = DIFFERENCE_STEP;
        double stepFactor = Math.exp(h);
        MixingLengthSolution slopes = convectionSlopes[k];
        if (convective && slopes != null && extraRate != null && curvature[k] != null
                && curvature[k].servesAt(lnRho, lnT)) {
            // the second derivatives differenced nearby serve the Jacobian
            convectiveSlopes(k, s, op, slopes, radPerLuminosity);
            return;
        }
        // the perturbed states start from the unperturbed one (one or two neutrality steps each)
        EosState sRho = equationOfState.atDensity(rho * stepFactor, t, s);
        EosState sT = equationOfState.atDensity(rho, t * stepFactor, s);
        curvature[k] = differenced(s, sRho, sT, lnRho, lnT);
        if (extraRate == null) {
            dEps[2 * k] += (extra.at(k, sRho) - ex) / h;
            dEps[2 * k + 1] += (extra.at(k, sT) - ex) / h;
        }
        if (!convective) {
            dNabla[4 * k] = 0.0;
            dNabla[4 * k + 1] = nabla[k] * (op.dlnKappaDlnRho() + s.chiRho());
            dNabla[4 * k + 2] = nabla[k] * (op.dlnKappaDlnT() + s.chiT() - 4.0);
            dNabla[4 * k + 3] = radPerLuminosity;
        } else if (slopes != null) {
            convectiveSlopes(k, s, op, slopes, radPerLuminosity);
        } else {
            // a convection model without slopes: one-sided differences of the whole local evaluation (the
            // opacity follows its own analytic slopes)
            double kappaRho = op.kappa() * Math.exp(op.dlnKappaDlnRho() * h);
            double kappaT = op.kappa() * Math.exp(op.dlnKappaDlnT() * h);
            double base = nabla[k];
            dNabla[4 * k] = (localNabla(k, r * stepFactor, lum, s, op.kappa(), false) - base) / h;
            dNabla[4 * k + 1] = (localNabla(k, r, lum, sRho, kappaRho, false) - base) / h;
            dNabla[4 * k + 2] = (localNabla(k, r, lum, sT, kappaT, false) - base) / h;
            double dl = h * Math.max(Math.abs(y[4 * k + 3]), 1.0e-3);
            dNabla[4 * k + 3] = (localNabla(k, r, lum + dl * luminosityScale, s, op.kappa(), false) - base) / dl;
        }
    }

    /**
     * Binds the opacity and the equation of state at point k to its composition c: the inner neighbour's where it
     * has the same composition, made afresh otherwise. Why: every point of a mixed zone holds one composition (the
     * convective envelope of a 1 Msun star), and binding each point's own was ~6 % of a 1 Msun zero-age track's
     * CPU (JFR, mostly the opacity tables' weights, 2 % after this); sharing the neighbour's saves 103 000 of the
     * 178 000 bindings of a 1 Msun, Z = 0.02 zero-age model, its track and the track from birth (carrying them from
     * the previous model where a point's composition is unchanged would save 2 000 more: burning moves nearly
     * every radiative point's). Both are functions of the composition alone, so whose copy serves changes no
     * result. Points are evaluated in order, so the neighbour is bound already.
     */
    private void bind(int k, Composition c) {
        if (k > 0 && opacityAtComposition[k - 1] != null && eosAtComposition[k - 1] != null
                && (composition[k - 1] == c || composition[k - 1].equals(c))) {
            opacityAtComposition[k] = opacityAtComposition[k - 1];
            eosAtComposition[k] = eosAtComposition[k - 1];
            return;
        }
        if (opacityAtComposition[k] == null) {
            opacityAtComposition[k] = physics.opacity().atComposition(c);
        }
        if (eosAtComposition[k] == null) {
            eosAtComposition[k] = physics.eos().atComposition(c);
        }
    }

    /**
     * The convective gradient's derivatives by the chain rule through the convection model's own slopes:
     * d nabla = N_rad d nabla_rad + N_ad d nabla_ad + N_U d ln U, with nabla_rad = C kappa L P/(m T^4) and
     * U proportional to T^3 rho^-1/2 P^-3/2 g delta^-1/2/(c_P kappa) at fixed alpha (the U of Kippenhahn, Weigert
     * &amp; Weiss 2012, ch. 7, with H_P = P/(rho g) and l_m = alpha H_P written out), g = G m/r^2. The changes of
     * nabla_ad, c_P and delta with the state (second derivatives of the equation of state) are one-sided
     * differences over the neighbouring states sRho and sT, taken at this point near its present ln rho and ln T
     * ({@link EosCurvature#servesAt}); everything else is analytic.
     */
    private void convectiveSlopes(int k, EosState s, OpacityValue op, MixingLengthSolution slopes,
                                  double radPerLuminosity) {
        double rad = nablaRad[k];
        double nRad = slopes.dNablaDNablaRad();
        double nAd = slopes.dNablaDNablaAd();
        double nU = slopes.dNablaDLnU();
        // ln g = ln(G m) - 2 ln r; nothing else in nabla depends on r
        dNabla[4 * k] = -2.0 * nU;
        EosCurvature c = curvature[k];
        dNabla[4 * k + 1] = gradientSlope(rad, nRad, nAd, nU, c.dNablaAdDLnRho(), c.dLnCpDLnRho(),
                c.dLnDeltaDLnRho(), op.dlnKappaDlnRho(), s.chiRho(), 0.0, 1.0);
        dNabla[4 * k + 2] = gradientSlope(rad, nRad, nAd, nU, c.dNablaAdDLnT(), c.dLnCpDLnT(), c.dLnDeltaDLnT(),
                op.dlnKappaDlnT(), s.chiT(), 1.0, 0.0);
        dNabla[4 * k + 3] = nRad * radPerLuminosity;
    }

    /**
     * d nabla/d x for x = ln rho (dLnT = 0, dLnRho = 1) or ln T (dLnT = 1, dLnRho = 0) at fixed r and L, from
     * the logarithmic slopes of kappa and P in x and the changes of nabla_ad, ln c_P and ln delta in x.
     */
    private static double gradientSlope(double rad, double nRad, double nAd, double nU, double dAd, double dLnCp,
                                        double dLnDelta, double dLnKappa, double dLnP, double dLnT,
                                        double dLnRho) {
        double dRad = rad * (dLnKappa + dLnP - 4.0 * dLnT);
        double dLnU = 3.0 * dLnT - 0.5 * dLnRho - 1.5 * dLnP - 0.5 * dLnDelta - dLnCp - dLnKappa;
        return nRad * dRad + nAd * dAd + nU * dLnU;
    }

    /** The second derivatives differenced over the states a step further in ln rho and in ln T. */
    private static EosCurvature differenced(EosState s, EosState sRho, EosState sT, double lnRho, double lnT) {
        double h = DIFFERENCE_STEP;
        return new EosCurvature((sRho.nablaAd() - s.nablaAd()) / h, Math.log(sRho.cp() / s.cp()) / h,
                Math.log(sRho.delta() / s.delta()) / h, (sT.nablaAd() - s.nablaAd()) / h,
                Math.log(sT.cp() / s.cp()) / h, Math.log(sT.delta() / s.delta()) / h, lnRho, lnT);
    }

    /** The actual gradient at point k for the given local state; records the convection result when asked. */
    private double localNabla(int k, double r, double lum, EosState s, double kappa, boolean record) {
        double m = mesh.mass(k);
        double t = s.temperature();
        double p = s.pressure();
        double rad = LayerGradient.radiative(kappa, lum, p, m, t);
        double stability = LedouxGradient.stabilityGradient(physics.criterion(), s.nablaAd(),
                LayerGradient.IDEAL_GAS_PHI, s.delta(), nablaMu[k]);
        ConvectiveGradient g = null;
        MixingLengthSolution slopes = null;
        double result = rad;
        if (rad > stability) {
            double gravity = Constants.G * m / (r * r);
            LocalConvectionState local = new LocalConvectionState(t, s.density(), p, gravity, kappa, s.cp(),
                    s.delta(), rad, s.nablaAd(), stability);
            slopes = record ? physics.convection().withSlopes(local) : null;
            g = slopes != null ? slopes.gradient() : physics.convection().gradient(local);
            result = g.nabla();
        }
        if (record) {
            nablaRad[k] = rad;
            nablaStability[k] = stability;
            convection[k] = g;
            convectionSlopes[k] = slopes;
        }
        return result;
    }

    private void central(double[] y, double[] f, BandMatrix jac) {
        double r0 = radius[0];
        double m0 = mesh.mass(0);
        double ratio = FOUR_PI * r0 * r0 * r0 * Math.exp(y[1]) / (3.0 * m0);
        f[0] = ratio - 1.0;
        f[1] = y[3] - eps[0] * m0 / luminosityScale;
        if (jac != null) {
            jac.add(0, 0, 3.0 * ratio);
            jac.add(0, 1, ratio);
            jac.add(1, 3, 1.0);
            jac.add(1, 1, -dEps[0] * m0 / luminosityScale);
            jac.add(1, 2, -dEps[1] * m0 / luminosityScale);
        }
    }

    private void interval(int k, double[] y, double[] f, BandMatrix jac) {
        int a = 4 * k;
        int b = a + 4;
        double dm = mesh.intervalMass(k);
        double ra = radius[k];
        double rb = radius[k + 1];
        // r_b^3 - r_a^3 without cancellation in the thin outer shells
        double volume = ra * Math.expm1(y[b] - y[a]) * (ra * ra + ra * rb + rb * rb);
        double rhoBar = Math.exp(0.5 * (y[a + 1] + y[b + 1]));
        double massTerm = FOUR_PI * rhoBar / (3.0 * dm);
        int row = intervalRow(k, 0);
        f[row] = volume * massTerm - 1.0;

        double lnPa = lnPressure[k];
        double lnPb = lnPressure[k + 1];
        double mBar = 0.5 * (mesh.mass(k) + mesh.mass(k + 1));
        double hydro = Constants.G * mBar * dm / (FOUR_PI * ra * ra * rb * rb * Math.exp(0.5 * (lnPa + lnPb)));
        f[row + 1] = lnPb - lnPa + hydro;

        f[row + 2] = y[b + 3] - y[a + 3] - 0.5 * (eps[k] + eps[k + 1]) * dm / luminosityScale;

        double nablaBar = 0.5 * (nabla[k] + nabla[k + 1]);
        double dLnP = lnPb - lnPa;
        f[row + 3] = y[b + 2] - y[a + 2] - nablaBar * dLnP;

        if (jac == null) {
            return;
        }
        int ca = column(k, 0);
        int cb = column(k + 1, 0);
        jac.add(row, ca, -3.0 * ra * ra * ra * massTerm);
        jac.add(row, cb, 3.0 * rb * rb * rb * massTerm);
        jac.add(row, ca + 1, 0.5 * volume * massTerm);
        jac.add(row, cb + 1, 0.5 * volume * massTerm);

        double pRhoA = eos[k].chiRho();
        double pTA = eos[k].chiT();
        double pRhoB = eos[k + 1].chiRho();
        double pTB = eos[k + 1].chiT();
        jac.add(row + 1, ca, -2.0 * hydro);
        jac.add(row + 1, cb, -2.0 * hydro);
        jac.add(row + 1, ca + 1, -(1.0 + 0.5 * hydro) * pRhoA);
        jac.add(row + 1, ca + 2, -(1.0 + 0.5 * hydro) * pTA);
        jac.add(row + 1, cb + 1, (1.0 - 0.5 * hydro) * pRhoB);
        jac.add(row + 1, cb + 2, (1.0 - 0.5 * hydro) * pTB);

        double e = 0.5 * dm / luminosityScale;
        jac.add(row + 2, ca + 3, -1.0);
        jac.add(row + 2, cb + 3, 1.0);
        jac.add(row + 2, ca + 1, -e * dEps[2 * k]);
        jac.add(row + 2, ca + 2, -e * dEps[2 * k + 1]);
        jac.add(row + 2, cb + 1, -e * dEps[2 * k + 2]);
        jac.add(row + 2, cb + 2, -e * dEps[2 * k + 3]);

        jac.add(row + 3, ca + 2, -1.0);
        jac.add(row + 3, cb + 2, 1.0);
        for (int j = 0; j < 4; j++) {
            jac.add(row + 3, ca + j, -0.5 * dNabla[a + j] * dLnP);
            jac.add(row + 3, cb + j, -0.5 * dNabla[b + j] * dLnP);
        }
        jac.add(row + 3, ca + 1, nablaBar * pRhoA);
        jac.add(row + 3, ca + 2, nablaBar * pTA);
        jac.add(row + 3, cb + 1, -nablaBar * pRhoB);
        jac.add(row + 3, cb + 2, -nablaBar * pTB);
    }

    private void surface(double[] y, double[] f, BandMatrix jac) {
        int s = n - 1;
        double r = radius[s];
        double lum = y[4 * s + 3] * luminosityScale;
        if (!(lum > 0.0)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, "surface luminosity must be positive, got " + lum,
                    "L", lum, 0.0, Double.POSITIVE_INFINITY);
        }
        double teff = Math.pow(lum / (FOUR_PI * r * r * Constants.SIGMA_SB), 0.25);
        double gravity = Constants.G * mesh.totalMass() / (r * r);
        SurfaceCondition bc = physics.surface().at(teff, gravity, composition[s]);
        int row0 = surfaceRow(0);
        f[row0] = lnPressure[s] - bc.lnPressure();
        f[row0 + 1] = y[4 * s + 2] - bc.lnTemperature();
        if (jac == null) {
            return;
        }
        int c = column(s, 0);
        // dln Teff = dlnL/4 - dln r/2, dln g = -2 dln r
        double dTeffDl = 0.25 / y[4 * s + 3];
        jac.add(row0, c, -(-0.5 * bc.dlnPDlnTeff() - 2.0 * bc.dlnPDlnG()));
        jac.add(row0, c + 1, eos[s].chiRho());
        jac.add(row0, c + 2, eos[s].chiT());
        jac.add(row0, c + 3, -bc.dlnPDlnTeff() * dTeffDl);
        jac.add(row0 + 1, c, -(-0.5 * bc.dlnTDlnTeff() - 2.0 * bc.dlnTDlnG()));
        jac.add(row0 + 1, c + 2, 1.0);
        jac.add(row0 + 1, c + 3, -bc.dlnTDlnTeff() * dTeffDl);
    }

    // --- read-out of the last evaluation, for building profiles -------------------------------------------

    /** The equation-of-state second derivatives the last derivative evaluation used at point k, or null. */
    EosCurvature curvatureAt(int k) {
        return curvature[k];
    }

    EosState eosAt(int k) {
        return eos[k];
    }

    OpacityValue opacityAt(int k) {
        return opacity[k];
    }

    /** The convection result at point k, null where the point is stable. */
    ConvectiveGradient convectionAt(int k) {
        return convection[k];
    }

    double nablaAt(int k) {
        return nabla[k];
    }

    double nablaRadAt(int k) {
        return nablaRad[k];
    }

    double nablaStabilityAt(int k) {
        return nablaStability[k];
    }

    /** Total nuclear luminosity of the last evaluation with the burning factor one, erg s^-1 (trapezoid rule). */
    double nuclearLuminosity() {
        double sum = epsNuclear[0] * mesh.mass(0);
        for (int k = 0; k < n - 1; k++) {
            sum += 0.5 * (epsNuclear[k] + epsNuclear[k + 1]) * mesh.intervalMass(k);
        }
        return sum;
    }

    double epsNuclearAt(int k) {
        return epsNuclear[k];
    }

    double luminosityScale() {
        return luminosityScale;
    }

    MassMesh mesh() {
        return mesh;
    }
}
