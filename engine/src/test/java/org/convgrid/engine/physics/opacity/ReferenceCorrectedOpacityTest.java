package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class ReferenceCorrectedOpacityTest {

    private static final Opacity BASE = AnalyticCompositeOpacity.standard();
    private static final ReferenceCorrectedOpacity OPACITY = ReferenceCorrectedOpacity.opalGn93(BASE);

    @Test
    void reproducesThePublishedTableAtItsNodes() throws IOException {
        // Iglesias & Rogers 1996 (ApJ 464, 943), OPAL GN93 X = 0.70, Z = 0.02 (table 73) and X = 0.35, Z = 0.02
        // (table 47): at every tabulated node of their own composition the corrected opacity is the table
        assertNodes("opal-gn93-x070-z002.txt", 0.70);
        assertNodes("opal-gn93-x035-z002.txt", 0.35);
    }

    private static void assertNodes(String table, double x) throws IOException {
        Composition composition = Composition.scaledSolar(x, 0.02);
        int checked = 0;
        // every node up to log R = FADE_LOG_R_LOW, where the correction is whole
        for (OpalTableNodes.Node node : OpalTableNodes.in(table, -100.0, 100.0, -100.0,
                ReferenceCorrectedOpacity.FADE_LOG_R_LOW)) {
            double model = Math.log10(OPACITY.rosselandMean(node.density(), node.temperature(), composition)
                    .kappa());
            assertThat(model).as("%s log T %s log R %s", table, node.logT(), node.logR())
                    .isCloseTo(node.logKappa(), within(1e-9));
            checked++;
        }
        assertThat(checked).isGreaterThan(200);
    }

    @Test
    void betweenNodesStaysWithinTheNeighbouringTableValues() {
        // OPAL X = 0.70, Z = 0.02 around the base of the solar convective envelope (log T 6.3-6.4, log R -2.0 to
        // -1.5): log kappa 1.127-1.544 at the four nodes (table 73); the interpolated value lies inside that range
        Composition c = Composition.scaledSolar(0.70, 0.02);
        double logT = 6.35;
        double logR = -1.75;
        double rho = Math.pow(10.0, logR + 3.0 * logT - 18.0);
        double logK = Math.log10(OPACITY.rosselandMean(rho, Math.pow(10.0, logT), c).kappa());
        assertThat(logK).isBetween(1.127, 1.544);
    }

    @Test
    void fadesToTheBaseModelInCoolDenseGas() {
        Composition c = Composition.scaledSolar(0.70, 0.02);
        // below log T = 3.70 and above log R = 1.5 there is no table: the base answers alone
        double cool = Math.pow(10.0, 3.65);
        assertThat(OPACITY.rosselandMean(1e-6, cool, c)).isEqualTo(BASE.rosselandMean(1e-6, cool, c));
        double t = 1.0e6;
        double dense = Math.pow(10.0, 1.6 + 18.0 - 3.0 * 6.0);
        assertThat(OPACITY.rosselandMean(dense, t, c)).isEqualTo(BASE.rosselandMean(dense, t, c));
        assertThat(OPACITY.correctionDex(dense, t, c)).isZero();
    }

    @Test
    void derivativesMatchFiniteDifferencesIncludingTheFades() {
        // log T 3.72 and log R 1.2 lie inside the fades, the others inside the table, one outside in log T
        double[][] points = {{3.72, -1.0}, {3.90, -3.0}, {4.55, -0.3}, {5.25, -5.0}, {6.35, -1.8}, {7.05, -1.4},
            {6.6, 1.2}, {8.2, -2.0}};
        for (double x : new double[] {0.2, 0.5, 0.70, 0.9}) {
            Composition c = Composition.scaledSolar(x, 0.014);
            for (double[] p : points) {
                double t = Math.pow(10.0, p[0]);
                double rho = Math.pow(10.0, p[1] + 3.0 * p[0] - 18.0);
                OpacityValue v = OPACITY.rosselandMean(rho, t, c);
                double h = 1e-5;
                double dRho = (Math.log(OPACITY.rosselandMean(rho * Math.exp(h), t, c).kappa())
                        - Math.log(OPACITY.rosselandMean(rho * Math.exp(-h), t, c).kappa())) / (2 * h);
                double dT = (Math.log(OPACITY.rosselandMean(rho, t * Math.exp(h), c).kappa())
                        - Math.log(OPACITY.rosselandMean(rho, t * Math.exp(-h), c).kappa())) / (2 * h);
                assertThat(v.dlnKappaDlnRho()).as("dln kappa/dln rho at %s, X %s", p, x)
                        .isCloseTo(dRho, within(2e-4 * Math.max(1.0, Math.abs(dRho))));
                assertThat(v.dlnKappaDlnT()).as("dln kappa/dln T at %s, X %s", p, x)
                        .isCloseTo(dT, within(2e-4 * Math.max(1.0, Math.abs(dT))));
            }
        }
    }

    @Test
    void isContinuousAcrossTheFadeEdgesAndTheHydrogenRange() {
        Composition c = Composition.scaledSolar(0.70, 0.02);
        double rho = 1e-7;
        double below = OPACITY.rosselandMean(rho, Math.pow(10.0, 3.70 - 1e-9), c).kappa();
        double above = OPACITY.rosselandMean(rho, Math.pow(10.0, 3.70 + 1e-9), c).kappa();
        assertThat(above / below).isCloseTo(1.0, within(1e-6));
        // X outside 0.35-0.70 takes the nearest reference table's correction
        double t = 1.2e7;
        double d = 80.0;
        assertThat(OPACITY.correctionDex(d, t, Composition.scaledSolar(0.20, 0.02)))
                .isCloseTo(OPACITY.correctionDex(d, t, Composition.scaledSolar(0.35, 0.02)), within(1e-12));
        assertThat(OPACITY.correctionDex(d, t, Composition.scaledSolar(0.75, 0.02)))
                .isCloseTo(OPACITY.correctionDex(d, t, Composition.scaledSolar(0.70, 0.02)), within(1e-12));
    }

    @Test
    void smoothStepIsZeroOneAndMonotoneBetween() {
        assertThat(ReferenceCorrectedOpacity.smoothStep(0.0, 0.0, 1.0)).containsExactly(0.0, 0.0);
        assertThat(ReferenceCorrectedOpacity.smoothStep(1.0, 0.0, 1.0)).containsExactly(1.0, 0.0);
        assertThat(ReferenceCorrectedOpacity.smoothStep(0.5, 0.0, 1.0)[0]).isCloseTo(0.5, within(1e-15));
    }
}
