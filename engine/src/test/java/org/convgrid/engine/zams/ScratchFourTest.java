package org.convgrid.engine.zams;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchFourTest {
    @Test
    void four() {
        var c = ZamsFixtures.withHeliumRelation(Double.parseDouble(System.getProperty("z", "0.0188")));
        for (double m : new double[] {1.0, 0.3, 0.2, 0.15}) {
            long t0 = System.nanoTime();
            ZamsModel z = ZamsFixtures.model(c, m);
            var g = z.model().global();
            var cs = z.model().convection();
            System.out.printf("M=%.2f L=%.4f R=%.4f Teff=%.0f Tc=%.4e rhoc=%.2f class=%s core=%.4f envbase=%.4f rbase=%.4f env=%.4f it=%d %.0f ms %s%n", m,
                    g.luminosity() / Constants.L_SUN, g.radius() / Constants.R_SUN, g.effectiveTemperature(),
                    g.centralTemperature(), g.centralDensity(), cs.structureClass(), cs.coreMassFraction(),
                    cs.envelopeBaseMassFraction(), cs.envelopeBaseRadiusFraction(), cs.envelopeMass() / Constants.M_SUN,
                    z.iterations(), (System.nanoTime() - t0) / 1e6, cs.zones());
        }
    }
}
