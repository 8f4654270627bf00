package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsTrack;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One 1 Msun track (X = 0.7062, Z = 0.0188, default physics and time steps) from its zero-age model to
 * core-hydrogen exhaustion on one thread: the unit of work of an evolved grid. The zero-age model and the
 * physics (atmosphere table) are built once in the setup, so the figure is the evolution alone.
 * Run pinned to one core for the one-core figure: {@code taskset -c 0 java -jar benchmarks.jar SolarTrackBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
@Fork(1)
public class SolarTrackBenchmark {

    private PhysicsSet physics;
    private StellarModel zeroAge;

    @Setup
    public void setUp() {
        Composition composition = Composition.scaledSolar(0.7062, 0.0188);
        physics = StandardPhysics.create(PhysicsOptions.DEFAULT, composition);
        zeroAge = ZamsTrack.solveOne(new ZamsBuilder(physics), composition, Constants.M_SUN, null).model().model();
    }

    @Benchmark
    public double trackToExhaustion() {
        EvolutionResult r = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(zeroAge, new double[] {0.0});
        return r.exhaustionAge();
    }
}
