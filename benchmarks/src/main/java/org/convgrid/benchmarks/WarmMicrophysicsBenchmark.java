package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EosAtComposition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityAtComposition;
import org.convgrid.engine.state.Composition;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Cost of one point of equation of state + opacity + nuclear energy generation the way the structure solver calls
 * them in a Newton iteration, at the points of {@link MicrophysicsBenchmark}: the equation of state and the opacity
 * bound to the point's composition ({@code atComposition}), the equation of state started from the point's state of
 * the previous iteration, {@code offset} away in ln rho and in ln T (a time step's first corrections are ~1e-3, its
 * last ~1e-6 and below), the opacity having answered there too (a bound opacity keeps its last table cell), and the
 * network's energy generation with its two slopes only ({@code NuclearNetwork.energy}).
 * {@link MicrophysicsBenchmark} times the same three from nothing: the equation of state's cold start and the
 * network's full rates with their composition slopes.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class WarmMicrophysicsBenchmark {

    @Param({"centre_sun", "envelope_sun", "centre_m_dwarf", "photosphere_k_dwarf"})
    public String point;

    /** Distance in ln rho and in ln T from the previous iteration's state. */
    @Param({"1e-3", "1e-6"})
    public double offset;

    private final Opacity opacity = StandardPhysics.opacity(1.0);
    private final NuclearNetwork nuclear = StandardPhysics.nuclearNetwork();
    private final double[] burning = new double[3];
    private double density;
    private double temperature;
    private Composition composition;
    private EosAtComposition eos;
    private OpacityAtComposition boundOpacity;
    private EosState previousIteration;

    @org.openjdk.jmh.annotations.Setup
    public void setUp() {
        BenchmarkPoint p = BenchmarkPoint.named(point);
        double rho = p.density();
        double t = p.temperature();
        density = rho;
        temperature = t;
        composition = p.composition(nuclear);
        eos = StandardPhysics.equationOfState().atComposition(composition);
        previousIteration = eos.atDensity(rho * Math.exp(-offset), t * Math.exp(-offset), null);
        boundOpacity = opacity.atComposition(composition);
        boundOpacity.rosselandMean(rho * Math.exp(-offset), t * Math.exp(-offset));
    }

    @Benchmark
    public void asTheSolverCalls(Blackhole hole) {
        hole.consume(eos.atDensity(density, temperature, previousIteration));
        hole.consume(boundOpacity.rosselandMean(density, temperature));
        nuclear.energy(density, temperature, composition, burning);
        hole.consume(burning[0]);
    }
}
