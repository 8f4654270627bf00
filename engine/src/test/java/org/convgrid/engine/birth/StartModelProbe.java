package org.convgrid.engine.birth;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/** Start models across the mass range, printed (run with -Dconvgrid.probe=true). */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class StartModelProbe {

    @Test
    void startModels() {
        Composition birth = BirthAbundances.of(0.70, 0.02);
        PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, birth);
        StartModelBuilder builder = new StartModelBuilder(physics);
        for (double m : new double[] {0.08, 0.1, 0.3, 1.0, 2.0, 3.0, 5.0, 7.0, 10.0}) {
            long t0 = System.nanoTime();
            try {
                StartModel s = builder.build(m * Constants.M_SUN, birth);
                var g = s.model().global();
                System.out.printf("M %.2f: R %.3g Rsun L %.3g Lsun Teff %.0f Tc %.3g rate^-1 %.3g yr it %d zones %s  %.1f s%n",
                        m, g.radius() / Constants.R_SUN, g.luminosity() / Constants.L_SUN, g.effectiveTemperature(),
                        g.centralTemperature(), s.contractionTime() / Constants.YEAR, s.iterations(),
                        s.model().convection().zones().size(), (System.nanoTime() - t0) * 1e-9);
            } catch (RuntimeException e) {
                System.out.printf("M %.2f failed: %s%n", m, e);
            }
        }
    }
}
