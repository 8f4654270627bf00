package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;

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
 * zero-age main-sequence model, default settings, best and median of {@code probe.repeats} runs each, the two
 * tracks alternating in one JVM (run with -Dconvgrid.benchmark=true; under taskset -c 0 for a one-core figure).
 * The ratio of thread CPU within one JVM is steadier than JMH's separate forks, whose compiled code differs
 * from fork to fork by up to ~30 % on this workload (2026-12-03: 809-1271 ms for the same birth track); steadier
 * still is each step's least CPU over the runs, summed (the steps are the same in every run, and a busy
 * neighbour only ever adds time), which it prints last.
 */
@EnabledIfSystemProperty(named = "convgrid.benchmark", matches = "true")
class BirthCostProbe {

    @Test
    void birthAgainstZeroAge() {
        int repeats = Integer.parseInt(System.getProperty("probe.repeats", "3"));
        var physics = BirthTracks.physics(0.02);
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT);
        double pms = Double.parseDouble(System.getProperty("probe.pms", "1"));
        StartModelBuilder starts = new StartModelBuilder(physics);
        MainSequenceEvolver pmsEvolver = evolver.withPreMainSequenceLimits(
                org.convgrid.engine.evolution.PreMainSequenceLimits.DEFAULT.scaled(pms));
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
        // per step (the first entry: the zero-age model or the start model), the least thread CPU over the runs:
        // the steps are the same in every run, and noise only ever adds time
        double[] zeroLeast = null;
        double[] birthLeast = null;
        double[] zamsCpuRuns = new double[repeats];
        double[] birthCpuRuns = new double[repeats];
        // steps before the zero-age main sequence (the same in every run), for the split of the least sums
        int youngSteps = 0;
        for (int r = 0; r < repeats; r++) {
            long t0 = System.nanoTime();
            long c0 = threads.getCurrentThreadCpuTime();
            var zero = BirthTracks.birth(0.02);
            var bare = org.convgrid.engine.state.Composition.scaledSolar(zero.x(), zero.z());
            ZamsModel z = new ZamsTrack(new ZamsBuilder(physics), bare).solve(Constants.M_SUN).model();
            long zamsModelCpu = threads.getCurrentThreadCpuTime() - c0;
            List<Double> zeroStepCpu = new ArrayList<>();
            long[] zeroLast = {threads.getCurrentThreadCpuTime()};
            EvolutionResult ms = evolver.evolve(z.model(), new double[] {0.0}, (age, dt, model) -> {
                long now = threads.getCurrentThreadCpuTime();
                zeroStepCpu.add((now - zeroLast[0]) * 1e-9);
                zeroLast[0] = now;
            });
            zeroLeast = leastSoFar(zeroLeast, zeroStepCpu, zamsModelCpu * 1e-9);
            bestZams = Math.min(bestZams, (System.nanoTime() - t0) * 1e-9);
            zamsCpuRuns[r] = (threads.getCurrentThreadCpuTime() - c0) * 1e-9;
            cpuZams = Math.min(cpuZams, zamsCpuRuns[r]);
            zamsSteps = ms.steps().size();
            zamsNewton = z.iterations() + ms.steps().stream().mapToInt(st -> st.iterations()).sum();
            t0 = System.nanoTime();
            c0 = threads.getCurrentThreadCpuTime();
            // the start model, then every step's thread CPU time with the age it reached, to split the track at
            // its zero-age main sequence (what the pre-main sequence costs, and what the main sequence costs
            // beyond the zero-age track's)
            StartModel start = starts.build(Constants.M_SUN, zero);
            long startCpu = threads.getCurrentThreadCpuTime() - c0;
            List<double[]> stepCpu = new ArrayList<>();
            long[] last = {threads.getCurrentThreadCpuTime()};
            LifeRecorder recorder = new LifeRecorder(BirthEvolution.DEFAULT_CORE_THRESHOLD);
            EvolutionResult track = pmsEvolver.evolve(start.model(), new double[] {0.0}, (age, dt, model) -> {
                recorder.accepted(age, dt, model);
                long now = threads.getCurrentThreadCpuTime();
                stepCpu.add(new double[] {age, (now - last[0]) * 1e-9});
                last[0] = now;
            });
            bestBirth = Math.min(bestBirth, (System.nanoTime() - t0) * 1e-9);
            birthCpuRuns[r] = (threads.getCurrentThreadCpuTime() - c0) * 1e-9;
            cpuBirth = Math.min(cpuBirth, birthCpuRuns[r]);
            birthSteps = track.steps().size();
            birthNewton = start.iterations() + track.steps().stream().mapToInt(st -> st.iterations()).sum();
            List<Double> birthPerStep = new ArrayList<>();
            for (double[] step : stepCpu) {
                birthPerStep.add(step[1]);
            }
            birthLeast = leastSoFar(birthLeast, birthPerStep, startCpu * 1e-9);
            double zams = recorder.events().zeroAgeMainSequence();
            double pre = 0.0;
            double post = 0.0;
            int preSteps = 0;
            int preNewton = 0;
            for (int i = 1; i < stepCpu.size(); i++) {
                if (stepCpu.get(i)[0] <= zams) {
                    pre += stepCpu.get(i)[1];
                    preSteps++;
                    preNewton += track.steps().get(i).iterations();
                } else {
                    post += stepCpu.get(i)[1];
                }
            }
            youngSteps = preSteps;
            System.out.printf("run %d: zams %s at %.4g Gyr, birth %s at %.4g Gyr (ZAMS at %.4g Myr); thread CPU from ZAMS "
                    + "%.3f s, from birth %.3f s (ratio %.3f): start model %.3f s, %d steps to the ZAMS %.3f s (%d "
                    + "Newton iterations), the rest %.3f s%n", r, ms.end(), ms.endAge() / Constants.GYR, track.end(),
                    track.endAge() / Constants.GYR, zams / BirthTracks.MYR, zamsCpuRuns[r], birthCpuRuns[r],
                    birthCpuRuns[r] / zamsCpuRuns[r], startCpu * 1e-9, preSteps, pre, preNewton, post);
        }
        System.out.printf("1 Msun to exhaustion: from ZAMS %.2f s (%d steps), from birth %.2f s (%d steps), ratio %.2f%n",
                bestZams, zamsSteps, bestBirth, birthSteps, bestBirth / bestZams);
        System.out.printf("thread CPU: from ZAMS %.2f s (%d Newton iterations), from birth %.2f s (%d), ratio %.2f%n",
                cpuZams, zamsNewton, cpuBirth, birthNewton, cpuBirth / cpuZams);
        double zeroSum = java.util.Arrays.stream(zeroLeast).sum();
        double birthSum = java.util.Arrays.stream(birthLeast).sum();
        System.out.printf("thread CPU, each step's least over %d runs, summed: from ZAMS %.3f s, from birth %.3f s, "
                + "ratio %.3f%n", repeats, zeroSum, birthSum, birthSum / zeroSum);
        // birthLeast: the start model, the evolver's first call (the start model itself), then one entry per step
        double youngSum = java.util.Arrays.stream(birthLeast, 2, 2 + youngSteps).sum();
        System.out.printf("  of which: start model %.4f s, %d steps to the ZAMS %.4f s, the rest %.4f s%n",
                birthLeast[0], youngSteps, youngSum, birthSum - birthLeast[0] - youngSum);
        double medianZams = median(zamsCpuRuns);
        double medianBirth = median(birthCpuRuns);
        System.out.printf("thread CPU, medians of %d: from ZAMS %.3f s, from birth %.3f s, ratio %.3f%n", repeats,
                medianZams, medianBirth, medianBirth / medianZams);
    }

    /** {@code least} (null at first) lowered elementwise to {@code first} followed by {@code steps}. */
    private static double[] leastSoFar(double[] least, List<Double> steps, double first) {
        double[] now = new double[steps.size() + 1];
        now[0] = first;
        for (int i = 0; i < steps.size(); i++) {
            now[i + 1] = steps.get(i);
        }
        if (least == null) {
            return now;
        }
        if (least.length != now.length) {
            throw new IllegalStateException("runs of one track took " + least.length + " and " + now.length
                    + " steps");
        }
        for (int i = 0; i < now.length; i++) {
            now[i] = Math.min(now[i], least[i]);
        }
        return now;
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        java.util.Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }
}
