package org.convgrid.engine.structure;

import java.util.List;

import org.convgrid.engine.state.Composition;

/**
 * Places mesh points where the structure changes fast (Eggleton 1971, MNRAS 151, 351, for the idea of an
 * adaptive mesh; the weights are common practice): every old interval gets a cost
 * |D ln P|/0.05 + |D ln T|/0.03 + |D ln r|/0.08 + |D(m/M)|/0.01 + |D ln(1 - m/M)|/1 (not for the
 * outermost interval, which reaches m = M) + |D L/L_s|/0.02
 * + 2 (499/(N - 1) for N points) at a change of convective state, and the new points divide the cumulative cost
 * evenly. The boundary term is a fixed share of the even share (N - 1 of them), as every other term is by
 * construction: at a fixed 2 it exceeded {@link #UNEVENNESS_LIMIT} times the even share from ~700 points on, and
 * the mesh was redistributed at nearly every step while a convective boundary moved (1 Msun from birth, Z = 0.02:
 * 12 / 45 / 55 of the 57 steps before 10 Myr at 500 / 700 / 1000 points, now 12 / 13 / 13, 14 at 2000), which
 * made the ages change with the number of points in jumps (MeshConvergenceProbe). At the default 500 points
 * nothing changes. The structure is
 * carried over by linear interpolation in that cost coordinate (equivalently in ln P, ln T, ... where they
 * dominate). Immutable and thread-safe.
 */
public final class MeshPlanner {

    /** Default number of mesh points. */
    public static final int DEFAULT_POINTS = 500;
    /** Remesh when some interval costs more than this many times the even share. */
    public static final double UNEVENNESS_LIMIT = 2.5;

    // the change across an interval that costs 1, per term
    /** |D ln P| per unit cost. */
    private static final double STEP_LN_P = 0.05;
    /** |D ln T| per unit cost. */
    private static final double STEP_LN_T = 0.03;
    /** |D ln r| per unit cost. */
    private static final double STEP_LN_R = 0.08;
    /** |D(m/M)| per unit cost. */
    private static final double STEP_MASS = 0.01;
    /** |D ln(1 - m/M)| per unit cost (not charged on the outermost interval). */
    private static final double STEP_LN_EXTERIOR = 1.0;
    /** |D L| over the surface luminosity per unit cost. */
    private static final double STEP_LUMINOSITY = 0.02;
    /** Names of the terms of {@link #costTerms}, in order. */
    public static final List<String> COST_TERMS = List.of("lnP", "lnT", "lnr", "m/M", "ln(1-m/M)", "L", "boundary");
    /** Cost of an interval holding a convective boundary at {@link #DEFAULT_POINTS}; scaled as 1/(N - 1). */
    private static final double BOUNDARY_COST = 2.0;
    private static final double MINIMUM_COST = 1.0e-6;
    /** Smallest D ln P assumed for the outermost interval when it is split. */
    private static final double MIN_OUTER_SPAN = 1.0e-3;

    private final int points;
    private final double boundaryCost;

    public MeshPlanner(int points) {
        if (points < 10) {
            throw new IllegalArgumentException("need at least 10 mesh points, got " + points);
        }
        this.points = points;
        this.boundaryCost = BOUNDARY_COST * (DEFAULT_POINTS - 1) / (points - 1);
    }

    public int points() {
        return points;
    }

    /** The cost of an interval where the convective state changes (2 at the default size, scaled as 1/(N - 1)). */
    public double boundaryCost() {
        return boundaryCost;
    }

    /** Whether the model's mesh is uneven enough (or of the wrong size) to be worth redistributing. */
    public boolean needsRemesh(StellarModel model) {
        return needsRemesh(model, null);
    }

    /**
     * As {@link #needsRemesh(StellarModel)}, with an extra cost per interval added to the structure's (e.g. a
     * composition gradient |D X|/0.01, common practice); null for none.
     *
     * @param extraCost one non-negative entry per interval (k, k + 1), or null
     */
    public boolean needsRemesh(StellarModel model, double[] extraCost) {
        double[] cost = costs(model, extraCost);
        double total = 0.0;
        double largest = 0.0;
        for (double c : cost) {
            total += c;
            largest = Math.max(largest, c);
        }
        return model.state().size() != points || largest > UNEVENNESS_LIMIT * total / (points - 1);
    }

    /** The model's state interpolated onto a new mesh of {@link #points()} points. */
    public ModelState remesh(StellarModel model) {
        return remesh(model, null);
    }

    /**
     * As {@link #remesh(StellarModel)}, with an extra cost per interval (see {@link #needsRemesh(StellarModel,
     * double[])}). Compositions are still copied from the nearest old point; callers that need conservation
     * remap them afterwards.
     */
    public ModelState remesh(StellarModel model, double[] extraCost) {
        ModelState old = model.state();
        double[] cost = costs(model, extraCost);
        int n = old.size();
        double[] cumulative = new double[n];
        for (int k = 1; k < n; k++) {
            cumulative[k] = cumulative[k - 1] + cost[k - 1];
        }
        MassMesh mesh = old.mesh();
        // in the outermost interval P - P_surface grows in proportion to M - m (hydrostatic equilibrium at
        // nearly constant g and r), so a point a fraction w of the way in ln P lies at
        // (M - m) = (M - m_{n-2}) (exp((1 - w) d) - 1)/(exp(d) - 1), d = ln(P_{n-2}/P_surface)
        StellarProfile p = model.profile();
        double outerSpan = Math.max(MIN_OUTER_SPAN, Math.log(p.pressure(n - 2) / p.pressure(n - 1)));
        double[] q = new double[points];
        double[] e = new double[points];
        Composition[] comp = new Composition[points];
        double[] lnR = new double[points];
        double[] lnRho = new double[points];
        double[] lnT = new double[points];
        double[] lum = new double[points];
        int k = 0;
        for (int j = 0; j < points; j++) {
            double target = cumulative[n - 1] * j / (points - 1);
            while (k < n - 2 && cumulative[k + 1] <= target) {
                k++;
            }
            double w = Math.min(1.0, Math.max(0.0, (target - cumulative[k]) / (cumulative[k + 1] - cumulative[k])));
            if (j == points - 1) {
                w = 1.0;
            }
            if (k == n - 2) {
                // outermost interval: ln(1 - m/M) runs on past the last interior point
                e[j] = j == points - 1 ? 0.0 : mesh.exteriorFraction(k)
                        * Math.expm1((1.0 - w) * outerSpan) / Math.expm1(outerSpan);
                q[j] = 1.0 - e[j];
            } else {
                double u = (1 - w) * mesh.logit(k) + w * mesh.logit(k + 1);
                q[j] = 1.0 / (1.0 + Math.exp(-u));
                e[j] = 1.0 / (1.0 + Math.exp(u));
            }
            comp[j] = old.composition(w < 0.5 ? k : k + 1);
            lnR[j] = (1 - w) * old.lnRadius(k) + w * old.lnRadius(k + 1);
            lnRho[j] = (1 - w) * old.lnDensity(k) + w * old.lnDensity(k + 1);
            lnT[j] = (1 - w) * old.lnTemperature(k) + w * old.lnTemperature(k + 1);
            lum[j] = (1 - w) * old.luminosity(k) + w * old.luminosity(k + 1);
        }
        q[0] = mesh.fraction(0);
        e[0] = mesh.exteriorFraction(0);
        return new ModelState(MassMesh.ofFractions(mesh.totalMass(), q, e), comp, lnR, lnRho, lnT, lum);
    }

    private double[] costs(StellarModel model, double[] extraCost) {
        StellarProfile p = model.profile();
        MassMesh mesh = model.state().mesh();
        int n = p.size();
        double lumScale = Math.abs(p.luminosity(n - 1));
        double[] cost = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            cost[k] = intervalCost(p, mesh, k, lumScale, null) + MINIMUM_COST
                    + (extraCost == null ? 0.0 : extraCost[k]);
        }
        return cost;
    }

    /**
     * The structure's share of the cost of interval (k, k + 1) of {@code model}: its terms in {@link #COST_TERMS}
     * order, for probes that break the cost down (the composition cost a caller adds is not among them).
     */
    public double[] costTerms(StellarModel model, int k) {
        StellarProfile p = model.profile();
        double[] terms = new double[COST_TERMS.size()];
        intervalCost(p, model.state().mesh(), k, Math.abs(p.luminosity(p.size() - 1)), terms);
        return terms;
    }

    /** The cost of interval (k, k + 1), each term also into {@code terms} when it is not null. */
    private double intervalCost(StellarProfile p, MassMesh mesh, int k, double lumScale, double[] terms) {
        int n = p.size();
        double lnP = Math.abs(Math.log(p.pressure(k + 1) / p.pressure(k))) / STEP_LN_P;
        double lnT = Math.abs(Math.log(p.temperature(k + 1) / p.temperature(k))) / STEP_LN_T;
        double lnR = Math.abs(Math.log(p.radius(k + 1) / p.radius(k))) / STEP_LN_R;
        double mass = Math.abs(mesh.fraction(k + 1) - mesh.fraction(k)) / STEP_MASS;
        double lum = Math.abs(p.luminosity(k + 1) - p.luminosity(k)) / lumScale / STEP_LUMINOSITY;
        double c = lnP + lnT + lnR + mass + lum;
        double exterior = 0.0;
        if (k < n - 2) {
            exterior = Math.abs(Math.log(mesh.exteriorFraction(k) / mesh.exteriorFraction(k + 1))) / STEP_LN_EXTERIOR;
            c += exterior;
        }
        double boundary = 0.0;
        if (p.convective(k) != p.convective(k + 1)) {
            boundary = boundaryCost;
            c += boundary;
        }
        if (terms != null) {
            terms[0] = lnP;
            terms[1] = lnT;
            terms[2] = lnR;
            terms[3] = mass;
            terms[4] = exterior;
            terms[5] = lum;
            terms[6] = boundary;
        }
        return c;
    }
}
