package org.convgrid.engine.zams;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ExtraEnergy;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.RelaxationTrace;
import org.convgrid.engine.structure.ShellComposition;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StructureSolver;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: what the zero-age ladder's rungs cost against the answers they seed, on the lines of the 200-model
 * zero-age grid (50 masses 0.1-20 Msun in log spacing, Y = 0.2471 + 1.5 Z, chunks of 8). Run with
 * {@code -Dconvgrid.probe=true -Dtest=LadderCostProbe} ({@code -Dprobe.z=0.004,0.01,0.02,0.03}, {@code
 * -Dprobe.rounds=3}). Each line is solved {@code rounds} times with one physics bundle: round 0 fills the atmosphere
 * table (and warms the JIT), the later rounds measure the solve's own cost. The real {@link ZamsLadder} and {@link
 * ZamsTrack} give each model's thread CPU and Newton iterations; {@link #traced} walks each rung again the way the
 * ladder does, relaxation by relaxation (seed, remesh passes, failed attempts), and must find the same iterations.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class LadderCostProbe {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
    private static final int LINE_MASSES = 50;
    private static final int CHUNK = 8;

    @Test
    void rungsAgainstAnswers() {
        int rounds = Integer.getInteger("probe.rounds", 3);
        for (String text : System.getProperty("probe.z", "0.004,0.01,0.02,0.03").split(",")) {
            double z = Double.parseDouble(text);
            double y = 0.2471 + 1.5 * z;
            Composition c = Composition.scaledSolar(1.0 - y - z, z);
            PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, c);
            ZamsBuilder builder = new ZamsBuilder(physics);
            for (int round = 0; round < rounds; round++) {
                line(z, round, builder, c, round == rounds - 1);
            }
            traced(z, physics, c);
        }
    }

    /** One line as a grid solves it: the rungs each chunk's first mass asks for, in order, then its masses. */
    private static void line(double z, int round, ZamsBuilder builder, Composition c, boolean print) {
        ZamsLadder ladder = new ZamsLadder(builder, c);
        long rungCpu = 0;
        int rungIterations = 0;
        int rungs = 0;
        long answerCpu = 0;
        int answerIterations = 0;
        int answers = 0;
        int failed = 0;
        List<Integer> built = new ArrayList<>();
        for (int start = 0; start < LINE_MASSES; start += CHUNK) {
            double first = massOf(start) * Constants.M_SUN;
            for (int index : ZamsLadder.rungsFor(first)) {
                if (built.contains(index)) {
                    continue;
                }
                built.add(index);
                long t0 = THREADS.getCurrentThreadCpuTime();
                List<ZamsModel> got = ladder.startFor(ZamsLadder.rungMass(index));
                long cpu = THREADS.getCurrentThreadCpuTime() - t0;
                ZamsModel rung = got.get(got.size() - 1);
                rungCpu += cpu;
                rungIterations += rung.iterations();
                rungs++;
                if (print) {
                    System.out.printf("Z=%s rung %+3d M=%7.4f: %3d iterations %7.2f ms%n", z, index,
                            ZamsLadder.rungMass(index) / Constants.M_SUN, rung.iterations(), cpu / 1e6);
                }
            }
            ZamsTrack track = new ZamsTrack(builder, c, ladder);
            for (int i = start; i < Math.min(LINE_MASSES, start + CHUNK); i++) {
                long t0 = THREADS.getCurrentThreadCpuTime();
                ZamsResult r = track.solve(massOf(i) * Constants.M_SUN);
                long cpu = THREADS.getCurrentThreadCpuTime() - t0;
                answerCpu += cpu;
                answerIterations += r.iterations();
                answers++;
                failed += r.converged() ? 0 : 1;
                if (print) {
                    System.out.printf("Z=%s answer  M=%7.4f: %3d iterations %7.2f ms%s%n", z, massOf(i),
                            r.iterations(), cpu / 1e6, r.converged() ? "" : " FAILED");
                }
            }
        }
        System.out.printf("Z=%s round %d: %d rungs %d iterations %.1f ms (%.2f ms, %.1f it per rung); %d answers %d"
                        + " iterations %.1f ms (%.2f ms, %.1f it per answer), %d failed%n", z, round, rungs,
                rungIterations, rungCpu / 1e6, rungCpu / 1e6 / rungs, (double) rungIterations / rungs, answers,
                answerIterations, answerCpu / 1e6, answerCpu / 1e6 / answers, (double) answerIterations / answers,
                failed);
    }

    private static double massOf(int i) {
        return Math.exp(Math.log(0.1) + i * Math.log(200.0) / (LINE_MASSES - 1));
    }

    /**
     * The ladder's rungs walked again relaxation by relaxation, as {@link ZamsLadder} and {@link ZamsTrack} do (a
     * copy of their walk, printed): per attempt the target, the two seeding masses, each relaxation's iterations
     * and whether it failed, and the thread CPU.
     */
    private static void traced(double z, PhysicsSet physics, Composition c) {
        MeshPlanner planner = new MeshPlanner(MeshPlanner.DEFAULT_POINTS);
        HenyeySolver.Settings settings = HenyeySolver.Settings.DEFAULT;
        StructureSolver solver = new StructureSolver(physics, settings);
        ShellComposition rule = new LocalEquilibriumComposition(physics.nuclear(), c);
        ZamsModel anchor = new ZamsBuilder(physics).coldStart(ZamsTrack.ANCHOR_MASS, c);
        HomologySeeder seeder = new HomologySeeder();
        EnvelopeSweep envelope = new EnvelopeSweep(physics);
        int last = (int) Math.floor(Math.abs(Math.log(massOf(LINE_MASSES - 1)) / ZamsLadder.RUNG_SPACING));
        int lowest = (int) Math.floor(Math.abs(Math.log(massOf(0)) / ZamsLadder.RUNG_SPACING));
        ZamsModel below = null;
        for (int sign : new int[] {-1, +1}) {
            List<ZamsModel> rungs = new ArrayList<>();
            for (int next = 1; next <= (sign < 0 ? lowest : last); next++) {
                List<ZamsModel> known = new ArrayList<>();
                known.add(next == 1 ? anchor : rungs.get(next - 2));
                if (next == 1 && sign > 0 && below != null) {
                    known.add(below);
                }
                if (next >= 2) {
                    known.add(next == 2 ? anchor : rungs.get(next - 3));
                }
                double mass = ZamsLadder.rungMass(sign * next);
                double step = ZamsTrack.MAX_STEP;
                StringBuilder line = new StringBuilder();
                long t0 = THREADS.getCurrentThreadCpuTime();
                int spent = 0;
                int attempts = 0;
                int failures = 0;
                ZamsModel done = null;
                while (done == null && attempts < ZamsTrack.ATTEMPT_BUDGET) {
                    attempts++;
                    ZamsModel nearest = ZamsTrack.nearest(known, mass, null);
                    double remaining = Math.log(mass / nearest.model().mass());
                    double target = Math.abs(remaining) <= step + ZamsTrack.SAME_MASS ? mass
                            : nearest.model().mass() * Math.exp(Math.copySign(step, remaining));
                    ZamsModel other = ZamsTrack.partner(known, nearest, target);
                    ModelState seed = seeder.seed(nearest.model(), other == null ? null : other.model(), target);
                    if (other != null) {
                        seed = envelope.refine(seed, nearest.model(), other.model(), target);
                    }
                    line.append(String.format(" [%.4f<-%.4f,%.4f:", target / Constants.M_SUN,
                            nearest.model().mass() / Constants.M_SUN,
                            other == null ? Double.NaN : other.model().mass() / Constants.M_SUN));
                    long a0 = THREADS.getCurrentThreadCpuTime();
                    if (Boolean.getBoolean("probe.trace")) {
                        line.append(" corrections ").append(corrections(seed, physics, rule));
                    }
                    try {
                        StellarModel model = solver.relax(seed, ExtraEnergy.NONE, null,
                                settings.withIterationBudget(ZamsBuilder.SEEDED_BUDGET).withGiveUpRate(Double.parseDouble(
                                        System.getProperty("probe.giveUp", "" + ZamsBuilder.SEEDED_GIVE_UP_RATE))),
                                1.0, rule);
                        int its = model.report().iterations();
                        line.append(" ").append(its);
                        for (int pass = 0; pass < ZamsBuilder.MAX_REMESH_PASSES && planner.needsRemesh(model);
                             pass++) {
                            model = solver.relax(planner.remesh(model), ExtraEnergy.NONE, null, settings, 1.0, rule);
                            line.append("+r").append(model.report().iterations());
                            its += model.report().iterations();
                        }
                        spent += its;
                        ZamsModel zm = new ZamsModel(model, c, its, false);
                        known.add(zm);
                        if (target == mass) {
                            done = zm;
                        } else if (its <= ZamsTrack.EASY_ITERATIONS) {
                            step = Math.min(ZamsTrack.MAX_STEP, 2.0 * step);
                        }
                        line.append(String.format(" %.1f ms]", (THREADS.getCurrentThreadCpuTime() - a0) / 1e6));
                    } catch (SolveFailedException e) {
                        failures++;
                        spent += e.report().iterations();
                        line.append(" FAIL ").append(e.report().iterations()).append(" ")
                                .append(e.report().reason()).append(" ").append(e.report().detail())
                                .append(String.format(" %.1f ms]", (THREADS.getCurrentThreadCpuTime() - a0) / 1e6));
                        step = 0.5 * Math.min(step, Math.abs(remaining));
                        if (step < ZamsTrack.MIN_STEP) {
                            break;
                        }
                    }
                }
                long cpu = THREADS.getCurrentThreadCpuTime() - t0;
                System.out.printf("Z=%s traced rung %+3d: %3d iterations, %d attempts, %d failed, %7.2f ms,"
                                + " %d points:%s%n", z, sign * next, spent, attempts, failures, cpu / 1e6,
                        done == null ? -1 : done.model().state().size(), line);
                if (done == null) {
                    break;
                }
                rungs.add(done);
                if (sign < 0 && next == 1) {
                    below = done;
                }
            }
        }
    }

    /** The largest undamped correction of each Newton iteration of a seeded relaxation, traced. */
    private static String corrections(ModelState seed, PhysicsSet physics, ShellComposition rule) {
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        RelaxationTrace.relax(seed, physics, HenyeySolver.Settings.DEFAULT.withIterationBudget(ZamsBuilder.SEEDED_BUDGET),
                rule, new java.io.PrintStream(bytes, true));
        StringBuilder out = new StringBuilder();
        for (String text : bytes.toString().split("\n")) {
            if (text.contains("correction:")) {
                double largest = 0.0;
                for (String part : text.split(" ")) {
                    if (part.contains("e") && part.contains("@")) {
                        largest = Math.max(largest, Double.parseDouble(part.substring(0, part.indexOf('@'))));
                    }
                }
                out.append(String.format("%.1e,", largest));
            }
        }
        return out.toString();
    }
}
