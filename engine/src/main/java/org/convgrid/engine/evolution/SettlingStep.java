package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarModel;

/**
 * Moves the composition by microscopic diffusion ({@link GravitationalSettling}) over a time step, on the point
 * cells of the mass mesh: first the settling, as explicit upwind fluxes 4 pi r^2 rho X_s v_s through the cell
 * boundaries (helium and the metals sink, hydrogen takes the balancing flux so that no mass moves in all), in as
 * many sub-steps as keep each boundary's flow below half the content of the smaller cell beside it; then the concentration diffusion, one
 * backward-Euler step of dX/dt = d/dm((4 pi r^2 rho)^2 D dX/dm) ({@link SemiconvectiveMixing#diffuse}) with helium's
 * D for helium and the metals' D for the metals, hydrogen taking the balance. Both
 * conserve the mass of every species to rounding (the fluxes telescope); no flux crosses the centre or the
 * surface. Stateless.
 */
final class SettlingStep {

    /** Largest fraction of a cell's content that one sub-step may carry out. */
    static final double MAX_COURANT = 0.5;
    /**
     * Sub-step budget. At a boundary that would need more (thin, fast-settling outer layers) the flows are scaled
     * down to what this many sub-steps carry stably, so settling there is slowed, never unstable.
     */
    static final int MAX_SUBSTEPS = 200;

    private static final int H1 = 0;
    private static final int HE3 = 1;
    private static final int HE4 = 2;
    private static final int FIRST_METAL = 3;

    private SettlingStep() {
    }

    /**
     * @param previous the model whose structure drives the diffusion
     * @param mesh the mesh of {@code composition} (the previous model's or a redistribution of it)
     * @param remeshed whether {@code mesh} differs from the previous model's
     * @param dt s
     */
    static Composition[] apply(StellarModel previous, MassMesh mesh, boolean remeshed, Composition[] composition,
                               boolean[] mixed, double dt) {
        GravitationalSettling.Coefficients c = GravitationalSettling.of(previous);
        var profile = previous.profile();
        int m = profile.size();
        double[] area = new double[m];
        double[] s = new double[m];
        double[] sZ = new double[m];
        for (int k = 0; k < m; k++) {
            area[k] = 4.0 * Math.PI * profile.radius(k) * profile.radius(k) * profile.density(k);
            s[k] = area[k] * area[k] * c.diffusion()[k];
            sZ[k] = area[k] * area[k] * c.metalDiffusion()[k];
        }
        double[] vHe = c.helium();
        double[] vZ = c.metals();
        if (remeshed) {
            area = SemiconvectiveMixing.onMesh(profile, area, mesh);
            s = SemiconvectiveMixing.onMesh(profile, s, mesh);
            sZ = SemiconvectiveMixing.onMesh(profile, sZ, mesh);
            vHe = SemiconvectiveMixing.onMesh(profile, vHe, mesh);
            vZ = SemiconvectiveMixing.onMesh(profile, vZ, mesh);
        }
        Composition[] settled = settle(mesh, composition, area, vHe, vZ, mixed, dt);
        return combine(SemiconvectiveMixing.diffuse(mesh, settled, s, dt),
                SemiconvectiveMixing.diffuse(mesh, settled, sZ, dt));
    }

    /**
     * Helium (and deuterium) from the diffusion with helium's coefficient, the metals (and 7Li) from the one with
     * the metals' coefficient, hydrogen the balance. Each species' diffusion conserves its mass, so the balance
     * conserves hydrogen's.
     */
    static Composition[] combine(Composition[] byHelium, Composition[] byMetals) {
        Composition[] out = new Composition[byHelium.length];
        for (int k = 0; k < out.length; k++) {
            double[] x = MassFractions.of(byHelium[k]);
            double[] metals = MassFractions.of(byMetals[k]);
            for (int i = FIRST_METAL; i <= MassFractions.OTHER_METALS; i++) {
                x[i] = metals[i];
            }
            x[MassFractions.LI7] = metals[MassFractions.LI7];
            double rest = 0.0;
            for (int i = 1; i < MassFractions.ALL; i++) {
                rest += x[i];
            }
            x[H1] = Math.max(0.0, 1.0 - rest);
            double sum = x[H1] + rest;
            for (int i = 0; i < MassFractions.ALL; i++) {
                x[i] /= sum;
            }
            out[k] = MassFractions.composition(x);
        }
        return out;
    }

    /**
     * The explicit upwind settling of helium and metals, hydrogen balancing. No flow is computed between two mixed
     * points (a mixed zone is homogenised right after, so flows inside it would change nothing); a zone exchanges
     * matter only through its edges.
     *
     * @param mixed per point, whether it belongs to an instantaneously mixed zone
     */
    static Composition[] settle(MassMesh mesh, Composition[] composition, double[] area, double[] vHe,
                                double[] vZ, boolean[] mixed, double dt) {
        int n = mesh.size();
        double[] w = PointCells.masses(mesh);
        double[][] x = new double[n][];
        for (int k = 0; k < n; k++) {
            x[k] = MassFractions.of(composition[k]);
        }
        // mass flow rates through the boundary between points k and k+1, g s^-1 per unit mass fraction
        double[] flowHe = new double[n - 1];
        double[] flowZ = new double[n - 1];
        double courant = 0.0;
        double limit = MAX_COURANT * MAX_SUBSTEPS;
        for (int k = 0; k < n - 1; k++) {
            if (mixed[k] && mixed[k + 1]) {
                continue;
            }
            double a = 0.5 * (area[k] + area[k + 1]);
            flowHe[k] = a * 0.5 * (vHe[k] + vHe[k + 1]);
            flowZ[k] = a * 0.5 * (vZ[k] + vZ[k + 1]);
            double donor = Math.min(w[k], w[k + 1]);
            double c = Math.max(Math.abs(flowHe[k]), Math.abs(flowZ[k])) * dt / donor;
            if (c > limit) {
                // a thin, fast-settling layer: slowed at this boundary alone
                flowHe[k] *= limit / c;
                flowZ[k] *= limit / c;
                c = limit;
            }
            courant = Math.max(courant, c);
        }
        int substeps = (int) Math.max(1, Math.ceil(courant / MAX_COURANT));
        double h = dt / substeps;
        double[] flux = new double[MassFractions.ALL];
        for (int step = 0; step < substeps; step++) {
            double[][] next = new double[n][];
            for (int k = 0; k < n; k++) {
                next[k] = x[k].clone();
            }
            for (int k = 0; k < n - 1; k++) {
                double[] up = flowHe[k] >= 0.0 ? x[k] : x[k + 1];
                double[] upZ = flowZ[k] >= 0.0 ? x[k] : x[k + 1];
                flux[HE3] = flowHe[k] * up[HE3];
                flux[HE4] = flowHe[k] * up[HE4];
                double total = flux[HE3] + flux[HE4];
                for (int i = FIRST_METAL; i < MassFractions.ALL; i++) {
                    flux[i] = flowZ[k] * upZ[i];
                    total += flux[i];
                }
                flux[H1] = -total;
                // hydrogen's counter-flow cannot take more than half the hydrogen its donor cell holds (an
                // exhausted core has none to give): the boundary's flows shrink together, so mass stays conserved
                int donorH = flux[H1] >= 0.0 ? k : k + 1;
                double hOut = Math.abs(flux[H1]) * h / w[donorH];
                double hHeld = MAX_COURANT * x[donorH][H1];
                if (hOut > hHeld) {
                    double shrink = hHeld / hOut;
                    for (int i = 0; i < MassFractions.ALL; i++) {
                        flux[i] *= shrink;
                    }
                }
                for (int i = 0; i < MassFractions.ALL; i++) {
                    next[k][i] -= h * flux[i] / w[k];
                    next[k + 1][i] += h * flux[i] / w[k + 1];
                }
            }
            x = next;
        }
        Composition[] out = new Composition[n];
        for (int k = 0; k < n; k++) {
            double sum = 0.0;
            for (int i = 0; i < MassFractions.ALL; i++) {
                x[k][i] = Math.max(0.0, x[k][i]);
                sum += x[k][i];
            }
            for (int i = 0; i < MassFractions.ALL; i++) {
                x[k][i] /= sum;
            }
            out[k] = MassFractions.composition(x[k]);
        }
        return out;
    }
}
