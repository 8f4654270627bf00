package org.convgrid.engine.birth;

import java.util.Arrays;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.PreMainSequenceLimits;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsModel;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Measures how the ages a track from birth reports move with the number of mesh points (the same N for the start
 * model and the evolution): ZAMS, radiative-core onset, lithium halved and core-hydrogen exhaustion, with the
 * steps, Newton iterations and points x iterations each track costs; and the exhaustion age of a zero-age track.
 * Run with -Dconvgrid.probe=true, -Dprobe.points=250,500,1000, -Dprobe.masses=1.0 (Msun), -Dprobe.z=0.02,
 * -Dprobe.coarse=1 (factor on every step limit) and -Dprobe.zeroAge=true.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class MeshConvergenceProbe {

    /** Zero-age tracks only up to here, Msun (the cold start is the direct relaxation below it). */
    private static final double ZERO_AGE_LIMIT = 1.5;
    private static final double[] LITHIUM_AGES_MYR = {3.0, 10.0, 30.0, 100.0, 1000.0};

    /** Surface lithium over its birth value at {@code age} (s), linear between the steps around it. */
    private static double lithiumAt(BirthTrack b, double age) {
        var pts = b.points();
        for (int i = 1; i < pts.size(); i++) {
            if (pts.get(i).age() >= age) {
                double a0 = pts.get(i - 1).age();
                double w = (age - a0) / (pts.get(i).age() - a0);
                return (1 - w) * pts.get(i - 1).surfaceLithium() + w * pts.get(i).surfaceLithium();
            }
        }
        return Double.NaN;
    }

    /** m/M at the base of the outermost convective zone of the first step at or after {@code age} (s). */
    private static double envelopeBaseAt(BirthTrack b, double age) {
        for (TrackPoint p : b.points()) {
            if (p.age() >= age && !p.step().convectiveZones().isEmpty()) {
                var zones = p.step().convectiveZones();
                return zones.get(zones.size() - 1).innerMassFraction();
            }
        }
        return Double.NaN;
    }

    /**
     * Per N (-Dprobe.points) and mass (-Dprobe.masses): the life events of a track from birth, surface lithium at
     * a few ages and at the ZAMS, steps and iterations; then, up to {@link #ZERO_AGE_LIMIT}, a zero-age track of
     * the same X and Z to core-hydrogen exhaustion.
     */
    @Test
    void agesAgainstMeshPoints() {
        double z = number("probe.z", "0.02");
        var physics = BirthTracks.physics(z);
        boolean zeroAge = Boolean.parseBoolean(System.getProperty("probe.zeroAge", "true"));
        for (int n : meshSizes("250,500,1000")) {
            MeshPlanner planner = new MeshPlanner(n);
            double coarse = number("probe.coarse", "1");
            MainSequenceEvolver evolver = evolver(physics, planner, coarse);
            BirthEvolution birth = new BirthEvolution(new StartModelBuilder(physics, planner,
                    StartModelBuilder.DEFAULT_CENTRAL_TEMPERATURE), evolver, BirthEvolution.DEFAULT_CORE_THRESHOLD);
            for (String ms : System.getProperty("probe.masses", "1.0").split(",")) {
                double m = Double.parseDouble(ms.trim());
                long t0 = System.nanoTime();
                BirthTrack b = birth.evolve(m * Constants.M_SUN, BirthTracks.birth(z), new double[] {0.0});
                double s = (System.nanoTime() - t0) * 1e-9;
                var e = b.events();
                EvolutionResult r = b.result();
                int iterations = b.start().iterations() ;
                int preSteps = 0;
                for (EvolutionStep st : r.steps()) {
                    iterations += st.iterations();
                    if (st.age() < e.zeroAgeMainSequence()) {
                        preSteps++;
                    }
                }
                StringBuilder li = new StringBuilder();
                for (double at : LITHIUM_AGES_MYR) {
                    li.append(String.format(" Li(%.0f Myr) %.4f", at, lithiumAt(b, at * BirthTracks.MYR)));
                }
                li.append(String.format(" Li(ZAMS) %.4f", lithiumAt(b, e.zeroAgeMainSequence())));
                li.append(String.format(" env.base m/M at Li-half %.4f", envelopeBaseAt(b, e.lithiumHalved())));
                System.out.println("birth n=" + n + li);
                System.out.printf("birth n=%d M=%.2f ZAMS %.5g Myr radcore %.5g Myr Li-half %.5g Myr cc %.5g Myr"
                                + " exh %.5g Gyr end %s steps %d (pre-ZAMS %d) iter %d pts*iter %.3g %.1f s%n",
                        n, m, e.zeroAgeMainSequence() / BirthTracks.MYR, e.radiativeCore() / BirthTracks.MYR,
                        e.lithiumHalved() / BirthTracks.MYR, e.convectiveCoreOnset() / BirthTracks.MYR,
                        r.exhaustionAge() / Constants.GYR, r.end(), r.steps().size(), preSteps, iterations,
                        (double) n * iterations, s);
                if (zeroAge && m <= ZERO_AGE_LIMIT) {
                    long t1 = System.nanoTime();
                    // the zero-age composition as a grid's zero-age origin gives it: same X and Z, no light elements
                    Composition c = BirthTracks.birth(z);
                    Composition scaled = Composition.scaledSolar(c.x(), z);
                    ZamsResult zr0 = new ZamsTrack(new ZamsBuilder(BirthTracks.physics(z), planner,
                            HenyeySolver.Settings.DEFAULT), scaled).solve(m * Constants.M_SUN);
                    if (!zr0.converged()) {
                        System.out.printf("zero-age n=%d M=%.2f no zero-age model: %s%n", n, m, zr0.failure());
                        continue;
                    }
                    ZamsModel zams = zr0.model();
                    EvolutionResult zr = evolver.evolve(zams.model(), new double[] {0.0});
                    int zi = zams.iterations();
                    for (EvolutionStep st : zr.steps()) {
                        zi += st.iterations();
                    }
                    System.out.printf("zero-age n=%d M=%.2f exh %.5g Gyr end %s steps %d iter %d %.1f s%n", n, m,
                            zr.exhaustionAge() / Constants.GYR, zr.end(), zr.steps().size(), zi,
                            (System.nanoTime() - t1) * 1e-9);
                }
            }
        }
    }

    /**
     * Where the points of a zero-age 1 Msun track lie, per N (-Dprobe.points): the innermost point's m/M, the
     * points below m/M 0.1 and 0.3 and in the outermost 1e-3 of the mass, the central X, and each term's share of
     * the mesh cost (in the order ln P, ln T, ln r, m/M, ln(1 - m/M), L, convective boundaries, composition), at the
     * zero-age model and as the central hydrogen passes 0.5, 0.3 and 0.1.
     */
    @Test
    void zeroAgeMeshDetail() {
        double z = number("probe.z", "0.02");
        double m = number("probe.mass", "1.0");
        var physics = BirthTracks.physics(z);
        for (int n : meshSizes("500,1000")) {
            MeshPlanner planner = new MeshPlanner(n);
            MainSequenceEvolver evolver = evolver(physics, planner, number("probe.coarse", "1"));
            Composition c = BirthTracks.birth(z);
            ZamsResult zr0 = new ZamsTrack(new ZamsBuilder(physics, planner, HenyeySolver.Settings.DEFAULT),
                    Composition.scaledSolar(c.x(), z)).solve(m * Constants.M_SUN);
            double[] marks = {0.5, 0.3, 0.1, 0.03};
            int[] next = {0};
            int[] remeshes = {0};
            Object[] lastMesh = {zr0.model().model().state().mesh()};
            describe(n, 0.0, zr0.model().model());
            EvolutionResult r = evolver.evolve(zr0.model().model(), new double[] {0.0}, (age, dt, model) -> {
                if (model.state().mesh() != lastMesh[0]) {
                    remeshes[0]++;
                    lastMesh[0] = model.state().mesh();
                }
                double xc = model.profile().hydrogen(0);
                if (next[0] < marks.length && xc <= marks[next[0]]) {
                    next[0]++;
                    describe(n, age, model);
                }
            });
            System.out.printf("n=%d exh %.5g Gyr, %d of %d steps on a new mesh%n", n,
                    r.exhaustionAge() / Constants.GYR, remeshes[0], r.steps().size());
        }
    }

    private static void describe(int n, double age, org.convgrid.engine.structure.StellarModel model) {
        var p = model.profile();
        var mesh = model.state().mesh();
        int size = p.size();
        int below01 = 0;
        int below03 = 0;
        int outer = 0;
        for (int k = 0; k < size; k++) {
            below01 += mesh.fraction(k) < 0.1 ? 1 : 0;
            below03 += mesh.fraction(k) < 0.3 ? 1 : 0;
            outer += mesh.exteriorFraction(k) < 1e-3 ? 1 : 0;
        }
        double[] terms = new double[TERMS.length];
        for (int k = 0; k < size - 1; k++) {
            double[] t = costTerms(model, k);
            for (int i = 0; i < t.length; i++) {
                terms[i] += t[i];
            }
        }
        double total = 0;
        for (double t : terms) {
            total += t;
        }
        StringBuilder sb = new StringBuilder();
        for (double t : terms) {
            sb.append(String.format(" %.3f", t / total));
        }
        System.out.printf("n=%d age %.4g Gyr Xc %.4f q0 %.3e pts<0.1 %d pts<0.3 %d pts(1-q<1e-3) %d cost %.0f"
                + " shares%s%n", n, age / Constants.GYR, p.hydrogen(0), mesh.fraction(0), below01, below03, outer,
                total, sb);
    }

    /**
     * Per N (-Dprobe.points): how many steps of a 1 Msun track from birth (-Dprobe.mass) start on a new mesh, before
     * 10 Myr (the lithium burning), from there to 40 Myr (the arrival on the main sequence) and after, and which cost
     * term asked for each redistribution.
     */
    @Test
    void remeshedStepsFromBirth() {
        double z = number("probe.z", "0.02");
        double m = number("probe.mass", "1.0");
        var physics = BirthTracks.physics(z);
        for (int n : meshSizes("500,1000")) {
            MeshPlanner planner = new MeshPlanner(n);
            MainSequenceEvolver evolver = evolver(physics, planner, 1.0);
            StartModel start = new StartModelBuilder(physics, planner, StartModelBuilder.DEFAULT_CENTRAL_TEMPERATURE)
                    .build(m * Constants.M_SUN, BirthTracks.birth(z));
            double[] bands = {10.0 * BirthTracks.MYR, 40.0 * BirthTracks.MYR, Double.MAX_VALUE};
            int[] remeshed = new int[bands.length];
            int[] steps = new int[bands.length];
            int[][] trigger = new int[bands.length][TERMS.length];
            Object[] lastMesh = {start.model().state().mesh()};
            evolver.evolve(start.model(), new double[] {0.0}, (age, dt, model) -> {
                int band = 0;
                while (age > bands[band]) {
                    band++;
                }
                steps[band]++;
                int term = remeshTrigger(model);
                if (term >= 0) {
                    trigger[band][term]++;
                }
                if (model.state().mesh() != lastMesh[0]) {
                    remeshed[band]++;
                    lastMesh[0] = model.state().mesh();
                }
            });
            System.out.printf("n=%d remeshed steps: %d of %d before 10 Myr, %d of %d to 40 Myr, %d of %d after%n", n,
                    remeshed[0], steps[0], remeshed[1], steps[1], remeshed[2], steps[2]);
            for (int b = 0; b < bands.length; b++) {
                StringBuilder sb = new StringBuilder();
                for (int i = 0; i < TERMS.length; i++) {
                    sb.append(' ').append(TERMS[i]).append(' ').append(trigger[b][i]);
                }
                System.out.printf("n=%d band %d: models whose costliest interval asks for a remesh, by its largest"
                        + " term:%s%n", n, b, sb);
            }
        }
    }

    private static final String[] TERMS = java.util.stream.Stream.concat(MeshPlanner.COST_TERMS.stream(),
            java.util.stream.Stream.of("X")).toArray(String[]::new);

    /**
     * The index in {@link #TERMS} of the largest term of the model's costliest interval when that interval exceeds
     * {@link MeshPlanner#UNEVENNESS_LIMIT} times the even share (the planner then remeshes), else -1.
     */
    private static int remeshTrigger(org.convgrid.engine.structure.StellarModel model) {
        int size = model.profile().size();
        double total = 0.0;
        double largest = -1.0;
        int term = -1;
        for (int k = 0; k < size - 1; k++) {
            double[] t = costTerms(model, k);
            double c = 0.0;
            int big = 0;
            for (int i = 0; i < t.length; i++) {
                c += t[i];
                big = t[i] > t[big] ? i : big;
            }
            total += c;
            if (c > largest) {
                largest = c;
                term = big;
            }
        }
        return largest > MeshPlanner.UNEVENNESS_LIMIT * total / (size - 1) ? term : -1;
    }

    /**
     * The terms of the mesh cost of interval (k, k + 1), in the order of {@link #TERMS}: the planner's own terms for
     * the model's size ({@link MeshPlanner#costTerms}) and the evolver's composition cost.
     */
    private static double[] costTerms(org.convgrid.engine.structure.StellarModel model, int k) {
        var p = model.profile();
        var mesh = model.state().mesh();
        double[] structure = new MeshPlanner(p.size()).costTerms(model, k);
        double[] t = Arrays.copyOf(structure, TERMS.length);
        t[structure.length] = Math.min(Math.abs(p.hydrogen(k + 1) - p.hydrogen(k))
                / MainSequenceEvolver.COMPOSITION_MESH_STEP,
                (mesh.fraction(k + 1) - mesh.fraction(k)) / MainSequenceEvolver.COMPOSITION_MESH_RESOLUTION);
        return t;
    }

    /** The system property {@code name} as a number, {@code fallback} when it is not set. */
    private static double number(String name, String fallback) {
        return Double.parseDouble(System.getProperty(name, fallback));
    }

    /** The mesh sizes of -Dprobe.points (comma-separated), {@code fallback} when it is not set. */
    private static int[] meshSizes(String fallback) {
        return Arrays.stream(System.getProperty("probe.points", fallback).split(","))
                .mapToInt(s -> Integer.parseInt(s.trim())).toArray();
    }

    /** The default evolver on {@code planner}'s mesh, every step limit (main sequence and before it) times coarse. */
    private static MainSequenceEvolver evolver(PhysicsSet physics, MeshPlanner planner,
                                               double coarse) {
        return new MainSequenceEvolver(physics, planner,
                HenyeySolver.Settings.DEFAULT.withIterationBudget(MainSequenceEvolver.RELAXATION_BUDGET),
                MainSequenceEvolver.Settings.DEFAULT.scaled(coarse))
                .withPreMainSequenceLimits(PreMainSequenceLimits.DEFAULT.scaled(coarse));
    }
}
