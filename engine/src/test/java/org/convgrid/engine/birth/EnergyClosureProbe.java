package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.NuclearLuminosity;
import org.convgrid.engine.evolution.PreMainSequenceLimits;
import org.convgrid.engine.evolution.StepObserver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Where the energy budget of a track from birth fails to close: per step, the release the structure saw,
 * h (L - L_nuc), against the drop of the total energy E = integral (u - G m/r) dm between the two models, summed
 * per decade of age (run with -Dconvgrid.probe=true; -Dprobe.mass, -Dprobe.myr, -Dprobe.coarse).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class EnergyClosureProbe {

    @Test
    void closurePerDecade() {
        double mass = Double.parseDouble(System.getProperty("probe.mass", "0.5"));
        double myr = Double.parseDouble(System.getProperty("probe.myr", "100"));
        double coarse = Double.parseDouble(System.getProperty("probe.coarse", "1"));
        PhysicsSet physics = BirthTracks.physics(0.02);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(coarse);
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                myr * BirthTracks.MYR, d.stepBudget(), d.retryBudget());
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, s)
                .withPreMainSequenceLimits(PreMainSequenceLimits.DEFAULT.scaled(coarse));
        StartModel start = new StartModelBuilder(physics).build(mass * Constants.M_SUN, BirthTracks.birth(0.02));
        List<double[]> rows = new ArrayList<>();
        StepObserver observer = (age, h, model) -> rows.add(new double[] {age, h, model.global().luminosity(),
            NuclearLuminosity.of(model), StarEnergy.total(model, physics)});
        long t0 = System.nanoTime();
        evolver.evolve(start.model(), new double[] {myr * BirthTracks.MYR}, observer);
        double radiated = 0.0;
        double defect = 0.0;
        double decadeRad = 0.0;
        double decadeDefect = 0.0;
        int decade = Integer.MIN_VALUE;
        int steps = 0;
        for (int i = 1; i < rows.size(); i++) {
            double[] r = rows.get(i);
            double h = r[1];
            double grav = h * (r[2] - r[3]);
            double released = rows.get(i - 1)[4] - r[4];
            int dec = (int) Math.floor(Math.log10(r[0] / Constants.YEAR));
            if (dec != decade && decade != Integer.MIN_VALUE) {
                System.out.printf("  log age %d: radiated %.4e erg, defect %.4e (%.3f %% of it)%n", decade,
                        decadeRad, decadeDefect, 100 * decadeDefect / decadeRad);
                decadeRad = 0.0;
                decadeDefect = 0.0;
            }
            decade = dec;
            radiated += h * r[2];
            defect += grav - released;
            decadeRad += h * r[2];
            decadeDefect += grav - released;
            steps++;
        }
        System.out.printf("  log age %d: radiated %.4e erg, defect %.4e (%.3f %% of it)%n", decade, decadeRad,
                decadeDefect, 100 * decadeDefect / decadeRad);
        System.out.printf("M %.2f to %.0f Myr, coarse %.2f: %d steps %.1f s, (gravothermal seen - E drop)/radiated "
                + "= %.3f %%, (first - last E)/radiated %.3f%n", mass, myr, coarse, steps,
                (System.nanoTime() - t0) * 1e-9, 100 * defect / radiated,
                (rows.get(0)[4] - rows.get(rows.size() - 1)[4]) / radiated);
    }
}
