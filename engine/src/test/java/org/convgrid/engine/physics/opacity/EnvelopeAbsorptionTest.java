package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class EnvelopeAbsorptionTest extends OpacityContractTest {

    private final EnvelopeAbsorption envelope = new EnvelopeAbsorption();

    @Override
    Opacity opacity() {
        return envelope;
    }

    @Override
    void kappaIsFiniteAndPositive() {
        // kappa_env may underflow to 0 far from its range; it must stay finite and non-negative
        for (double[] q : points()) {
            double k = envelope.rosselandMean(q[0], q[1], Composition.scaledSolar(q[2], q[3])).kappa();
            assertThat(k).isFinite().isGreaterThanOrEqualTo(0.0);
        }
    }

    @Test
    void hydrogenFractionFollowsSahaWhereHydrogenIsMostlyIonised() {
        // Saha equation for hydrogen (Saha 1920; any stellar-atmospheres text): with n_e = n_H y + (He, metals),
        // y^2/(1-y) ~ s when electrons come from hydrogen. y_H = s/(1+s) takes n_e at full ionisation, which is
        // exact in the ionised limit the term is used in (documented approximation), and neutral at 6000 K.
        double rho = 1e-7;
        for (double t : new double[] {2.0e4, 3.0e4}) {
            double y = EnvelopeAbsorption.hydrogenIonisedFraction(rho, t, 0.7);
            double s = y / (1.0 - y);
            double nH = 0.7 * rho / 1.6735575e-24;
            double ne = rho * 1.7 / (2.0 * 1.66053906660e-24);
            double exact = s * ne / nH; // y^2/(1-y) = S/n_H with the same S
            double root = 0.5 * (-exact + Math.sqrt(exact * exact + 4.0 * exact));
            assertThat(y).as("T %s", t).isGreaterThan(0.95).isCloseTo(root, within(0.02));
        }
        assertThat(EnvelopeAbsorption.hydrogenIonisedFraction(rho, 6000.0, 0.7)).isLessThan(1e-6);
    }

    @Test
    void leavesTheCompositeUnchangedInThePhotosphereAndTheDeepInterior() {
        // the term was fitted with the photospheric H^- regime and the interior (log T >= 6.3) held fixed: there
        // it must move the standard composite by less than 1 % (photosphere) and 5 % (interior)
        Composition sun = Composition.scaledSolar(0.7, 0.02);
        Opacity with = AnalyticCompositeOpacity.standard();
        Opacity without = new AnalyticCompositeOpacity(new ElectronScattering(), new KramersFreeFree(),
                new KramersBoundFree(), new HydrogenMinus(), new MolecularOpacity(), new ElectronConduction(),
                AnalyticCompositeOpacity.FITTED_ABSORPTION_DEGENERACY);
        for (double t : new double[] {5000.0, 5800.0, 7000.0}) {
            double rho = 2e-7 * Math.pow(t / 5800.0, 3);
            assertThat(with.rosselandMean(rho, t, sun).kappa() / without.rosselandMean(rho, t, sun).kappa())
                    .as("T %s", t).isBetween(1.0, 1.01);
        }
        for (double t : new double[] {2.2e6, 5e6, 1.5e7}) {
            double rho = 0.03 * Math.pow(t * 1e-6, 3);
            assertThat(with.rosselandMean(rho, t, sun).kappa() / without.rosselandMean(rho, t, sun).kappa())
                    .as("T %s", t).isBetween(1.0, 1.05);
        }
    }

    @Test
    void zBumpScalesWithMetallicity() {
        // the metal term is proportional to Z by construction; at the bump centre it dominates
        double t = Math.pow(10.0, EnvelopeAbsorption.FITTED_LOG_BUMP_TEMPERATURE);
        double rho = 1e-4 * Math.pow(t * 1e-6, 3);
        double rich = envelope.rosselandMean(rho, t, Composition.scaledSolar(0.7, 0.02)).kappa();
        double poor = envelope.rosselandMean(rho, t, Composition.scaledSolar(0.7, 0.002)).kappa();
        assertThat(rich / poor).isBetween(3.0, 10.0);
    }
}
