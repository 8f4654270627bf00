package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsModel;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One zero-age model seeded by homology from its two converged neighbours 0.05 and 0.10 Msun below it (X = 0.7062,
 * Z = 0.0188, default physics): the unit of work of a zero-age grid line. The neighbours and the physics are built
 * in the setup, and the atmosphere nodes the model needs are integrated during warm-up, so the figure is the
 * relaxation alone. {@code -bm sample} gives the median. The warm-up is long because nothing else warms the JIT
 * here: with 40 models only, a seeded model measured ~81 ms of CPU against ~17 ms after 120 (both under load).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 5, time = 4)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SeededZamsBenchmark {

    /** Mass of the model, Msun: a radiative-core star with a convective envelope, and one with a convective core. */
    @Param({"1.0", "1.5"})
    public double massMsun;

    private ZamsBuilder builder;
    private Composition composition;
    private ZamsModel lower;
    private ZamsModel nearer;

    @Setup
    public void setUp() {
        composition = Composition.scaledSolar(0.7062, 0.0188);
        PhysicsSet physics = StandardPhysics.create(PhysicsOptions.DEFAULT, composition);
        builder = new ZamsBuilder(physics);
        lower = converged(massMsun - 0.10, null);
        nearer = converged(massMsun - 0.05, lower);
    }

    private ZamsModel converged(double msun, ZamsModel seed) {
        ZamsResult r = ZamsTrack.solveOne(builder, composition, msun * Constants.M_SUN, seed);
        if (!r.converged()) {
            throw new IllegalStateException("benchmark neighbour at " + msun + " Msun did not converge: " + r.failure());
        }
        return r.model();
    }

    @Benchmark
    public int seededModel() {
        ZamsTrack track = new ZamsTrack(builder, composition);
        track.add(lower);
        track.add(nearer);
        ZamsResult r = track.solve(massMsun * Constants.M_SUN);
        if (!r.converged()) {
            throw new IllegalStateException("benchmark model did not converge: " + r.failure());
        }
        return r.iterations();
    }
}
