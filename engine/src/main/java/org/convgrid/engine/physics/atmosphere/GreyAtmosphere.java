package org.convgrid.engine.physics.atmosphere;

import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.eos.EosAtComposition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityAtComposition;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Pressure and temperature at a fitting optical depth from hydrostatic equilibrium in a plane-parallel grey
 * atmosphere, dP/dtau = g/kappa(P, T(tau)), with T(tau) from a {@link TemperatureTauRelation} and P the total
 * (gas + radiation) pressure (derived; e.g. Kippenhahn, Weigert &amp; Weiss 2012, ch. 10).
 *
 * <p>The radiative force on the gas is kappa F/c with the constant flux F = sigma Teff^4, so the gas pressure
 * obeys dP_gas/dtau = g/kappa - F/c whatever the relation; the total pressure handed to the interior is P_gas +
 * aT^4/3, the EOS's radiation pressure, which in the Eddington approximation has exactly the gradient F/c.
 * (Differentiating aT^4/3 along a relation with a steep Hopf function near tau = 0, such as Krishna Swamy's, would
 * give a spurious force (1 + q') F/c, up to 3.8 F/c, that pushes hot ~50 000 K atmospheres past gravity.)
 * The integration follows the density in ln tau (so that each step calls the EOS forward, never inverting it for
 * rho) from an outer depth tau_0 = {@value #DEFAULT_OUTER_DEPTH}, where
 * P_gas(rho, T(tau_0)) = tau_0 g/kappa(rho, T(tau_0)) is solved by Newton in ln rho: the gas column above tau_0 is
 * taken at its hydrostatic value without the radiative force, an error of at most tau_0 F/c in P. The sensitivities
 * d ln P_gas/d ln Teff and d ln P_gas/d ln g are integrated with the density (variational equations), using the
 * EOS's chi_rho and delta and the opacity's logarithmic derivatives;
 * ln T at the fitting depth is ln Teff + ln(3/4 (tau + q))/4 exactly. Fails with OUT_OF_RANGE where the
 * radiative force outweighs gravity (P_gas driven below {@value #MIN_GAS_PRESSURE_FRACTION} of P), with
 * NOT_CONVERGED when the integration budget runs out, and with the EOS's or opacity's exception where they fail.
 * Each EOS call starts from the state of the previous evaluation of the same integration
 * ({@link EosAtComposition#atDensity(double, double, EosState)}), a deterministic sequence, so a node
 * does not depend on anything outside its own integration. Against the former integration of ln P_gas, which
 * inverted the EOS at each call (~2.4 forward evaluations), the nodes agree to 3e-11 in ln P at tolerance 1e-11
 * and cost ~0.6 instead of ~1.0 ms each, at the same ~415-425 calls per node (AtmosphereNodeProbe, 2026-12-03).
 * Immutable and thread-safe when the EOS and opacity are.
 */
public final class GreyAtmosphere implements SurfaceBoundary {

    /** Optical depth where the integration starts. */
    public static final double DEFAULT_OUTER_DEPTH = 1.0e-4;
    /**
     * Relative and absolute (in ln P) tolerance of the step-size control, chosen against the error of the
     * {@link AtmosphereTable} the nodes feed, 3e-4 to 1e-2 in ln P between nodes. Over the nodes the 200-model
     * zero-age grid visits (default table, log Teff 3.30-4.63, log g 3.55-5.65, Z = 0.004/0.01/0.02/0.03;
     * AtmosphereNodeProbe, 2026-12-03), against a 1e-11 integration, and in EOS and opacity calls per node:
     * <pre>
     * tolerance   calls/node   max |d ln P|       max |d dlnP/dlnTeff|   max |d dlnP/dlng|
     * 1e-9        1022-1047    4.3e-9 - 7.7e-8    2.1e-6 - 9.2e-6        8e-8 - 1.4e-7
     * 1e-8         696-718     1.0e-7 - 2.6e-7    4.8e-5 - 8.7e-5        6.6e-7 - 1.4e-6
     * 1e-7         412-419     1.3e-6 - 4.3e-6    1.9e-4 - 3.5e-4        3.5e-6 - 9.3e-5
     * 3e-7         325-336     6.6e-6 - 1.1e-5    8.1e-4 - 1.3e-3        1.0e-5 - 4.1e-5
     * 1e-6         259-264     1.8e-5 - 4.9e-5    2.0e-3 - 6.6e-3        4.0e-5 - 7.2e-5
     * </pre>
     * At 1e-7 the node error stays 70 times below the table's smallest error and 90 times below its mean over those
     * cells (3.8e-4 - 4.5e-4 in ln P at two points per cell), which moved by less than 1e-6 from 1e-9 to 1e-7; 3e-7
     * would leave only 27 times. The fifth-order pair rather than the eighth: the tabulated opacity is a piecewise
     * bicubic whose second derivatives jump at every table node, where a high-order step is cut short.
     */
    public static final double INTEGRATION_TOLERANCE = 1.0e-7;
    /** Budget of right-hand-side evaluations per integration. */
    public static final int MAX_EVALUATIONS = 20_000;
    /** Newton budget and tolerance (in ln P) for the outer boundary pressure. */
    public static final int MAX_START_ITERATIONS = 50;
    public static final double START_TOLERANCE = 1.0e-13;

    /** Below this P_gas/P with the radiative force winning, the atmosphere is declared super-Eddington. */
    public static final double MIN_GAS_PRESSURE_FRACTION = 1.0e-8;

    private final EquationOfState eos;
    private final Opacity opacity;
    private final TemperatureTauRelation relation;
    private final double fittingDepth;
    private final double tolerance;

    /** Eddington grey atmosphere fitted at its photosphere, tau = 2/3. */
    public GreyAtmosphere(EquationOfState eos, Opacity opacity) {
        this(eos, opacity, new EddingtonGrey(), EddingtonGrey.HOPF);
    }

    /**
     * @param fittingDepth optical depth of the fitting point, in (tau_0, 100]; the relation's
     *        {@link TemperatureTauRelation#photosphericDepth()} fits at its photosphere
     */
    public GreyAtmosphere(EquationOfState eos, Opacity opacity, TemperatureTauRelation relation,
                          double fittingDepth) {
        this(eos, opacity, relation, fittingDepth, INTEGRATION_TOLERANCE);
    }

    /**
     * @param tolerance relative and absolute tolerance of the step-size control in (0, 1e-3]; {@link
     *        #INTEGRATION_TOLERANCE} unless measuring what another one changes
     */
    public GreyAtmosphere(EquationOfState eos, Opacity opacity, TemperatureTauRelation relation,
                          double fittingDepth, double tolerance) {
        this.eos = eos;
        this.opacity = opacity;
        this.relation = relation;
        this.fittingDepth = ConvgridException.requireInRange("fittingDepth", fittingDepth,
                10.0 * DEFAULT_OUTER_DEPTH, 100.0, "");
        this.tolerance = ConvgridException.requireInRange("tolerance", tolerance, 1.0e-14, 1.0e-3, "");
    }

    /** Optical depth of the fitting point. */
    public double fittingDepth() {
        return fittingDepth;
    }

    @Override
    public SurfaceCondition at(double effectiveTemperature, double gravity, Composition composition) {
        ConvgridException.requireInRange("effectiveTemperature", effectiveTemperature, 1.0e3, 1.0e6, "K");
        ConvgridException.requireInRange("gravity", gravity, 1.0, 1.0e10, "cm s^-2");
        Column column = new Column(effectiveTemperature, gravity, composition);
        double[] y = column.start(DEFAULT_OUTER_DEPTH);
        // Fifth order rather than eighth: the tabulated opacity is a piecewise bicubic whose second derivatives jump at
        // every table node and in the blends, and a high-order step is cut short at each such kink; at the same
        // accuracy the fifth-order pair needs less than half the evaluations.
        DormandPrince54Integrator integrator = new DormandPrince54Integrator(1.0e-8, 10.0, tolerance, tolerance);
        integrator.setMaxEvaluations(MAX_EVALUATIONS);
        try {
            integrator.integrate(column, Math.log(DEFAULT_OUTER_DEPTH), y, Math.log(fittingDepth), y);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            // Budget exhausted or step size collapsed: typically P_gas driven to 0 where radiation outweighs gravity.
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                    "atmosphere integration failed within %d evaluations (Teff = %s K, g = %s cm s^-2): %s",
                    MAX_EVALUATIONS, effectiveTemperature, gravity, e.getMessage()), MAX_EVALUATIONS,
                    effectiveTemperature, gravity);
        }
        double t = relation.temperature(fittingDepth, effectiveTemperature);
        EosState end = column.stateAt(Math.exp(y[0]), t);
        double p = end.pressure();
        double b = end.gasPressureFraction();
        return new SurfaceCondition(Math.log(p), Math.log(t), b * y[1] + 4.0 * (1.0 - b), b * y[2], 1.0, 0.0);
    }

    /**
     * The ODE in s = ln tau for y = (ln rho, d ln P_gas/d ln Teff, d ln P_gas/d ln g), one atmosphere.
     * The density rather than the gas pressure is the integrated variable so that each evaluation is one forward
     * call of the EOS (no inversion for rho): with T(tau) given, the gas pressure's equation
     * dP_gas/dtau = g/kappa - F/c, F/c = sigma Teff^4/c, becomes
     * d ln rho/ds = (d ln P_gas/ds - chi_T^gas d ln T/ds)/chi_rho^gas, and with the EOS's total-pressure
     * chi_rho = b chi_rho^gas, chi_T = b chi_T^gas + 4(1 - b), b = P_gas/P,
     * y0' = (b (A - B) - (chi_T - 4(1 - b)) d ln T/ds)/chi_rho, free of 1/b where radiation dominates.
     * The sensitivities stay those of ln P_gas at fixed tau, whose equations need only first derivatives of the
     * EOS and opacity along the solution (those of ln rho would need chi_rho's own derivatives):
     * writing A = tau g/(kappa P_gas), B = tau (F/c)/P_gas, k_P = (dln kappa/dln P)_T =
     * kappa_rho/chi_rho, k_T = (dln kappa/dln T)_P = kappa_T - kappa_rho delta,
     * y1' = A(-k_P(b y1 + 4(1 - b)) - k_T - y1) - B(4 - y1), y2' = A(1 - (1 + k_P b) y2) + B y2.
     */
    private final class Column implements FirstOrderDifferentialEquations {
        private final double teff;
        private final double gravity;
        private final Composition composition;
        private final double fluxOverC;
        /** The EOS and opacity at this composition, prepared once for the integration's few hundred calls. */
        private final EosAtComposition boundEos;
        private final OpacityAtComposition boundOpacity;
        /** The state of the previous call: the next EOS call starts from it (consecutive points lie close). */
        private EosState last;
        /** From the last {@link #evaluate}: its state, the opacity and its derivatives at constant T and at constant P. */
        private EosState state;
        private double kappa;
        private double kappaP;
        private double kappaT;

        Column(double teff, double gravity, Composition composition) {
            this.teff = teff;
            this.gravity = gravity;
            this.composition = composition;
            this.boundEos = eos.atComposition(composition);
            this.boundOpacity = opacity.atComposition(composition);
            this.fluxOverC = Constants.SIGMA_SB * teff * teff * teff * teff / Constants.C;
        }

        @Override
        public int getDimension() {
            return 3;
        }

        @Override
        public void computeDerivatives(double s, double[] y, double[] yDot) {
            double tau = Math.exp(s);
            double t = relation.temperature(tau, teff);
            evaluate(Math.exp(y[0]), t);
            double b = state.gasPressureFraction();
            double pGas = b * state.pressure();
            double a = tau * gravity / (kappa * pGas);
            double r = tau * fluxOverC / pGas;
            if (r > a && b < MIN_GAS_PRESSURE_FRACTION) {
                throw superEddington(tau, kappa);
            }
            yDot[0] = (b * (a - r) - (state.chiT() - 4.0 * (1.0 - b)) * relation.dlnTDlnTau(tau)) / state.chiRho();
            yDot[1] = a * (-kappaP * (b * y[1] + 4.0 * (1.0 - b)) - kappaT - y[1]) - r * (4.0 - y[1]);
            yDot[2] = a * (1.0 - (1.0 + kappaP * b) * y[2]) + r * y[2];
        }

        /**
         * Initial y at tau0: ln rho solving ln P_gas(rho, T0) = ln(tau0 g/kappa(rho, T0)) by Newton in ln rho
         * (slope chi_rho/b + kappa_rho), from the density of an electron-scattering guess for P_gas.
         */
        double[] start(double tau0) {
            double t0 = relation.temperature(tau0, teff);
            double pGuess = tau0 * gravity / 0.2; // electron scattering, kappa ~ 0.2 (1+X)
            double lnRho = Math.log(eos.atPressure(pGuess + radiationPressure(t0), t0, composition).density());
            for (int i = 0; i < MAX_START_ITERATIONS; i++) {
                evaluate(Math.exp(lnRho), t0);
                double b = state.gasPressureFraction();
                double kappaRho = kappaP * state.chiRho();
                double step = (Math.log(b * state.pressure()) - Math.log(tau0 * gravity / kappa))
                        / (state.chiRho() / b + kappaRho);
                lnRho -= step;
                // P_gas = b P carries the rounding of P over b where radiation dominates: the tolerance scales so
                if (Math.abs(step) < START_TOLERANCE / b) {
                    if (gravity / kappa <= fluxOverC) {
                        throw superEddington(tau0, kappa);
                    }
                    // Differentiating P_gas = tau0 g/kappa(P, T) with T proportional to Teff.
                    double denominator = 1.0 + kappaP * b;
                    return new double[] {lnRho, -(4.0 * kappaP * (1.0 - b) + kappaT) / denominator,
                            1.0 / denominator};
                }
            }
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                    "outer atmosphere pressure did not converge in %d iterations (Teff = %s K, g = %s cm s^-2)",
                    MAX_START_ITERATIONS, teff, gravity), MAX_START_ITERATIONS, teff, gravity);
        }

        private ConvgridException superEddington(double tau, double kappa) {
            return new ConvgridException(ErrorKind.OUT_OF_RANGE, String.format(
                    "radiative force exceeds gravity at tau = %s (Teff = %s K, g = %s cm s^-2, kappa = %s cm^2/g)",
                    tau, teff, gravity, kappa), "gravity", gravity, kappa * fluxOverC, Double.POSITIVE_INFINITY);
        }

        /** The EOS state at (rho, T), started from the previous call's. */
        EosState stateAt(double density, double t) {
            EosState s = boundEos.atDensity(density, t, last);
            last = s;
            return s;
        }

        /**
         * Sets {@link #state}, {@link #kappa}, {@link #kappaP} = (dln kappa/dln P)_T and {@link #kappaT} =
         * (dln kappa/dln T)_P at density rho and temperature t (fields rather than a returned array: no allocation
         * per call).
         */
        private void evaluate(double density, double t) {
            state = stateAt(density, t);
            OpacityValue k = boundOpacity.rosselandMean(density, t);
            kappa = k.kappa();
            kappaP = k.dlnKappaDlnRho() / state.chiRho();
            kappaT = k.dlnKappaDlnT() - k.dlnKappaDlnRho() * state.delta();
        }
    }

    private static double radiationPressure(double t) {
        return Constants.A_RAD * t * t * t * t / 3.0;
    }
}
