package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsModel;
import org.convgrid.engine.zams.ZamsTrack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * The cost of a 1 Msun, Z = 0.02 track from birth to core-hydrogen exhaustion against the same track from its
 * zero-age main-sequence model, default settings, best of {@code probe.repeats} runs each (run with
 * -Dconvgrid.benchmark=true; under taskset -c 0 for a one-core figure).
 */
@EnabledIfSystemProperty(named = "convgrid.benchmark", matches = "true")
class BirthCostProbe {

    @Test
    void birthAgainstZeroAge() {
        int repeats = Integer.parseInt(System.getProperty("probe.repeats", "3"));
        var physics = BirthTracks.physics(0.02);
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT);
        double pms = Double.parseDouble(System.getProperty("probe.pms", "1"));
        BirthEvolution birth = new BirthEvolution(new StartModelBuilder(physics), evolver.withPreMainSequenceLimits(
                org.convgrid.engine.evolution.PreMainSequenceLimits.DEFAULT.scaled(pms)),
                BirthEvolution.DEFAULT_CORE_THRESHOLD);
        double bestZams = Double.MAX_VALUE;
        double bestBirth = Double.MAX_VALUE;
        // thread CPU time beside the wall time: on a shared machine the wall time of one run moves by tens of per
        // cent with the load, the CPU time of the evolving thread much less
        var threads = java.lang.management.ManagementFactory.getThreadMXBean();
        double cpuZams = Double.MAX_VALUE;
        double cpuBirth = Double.MAX_VALUE;
        int zamsNewton = 0;
        int birthNewton = 0;
        int zamsSteps = 0;
        int birthSteps = 0;
        for (int r = 0; r < repeats; r++) {
            long t0 = System.nanoTime();
            long c0 = threads.getCurrentThreadCpuTime();
            var zero = BirthTracks.birth(0.02);
            var bare = org.convgrid.engine.state.Composition.scaledSolar(zero.x(), zero.z());
            ZamsModel z = new ZamsTrack(new ZamsBuilder(physics), bare).solve(Constants.M_SUN).model();
            EvolutionResult ms = evolver.evolve(z.model(), new double[] {0.0});
            bestZams = Math.min(bestZams, (System.nanoTime() - t0) * 1e-9);
            cpuZams = Math.min(cpuZams, (threads.getCurrentThreadCpuTime() - c0) * 1e-9);
            zamsSteps = ms.steps().size();
            zamsNewton = z.iterations() + ms.steps().stream().mapToInt(st -> st.iterations()).sum();
            t0 = System.nanoTime();
            c0 = threads.getCurrentThreadCpuTime();
            BirthTrack b = birth.evolve(Constants.M_SUN, zero, new double[] {0.0});
            bestBirth = Math.min(bestBirth, (System.nanoTime() - t0) * 1e-9);
            cpuBirth = Math.min(cpuBirth, (threads.getCurrentThreadCpuTime() - c0) * 1e-9);
            birthSteps = b.points().size();
            birthNewton = b.start().iterations() + b.result().steps().stream().mapToInt(st -> st.iterations()).sum();
            System.out.printf("run %d: zams %s at %.4g Gyr, birth %s at %.4g Gyr (ZAMS at %.4g Myr)%n", r,
                    ms.end(), ms.endAge() / Constants.GYR, b.result().end(), b.result().endAge() / Constants.GYR,
                    b.events().zeroAgeMainSequence() / BirthTracks.MYR);
        }
        System.out.printf("1 Msun to exhaustion: from ZAMS %.2f s (%d steps), from birth %.2f s (%d steps), ratio %.2f%n",
                bestZams, zamsSteps, bestBirth, birthSteps, bestBirth / bestZams);
        System.out.printf("thread CPU: from ZAMS %.2f s (%d Newton iterations), from birth %.2f s (%d), ratio %.2f%n",
                cpuZams, zamsNewton, cpuBirth, birthNewton, cpuBirth / cpuZams);
    }
}
