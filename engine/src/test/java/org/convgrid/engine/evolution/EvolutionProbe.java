package org.convgrid.engine.evolution;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/** Not a test: prints a track. Run with -Dconvgrid.probe=true -Dprobe.mass=1 -Dprobe.scale=1. */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class EvolutionProbe {

    @Test
    void track() {
        double mass = Double.parseDouble(System.getProperty("probe.mass", "1"));
        double scale = Double.parseDouble(System.getProperty("probe.scale", "1"));
        var z = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, mass);
        double overshoot = Double.parseDouble(System.getProperty("probe.overshoot", "0"));
        var criterion = StabilityCriterion.valueOf(System.getProperty("probe.criterion", "SCHWARZSCHILD"));
        var evolver = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR, overshoot,
                criterion),
                MainSequenceEvolver.Settings.DEFAULT.scaled(scale));
        long t0 = System.nanoTime();
        EvolutionResult r = evolver.evolve(z.model(), new double[] {4.57 * Constants.GYR});
        long t1 = System.nanoTime();
        for (EvolutionStep s : r.steps()) {
            System.out.printf("%8.4f %9.3e L=%7.4f R=%6.3f Tc=%.4e Xc=%.5f core=%.4f burn=%.3f-%.3f zones=%s it=%d%n",
                    s.age() / Constants.GYR, s.timeStep() / Constants.YEAR, s.luminosity() / Constants.L_SUN,
                    s.radius() / Constants.R_SUN, s.centralTemperature(), s.centralHydrogen(),
                    s.convectiveCoreMassFraction(), s.burningInner(), s.burningOuter(),
                    s.convectiveZones().stream().map(c -> String.format("%.4f-%.4f", c.innerMassFraction(),
                            c.outerMassFraction())).toList(), s.iterations());
        }
        System.out.printf("end %s at %.4f Gyr, exhaustion %.4f Gyr, %d steps, %.2f s; %s%n", r.end(),
                r.endAge() / Constants.GYR, r.exhaustionAge() / Constants.GYR, r.steps().size() - 1,
                (t1 - t0) / 1e9, r.detail());
        r.models().forEach(m -> System.out.println(m.status() + " " + m.detail()));
    }
}
