package org.convgrid.engine.physics.opacity;

import java.util.Locale;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: the jump the cool join removes, the shipped OPAL GN93 tables without the low-temperature ones (Iglesias
 * &amp; Rogers 1996, ApJ 464, 943) minus the standard analytic radiative terms at log T = 3.75, largest and rms over
 * the log R nodes, per tabulated composition. Run with {@code -Dconvgrid.probe=true}. It was a method of
 * {@link OpalGn93OpacityTest} that asserted nothing (it only printed), so a probe of its own.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class CoolJoinProbe {

    @Test
    void printTheTableMinusAnalyticOffsetAtTheCoolJoin() {
        TabulatedOpacity table = OpalGn93OpacityTest.OPACITY.table();
        Opacity analytic = OpalGn93OpacityTest.ANALYTIC;
        double[] out = new double[3];
        for (int k = 0; k < table.tableCount(); k++) {
            Composition c = Composition.scaledSolar(table.hydrogen(k), table.metals(k));
            double worst = 0.0;
            double sum = 0.0;
            int n = 0;
            for (double logR : table.logR()) {
                if (table.interpolate(3.75, logR, c.x(), c.z(), out) != TabulatedOpacity.ANSWERED) {
                    continue;
                }
                double rho = Math.pow(10.0, logR + 3.0 * (3.75 - 6.0));
                double jump = out[0] - Math.log10(analytic.rosselandMean(rho, Math.pow(10.0, 3.75), c).kappa());
                worst = Math.max(worst, Math.abs(jump));
                sum += jump * jump;
                n++;
            }
            System.out.printf(Locale.ROOT, "join at log T 3.75, X = %.4f Z = %.4g: largest %.3f dex,"
                    + " rms %.3f dex over %d log R nodes%n", c.x(), c.z(), worst, Math.sqrt(sum / Math.max(n, 1)), n);
        }
    }
}
