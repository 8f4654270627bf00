package org.convgrid.engine.zams;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Timing of homology-seeded zero-age models along a grid line, against cold starts. Not a test: run with
 * {@code ./mvnw -o -q -pl engine test -Dtest=ZamsBenchmark -Dconvgrid.benchmark=true}; prints its figures.
 */
@Tag("benchmark")
@EnabledIfSystemProperty(named = "convgrid.benchmark", matches = "true")
class ZamsBenchmark {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    @Test
    void seededModelsAlongALine() {
        Composition composition = Composition.scaledSolar(0.7062, 0.0188);
        PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, composition);
        ZamsBuilder builder = new ZamsBuilder(physics);
        // warm-up: one full line, so that the JIT and the atmosphere table are ready
        walk(builder, composition, 0.5, 1.5, 0.05);
        List<long[]> seeded = walk(builder, composition, 0.1, 2.0, 0.05);
        List<Double> times = new ArrayList<>();
        double iterations = 0;
        List<Double> cpu = new ArrayList<>();
        for (long[] s : seeded) {
            times.add(s[0] / 1e6);
            cpu.add(s[2] / 1e6);
            iterations += s[1];
        }
        Collections.sort(times);
        Collections.sort(cpu);
        double coldIterations = 0;
        double coldTime = 0;
        double[] coldMasses = {0.3, 0.6, 1.0, 1.5};
        for (double m : coldMasses) {
            long t0 = System.nanoTime();
            ZamsModel z = builder.coldStart(m * Constants.M_SUN, composition);
            coldTime += (System.nanoTime() - t0) / 1e6;
            coldIterations += z.iterations();
        }
        System.out.printf("seeded models: %d, median %.1f ms wall, %.1f ms CPU, mean %.1f Newton iterations%n",
                seeded.size(), times.get(times.size() / 2), cpu.get(cpu.size() / 2), iterations / seeded.size());
        System.out.printf("cold starts: mean %.1f ms, mean %.1f Newton iterations%n", coldTime / coldMasses.length,
                coldIterations / coldMasses.length);
    }

    /** Requests masses in order; returns {wall nanoseconds, iterations, CPU nanoseconds} of each. */
    private static List<long[]> walk(ZamsBuilder builder, Composition composition, double from, double to,
                                     double step) {
        ZamsTrack track = new ZamsTrack(builder, composition);
        track.solve(from * Constants.M_SUN);
        List<long[]> result = new ArrayList<>();
        for (double m = from + step; m <= to + 1e-9; m += step) {
            long t0 = System.nanoTime();
            long c0 = THREADS.getCurrentThreadCpuTime();
            ZamsResult r = track.solve(m * Constants.M_SUN);
            long dt = System.nanoTime() - t0;
            long dc = THREADS.getCurrentThreadCpuTime() - c0;
            if (!r.converged()) {
                throw new IllegalStateException("benchmark model failed at " + m + ": " + r.failure());
            }
            result.add(new long[] {dt, r.iterations(), dc});
        }
        return result;
    }
}
