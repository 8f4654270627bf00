package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchZamsTest {
    @Test
    void cold() {
        PhysicsSet physics = StandInPhysics.create(1.8);
        ZamsBuilder b = new ZamsBuilder(physics);
        Composition c = Composition.scaledSolar(0.7062, 0.0188);
        for (double m : new double[] {1.0}) {
            long t0 = System.nanoTime();
            try {
                ZamsModel z = b.coldStart(m * Constants.M_SUN, c);
                var g = z.model().global();
                System.out.printf("M=%.2f L=%.4f R=%.4f Teff=%.0f Tc=%.3e rhoc=%.1f it=%d %.0f ms%n", m,
                        g.luminosity() / Constants.L_SUN, g.radius() / Constants.R_SUN, g.effectiveTemperature(),
                        g.centralTemperature(), g.centralDensity(), z.iterations(), (System.nanoTime() - t0) / 1e6);
                StellarProfile p = z.model().profile();
                for (int k = 0; k < p.size(); k += 25) {
                    System.out.printf("%4d q=%.6f 1-q=%.3e r=%.4f P=%.3e T=%.3e rho=%.3e L=%.4f nab=%.3f rad=%.3f ad=%.3f conv=%s%n",
                            k, p.mass(k) / z.model().mass(), z.model().state().mesh().exteriorFraction(k),
                            p.radius(k) / Constants.R_SUN, p.pressure(k), p.temperature(k), p.density(k),
                            p.luminosity(k) / Constants.L_SUN, p.nabla(k), p.nablaRad(k), p.nablaAd(k), p.convective(k));
                }
            } catch (SolveFailedException e) {
                System.out.println("M=" + m + " FAILED " + e.report());
            }
        }
    }
}
