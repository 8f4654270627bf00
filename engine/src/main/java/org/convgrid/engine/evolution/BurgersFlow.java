package org.convgrid.engine.evolution;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Burgers' (1969) flow equations of a fully ionised multi-species plasma at one point, with the residual heat
 * flows, solved exactly as Thoul, Bahcall &amp; Loeb (1994, ApJ 421, 828, section 2) do: no species is treated as
 * a trace. For every species s (the electrons included, charge -1) the momentum and heat-flow equations are
 * <pre>
 * dp_s/dr + rho_s g - n_s Z_s e E = sum_t K_st (w_t - w_s) + sum_t K_st z_st (m_t r_s - m_s r_t)/(m_s + m_t)
 * (5/2) n_s k dT/dr = (5/2) sum_t K_st z_st m_t/(m_s + m_t) (w_t - w_s) - (2/5) K_ss z''_ss r_s
 *     - sum_t K_st/(m_s + m_t)^2 (3 m_s^2 + m_t^2 z'_st + (4/5) m_s m_t z''_st) r_s
 *     + sum_t K_st m_s m_t/(m_s + m_t)^2 (3 + z'_st - (4/5) z''_st) r_t
 * </pre>
 * (sums over t different from s), closed by no net mass flow, sum rho_s w_s = 0, and no electric current,
 * sum Z_s n_s w_s = 0. The unknowns are the 2N + 2 quantities w_s (velocities relative to the centre of mass),
 * r_s (residual heat flows), e E and g, as in Thoul et al.: with the partial-pressure gradients given, g is
 * the one that satisfies hydrostatic equilibrium of the gas. For Coulomb collisions z_st = 0.6, z'_st = 1.3,
 * z''_st = 2.0 (Burgers 1969, the values Thoul et al. use; from memory). The temperature-gradient term on the
 * left of the heat equations is thermal diffusion: it drives the heavier, more charged ions towards higher
 * temperature, adding to gravitational settling in a star. With {@code heatFlow} false the r_s are set to zero
 * (the equations without thermal diffusion). The system is solved by LU decomposition after scaling every row
 * and column to unit size (its entries span tens of orders of magnitude). Immutable; one instance per point.
 */
final class BurgersFlow {

    /** Burgers' Coulomb collision ratios (class comment). */
    static final double Z1 = 0.6;
    static final double Z2 = 1.3;
    static final double Z3 = 2.0;

    private final double[] mass;
    private final double[] charge;
    private final double[] density;
    private final double kt;
    private final double[][] resistance;

    /**
     * @param mass particle mass of each species, g
     * @param charge charge number of each species (electrons -1)
     * @param density number density of each species, cm^-3 (the plasma neutral: sum Z_s n_s = 0)
     * @param kt k T, erg
     * @param resistance K_st, g cm^-3 s^-1, symmetric, the diagonal K_ss (self-collisions, used in the heat
     *                   equations only)
     */
    BurgersFlow(double[] mass, double[] charge, double[] density, double kt, double[][] resistance) {
        this.mass = mass.clone();
        this.charge = charge.clone();
        this.density = density.clone();
        this.kt = kt;
        this.resistance = new double[resistance.length][];
        for (int i = 0; i < resistance.length; i++) {
            this.resistance[i] = resistance[i].clone();
        }
    }

    /**
     * The velocities of every species relative to the centre of mass.
     *
     * @param dlnDensity d ln n_s/dr of each species, cm^-1
     * @param dlnT d ln T/dr, cm^-1
     * @param heatFlow whether the residual heat flows (and with them thermal diffusion) are included
     * @return w_s, cm s^-1, outward positive
     */
    double[] velocities(double[] dlnDensity, double dlnT, boolean heatFlow) {
        int n = mass.length;
        int size = 2 * n + 2;
        double[][] a = new double[size][size];
        double[] b = new double[size];
        int field = 2 * n;
        int gravity = 2 * n + 1;
        for (int s = 0; s < n; s++) {
            double[] row = a[s];
            for (int t = 0; t < n; t++) {
                if (t == s) {
                    continue;
                }
                double k = resistance[s][t];
                double sum = mass[s] + mass[t];
                row[s] += k;
                row[t] -= k;
                row[n + s] -= k * Z1 * mass[t] / sum;
                row[n + t] += k * Z1 * mass[s] / sum;
            }
            row[field] = -density[s] * charge[s];
            row[gravity] = density[s] * mass[s];
            b[s] = -density[s] * kt * (dlnDensity[s] + dlnT);
        }
        for (int s = 0; s < n; s++) {
            double[] row = a[n + s];
            if (!heatFlow) {
                row[n + s] = 1.0;
                continue;
            }
            row[n + s] = -0.4 * resistance[s][s] * Z3;
            for (int t = 0; t < n; t++) {
                if (t == s) {
                    continue;
                }
                double k = resistance[s][t];
                double sum = mass[s] + mass[t];
                double drag = 2.5 * k * Z1 * mass[t] / sum;
                row[t] += drag;
                row[s] -= drag;
                row[n + s] -= k / (sum * sum)
                        * (3.0 * mass[s] * mass[s] + mass[t] * mass[t] * Z2 + 0.8 * mass[s] * mass[t] * Z3);
                row[n + t] += k * mass[s] * mass[t] / (sum * sum) * (3.0 + Z2 - 0.8 * Z3);
            }
            b[n + s] = 2.5 * density[s] * kt * dlnT;
        }
        for (int s = 0; s < n; s++) {
            a[field][s] = density[s] * mass[s];
            a[gravity][s] = density[s] * charge[s];
        }
        double[] u = solveScaled(a, b);
        double[] w = new double[n];
        System.arraycopy(u, 0, w, 0, n);
        return w;
    }

    /** Solves a u = b with every row, then every column, scaled to a largest entry of 1. */
    private static double[] solveScaled(double[][] a, double[] b) {
        int size = b.length;
        for (int i = 0; i < size; i++) {
            double max = 0.0;
            for (double v : a[i]) {
                max = Math.max(max, Math.abs(v));
            }
            for (int j = 0; j < size; j++) {
                a[i][j] /= max;
            }
            b[i] /= max;
        }
        double[] column = new double[size];
        for (int j = 0; j < size; j++) {
            double max = 0.0;
            for (int i = 0; i < size; i++) {
                max = Math.max(max, Math.abs(a[i][j]));
            }
            column[j] = max;
            for (int i = 0; i < size; i++) {
                a[i][j] /= max;
            }
        }
        RealMatrix matrix = new Array2DRowRealMatrix(a, false);
        double[] u = new LUDecomposition(matrix).getSolver().solve(new ArrayRealVector(b, false)).toArray();
        for (int j = 0; j < size; j++) {
            u[j] /= column[j];
        }
        return u;
    }
}
