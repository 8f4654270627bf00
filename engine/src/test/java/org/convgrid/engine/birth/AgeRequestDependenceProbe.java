package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.structure.StellarModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Whether a star's model at one age depends on the other ages its grid asks for: the same star evolved from birth
 * to 150 Myr alone and with a later age (600, 2000 Myr), at the default step limits and at finer ones; prints the
 * top of the central convective zone (m/M), the central 3He and X, L and the steps taken (run with
 * -Dconvgrid.probe=true; -Dprobe.mass=1 -Dprobe.z=0.02).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class AgeRequestDependenceProbe {

    @Test
    void sameStarDifferentRequests() {
        double m = Double.parseDouble(System.getProperty("probe.mass", "1"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double[][] cases = {{150, 1}, {600, 1}, {2000, 1}, {150, 0.5}, {2000, 0.5}, {150, 0.25}, {2000, 0.25}};
        System.out.println("end_Myr coarseness  core_top_m/M   He3_c       X_c        L/Lsun      steps");
        for (double[] c : cases) {
            BirthTrack t = c[0] > 150 ? BirthTracks.track(m, z, c[0], c[1], 150, c[0])
                    : BirthTracks.track(m, z, c[0], c[1], 150);
            AgedModel at150 = t.models().get(0);
            StellarModel model = at150.model();
            var zones = model.convection().zones();
            double coreTop = !zones.isEmpty() && zones.get(0).innerMassFraction() == 0.0
                    ? zones.get(0).outerMassFraction() : 0.0;
            System.out.printf("%7.0f %6.2f      %.6f     %.4e  %.6f  %.6f  %d%n", c[0], c[1], coreTop,
                    model.state().composition(0).he3(), model.state().composition(0).x(),
                    model.global().luminosity() / org.convgrid.engine.units.Constants.L_SUN, t.points().size());
        }
    }
}
