package org.convgrid.engine.physics.nuclear;

/**
 * Salpeter (1954, Aust. J. Phys. 7, 373) screening: the weak (Debye-Huckel) limit and the strong (ion-sphere)
 * limit, joined by a smooth minimum.
 *
 * <ul>
 *   <li>weak: {@code H_w = Z1 Z2 e^2/(lambda_D kT) = 0.188 Z1 Z2 zeta rho^(1/2) T6^(-3/2)}, valid for H_w &lt;&lt; 1;</li>
 *   <li>strong: {@code H_s = 0.9 Gamma_e [(Z1+Z2)^(5/3) - Z1^(5/3) - Z2^(5/3)]
 *       = 0.205 [...] (rho/mu_e)^(1/3) T6^(-1)}, valid for Gamma &gt;~ 1;</li>
 *   <li>joined: {@code H = (H_w^-4 + H_s^-4)^(-1/4)}.</li>
 * </ul>
 * Both limits overestimate the enhancement outside their range, so the smaller one is the better estimate
 * (common practice). The power-4 smooth minimum is our choice: it keeps
 * dH/dlnT continuous for the Newton solver, is within 5 % of min(H_w, H_s) when the two differ by 1.5x
 * (0.2 % in f at the solar centre) and 16 % below both where they are equal. That intermediate regime
 * (H ~ 0.5, centres of ~0.1 Msun stars) is where neither limit holds and the enhancement is uncertain by tens of
 * per cent; Graboske et al. (1973, ApJ 181, 457) treat it properly and are not implemented here.
 */
public final class SalpeterScreening implements Screening {

    /** The shared instance (the class has no state). */
    public static final SalpeterScreening INSTANCE = new SalpeterScreening();

    private static final double ION_SPHERE_FACTOR = 0.9;
    private static final int MAX_CHARGE = 32;
    private static final double[] POW_FIVE_THIRDS = new double[2 * MAX_CHARGE + 1];

    static {
        for (int z = 0; z < POW_FIVE_THIRDS.length; z++) {
            POW_FIVE_THIRDS[z] = Math.pow(z, 5.0 / 3.0);
        }
    }

    private SalpeterScreening() {
    }

    /** H_w for the pair, dimensionless. */
    public static double weakExponent(int z1, int z2, PlasmaState plasma) {
        return z1 * z2 * plasma.debyeCoupling();
    }

    /** H_s for the pair, dimensionless. */
    public static double strongExponent(int z1, int z2, PlasmaState plasma) {
        double charges = POW_FIVE_THIRDS[z1 + z2] - POW_FIVE_THIRDS[z1] - POW_FIVE_THIRDS[z2];
        return ION_SPHERE_FACTOR * charges * plasma.electronCoupling();
    }

    /**
     * H of the blend, and its slopes from those of the limits: H_w ~ rho^(1/2) T^(-3/2) and H_s ~ rho^(1/3) T^(-1)
     * at fixed composition ({@link PlasmaState}), so dlnH = w dlnH_w + (1 - w) dlnH_s with w = (H/H_w)^4. Where
     * either limit vanishes (no plasma coupling) there is no screening.
     */
    @Override
    public void exponentAndSlopes(int z1, int z2, PlasmaState plasma, double[] out) {
        double weak = weakExponent(z1, z2, plasma);
        double strong = strongExponent(z1, z2, plasma);
        if (!(weak > 0.0 && strong > 0.0)) {
            out[0] = 0.0;
            out[1] = 0.0;
            out[2] = 0.0;
            return;
        }
        double h = blend(weak, strong);
        double r = h / weak;
        double w = r * r * r * r;
        out[0] = h;
        out[1] = h * (w * -1.5 + (1.0 - w) * -1.0);
        out[2] = h * (w * 0.5 + (1.0 - w) * (1.0 / 3.0));
    }

    /** dH/d ln H_w = H w and dH/d ln H_s = H (1 - w), w = (H/H_w)^4, as in {@link #exponentAndSlopes}. */
    @Override
    public void couplingSlopes(int z1, int z2, PlasmaState plasma, double[] out) {
        double weak = weakExponent(z1, z2, plasma);
        double strong = strongExponent(z1, z2, plasma);
        if (!(weak > 0.0 && strong > 0.0)) {
            out[0] = 0.0;
            out[1] = 0.0;
            return;
        }
        double h = blend(weak, strong);
        double r = h / weak;
        double w = r * r * r * r;
        out[0] = h * w;
        out[1] = h * (1.0 - w);
    }

    private static double blend(double weak, double strong) {
        double a = 1.0 / weak;
        double b = 1.0 / strong;
        a *= a;
        b *= b;
        return 1.0 / Math.sqrt(Math.sqrt(a * a + b * b));
    }
}
