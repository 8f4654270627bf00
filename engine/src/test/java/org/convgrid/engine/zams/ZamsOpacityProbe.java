package org.convgrid.engine.zams;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: zero-age L, R and Teff of a few masses with the OPAL GN93 tables against the analytic composite
 * opacity alone, at one Z (default 0.02, Y = 0.2471 + 1.5 Z as in grids/transition-reference.yaml, alpha 1.8).
 * Run with -Dconvgrid.probe=true (-Dprobe.z, -Dprobe.masses=0.6,0.7,0.8).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class ZamsOpacityProbe {

    @Test
    void compare() {
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double y = 0.2471 + 1.5 * z;
        Composition c = Composition.scaledSolar(1.0 - y - z, z);
        OpacityChoice analytic = OpacityChoice.table("analytic composite", StandardPhysics.analyticOpacity(1.0));
        for (OpacityChoice choice : new OpacityChoice[] {OpacityChoice.BUILT_IN, analytic}) {
            var options = new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0, choice);
            ZamsBuilder builder = new ZamsBuilder(StandardPhysics.create(options, c));
            for (String m : System.getProperty("probe.masses", "0.6,0.7,0.8").split(",")) {
                ZamsResult r = ZamsTrack.solveOne(builder, c, Double.parseDouble(m) * Constants.M_SUN, null);
                var g = r.model().model().global();
                System.out.printf("opacity=%s Z=%.4f M=%s L=%.5f Lsun R=%.5f Rsun Teff=%.0f K%n",
                        choice.isTable() ? "analytic" : "OPAL", z, m, g.luminosity() / Constants.L_SUN,
                        g.radius() / Constants.R_SUN, g.effectiveTemperature());
            }
        }
    }
}
