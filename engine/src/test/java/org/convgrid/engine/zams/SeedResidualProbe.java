package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.RelaxationTrace;
import org.convgrid.engine.structure.ShellComposition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: why a homology-seeded zero-age model takes the Newton iterations it takes. Run with
 * {@code -Dconvgrid.probe=true}:
 * <ul>
 * <li>{@code -Dtest='SeedResidualProbe#seedResiduals'} (-Dprobe.masses=1.0,1.5, -Dprobe.every=20): each mass seeded
 * from its converged neighbours 0.10 and 0.05 Msun below it (the SeededZamsBenchmark setup, X = 0.7062,
 * Z = 0.0188), the relaxation traced equation by equation ({@link RelaxationTrace}), then the seed against the
 * solution every few points (D ln r, D ln rho, D ln T, L of both) with the solution's convective points;</li>
 * <li>{@code -Dtest='SeedResidualProbe#gridLine'} (-Dprobe.z=0.02): Newton iterations per mass on a line of 50
 * masses 0.1-20 Msun in log spacing (Y = 0.2471 + 1.5 Z) solved in chunks of 8 from the line's ladder, as a grid
 * sweep does, with L and R of each model.</li>
 * </ul>
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class SeedResidualProbe {

    private static final int LINE_MASSES = 50;
    private static final int CHUNK = 8;

    @Test
    void seedResiduals() {
        Composition c = ZamsFixtures.PROTOSOLAR;
        PhysicsSet physics = ZamsFixtures.physics(c);
        ZamsBuilder builder = new ZamsBuilder(physics);
        int every = Integer.getInteger("probe.every", 20);
        for (String text : System.getProperty("probe.masses", "1.0,1.5").split(",")) {
            double m = Double.parseDouble(text);
            ZamsModel lower = ZamsTrack.solveOne(builder, c, (m - 0.10) * Constants.M_SUN, null).model();
            ZamsModel nearer = ZamsTrack.solveOne(builder, c, (m - 0.05) * Constants.M_SUN, lower).model();
            ModelState seed = new HomologySeeder().seed(nearer.model(), lower.model(), m * Constants.M_SUN);
            ShellComposition rule = new LocalEquilibriumComposition(physics.nuclear(), c);
            System.out.printf("=== %s Msun from %.2f and %.2f Msun%n", text, m - 0.05, m - 0.10);
            StellarModel model = RelaxationTrace.relax(seed, physics,
                    HenyeySolver.Settings.DEFAULT.withIterationBudget(ZamsBuilder.SEEDED_BUDGET), rule, System.out);
            if (model == null) {
                continue;
            }
            ModelState solution = model.state();
            for (int k = 0; k < seed.size(); k += every) {
                System.out.printf(" k=%3d log(1-m/M)=%7.3f D lnr %+.2e D lnrho %+.2e D lnT %+.2e L %.4e -> %.4e Lsun"
                        + " convective %s%n", k, Math.log10(seed.mesh().exteriorFraction(k)),
                        seed.lnRadius(k) - solution.lnRadius(k), seed.lnDensity(k) - solution.lnDensity(k),
                        seed.lnTemperature(k) - solution.lnTemperature(k), seed.luminosity(k) / Constants.L_SUN,
                        solution.luminosity(k) / Constants.L_SUN, model.profile().convective(k));
            }
        }
    }

    @Test
    void gridLine() {
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double y = 0.2471 + 1.5 * z;
        Composition c = Composition.scaledSolar(1.0 - y - z, z);
        ZamsBuilder builder = new ZamsBuilder(ZamsFixtures.physics(c));
        ZamsLadder ladder = new ZamsLadder(builder, c);
        int total = 0;
        for (int start = 0; start < LINE_MASSES; start += CHUNK) {
            ZamsTrack track = new ZamsTrack(builder, c, ladder);
            for (int i = start; i < Math.min(LINE_MASSES, start + CHUNK); i++) {
                double m = Math.exp(Math.log(0.1) + i * Math.log(200.0) / (LINE_MASSES - 1));
                ZamsResult r = track.solve(m * Constants.M_SUN);
                total += r.iterations();
                System.out.printf("Z=%s M=%.3f Msun: %d iterations%s%n", z, m, r.iterations(), r.converged()
                        ? String.format(" L=%.5e Lsun R=%.5e Rsun", r.model().model().global().luminosity()
                        / Constants.L_SUN, r.model().model().global().radius() / Constants.R_SUN) : " failed");
            }
        }
        System.out.println("Z=" + z + ": " + total + " Newton iterations on the line (ladder rungs not counted)");
    }
}
