package org.convgrid.engine.birth;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import jdk.jfr.Recording;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsTrack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * What the main sequence of a track from birth costs beyond the zero-age track's: a 1 Msun, Z = 0.02 track from birth
 * is evolved to the first model past its zero-age main sequence, and from that model (its deuterium, 7Li, 3He and CN as
 * the pre-main sequence left them) the main sequence is evolved again, {@code probe.repeats} times, against the main
 * sequence from the zero-age model of the same mass and composition; thread CPU time, best of the repeats, steps and
 * Newton iterations. With {@code -Dprobe.jfr=DIR} each of the two loops is recorded in its own flight recording
 * (DIR/birth-ms.jfr, DIR/zero-age.jfr; execution samples every 1 ms) for a profile of the difference;
 * {@code -Dprobe.census=true} prints how many points hold deuterium and 7Li at every step and the Newton iterations per
 * step; {@code -Dprobe.warmups=N} runs both loops N times unrecorded first (the JIT compiles for a dozen runs: without
 * it the first loop's profile holds the compilation); {@code -Dprobe.bare=true} also evolves the birth track's model
 * with its deuterium and 7Li removed (birth-ms-bare), which tells their cost from that of the 3He and CN out of
 * equilibrium. Run with -Dconvgrid.benchmark=true, under taskset -c 0 for a one-core figure. Found with it
 * (2026-12-03): the birth track's main sequence takes 366 Newton iterations against the zero-age track's 342 with or
 * without its deuterium and 7Li (4 instead of 3 in each of the first 12 steps, while the central 12C, 3e-3 at arrival,
 * falls to its CN equilibrium), and 7Li is held at 300-340 of the 500 points all along (the convective envelope and the
 * radiative layers below it cooler than ~2.5e6 K), deuterium at the outermost 4-5. Found next (same day, with
 * perStepMinimum and a split of each step's CPU): of the ~0.05 s the main sequence from birth cost beyond the zero-age
 * track's (~10 %), ~0.024 s were the extra iterations of its first 12 steps, 0.015 s the three deuterium/7Li rate
 * evaluations a step, and the rest (~0.015 s) per-point work at the ~330 points holding 7Li, part of it the opacity,
 * slower where 7Li burning had moved Z off its table node; no step remeshed on either track.
 */
@EnabledIfSystemProperty(named = "convgrid.benchmark", matches = "true")
class MainSequenceCostProbe {

    @Test
    void mainSequenceFromBirthAgainstZeroAge() throws Exception {
        int repeats = Integer.parseInt(System.getProperty("probe.repeats", "3"));
        String jfr = System.getProperty("probe.jfr");
        var physics = BirthTracks.physics(0.02);
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT);
        Composition birth = BirthTracks.birth(0.02);
        StartModel start = new StartModelBuilder(physics).build(Constants.M_SUN, birth);
        List<StellarModel> models = new ArrayList<>();
        List<Double> ages = new ArrayList<>();
        LifeRecorder recorder = new LifeRecorder(BirthEvolution.DEFAULT_CORE_THRESHOLD);
        evolver.evolve(start.model(), new double[] {0.0}, (age, dt, model) -> {
            recorder.accepted(age, dt, model);
            models.add(model);
            ages.add(age);
        });
        double zams = recorder.events().zeroAgeMainSequence();
        int first = 0;
        while (ages.get(first) <= zams) {
            first++;
        }
        StellarModel arrived = models.get(first);
        describe("first model past the ZAMS (" + ages.get(first) / BirthTracks.MYR + " Myr)", arrived);
        Composition bare = Composition.scaledSolar(birth.x(), birth.z());
        StellarModel zeroAge = new ZamsTrack(new ZamsBuilder(physics), bare).solve(Constants.M_SUN).model().model();
        describe("zero-age model", zeroAge);
        if (Boolean.getBoolean("probe.census")) {
            evolver.evolve(arrived, new double[] {0.0}, (age, dt, model) -> census(age, model));
        }
        int warmups = Integer.parseInt(System.getProperty("probe.warmups", "0"));
        for (int w = 0; w < warmups; w++) {
            // both loops once, unrecorded, so that neither profile holds the JIT's compilation of the other's code
            loop("warm-up birth-ms", evolver, arrived, 1, null);
            loop("warm-up zero-age", evolver, zeroAge, 1, null);
        }
        if (Boolean.getBoolean("probe.bare")) {
            // the same model without its deuterium and 7Li (given to 1H and to the metals), to tell their cost from
            // that of the 3He and CN the pre-main sequence left out of equilibrium; after the warm-ups (run before
            // them, its runs held the JIT's compilation: 0.64 s against 0.48 s for the same work, 2026-12-03)
            Composition[] comp = arrived.state().compositions().clone();
            for (int k = 0; k < comp.length; k++) {
                Composition c = comp[k];
                comp[k] = new Composition(c.h1() + c.h2(), c.he3(), c.he4(), c.c12(), c.n14(), c.o16(),
                        c.otherMetals() + c.li7(), 0.0, 0.0);
            }
            StellarModel bareModel = new StellarModel(arrived.state().withCompositions(comp), arrived.profile(),
                    arrived.global(), arrived.convection(), arrived.report());
            loop("birth-ms-bare", evolver, bareModel, repeats, jfr);
        }
        double birthMs = loop("birth-ms", evolver, arrived, repeats, jfr);
        double zeroMs = loop("zero-age", evolver, zeroAge, repeats, jfr);
        System.out.printf("main sequence thread CPU, best of %d: from the birth track's model %.3f s, from the "
                + "zero-age model %.3f s, ratio %.3f%n", repeats, birthMs, zeroMs, birthMs / zeroMs);
    }

    /**
     * The main sequence of the whole track from birth (steps after its ZAMS, each with the older models the track
     * has) against the zero-age track, {@code probe.repeats} (5) times alternately in one JVM: every step's thread
     * CPU time, the least over the repeats, summed, and the Newton iterations; {@code -Dprobe.steps=true} prints
     * every step. On a shared machine the minimum per step discards the preemptions that make one run's total move
     * by 10-20 %; the ratio of the two sums moved by ~2 % between runs at load 4-8 (2026-12-03), where the best
     * totals of BirthCostProbe moved by 10 %.
     */
    @Test
    void perStepMinimum() {
        int repeats = Integer.parseInt(System.getProperty("probe.repeats", "5"));
        var physics = BirthTracks.physics(0.02);
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT);
        Composition birth = BirthTracks.birth(0.02);
        var threads = ManagementFactory.getThreadMXBean();
        double[][] least = new double[2][];
        List<List<double[]>> rows = new ArrayList<>(List.of(new ArrayList<>(), new ArrayList<>()));
        for (int r = 0; r < repeats; r++) {
            for (int track = 0; track < 2; track++) {
                StellarModel start = track == 0 ? new StartModelBuilder(physics).build(Constants.M_SUN, birth).model()
                        : new ZamsTrack(new ZamsBuilder(physics), Composition.scaledSolar(birth.x(), birth.z()))
                        .solve(Constants.M_SUN).model().model();
                List<double[]> all = new ArrayList<>();
                LifeRecorder recorder = new LifeRecorder(BirthEvolution.DEFAULT_CORE_THRESHOLD);
                long[] last = {threads.getCurrentThreadCpuTime()};
                evolver.evolve(start, new double[] {0.0}, (age, dt, model) -> {
                    recorder.accepted(age, dt, model);
                    long now = threads.getCurrentThreadCpuTime();
                    all.add(new double[] {age, dt, (now - last[0]) * 1e-9, model.report().iterations(),
                        model.state().composition(0).c12()});
                    last[0] = now;
                });
                // the zero-age track from its first step; the birth track from its first model past the ZAMS
                double from = track == 0 ? recorder.events().zeroAgeMainSequence() : 0.0;
                List<double[]> ms = new ArrayList<>();
                for (double[] row : all) {
                    if (row[0] > from) {
                        ms.add(row);
                    }
                }
                rows.set(track, ms);
                double[] cpu = ms.stream().mapToDouble(x -> x[2]).toArray();
                least[track] = least[track] == null ? cpu : leastOf(least[track], cpu);
            }
        }
        double[] sum = new double[2];
        int[] newton = new int[2];
        for (int track = 0; track < 2; track++) {
            for (int i = 0; i < least[track].length; i++) {
                double[] row = rows.get(track).get(i);
                sum[track] += least[track][i];
                newton[track] += (int) row[3];
                if (Boolean.getBoolean("probe.steps")) {
                    System.out.printf("%s step %d: %.4g Gyr, dt %.3g s, %d iterations, central 12C %.3g, %.4f s%n",
                            track == 0 ? "birth" : "zero-age", i, row[0] / Constants.GYR, row[1], (int) row[3],
                            row[4], least[track][i]);
                }
            }
        }
        System.out.printf("main sequence, per-step least thread CPU of %d runs: from birth %.3f s (%d steps, %d "
                + "Newton iterations), zero-age track %.3f s (%d, %d), ratio %.3f%n", repeats, sum[0],
                least[0].length, newton[0], sum[1], least[1].length, newton[1], sum[0] / sum[1]);
    }

    private static double[] leastOf(double[] a, double[] b) {
        double[] out = new double[Math.min(a.length, b.length)];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.min(a[i], b[i]);
        }
        return out;
    }

    /**
     * The results a change to the light elements' bookkeeping must keep: 1 Msun, Z = 0.02, default settings, from
     * birth with a model landed on 1 Gyr; every figure to all its digits, to compare before and after.
     */
    @Test
    void resultsToCompare() {
        var physics = BirthTracks.physics(0.02);
        BirthTrack t = new BirthEvolution(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(Constants.M_SUN, BirthTracks.birth(0.02), new double[] {1000.0 * BirthTracks.MYR});
        System.out.printf("results: ZAMS %.15g Myr, surface Li/Li0 at 1 Gyr %.15g, exhaustion %.15g Gyr, %d steps%n",
                t.events().zeroAgeMainSequence() / BirthTracks.MYR, t.surfaceLithiumAt(t.models().get(0)),
                t.result().exhaustionAge() / Constants.GYR, t.result().steps().size());
    }

    private static double loop(String name, MainSequenceEvolver evolver, StellarModel from, int repeats,
                               String jfr) throws Exception {
        var threads = ManagementFactory.getThreadMXBean();
        Recording recording = null;
        if (jfr != null) {
            recording = new Recording(jdk.jfr.Configuration.getConfiguration("profile"));
            recording.enable("jdk.ExecutionSample").withPeriod(java.time.Duration.ofMillis(1));
            recording.start();
        }
        double best = Double.MAX_VALUE;
        for (int r = 0; r < repeats; r++) {
            long c0 = threads.getCurrentThreadCpuTime();
            EvolutionResult ms = evolver.evolve(from, new double[] {0.0});
            double cpu = (threads.getCurrentThreadCpuTime() - c0) * 1e-9;
            best = Math.min(best, cpu);
            int newton = ms.steps().stream().mapToInt(st -> st.iterations()).sum();
            if (r == 0 && Boolean.getBoolean("probe.census")) {
                StringBuilder b = new StringBuilder();
                ms.steps().forEach(st -> b.append(st.iterations()).append(' '));
                System.out.println(name + " iterations per step: " + b);
            }
            System.out.printf("%s run %d: %s at %.6g Gyr after %d steps, %d Newton iterations, %.3f s%n", name, r,
                    ms.end(), ms.endAge() / Constants.GYR, ms.steps().size() - 1, newton, cpu);
        }
        if (recording != null) {
            recording.stop();
            recording.dump(Path.of(jfr, name + ".jfr"));
            recording.close();
        }
        return best;
    }

    private static void census(double age, StellarModel model) {
        double[] floors = {0.0, 1e-60, 1e-40, 1e-30, 1e-20, 1e-15};
        int[] li = new int[floors.length];
        int d = 0;
        for (Composition c : model.state().compositions()) {
            for (int i = 0; i < floors.length; i++) {
                if (c.li7() > floors[i]) {
                    li[i]++;
                }
            }
            if (c.h2() > 0.0) {
                d++;
            }
        }
        System.out.printf("census %.4g Gyr: D %d, Li above 0/1e-60/1e-40/1e-30/1e-20/1e-15: %s%n",
                age / Constants.GYR, d,
                java.util.Arrays.toString(li));
    }

    /** How many points hold each trace, and the smallest nonzero amount. */
    private static void describe(String what, StellarModel model) {
        Composition[] comp = model.state().compositions();
        int d = 0;
        int li = 0;
        double minD = Double.MAX_VALUE;
        double minLi = Double.MAX_VALUE;
        for (Composition c : comp) {
            if (c.h2() > 0.0) {
                d++;
                minD = Math.min(minD, c.h2());
            }
            if (c.li7() > 0.0) {
                li++;
                minLi = Math.min(minLi, c.li7());
            }
        }
        System.out.printf("%s: %d points, %d hold deuterium (least %.3g, surface %.3g), %d hold 7Li (least %.3g, "
                + "surface %.3g); centre 3He %.4g, 12C %.4g%n", what, comp.length, d, minD, comp[comp.length - 1].h2(),
                li, minLi, comp[comp.length - 1].li7(), comp[0].he3(), comp[0].c12());
    }
}
