package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.BuoyancyFrequency;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * N^2 ({@link BuoyancyFrequency}) of two stars evolved from birth at Z = 0.02, Y = 0.2771 (the default helium law of
 * {@code convgrid star}): a 1 Msun star at 4.57 Gyr and a 1.4 Msun star at 2 Gyr, whose shrinking convective core
 * has left a hydrogen step behind.
 */
class BuoyancyFrequencyOfSolvedStarsTest {

    private static final double Z = 0.02;
    private static final double Y = 0.2771;

    private static StellarModel star(double massInSun, double ageInGyr) {
        ModelRequest request = new ModelRequest("n2", massInSun * Constants.M_SUN, Z, Y,
                new Age.SinceBirth(ageInGyr * Constants.GYR), PhysicsOptions.DEFAULT);
        return new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request))
                .get(0).model();
    }

    /** The index of the first point of the convective envelope (the surface point when there is none). */
    private static int envelopeBase(StellarProfile p) {
        int k = p.size() - 2;
        while (k > 0 && !p.convective(k)) {
            k--;
        }
        while (k > 0 && p.convective(k - 1)) {
            k--;
        }
        return k;
    }

    @Test
    void theSunLikeStarIsStableWhereRadiativeNeutralWhereConvectiveAndPeaksAtAFewHundredMicrohertz() {
        StellarModel sun = star(1.0, 4.57);
        StellarProfile p = sun.profile();
        double[] n2 = BuoyancyFrequency.squaredOf(sun);
        int base = envelopeBase(p);
        double peak = 0.0;
        for (int k = 0; k < base; k++) {
            // a radiative layer of uniform or inward-heavier composition is stable: N^2 > 0 (Unno et al. 1989,
            // "Nonradial Oscillations of Stars", 2nd ed., from memory)
            assertThat(p.convective(k)).as("radiative interior, point %d", k).isFalse();
            assertThat(n2[k]).as("N^2 at r/R %s", p.radius(k) / p.radius(p.size() - 1)).isPositive();
            peak = Math.max(peak, n2[k]);
        }
        for (int k = base; p.radius(k) < 0.95 * p.radius(p.size() - 1); k++) {
            // efficient convection is adiabatic to a part in 1e5 or better: N^2 ~ 0 (measured |N^2| <= 2.3e-10 s^-2
            // below r/R 0.95, against a peak of 7.8e-6 s^-2 in the radiative interior)
            assertThat(Math.abs(n2[k])).as("|N^2| in the convective envelope, point %d", k).isLessThan(1e-3 * peak);
        }
        double peakMicrohertz = Math.sqrt(peak) / (2.0 * Math.PI) * 1e6;
        // published standard solar models: N/(2 pi) peaks at ~400-500 uHz near r/R 0.1 (Aerts,
        // Christensen-Dalsgaard & Kurtz 2010, ch. 3, the Sun's propagation diagram; from memory)
        assertThat(peakMicrohertz).isBetween(380.0, 520.0);
        // non-regression: 443.6 uHz at r/R 0.095 (measured 2026-12-04)
        assertThat(peakMicrohertz).isCloseTo(443.6, within(1.0));
    }

    @Test
    void theAtmosphereAboveTheEnvelopeHoldsTheEnvelopesCompositionAndIsStable() {
        StellarModel sun = star(1.0, 4.57);
        StellarProfile p = sun.profile();
        double[] n2 = BuoyancyFrequency.squaredOf(sun);
        int last = p.size() - 1;
        int top = last;
        while (!p.convective(top)) {
            top--;
        }
        assertThat(top).as("radiative atmosphere points above the envelope").isLessThan(last);
        // surface abundances are those of the convective envelope (common practice; Kippenhahn, Weigert & Weiss
        // 2012, ch. 30): 3He made in the envelope's lower layers over 4.57 Gyr reaches the photosphere (measured
        // 7.68e-5 throughout, against 3.47e-5 at birth, which the atmosphere kept before it was mixed)
        Composition envelope = sun.state().composition(top);
        for (int k = top + 1; k <= last; k++) {
            Composition c = sun.state().composition(k);
            assertThat(c.he3()).as("3He at point %d", k).isEqualTo(envelope.he3());
            assertThat(c.h1()).as("hydrogen at point %d", k).isEqualTo(envelope.h1());
            // radiative and of uniform composition: stable, N^2 > 0 (Unno et al. 1989, from memory)
            assertThat(n2[k]).as("N^2 at point %d", k).isPositive();
        }
        assertThat(envelope.he3()).isGreaterThan(1.5 * 3.47e-5);
    }

    @Test
    void theHydrogenStepLeftByAShrinkingConvectiveCoreShowsAsACompositionSpike() {
        StellarModel star = star(1.4, 2.0);
        StellarProfile p = star.profile();
        double[] n2 = BuoyancyFrequency.squaredOf(star);
        int top = 0;
        while (p.convective(top + 1)) {
            top++;
        }
        double coreRadius = p.radius(top);
        double radiativePeak = 0.0;
        for (int k = top + 1; k < envelopeBase(p); k++) {
            if (!p.convective(k)) {
                // (Unno et al. 1989, from memory) as for the Sun-like star
                assertThat(n2[k]).as("N^2 at radiative point %d", k).isGreaterThanOrEqualTo(0.0);
                radiativePeak = Math.max(radiativePeak, n2[k]);
            }
        }
        for (int k = 0; k <= top; k++) {
            // the mixed core is adiabatic and homogeneous: N^2 ~ 0 (measured |N^2| <= 1.7e-13 s^-2)
            assertThat(Math.abs(n2[k])).as("|N^2| in the core, point %d", k).isLessThan(1e-6 * radiativePeak);
        }
        // the spike: the largest N^2 within 1.5 core radii, against N^2 at twice the core radius, where hydrogen
        // rises only gently (measured 6.4e-4 s^-2 at r/R 0.062 against 5.3e-6 at r/R 0.119). A mu gradient left
        // by a receding convective core raises N^2 there (Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3; from
        // memory)
        int spike = top + 1;
        int k = top + 1;
        for (; p.radius(k) < 1.5 * coreRadius; k++) {
            if (n2[k] > n2[spike]) {
                spike = k;
            }
        }
        while (p.radius(k) < 2.0 * coreRadius) {
            k++;
        }
        assertThat(n2[spike]).isGreaterThan(10.0 * n2[k]);
        assertThat(p.hydrogen(spike)).isGreaterThan(p.hydrogen(top) + 0.01);
        // it is the composition term: without it, the thermal part alone is a small fraction of the spike
        EosState s = p.eosState(spike);
        double gravity = Constants.G * p.mass(spike) / (p.radius(spike) * p.radius(spike));
        double thermal = BuoyancyFrequency.squared(gravity, p.density(spike), p.pressure(spike), s.chiT(), s.chiRho(),
                s.nablaAd(), p.nabla(spike), 0.0);
        assertThat(thermal).isLessThan(0.2 * n2[spike]);
    }
}
