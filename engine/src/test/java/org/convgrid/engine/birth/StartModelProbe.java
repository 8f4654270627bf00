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
        // -Dprobe.z: the birth composition of the robustness sweep at that Z (BirthTracks.birth); -Dprobe.masses
        String z = System.getProperty("probe.z");
        Composition birth = z == null ? BirthAbundances.of(0.70, 0.02) : BirthTracks.birth(Double.parseDouble(z));
        PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, birth);
        StartModelBuilder builder = new StartModelBuilder(physics);
        double[] masses = java.util.Arrays.stream(System.getProperty("probe.masses",
                "0.08,0.1,0.3,1.0,2.0,3.0,5.0,7.0,10.0").split(",")).mapToDouble(Double::parseDouble).toArray();
        for (double m : masses) {
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

    @Test
    void startMemory() {
        PhysicsSet physics = BirthTracks.physics(0.02);
        org.convgrid.engine.evolution.MainSequenceEvolver.Settings d =
                org.convgrid.engine.evolution.MainSequenceEvolver.Settings.DEFAULT;
        var evolver = new org.convgrid.engine.evolution.MainSequenceEvolver(physics,
                new org.convgrid.engine.evolution.MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                        d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                        2.0 * BirthTracks.MYR, d.stepBudget(), d.retryBudget()));
        double[] ages = {0.001 * BirthTracks.MYR, 0.01 * BirthTracks.MYR, 0.1 * BirthTracks.MYR, 0.3 * BirthTracks.MYR,
            1.0 * BirthTracks.MYR, 2.0 * BirthTracks.MYR};
        BirthTrack hot = new BirthEvolution(new StartModelBuilder(physics), evolver, 1.0e-3)
                .evolve(Constants.M_SUN, BirthTracks.birth(0.02), ages);
        BirthTrack cool = new BirthEvolution(new StartModelBuilder(physics,
                new org.convgrid.engine.structure.MeshPlanner(500), 3.5e5), evolver, 1.0e-3)
                .evolve(Constants.M_SUN, BirthTracks.birth(0.02), ages);
        for (int i = 0; i < ages.length; i++) {
            var a = hot.models().get(i).model().global();
            var b = cool.models().get(i).model().global();
            System.out.printf("age %.3g Myr: R %.4f / %.4f Rsun  dlnR %.4f  dlnL %.4f  dlnTc %.4f%n",
                    ages[i] / BirthTracks.MYR, a.radius() / Constants.R_SUN, b.radius() / Constants.R_SUN,
                    Math.log(a.radius() / b.radius()), Math.log(a.luminosity() / b.luminosity()),
                    Math.log(a.centralTemperature() / b.centralTemperature()));
        }
        System.out.printf("contraction times: %.3g yr, %.3g yr%n", hot.start().contractionTime() / Constants.YEAR,
                cool.start().contractionTime() / Constants.YEAR);
    }
}
