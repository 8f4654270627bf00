package org.convgrid.engine.zams;

import org.convgrid.engine.batch.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchFourTest {
    @Test
    void four() {
        Composition c = Composition.scaledSolar(0.7062, 0.0188);
        PhysicsSet physics = StandardPhysics.create(new PhysicsOptions(1.8, 0, org.convgrid.engine.convection.StabilityCriterion.SCHWARZSCHILD, Double.parseDouble(System.getProperty("kf", "1"))), c);
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(physics), c);
        for (double m : new double[] {1.0, 0.6, 0.2, 3.0}) {
            long t0 = System.nanoTime();
            ZamsResult r = track.solve(m * Constants.M_SUN);
            var g = r.model().model().global();
            var cs = r.model().model().convection();
            System.out.printf("M=%.2f L=%.4f R=%.4f Teff=%.0f Tc=%.4e rhoc=%.2f Xc=%.4f class=%s core=%.4f envbase=%.4f rbase=%.4f env=%.4f it=%d %.0f ms%n", m,
                    g.luminosity() / Constants.L_SUN, g.radius() / Constants.R_SUN, g.effectiveTemperature(),
                    g.centralTemperature(), g.centralDensity(), g.centralHydrogen(), cs.structureClass(), cs.coreMassFraction(),
                    cs.envelopeBaseMassFraction(), cs.envelopeBaseRadiusFraction(), cs.envelopeMass() / Constants.M_SUN,
                    r.iterations(), (System.nanoTime() - t0) / 1e6);
        }
    }
}
