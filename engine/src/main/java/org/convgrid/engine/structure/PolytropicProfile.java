package org.convgrid.engine.structure;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.state.Composition;

/**
 * A Lane-Emden solution resampled onto a mass mesh for starting models: mass fractions (interior and exterior,
 * each precise in its own half), xi and theta at every point. Points are spread evenly in the cost
 * |D ln theta| (n+1)/0.05 + |D m/M|/0.001 + |D ln xi|/0.01 + |D ln(1 - m/M)|/1 (the interior weights are
 * high because the second-order scheme needs ~1000 points there for 1e-4 accuracy in xi_1); an
 * analytic outer extension theta = |theta'_1| (xi_1 - xi) continues the table down to the requested surface
 * theta. Immutable.
 */
public final class PolytropicProfile {

    private static final double OUTER_LN_THETA_STEP = 0.05;

    private final double[] q;
    private final double[] exterior;
    private final double[] xi;
    private final double[] theta;
    private final double massConstant;
    private final LaneEmden solution;

    private PolytropicProfile(double[] q, double[] exterior, double[] xi, double[] theta, double massConstant,
                              LaneEmden solution) {
        this.q = q;
        this.exterior = exterior;
        this.xi = xi;
        this.theta = theta;
        this.massConstant = massConstant;
        this.solution = solution;
    }

    /**
     * @param le the Lane-Emden table
     * @param points number of mesh points
     * @param centralFraction m/M of the first point
     * @param surfaceTheta theta at the last point (the surface)
     */
    public static PolytropicProfile of(LaneEmden le, int points, double centralFraction, double surfaceTheta) {
        double n = le.index();
        int last = le.size() - 1;
        double x1 = le.firstZero();
        double slope1 = -le.massConstant() / (x1 * x1);
        // exterior dimensionless mass, integrated inward from the analytic tail
        double[] ext = new double[le.size()];
        ext[last] = tail(x1, slope1, n, x1 - le.xi(last));
        for (int i = last - 1; i >= 0; i--) {
            double fa = le.xi(i) * le.xi(i) * Math.pow(le.theta(i), n);
            double fb = le.xi(i + 1) * le.xi(i + 1) * Math.pow(le.theta(i + 1), n);
            ext[i] = ext[i + 1] + 0.5 * (le.xi(i + 1) - le.xi(i)) * (fa + fb);
        }
        double total = ext[0];
        List<double[]> fine = new ArrayList<>();
        double x0 = Math.cbrt(3.0 * centralFraction * total);
        fine.add(new double[] {x0, 1.0 - x0 * x0 / 6.0, centralFraction, 1.0 - centralFraction});
        double th = 1.0;
        for (int i = 1; i <= last; i++) {
            if (le.xi(i) <= x0) {
                continue;
            }
            if (le.theta(i) <= surfaceTheta) {
                break;
            }
            th = le.theta(i);
            double qi = le.mass(i) / total;
            double ei = ext[i] / total;
            fine.add(new double[] {le.xi(i), le.theta(i), qi < 0.5 ? qi : 1.0 - ei, qi < 0.5 ? 1.0 - qi : ei});
        }
        while (th > surfaceTheta) {
            th = Math.max(surfaceTheta, th * Math.exp(-OUTER_LN_THETA_STEP));
            double x = x1 - th / Math.abs(slope1);
            double e = tail(x1, slope1, n, x1 - x) / total;
            fine.add(new double[] {x, th, 1.0 - e, e});
        }
        int m = fine.size();
        double[] cumulative = new double[m];
        for (int i = 1; i < m; i++) {
            double[] a = fine.get(i - 1);
            double[] b = fine.get(i);
            cumulative[i] = cumulative[i - 1] + (n + 1) * Math.abs(Math.log(b[1] / a[1])) / 0.05
                    + Math.abs(b[2] - a[2]) / 0.001 + Math.abs(Math.log(b[0] / a[0])) / 0.01
                    + Math.abs(Math.log(b[3] / a[3])) + 1.0e-9;
        }
        double[] q = new double[points];
        double[] e = new double[points];
        double[] xs = new double[points];
        double[] ths = new double[points];
        int i = 0;
        for (int j = 0; j < points; j++) {
            double target = cumulative[m - 1] * j / (points - 1);
            while (i < m - 2 && cumulative[i + 1] <= target) {
                i++;
            }
            double w = Math.min(1.0, (target - cumulative[i]) / (cumulative[i + 1] - cumulative[i]));
            double[] a = fine.get(i);
            double[] b = fine.get(i + 1);
            xs[j] = Math.exp((1 - w) * Math.log(a[0]) + w * Math.log(b[0]));
            ths[j] = Math.exp((1 - w) * Math.log(a[1]) + w * Math.log(b[1]));
            double qi = Math.exp((1 - w) * Math.log(a[2]) + w * Math.log(b[2]));
            double ei = Math.exp((1 - w) * Math.log(a[3]) + w * Math.log(b[3]));
            q[j] = qi < 0.5 ? qi : 1.0 - ei;
            e[j] = qi < 0.5 ? 1.0 - qi : ei;
        }
        q[0] = centralFraction;
        e[0] = 1.0 - centralFraction;
        q[points - 1] = 1.0;
        e[points - 1] = 0.0;
        return new PolytropicProfile(q, e, xs, ths, total, le);
    }

    /** Exterior dimensionless mass of the linear-theta tail of depth d = xi_1 - xi. */
    private static double tail(double x1, double slope1, double n, double d) {
        return x1 * x1 * Math.pow(Math.abs(slope1), n) * Math.pow(d, n + 1) / (n + 1);
    }

    public int size() {
        return q.length;
    }

    /** m/M. */
    public double fraction(int k) {
        return q[k];
    }

    /** 1 - m/M. */
    public double exteriorFraction(int k) {
        return exterior[k];
    }

    public double xi(int k) {
        return xi[k];
    }

    public double theta(int k) {
        return theta[k];
    }

    /** -xi_1^2 theta'_1 as integrated here (the normalisation of the mass fractions). */
    public double massConstant() {
        return massConstant;
    }

    public LaneEmden solution() {
        return solution;
    }

    /** The mesh of these fractions for a star of the given mass, g. */
    public MassMesh mesh(double totalMass) {
        return MassMesh.ofFractions(totalMass, q, exterior);
    }

    /**
     * A starting state on this profile for a star of the given mass: r = alpha xi, rho = rho_c theta^n, T = T_c
     * theta (ideal gas at constant mu), one composition everywhere, and L(m) from a source per unit mass
     * proportional to theta^sourceExponent (integrated by trapezoids in mass), scaled to {@code luminosity} at the
     * surface. Only a guess for the Henyey relaxation.
     *
     * @param totalMass g
     * @param alpha radius scale R / xi_1, cm
     * @param centralDensity g cm^-3
     * @param centralTemperature K
     * @param sourceExponent p of the source theta^p (1 for a contracting star, n + nu for nuclear burning)
     * @param luminosity surface luminosity, erg s^-1
     */
    public ModelState state(double totalMass, double alpha, double centralDensity, double centralTemperature,
                            double sourceExponent, double luminosity, Composition composition) {
        int points = size();
        double n = solution.index();
        MassMesh mesh = mesh(totalMass);
        double[] lnR = new double[points];
        double[] lnRho = new double[points];
        double[] lnT = new double[points];
        double[] l = new double[points];
        Composition[] comp = new Composition[points];
        double cumulative = 0.0;
        for (int i = 0; i < points; i++) {
            double th = theta(i);
            lnR[i] = Math.log(alpha * xi(i));
            lnRho[i] = Math.log(centralDensity) + n * Math.log(th);
            lnT[i] = Math.log(centralTemperature * th);
            cumulative = i == 0 ? mesh.mass(0) : cumulative
                    + 0.5 * (Math.pow(theta(i - 1), sourceExponent) + Math.pow(th, sourceExponent))
                    * mesh.intervalMass(i - 1);
            l[i] = cumulative;
            comp[i] = composition;
        }
        for (int i = 0; i < points; i++) {
            l[i] *= luminosity / cumulative;
        }
        return new ModelState(mesh, comp, lnR, lnRho, lnT, l);
    }
}
