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
        var eos = new StandInPhysics.IdealGas();
        var opacity = org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity.standard();
        PhysicsSet physics = new PhysicsSet(eos, opacity, new org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork(),
                new org.convgrid.engine.convection.MixingLengthTheory(1.8), org.convgrid.engine.convection.StabilityCriterion.SCHWARZSCHILD,
                new org.convgrid.engine.physics.atmosphere.AtmosphereTable(new org.convgrid.engine.physics.atmosphere.GreyAtmosphere(eos, opacity)), 0.0);
        Composition c = Composition.scaledSolar(0.70, 0.02);
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(physics), c);
        ZamsModel z = track.solve(1.3 * Constants.M_SUN).model();
        StellarProfile p = z.model().profile();
        for (int k = 0; k < 40; k += 2) {
            System.out.printf("%3d q=%.3e r=%.3e rho=%.4e T=%.4e L=%.4e nab=%.4f rad=%.4f ad=%.4f eps=%.3e%n", k,
                    p.mass(k) / z.model().mass(), p.radius(k), p.density(k), p.temperature(k), p.luminosity(k),
                    p.nabla(k), p.nablaRad(k), p.nablaAd(k), p.eps(k));
        }
        ModelState seed = HomologySeeder.scale(z.model().state(), 1.35 * Constants.M_SUN, 0.8, 3.5, null);
        StructureEquationsProbe.trace(physics, seed, 30, 0.2);
    }
}
