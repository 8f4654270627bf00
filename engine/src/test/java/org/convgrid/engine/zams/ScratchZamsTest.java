package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchZamsTest {
    @Test
    void walk() {
        PhysicsSet physics = null;
        for (double z : new double[] {0.02, 1e-4, 0.04}) {
            Composition comp = Composition.scaledSolar(0.74 - 2 * z, z);
            long t0 = System.nanoTime();
            physics = org.convgrid.engine.physics.StandardPhysics.create(org.convgrid.engine.batch.PhysicsOptions.DEFAULT, comp);
            System.out.printf("physics %.0f ms%n", (System.nanoTime() - t0) / 1e6);
            ZamsTrack track = new ZamsTrack(new ZamsBuilder(physics), comp);
            for (double m : new double[] {1.0, 1.3, 2, 3, 5, 10, 20, 40, 70, 100}) {
                run(track, m);
            }
            for (double m : new double[] {0.8, 0.6, 0.4, 0.3, 0.2, 0.15, 0.1, 0.08}) {
                run(track, m);
            }
        }
    }

    private static void run(ZamsTrack track, double m) {
        long t0 = System.nanoTime();
        ZamsResult r = track.solve(m * Constants.M_SUN);
        double ms = (System.nanoTime() - t0) / 1e6;
        if (r.converged()) {
            var g = r.model().model().global();
            System.out.printf("M=%6.2f L=%.4e R=%.4f Teff=%6.0f Tc=%.3e rhoc=%8.2f it=%3d %6.0f ms %s%n", m,
                    g.luminosity() / Constants.L_SUN, g.radius() / Constants.R_SUN, g.effectiveTemperature(),
                    g.centralTemperature(), g.centralDensity(), r.iterations(), ms, r.model().model().convection().zones());
        } else {
            System.out.printf("M=%6.2f FAILED %s it=%d %.0f ms%n", m, r.failure(), r.iterations(), ms);
        }
    }
}
