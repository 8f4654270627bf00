package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * One track from birth, step by step (run with -Dconvgrid.probe=true; -Dprobe.mass=1 -Dprobe.z=0.02
 * -Dprobe.myr=100 -Dprobe.coarse=1).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class BirthTrackProbe {

    @Test
    void track() {
        double m = Double.parseDouble(System.getProperty("probe.mass", "1"));
        double z = Double.parseDouble(System.getProperty("probe.z", "0.02"));
        double myr = Double.parseDouble(System.getProperty("probe.myr", "100"));
        double coarse = Double.parseDouble(System.getProperty("probe.coarse", "1"));
        double y = 0.2485 + 1.5 * z;
        Composition birth = BirthAbundances.of(1.0 - y - z, z);
        PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, birth);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(coarse);
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                myr * 1e6 * Constants.YEAR, d.stepBudget(), d.retryBudget());
        BirthEvolution evolution = new BirthEvolution(new StartModelBuilder(physics),
                new MainSequenceEvolver(physics, s).withPreMainSequenceLimits(
                        org.convgrid.engine.evolution.PreMainSequenceLimits.DEFAULT.scaled(coarse)),
                BirthEvolution.DEFAULT_CORE_THRESHOLD);
        long t0 = System.nanoTime();
        BirthTrack t = evolution.evolve(m * Constants.M_SUN, birth, new double[] {1e6 * Constants.YEAR});
        double secs = (System.nanoTime() - t0) * 1e-9;
        for (TrackPoint p : t.points()) {
            var st = p.step();
            System.out.printf("%.4e yr  R %.4f  L %.4g  Teff %.0f  Tc %.4g  Xc %.6f  fnuc %.4f  Li %.4g  Dc %.3g  %s core %.3f zones %d env %.4f it %d%n",
                    p.age() / Constants.YEAR, st.radius() / Constants.R_SUN, st.luminosity() / Constants.L_SUN,
                    st.effectiveTemperature(), st.centralTemperature(), st.centralHydrogen(), p.nuclearFraction(),
                    p.surfaceLithium(), p.centralDeuterium(), p.phase(), st.convectiveCoreMassFraction(),
                    st.convectiveZones().size(), st.convectiveZones().isEmpty() ? Double.NaN
                            : st.convectiveZones().get(st.convectiveZones().size() - 1).innerMassFraction(),
                    st.iterations());
        }
        LifeEvents e = t.events();
        System.out.printf("end %s at %.4g Myr: %s%n", t.result().end(), t.result().endAge() / 1e6 / Constants.YEAR,
                t.result().detail());
        System.out.printf("events (Myr): radiative core %.4g, ZAMS %.4g, core on %.4g, core off %.4g, Li halved %.4g%n",
                e.radiativeCore() / 1e6 / Constants.YEAR, e.zeroAgeMainSequence() / 1e6 / Constants.YEAR,
                e.convectiveCoreOnset() / 1e6 / Constants.YEAR, e.convectiveCoreEnd() / 1e6 / Constants.YEAR,
                e.lithiumHalved() / 1e6 / Constants.YEAR);
        System.out.printf("%d steps, %.1f s, start %d iterations%n", t.points().size(), secs, t.start().iterations());
    }
}
