package org.convgrid.engine.zams;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchColdTest {
    @Test
    void cold() {
        for (double z : new double[] {0.02, 1e-4}) {
            Composition c = ZamsFixtures.withHeliumRelation(z);
            ZamsBuilder b = new ZamsBuilder(ZamsFixtures.physics(c));
            for (double m : new double[] {0.1, 0.2, 0.3, 0.5, 0.7, 1.0, 1.5, 2, 3, 5, 10, 30, 100}) {
                long t0 = System.nanoTime();
                try {
                    ZamsModel zm = b.coldStart(m * Constants.M_SUN, c);
                    System.out.printf("COLD z=%.4f M=%.2f ok it=%d %.0f ms%n", z, m, zm.iterations(), (System.nanoTime() - t0) / 1e6);
                } catch (SolveFailedException e) {
                    System.out.printf("COLD z=%.4f M=%.2f FAIL %s %.0f ms%n", z, m, e.report(), (System.nanoTime() - t0) / 1e6);
                }
            }
        }
    }
}
