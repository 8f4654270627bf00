package org.convgrid.engine.evolution;

import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;

/**
 * Semiconvective mixing under the Ledoux criterion: layers with nabla_ad &lt; nabla_rad &lt; nabla_L are mixed
 * by diffusion with D_sc = alpha_sc K_rad/(6 c_P rho) (nabla - nabla_ad)/(nabla_L - nabla), K_rad = 4 a c
 * T^3/(3 kappa rho), nabla = nabla_rad there (Langer, Sugimoto &amp; Fricke 1983, A&amp;A 126, 207).
 * Each species obeys dX/dt = d/dm (S dX/dm), S = (4 pi r^2 rho)^2 D, advanced over the step
 * by one backward-Euler step on the point cells of the mass mesh ({@link PointCells}): the fluxes between
 * cells telescope, so the mass of every species is conserved to rounding (the elimination's rounding grows
 * with S dt/(Dm^2), ~1e-16 times it), and the same matrix for every species keeps the fractions summing to one. D is evaluated on the previous model and carried onto the step
 * mesh by linear interpolation of S in mass; an interface takes the mean of its two points. Stateless.
 */
final class SemiconvectiveMixing {

    private static final double FOUR_PI = 4.0 * Math.PI;
    /** Largest S dt/Dm^2 kept by {@link #capped}. */
    static final double MAX_COUPLING = 1.0e6;

    private SemiconvectiveMixing() {
    }

    /** S = (4 pi r^2 rho)^2 D_sc per point of {@code model}, g^2 s^-1 (0 where not semiconvective). */
    static double[] coefficients(StellarModel model, EquationOfState eos, double alphaSc) {
        StellarProfile p = model.profile();
        int n = p.size();
        double[] s = new double[n];
        for (int k = 0; k < n; k++) {
            double rad = p.nablaRad(k);
            double ad = p.nablaAd(k);
            double ledoux = rad - p.stabilityExcess(k);
            if (p.convective(k) || !(rad > ad) || !(ledoux > rad)) {
                continue;
            }
            double rho = p.density(k);
            double t = p.temperature(k);
            Composition c = model.state().composition(k);
            double cp = eos.atDensity(rho, t, c).cp();
            double conductivity = 4.0 * Constants.A_RAD * Constants.C * t * t * t / (3.0 * p.opacity(k) * rho);
            double d = alphaSc * conductivity / (6.0 * cp * rho) * (rad - ad) / (ledoux - rad);
            double area = FOUR_PI * p.radius(k) * p.radius(k) * rho;
            s[k] = area * area * d;
        }
        return s;
    }

    /** {@code s} (on the mesh of {@code from}) interpolated linearly in mass onto {@code to}. */
    static double[] onMesh(StellarProfile from, double[] s, MassMesh to) {
        int n = from.size();
        double[] out = new double[to.size()];
        int lo = 0;
        for (int j = 0; j < out.length; j++) {
            double m = to.mass(j);
            while (lo < n - 2 && from.mass(lo + 1) <= m) {
                lo++;
            }
            double f = (m - from.mass(lo)) / (from.mass(lo + 1) - from.mass(lo));
            f = Math.max(0.0, Math.min(1.0, f));
            out[j] = s[lo] + f * (s[lo + 1] - s[lo]);
        }
        return out;
    }

    /**
     * One implicit diffusion step of every species over dt.
     *
     * @param s (4 pi r^2 rho)^2 D per point of {@code mesh}, g^2 s^-1
     * @param dt s
     * @return the diffused compositions ({@code composition} itself when s vanishes everywhere)
     */
    static Composition[] diffuse(MassMesh mesh, Composition[] composition, double[] s, double dt) {
        int n = mesh.size();
        double[] w = PointCells.masses(mesh);
        double[] coupling = new double[n - 1];
        boolean any = false;
        for (int k = 0; k < n - 1; k++) {
            double dm = mesh.mass(k + 1) - mesh.mass(k);
            coupling[k] = 0.5 * (s[k] + s[k + 1]) * dt / dm;
            any |= coupling[k] > 0.0;
        }
        if (!any) {
            return composition;
        }
        // tridiagonal (w_k + c_{k-1} + c_k) X_k - c_{k-1} X_{k-1} - c_k X_{k+1} = w_k X_k^old
        double[][] x = new double[n][];
        for (int k = 0; k < n; k++) {
            x[k] = MassFractions.of(composition[k]);
        }
        double[] diag = new double[n];
        for (int k = 0; k < n; k++) {
            diag[k] = w[k] + (k > 0 ? coupling[k - 1] : 0.0) + (k < n - 1 ? coupling[k] : 0.0);
        }
        double[] upper = new double[n];
        double[] pivot = new double[n];
        pivot[0] = diag[0];
        for (int k = 1; k < n; k++) {
            upper[k - 1] = -coupling[k - 1] / pivot[k - 1];
            pivot[k] = diag[k] + coupling[k - 1] * upper[k - 1];
        }
        Composition[] out = new Composition[n];
        double[][] solved = new double[n][MassFractions.ALL];
        for (int i = 0; i < MassFractions.ALL; i++) {
            double[] rhs = new double[n];
            rhs[0] = w[0] * x[0][i] / pivot[0];
            for (int k = 1; k < n; k++) {
                rhs[k] = (w[k] * x[k][i] + coupling[k - 1] * rhs[k - 1]) / pivot[k];
            }
            for (int k = n - 2; k >= 0; k--) {
                rhs[k] -= upper[k] * rhs[k + 1];
            }
            for (int k = 0; k < n; k++) {
                solved[k][i] = Math.max(0.0, rhs[k]);
            }
        }
        for (int k = 0; k < n; k++) {
            if (!touches(k, coupling)) {
                out[k] = composition[k];
                continue;
            }
            // the elimination loses digits in proportion to the coupling over the cell mass; rescaling to a sum
            // of one keeps Composition's check, at a cost in conservation of that rounding size
            double sum = 0.0;
            for (double v : solved[k]) {
                sum += v;
            }
            for (int i = 0; i < MassFractions.ALL; i++) {
                solved[k][i] /= sum;
            }
            out[k] = MassFractions.composition(solved[k]);
        }
        return out;
    }

    /** Whether point k touches a diffusing interface (elsewhere the solve reproduces the input to rounding). */
    private static boolean touches(int k, double[] coupling) {
        return (k > 0 && coupling[k - 1] > 0.0) || (k < coupling.length && coupling[k] > 0.0);
    }

    /**
     * {@code s} on {@code mesh} with every S dt/Dm^2 held to {@link #MAX_COUPLING} (a new array): a coupling this
     * strong already homogenises the cells within the step, and a stronger one only costs conservation (the
     * elimination rounds at ~1e-16 times it).
     */
    static double[] capped(MassMesh mesh, double[] s, double dt) {
        int n = mesh.size();
        double[] out = s.clone();
        for (int j = 0; j < n; j++) {
            double dm = Double.POSITIVE_INFINITY;
            if (j > 0) {
                dm = Math.min(dm, mesh.mass(j) - mesh.mass(j - 1));
            }
            if (j < n - 1) {
                dm = Math.min(dm, mesh.mass(j + 1) - mesh.mass(j));
            }
            out[j] = Math.min(out[j], MAX_COUPLING * dm * dm / dt);
        }
        return out;
    }
}
