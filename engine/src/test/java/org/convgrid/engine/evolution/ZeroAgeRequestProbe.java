package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Whether a zero-age-origin star's model at 150 Myr (-Dprobe.ageMyr=A for another age) depends on the other ages its grid asks for, and how far it
 * moves with finer step limits: the star evolved from its zero-age model to 150 Myr alone and with a later age (600,
 * 2000, 20000 Myr) at the default limits, and alone at limits x0.5 and x0.25; prints the top of the central
 * convective zone (m/M), X_c, L, R and the steps of the whole track (run with -Dconvgrid.probe=true;
 * -Dprobe.masses=0.8,1 -Dprobe.z=0.02). The zero-age models come from one track over the masses in the order given,
 * each seeded by the one before, so the same star's figures differ slightly between mass lists (1.2 Msun core top
 * 0.0065 after 0.8 and 1 Msun, 0.0059 after 1 Msun alone): compare rows of one run.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class ZeroAgeRequestProbe {

    private static final double MYR = 1.0e-3 * Constants.GYR;

    @Test
    void sameStarDifferentRequests() {
        double at = Double.parseDouble(System.getProperty("probe.ageMyr", "150"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        Composition c = Composition.scaledSolar(1.0 - (0.2485 + 1.5 * z) - z, z);
        double[][] cases = {{at, 1}, {600, 1}, {2000, 1}, {20000, 1}, {at, 0.5}, {at, 0.25}, {2000, 0.25}};
        for (String ms : System.getProperty("probe.masses", "0.8,1,1.2,1.5").split(",")) {
            double m = Double.parseDouble(ms);
            var zeroAge = EvolutionFixtures.zeroAge(c, m).model();
            System.out.println("M=" + m + " end_Myr coarseness  core_top_m/M   X_c        L/Lsun      R/Rsun  steps");
            for (double[] k : cases) {
                MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(k[1]);
                MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                        d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                        k[0] * MYR, d.stepBudget(), d.retryBudget());
                double[] ages = k[0] > at ? new double[] {at * MYR, k[0] * MYR}
                        : new double[] {at * MYR};
                var r = new MainSequenceEvolver(EvolutionFixtures.physics(c), s).evolve(zeroAge, ages,
                        (a, dt, mm) -> { });
                StellarModel model = r.models().get(0).model();
                var zones = model.convection().zones();
                double coreTop = !zones.isEmpty() && zones.get(0).innerMassFraction() == 0.0
                        ? zones.get(0).outerMassFraction() : 0.0;
                System.out.printf("%7.0f %6.2f      %.6f     %.6f  %.7f  %.7f %d%n", k[0], k[1], coreTop,
                        model.state().composition(0).x(), model.global().luminosity() / Constants.L_SUN,
                        model.global().radius() / Constants.R_SUN, r.steps().size());
            }
        }
    }
}
