package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchColdTest {
    @Test
    void cold() {
        PhysicsSet physics = StandInPhysics.create(1.8);
        for (double x : new double[] {0.70, 0.7062, 0.74}) {
            Composition c = Composition.scaledSolar(x, 0.02);
            for (double m : new double[] {0.1, 0.3, 1.0, 3.0, 10, 50}) {
                StringBuilder sb = new StringBuilder(String.format("X=%.4f M=%5.1f:", x, m));
                for (int n : new int[] {300, 400, 500, 700, 1000}) {
                    ZamsBuilder b = new ZamsBuilder(physics, new MeshPlanner(n), HenyeySolver.Settings.DEFAULT);
                    try {
                        ZamsModel z = b.coldStart(m * Constants.M_SUN, c);
                        sb.append(String.format(" %d:%d", n, z.iterations()));
                    } catch (SolveFailedException e) {
                        sb.append(String.format(" %d:F(%s %d)", n, e.report().reason(), e.report().iterations()));
                    }
                }
                System.out.println(sb);
            }
        }
    }
}
