package org.convgrid.engine.zams;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.LayerGradient;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;

/**
 * The outer envelope of a homology seed integrated again, inward from its surface point, with the new mass's own
 * temperature gradient, where the extrapolation moves the outer convective shells of the neighbours much faster
 * than homology would (their zones end at very different depths). A thin outer convective zone recedes fast with
 * mass (X = 0.7062, Z = 0.0188: its base at 1 - m/M = 3e-6, 8e-8 and 5e-9 at 1.40, 1.45 and 1.50 Msun), so shells
 * that are convective in both neighbours can be radiative at the new mass and no extrapolation in mass at fixed
 * m/M, shell by shell ({@link HomologySeeder}), gets their ln T and ln rho: the 1.50
 * Msun seed was up to 0.42 off there (the interior within ~3e-3) and took 7 Newton iterations against 5 at 1 Msun.
 *
 * <p>The sweep solves the structure solver's hydrostatic and transport difference equations shell by shell
 * (Kippenhahn, Weigert &amp; Weiss 2012, ch. 10: d ln P = -G m dm/(4 pi r^4 P), d ln T = nabla d ln P, the midpoint
 * values of both intervals' ends as the solver takes them; nabla radiative, or from the convection model where
 * nabla_rad exceeds the stability gradient) at the seed's radii, masses, luminosities and compositions, with ln rho
 * corrected through the equation of state's chi_rho and chi_T. Integrated inward, a radiative envelope forgets
 * the errors it starts with, so the shells land near the solution whichever neighbour they resembled: the 1.50
 * Msun seed comes within 0.18 (the superadiabatic layers under the surface) and takes 5 iterations. Immutable and
 * thread-safe.
 */
final class EnvelopeSweep {

    /** The sweep reaches this far (log10(1 - m/M)) below the deepest of the neighbours' and the expected bases. */
    static final double DEPTH_MARGIN_DEX = 0.25;
    /**
     * Only in an outer envelope of at most this fraction of the mass, whose luminosity is the surface one and whose
     * radiative layers follow their own gradient; a deep convective envelope is carried along its adiabat from
     * the top and its extrapolation in mass is the better guess.
     */
    static final double OUTER_ENVELOPE = 1.0e-4;

    private static final double FOUR_PI = 4.0 * Math.PI;
    /**
     * Equation-of-state evaluations per shell: the first from the outer shell's gradient and slopes, then
     * corrections to the midpoint gradient and pressure (measured at 1.50 Msun: 1 leaves 0.24 and 6 iterations,
     * 2 leaves 0.20 and 6, 3 leaves 0.18 and 5; 3 passes over the ~140 swept shells cost ~0.35 of a Newton
     * iteration).
     */
    private static final int PASSES = 3;

    private final PhysicsSet physics;
    /** The solver's gradient of the homogeneous envelope. */
    private final LayerGradient gradient;

    EnvelopeSweep(PhysicsSet physics) {
        this.physics = physics;
        this.gradient = new LayerGradient(physics);
    }

    /**
     * {@code seed} (on the mesh of {@code nearest}, for {@code mass}) with its outer envelope swept where the
     * extrapolation moved a convective shell of the nearer model's outer envelope faster than homology would
     * ({@link HomologySeeder#RECEDING_ZONE_EXPONENT}), down to just below the deepest of the neighbours' outer
     * convective zones and the one expected at {@code mass}; otherwise, when those zones reach deeper than
     * {@link #OUTER_ENVELOPE}, or if the microphysics fails on the way, {@code seed} itself.
     *
     * @param mass the seed's mass, g
     */
    ModelState refine(ModelState seed, StellarModel nearest, StellarModel other, double mass) {
        if (!receding(seed, nearest, mass)) {
            return seed;
        }
        double baseNearest = outerZoneBase(nearest);
        double baseOther = outerZoneBase(other);
        double deepest = baseNearest;
        if (!Double.isNaN(baseOther)) {
            double ratio = Math.log(mass / nearest.mass()) / Math.log(nearest.mass() / other.mass());
            double expected = baseNearest + ratio * (baseNearest - baseOther);
            deepest = Math.max(deepest, Math.max(baseOther, expected));
        }
        double bottomDex = deepest + DEPTH_MARGIN_DEX;
        if (!(bottomDex <= Math.log10(OUTER_ENVELOPE))) {
            return seed;
        }
        int bottom = 0;
        while (bottom < seed.size() - 2 && Math.log10(seed.mesh().exteriorFraction(bottom + 1)) > bottomDex) {
            bottom++;
        }
        try {
            ModelState swept = sweep(seed, bottom);
            return finite(swept) ? swept : seed;
        } catch (ConvgridException e) {
            // only a better guess: the unswept seed still converges, in more iterations
            return seed;
        }
    }

    /**
     * Whether {@code seed} moved ln T of a convective point of the nearer model's outer envelope by more than
     * {@link HomologySeeder#RECEDING_ZONE_EXPONENT} times the ln M step from it.
     */
    private static boolean receding(ModelState seed, StellarModel nearest, double mass) {
        double limit = HomologySeeder.RECEDING_ZONE_EXPONENT * Math.abs(Math.log(mass / nearest.mass()));
        for (int k = seed.size() - 1; k >= 0 && seed.mesh().exteriorFraction(k) < OUTER_ENVELOPE; k--) {
            if (nearest.profile().convective(k)
                    && Math.abs(seed.lnTemperature(k) - nearest.state().lnTemperature(k)) > limit) {
                return true;
            }
        }
        return false;
    }

    /**
     * log10(1 - m/M) at the base of the outermost convective zone of {@code model} (below any radiative layers at
     * the surface) if that zone starts within {@link #OUTER_ENVELOPE} of the surface; NaN if none does.
     */
    static double outerZoneBase(StellarModel model) {
        MassMesh mesh = model.state().mesh();
        int k = model.profile().size() - 1;
        while (k >= 0 && mesh.exteriorFraction(k) < OUTER_ENVELOPE && !model.profile().convective(k)) {
            k--;
        }
        if (k < 0 || mesh.exteriorFraction(k) >= OUTER_ENVELOPE) {
            return Double.NaN;
        }
        while (k > 0 && model.profile().convective(k - 1)) {
            k--;
        }
        return Math.log10(mesh.exteriorFraction(k));
    }

    /**
     * {@code seed} with ln T and ln rho of points {@code bottom + 1} to {@code size - 2} integrated inward from the
     * surface point (kept as it is); radii, luminosities, compositions and mesh unchanged.
     */
    ModelState sweep(ModelState seed, int bottom) {
        int n = seed.size();
        MassMesh mesh = seed.mesh();
        double[] lnRho = seed.lnDensities();
        double[] lnT = seed.lnTemperatures();
        int s = n - 1;
        EosState outer = physics.eos().atDensity(Math.exp(lnRho[s]), Math.exp(lnT[s]), seed.composition(s));
        double nablaOuter = nabla(seed, s, outer);
        for (int a = n - 2; a > bottom; a--) {
            int b = a + 1;
            double lnPb = Math.log(outer.pressure());
            double ra = Math.exp(seed.lnRadius(a));
            double rb = Math.exp(seed.lnRadius(b));
            double mBar = 0.5 * (mesh.mass(a) + mesh.mass(b));
            // hydrostatic interval as the solver writes it: ln P_a - ln P_b = hydro / sqrt(P_a P_b)
            double hydro = Constants.G * mBar * mesh.intervalMass(a) / (FOUR_PI * ra * ra * rb * rb);
            Composition c = seed.composition(a);
            // first guess from the outer point's gradient and equation-of-state slopes
            double lnPa = lnPb + hydro / outer.pressure();
            double lnTa = lnT[b] + nablaOuter * (lnPa - lnPb);
            double lnRhoA = lnRho[b] + ((lnPa - lnPb) - outer.chiT() * (lnTa - lnT[b])) / outer.chiRho();
            EosState inner = physics.eos().atDensity(Math.exp(lnRhoA), Math.exp(lnTa), c, outer);
            double nablaInner = nabla(seed, a, inner);
            for (int pass = 1; pass < PASSES; pass++) {
                double lnPTarget = lnPb + hydro / Math.sqrt(inner.pressure() * outer.pressure());
                double lnTTarget = lnT[b] + 0.5 * (nablaInner + nablaOuter) * (lnPTarget - lnPb);
                lnRhoA += ((lnPTarget - Math.log(inner.pressure())) - inner.chiT() * (lnTTarget - lnTa))
                        / inner.chiRho();
                lnTa = lnTTarget;
                inner = physics.eos().atDensity(Math.exp(lnRhoA), Math.exp(lnTa), c, inner);
                nablaInner = nabla(seed, a, inner);
            }
            lnT[a] = lnTa;
            lnRho[a] = lnRhoA;
            outer = inner;
            nablaOuter = nablaInner;
        }
        return new ModelState(mesh, seed.compositions(), seed.lnRadii(), lnRho, lnT, seed.luminosities());
    }

    /** The actual gradient at point k of {@code seed} in the state {@code s}, as the structure solver takes it. */
    private double nabla(ModelState seed, int k, EosState s) {
        return gradient.nabla(s, seed.composition(k), seed.mesh().mass(k), Math.exp(seed.lnRadius(k)),
                seed.luminosity(k));
    }

    private static boolean finite(ModelState state) {
        for (int k = 0; k < state.size(); k++) {
            if (!Double.isFinite(state.lnDensity(k)) || !Double.isFinite(state.lnTemperature(k))) {
                return false;
            }
        }
        return true;
    }
}
