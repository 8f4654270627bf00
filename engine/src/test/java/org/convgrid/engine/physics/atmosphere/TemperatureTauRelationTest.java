package org.convgrid.engine.physics.atmosphere;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class TemperatureTauRelationTest {

    @Test
    void eddingtonGreyIsTeffAtTwoThirds() {
        // T^4 = (3/4) Teff^4 (tau + 2/3) (Chandrasekhar 1935, Proc. Camb. Phil. Soc. 31, 390).
        EddingtonGrey e = new EddingtonGrey();
        assertThat(e.temperature(2.0 / 3.0, 5772)).isCloseTo(5772, within(1e-9));
        assertThat(e.temperature(0.0, 1.0)).isCloseTo(Math.pow(0.5, 0.25), within(1e-15)); // T0 = 2^(-1/4) Teff
        assertThat(e.photosphericDepth()).isEqualTo(2.0 / 3.0);
    }

    @Test
    void krishnaSwamyPhotosphereAndLimits() {
        KrishnaSwamy ks = new KrishnaSwamy();
        // Photosphere near tau = 0.312 for the Krishna Swamy (1966, ApJ 145, 174) relation: from memory, loose.
        assertThat(ks.photosphericDepth()).isCloseTo(0.312, within(0.002));
        assertThat(ks.temperature(ks.photosphericDepth(), 5772)).isCloseTo(5772, within(1e-9));
        // Deep limit: q -> 1.39, the relation's constant (Krishna Swamy 1966; from memory).
        assertThat(ks.hopf(50.0)).isCloseTo(1.39, within(1e-15));
        // Surface: q(0) = 1.39 - 0.815 - 0.025 = 0.55, so T0/Teff = (0.75 * 0.55)^(1/4) = 0.801 (from memory),
        // cooler than the Eddington 0.841.
        assertThat(ks.temperature(0.0, 1.0)).isCloseTo(0.801, within(0.002));
        // The Hopf function increases monotonically with depth.
        for (double t = 0; t < 5; t += 0.01) {
            assertThat(ks.hopf(t + 0.01)).isGreaterThan(ks.hopf(t));
        }
    }

    @Test
    void hopfSlopeMatchesCentredDifferences() {
        // Analytic derivative against a centred difference (common practice, no published value).
        for (TemperatureTauRelation relation : new TemperatureTauRelation[] {new EddingtonGrey(), new KrishnaSwamy()}) {
            for (double tau = 1e-3; tau < 20; tau *= 1.7) {
                double h = 1e-6 * tau;
                double slope = (relation.hopf(tau + h) - relation.hopf(tau - h)) / (2 * h);
                assertThat(relation.hopfSlope(tau)).as("tau %s", tau).isCloseTo(slope, within(1e-7));
                double lnT = (Math.log(relation.temperature(tau + h, 1.0)) - Math.log(relation.temperature(tau - h, 1.0)))
                        / (Math.log(tau + h) - Math.log(tau - h));
                assertThat(relation.dlnTDlnTau(tau)).isCloseTo(lnT, within(1e-8));
            }
        }
    }
}
