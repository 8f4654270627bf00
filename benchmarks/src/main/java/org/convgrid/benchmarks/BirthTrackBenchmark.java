package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;

import org.convgrid.engine.birth.BirthEvolution;
import org.convgrid.engine.birth.BirthTrack;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
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
 * A 1 Msun, Z = 0.02 (Y = 0.2485 + 1.5 Z) track to core-hydrogen exhaustion on one thread, twice: from birth (start
 * model, pre-main sequence, main sequence) and from the zero-age model of the same mass and composition (built in
 * the benchmark too, as a grid line does), default physics and steps. The ratio of the two is the price of ages
 * counted from birth. Run both in one sitting, pinned to one core for the one-core figures:
 * {@code taskset -c 0 java -jar benchmarks.jar BirthTrackBenchmark}. Ten warm-up tracks: pinned to one core the
 * JIT compiles on the same core, and the birth track (more code: start model, light elements, remeshing) was still
 * getting faster after three (2026-12-03, -f 3 -wi 3: measured tracks 1022-1447 ms, still falling within a fork;
 * -f 2 -wi 10: 998-1235 ms);
 * six forks of five measured tracks, since a fork's compiled code can be faster or slower by 10-30 % for its whole
 * life, so the median over many forks, not over one fork's tracks, is the figure (2026-12-03, the same jar: fork
 * medians 913-1051 ms from birth and 571-760 ms from zero age; their ratio 1.45; runs of two forks had given 1.55-1.78).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 10)
@Measurement(iterations = 5)
@Fork(6)
public class BirthTrackBenchmark {

    private static final double Z = 0.02;

    private PhysicsSet physics;
    private Composition birth;
    private Composition zeroAge;

    @Setup
    public void setUp() {
        double y = 0.2485 + 1.5 * Z;
        birth = BirthAbundances.of(1.0 - y - Z, Z);
        zeroAge = Composition.scaledSolar(birth.x(), birth.z());
        physics = StandardPhysics.create(PhysicsOptions.DEFAULT, birth);
    }

    @Benchmark
    public double fromBirth() {
        BirthTrack t = new BirthEvolution(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(Constants.M_SUN, birth, new double[] {0.0});
        return t.result().exhaustionAge();
    }

    @Benchmark
    public double fromZeroAge() {
        var model = ZamsTrack.solveOne(new ZamsBuilder(physics), zeroAge, Constants.M_SUN, null).model().model();
        EvolutionResult r = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(model, new double[] {0.0});
        return r.exhaustionAge();
    }
}
