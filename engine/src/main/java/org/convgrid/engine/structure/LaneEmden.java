package org.convgrid.engine.structure;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * A tabulated solution theta(xi) of the Lane-Emden equation
 * (1/xi^2) d/dxi (xi^2 dtheta/dxi) = -theta^n, theta(0) = 1, theta'(0) = 0 (Chandrasekhar 1939, An Introduction
 * to the Study of Stellar Structure, ch. IV), by classical fourth-order Runge-Kutta from the series
 * theta = 1 - xi^2/6 + n xi^4/120 near the centre. Used to build starting models; the structure solver
 * itself is validated against Chandrasekhar's tabulated values, not against this table. Immutable.
 */
public final class LaneEmden {

    /** Integration step in xi. */
    public static final double STEP = 1.0e-3;
    /** Largest xi integrated (covers n &lt;= 4.5). */
    public static final double MAX_XI = 40.0;

    private final double index;
    private final double[] xi;
    private final double[] theta;
    private final double[] slope;
    private final double firstZero;
    private final double slopeAtZero;

    private LaneEmden(double index, double[] xi, double[] theta, double[] slope, double firstZero,
                      double slopeAtZero) {
        this.index = index;
        this.xi = xi;
        this.theta = theta;
        this.slope = slope;
        this.firstZero = firstZero;
        this.slopeAtZero = slopeAtZero;
    }

    /**
     * @param n polytropic index, 0 &lt;= n &lt; 4.5
     */
    public static LaneEmden solve(double n) {
        ConvgridException.requireInRange("polytropic index", n, 0.0, 4.5, "");
        int capacity = (int) (MAX_XI / STEP) + 2;
        double[] x = new double[capacity];
        double[] th = new double[capacity];
        double[] dth = new double[capacity];
        double x0 = STEP;
        x[0] = 0.0;
        th[0] = 1.0;
        dth[0] = 0.0;
        x[1] = x0;
        th[1] = 1.0 - x0 * x0 / 6.0 + n * Math.pow(x0, 4) / 120.0;
        dth[1] = -x0 / 3.0 + n * Math.pow(x0, 3) / 30.0;
        int i = 1;
        while (th[i] > 0.0) {
            if (i + 1 >= capacity) {
                throw new ConvgridException(ErrorKind.NOT_CONVERGED, "Lane-Emden surface beyond xi = " + MAX_XI, n);
            }
            double h = STEP;
            double xa = x[i];
            double ya = th[i];
            double za = dth[i];
            double k1y = za;
            double k1z = rhs(n, xa, ya, za);
            double k2y = za + 0.5 * h * k1z;
            double k2z = rhs(n, xa + 0.5 * h, ya + 0.5 * h * k1y, za + 0.5 * h * k1z);
            double k3y = za + 0.5 * h * k2z;
            double k3z = rhs(n, xa + 0.5 * h, ya + 0.5 * h * k2y, za + 0.5 * h * k2z);
            double k4y = za + h * k3z;
            double k4z = rhs(n, xa + h, ya + h * k3y, za + h * k3z);
            x[i + 1] = xa + h;
            th[i + 1] = ya + h * (k1y + 2 * k2y + 2 * k3y + k4y) / 6.0;
            dth[i + 1] = za + h * (k1z + 2 * k2z + 2 * k3z + k4z) / 6.0;
            i++;
        }
        // zero by linear extrapolation from the last positive point (theta is nearly linear at the surface)
        int last = i - 1;
        double zero = x[last] - th[last] / dth[last];
        return new LaneEmden(n, java.util.Arrays.copyOf(x, i), java.util.Arrays.copyOf(th, i),
                java.util.Arrays.copyOf(dth, i), zero, dth[last]);
    }

    private static double rhs(double n, double x, double y, double z) {
        return -Math.pow(Math.max(y, 0.0), n) - 2.0 * z / x;
    }

    public double index() {
        return index;
    }

    /** Number of tabulated points, all with theta &gt; 0. */
    public int size() {
        return xi.length;
    }

    public double xi(int i) {
        return xi[i];
    }

    public double theta(int i) {
        return theta[i];
    }

    public double slope(int i) {
        return slope[i];
    }

    /** First zero xi_1 of this table. */
    public double firstZero() {
        return firstZero;
    }

    /** -xi_1^2 theta'(xi_1) of this table: the dimensionless mass. */
    public double massConstant() {
        return -firstZero * firstZero * slopeAtZero;
    }

    /** Dimensionless mass -xi^2 theta' inside table point i. */
    public double mass(int i) {
        return -xi[i] * xi[i] * slope[i];
    }
}
