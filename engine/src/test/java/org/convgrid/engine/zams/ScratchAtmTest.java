package org.convgrid.engine.zams;

import org.convgrid.engine.physics.atmosphere.GreyAtmosphere;
import org.convgrid.engine.physics.eos.StellarPlasmaEos;
import org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class ScratchAtmTest {
    @Test
    void atm() {
        var g = new GreyAtmosphere(new StellarPlasmaEos(), AnalyticCompositeOpacity.standard());
        Composition c = Composition.scaledSolar(0.74 - 2e-4, 1e-4);
        for (double lt = 3.95; lt < 4.2; lt += 1.5 / 45) {
            StringBuilder sb = new StringBuilder(String.format("logTeff %.3f:", lt));
            for (double lg = 4.1; lg <= 6.0; lg += 0.35) {
                try {
                    var s = g.at(Math.pow(10, lt), Math.pow(10, lg), c);
                    sb.append(String.format(" %.2f", s.lnPressure() / Math.log(10)));
                } catch (RuntimeException e) {
                    sb.append(" FAIL(" + e.getMessage().substring(0, Math.min(60, e.getMessage().length())) + ")");
                }
            }
            System.out.println(sb);
        }
    }
}
