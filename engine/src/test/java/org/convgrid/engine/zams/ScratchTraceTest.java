package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.structure.StructureEquationsProbe;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchTraceTest {
    @Test
    void trace() {
        Composition c0 = Composition.scaledSolar(0.7062, 0.0188);
        PhysicsSet physics = org.convgrid.engine.physics.StandardPhysics.create(org.convgrid.engine.batch.PhysicsOptions.DEFAULT, c0);
        Composition c = c0;
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(physics), c);
        ZamsModel z = track.solve(Double.parseDouble(System.getProperty("m0", "1.0")) * Constants.M_SUN).model();
        StellarProfile p = z.model().profile();
        for (int k = 0; k < 0; k += 2) {
            System.out.printf("%3d q=%.3e r=%.3e rho=%.4e T=%.4e L=%.4e nab=%.4f rad=%.4f ad=%.4f eps=%.3e%n", k,
                    p.mass(k) / z.model().mass(), p.radius(k), p.density(k), p.temperature(k), p.luminosity(k),
                    p.nabla(k), p.nablaRad(k), p.nablaAd(k), p.eps(k));
        }
        ModelState seed = HomologySeeder.scale(z.model().state(), Double.parseDouble(System.getProperty("m1", "1.05")) * Constants.M_SUN, 0.8, 3.5, null);
        StructureEquationsProbe.trace(physics, seed, 30, Double.parseDouble(System.getProperty("step", "0.2")), (k, rho, t) -> physics.nuclear().equilibrium(rho, t, c));
    }
}
