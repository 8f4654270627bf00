package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StandInPhysics;
import org.convgrid.engine.structure.StructureEquationsProbe;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ScratchTraceTest {
    @Test
    void trace() {
        PhysicsSet physics = StandInPhysics.create(1.8);
        Composition c = Composition.scaledSolar(0.7062, 0.02);
        double m = Double.parseDouble(System.getProperty("mass", "10"));
        int n = Integer.getInteger("points", 400);
        ModelState guess = new PolytropicGuess(n).guess(m * Constants.M_SUN, c);
        StructureEquationsProbe.trace(physics, guess, 60, 0.3);
    }
}
