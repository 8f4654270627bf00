package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchMeshTest {
    @Test
    void mesh() {
        PhysicsSet physics = StandInPhysics.create(1.8);
        Composition c = Composition.scaledSolar(0.70, 0.02);
        for (double m : new double[] {1.0, 3.0, 0.3}) {
            for (int n : new int[] {300, 500, 1000, 2000}) {
                ZamsBuilder b = new ZamsBuilder(physics, new MeshPlanner(n), HenyeySolver.Settings.DEFAULT);
                ZamsModel z = new ZamsTrack(b, c).solve(m * Constants.M_SUN).model();
                var g = z.model().global();
                StellarProfile p = z.model().profile();
                int k = p.size() - 1;
                while (k > 0 && p.stabilityExcess(k) > 0) {
                    k--;
                }
                double base = k == p.size() - 1 ? 1 : p.mass(k) / z.model().mass();
                int kc = 0;
                while (kc < p.size() - 1 && p.stabilityExcess(kc) > 0) {
                    kc++;
                }
                System.out.printf("M=%.1f N=%d L=%.6e R=%.6f Tc=%.6e envbase q=%.6f core=%.5f it=%d%n", m, n,
                        g.luminosity() / Constants.L_SUN, g.radius() / Constants.R_SUN, g.centralTemperature(),
                        base, p.mass(kc) / z.model().mass(), z.iterations());
            }
        }
    }
}
