package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;

import org.convgrid.engine.convection.MuGradient;
import org.convgrid.engine.overshoot.StepOvershoot;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.junit.jupiter.api.Test;

/** Step overshoot, semiconvective diffusion and nabla_mu on fixed profiles (no evolution). */
class OvershootMixingTest {

    @Test
    void overshootWidensTheMixedCoreByTheLimitedDistanceAndConservesEverySpecies() {
        StellarModel zams = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 2.0).model();
        StellarProfile p = zams.profile();
        MassMesh mesh = zams.state().mesh();
        int n = mesh.size();
        boolean[] convective = new boolean[n];
        for (int k = 0; k < n; k++) {
            convective[k] = p.convective(k);
        }
        assertThat(convective[0]).isTrue();   // a 2 Msun star has a convective core (KWW 2012, ch. 22)
        assertThat(new StepOvershoot(0.0).mixedPoints(mesh::mass, convective, p)).isEqualTo(convective);
        boolean[] mixed = new StepOvershoot(0.2).mixedPoints(mesh::mass, convective, p);
        int formal = lastOfCore(convective);
        int extended = lastOfCore(mixed);
        assertThat(extended).isGreaterThan(formal);
        // the edge lies at r_core + 0.2 min(H_P, r_core) (common practice for the limit): the
        // last mixed point inside it, the next one outside (one mesh interval of slack for the interpolation)
        double rCore = p.radius(formal);
        double edge = rCore + 0.2 * Math.min(p.pressureScaleHeight(formal), rCore);
        assertThat(p.radius(extended - 1)).isLessThan(edge);
        assertThat(p.radius(extended + 2)).isGreaterThan(edge);

        Composition[] c = TestMeshes.burntCore(mesh);
        Composition[] after = ConvectiveMixing.mix(mesh, c, mixed);
        assertConserved(mesh, c, after, 1e-12);
        assertThat(after[extended]).isEqualTo(after[0]);
        assertThat(after[extended + 1]).isEqualTo(c[extended + 1]);
    }

    @Test
    void semiconvectiveDiffusionConservesSpeciesStaysBoundedAndHomogenisesOverLongSteps() {
        MassMesh mesh = TestMeshes.logit(300, -12, 25);
        Composition[] c = TestMeshes.burntCore(mesh);
        double[] s = new double[mesh.size()];
        int lo = -1;
        int hi = -1;
        for (int k = 0; k < s.length; k++) {
            double q = mesh.fraction(k);
            if (q > 0.1 && q < 0.25) {
                s[k] = 1.0e40;   // g^2 s^-1: of the order of (4 pi r^2 rho)^2 D in a stellar core, any value works
                lo = lo < 0 ? k : lo;
                hi = k;
            }
        }
        Composition[] shortStep = SemiconvectiveMixing.diffuse(mesh, c, s, 1.0e5);
        Composition[] longStep = SemiconvectiveMixing.diffuse(mesh, c, s, 1.0e29);
        assertConserved(mesh, c, shortStep, 1e-12);
        // the elimination's rounding grows with S dt/Dm^2 (~5e8 here): 1e-9 relative
        assertConserved(mesh, c, longStep, 1e-9);
        double min = 1.0;
        double max = 0.0;
        for (int k = lo - 1; k <= hi + 1; k++) {
            min = Math.min(min, c[k].h1());
            max = Math.max(max, c[k].h1());
        }
        for (int k = 0; k < c.length; k++) {
            // a diffusion step obeys the maximum principle (backward Euler, an M-matrix)
            assertThat(shortStep[k].h1()).isBetween(Math.min(c[k].h1(), min) - 1e-12,
                    Math.max(c[k].h1(), max) + 1e-12);
        }
        assertThat(shortStep[0]).isEqualTo(c[0]);   // outside the diffusing layer nothing moves
        // over a long step the coupled layer (the points with S > 0, their interfaces and the two neighbours
        // they touch) tends to its mass-weighted mean
        Composition mean = ConvectiveMixing.mean(PointCells.masses(mesh), c, lo - 1, hi + 1);
        assertThat(longStep[lo].h1()).isCloseTo(mean.h1(), within(1e-5));
        assertThat(longStep[hi].h1()).isCloseTo(mean.h1(), within(1e-5));
    }

    @Test
    void nablaMuVanishesForAHomogeneousStarAndFollowsTheHydrogenProfile() {
        Composition solar = EvolutionFixtures.SOLAR;
        // fully ionised mu of X = 0.7, Y = 0.28, Z = 0.02 is ~0.62 (KWW 2012, ch. 13: mu ~ 0.6 for solar mix)
        assertThat(1.0 / MuGradient.inverseMu(solar)).isCloseTo(0.61, within(0.01));
        // pure ionised hydrogen: mu = 1/2
        assertThat(MuGradient.inverseMu(new Composition(1, 0, 0, 0, 0, 0, 0))).isEqualTo(2.0);
        int n = 50;
        Composition[] same = new Composition[n];
        Composition[] layered = new Composition[n];
        double[] lnP = new double[n];
        for (int k = 0; k < n; k++) {
            same[k] = solar;
            double x = 0.3 + 0.4 * k / (n - 1.0);
            layered[k] = Composition.scaledSolar(x, 0.02);
            lnP[k] = 40.0 - 0.2 * k;
        }
        assertThat(Arrays.stream(MuGradient.of(same, lnP)).map(Math::abs)).containsOnly(0.0);
        double[] mu = MuGradient.of(layered, lnP);
        for (int k = 1; k < n - 1; k++) {
            // mu grows inwards where hydrogen was burnt: nabla_mu > 0 (KWW 2012, ch. 6), and equals the
            // difference quotient of ln mu in ln P to the order of the mesh spacing
            double dLnMu = -Math.log(MuGradient.inverseMu(layered[k + 1]) / MuGradient.inverseMu(layered[k - 1]));
            assertThat(mu[k]).isPositive().isCloseTo(dLnMu / (lnP[k + 1] - lnP[k - 1]), within(0.05 * mu[k]));
        }
    }

    private static int lastOfCore(boolean[] flags) {
        int k = 0;
        while (k + 1 < flags.length && flags[k + 1]) {
            k++;
        }
        return k;
    }

    private static void assertConserved(MassMesh mesh, Composition[] before, Composition[] after,
                                        double tolerance) {
        double[] a = TestMeshes.totals(mesh, before);
        double[] b = TestMeshes.totals(mesh, after);
        for (int s = 0; s < a.length; s++) {
            // exact in arithmetic (fluxes telescope, or a mass-weighted mean); the tolerance is rounding
            assertThat(b[s]).isCloseTo(a[s], within(tolerance * Math.max(a[s], 1e-30)));
        }
    }
}
