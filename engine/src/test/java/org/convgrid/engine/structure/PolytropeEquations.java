package org.convgrid.engine.structure;

import org.convgrid.engine.units.Constants;

/**
 * A polytropic star, P = K rho^(1 + 1/n), as a {@link DifferenceSystem} for testing the Henyey machinery
 * against the Lane-Emden solutions (Chandrasekhar 1939, ch. IV). There is no energy equation. The unknowns per
 * point are ln r, ln rho and ln K: K is the eigenvalue that makes a star of mass M with the prescribed central
 * density, carried at every point with D ln K = 0 so that the system stays banded.
 *
 * <p>Interval equations: mass and hydrostatic equilibrium in the same discrete form as
 * {@link StructureEquations}, and ln K_b - ln K_a = 0. Centre: 4 pi r_0^3 rho_0/(3 m_0) = 1 and
 * ln rho_0 = ln rho_c. Surface: ln rho = ln rho_s (a tiny density standing in for the zero-density surface).
 */
public final class PolytropeEquations implements DifferenceSystem {

    private static final double FOUR_PI = 4.0 * Math.PI;

    private final MassMesh mesh;
    private final double index;
    private final double lnCentralDensity;
    private final double lnSurfaceDensity;

    /**
     * @param mesh mass coordinates
     * @param index polytropic index n
     * @param centralDensity rho_c, g cm^-3
     * @param surfaceDensity rho at the last point, g cm^-3 (much smaller than rho_c)
     */
    public PolytropeEquations(MassMesh mesh, double index, double centralDensity, double surfaceDensity) {
        this.mesh = mesh;
        this.index = index;
        this.lnCentralDensity = Math.log(centralDensity);
        this.lnSurfaceDensity = Math.log(surfaceDensity);
    }

    @Override
    public int points() {
        return mesh.size();
    }

    @Override
    public int variables() {
        return 3;
    }

    @Override
    public int centralConditions() {
        return 2;
    }

    @Override
    public void evaluate(double[] y, double[] f, BandMatrix jac) {
        int n = mesh.size();
        double gamma = 1.0 + 1.0 / index;
        double r0 = Math.exp(y[0]);
        double ratio = FOUR_PI * r0 * r0 * r0 * Math.exp(y[1]) / (3.0 * mesh.mass(0));
        f[0] = ratio - 1.0;
        f[1] = y[1] - lnCentralDensity;
        if (jac != null) {
            jac.add(0, 0, 3.0 * ratio);
            jac.add(0, 1, ratio);
            jac.add(1, 1, 1.0);
        }
        for (int k = 0; k < n - 1; k++) {
            int a = 3 * k;
            int b = a + 3;
            int row = intervalRow(k, 0);
            double dm = mesh.intervalMass(k);
            double ra = Math.exp(y[a]);
            double rb = Math.exp(y[b]);
            double volume = ra * Math.expm1(y[b] - y[a]) * (ra * ra + ra * rb + rb * rb);
            double massTerm = FOUR_PI * Math.exp(0.5 * (y[a + 1] + y[b + 1])) / (3.0 * dm);
            f[row] = volume * massTerm - 1.0;
            double lnPa = y[a + 2] + gamma * y[a + 1];
            double lnPb = y[b + 2] + gamma * y[b + 1];
            double mBar = 0.5 * (mesh.mass(k) + mesh.mass(k + 1));
            double hydro = Constants.G * mBar * dm / (FOUR_PI * ra * ra * rb * rb * Math.exp(0.5 * (lnPa + lnPb)));
            f[row + 1] = lnPb - lnPa + hydro;
            f[row + 2] = y[b + 2] - y[a + 2];
            if (jac != null) {
                jac.add(row, a, -3.0 * ra * ra * ra * massTerm);
                jac.add(row, b, 3.0 * rb * rb * rb * massTerm);
                jac.add(row, a + 1, 0.5 * volume * massTerm);
                jac.add(row, b + 1, 0.5 * volume * massTerm);
                jac.add(row + 1, a, -2.0 * hydro);
                jac.add(row + 1, b, -2.0 * hydro);
                jac.add(row + 1, a + 1, -(1.0 + 0.5 * hydro) * gamma);
                jac.add(row + 1, a + 2, -(1.0 + 0.5 * hydro));
                jac.add(row + 1, b + 1, (1.0 - 0.5 * hydro) * gamma);
                jac.add(row + 1, b + 2, (1.0 - 0.5 * hydro));
                jac.add(row + 2, a + 2, -1.0);
                jac.add(row + 2, b + 2, 1.0);
            }
        }
        int s = surfaceRow(0);
        f[s] = y[3 * (n - 1) + 1] - lnSurfaceDensity;
        if (jac != null) {
            jac.add(s, 3 * (n - 1) + 1, 1.0);
        }
    }

    /**
     * The Lane-Emden constants of a solution: xi_1 = R/alpha and -xi_1^2 theta'(xi_1) = M/(4 pi alpha^3 rho_c),
     * with alpha^2 = (n + 1) K rho_c^(1/n - 1)/(4 pi G) (Chandrasekhar 1939, ch. IV).
     *
     * @return {xi_1, -xi_1^2 theta'(xi_1)}
     */
    public double[] laneEmdenConstants(double[] y) {
        int n = mesh.size();
        double rhoC = Math.exp(lnCentralDensity);
        double k = Math.exp(y[2]);
        double alpha = Math.sqrt((index + 1.0) * k * Math.pow(rhoC, 1.0 / index - 1.0) / (FOUR_PI * Constants.G));
        double radius = Math.exp(y[3 * (n - 1)]);
        return new double[] {radius / alpha, mesh.totalMass() / (FOUR_PI * alpha * alpha * alpha * rhoC)};
    }
}
