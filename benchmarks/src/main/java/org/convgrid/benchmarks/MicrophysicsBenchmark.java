package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;
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
 * Cost of one call of equation of state + opacity + nuclear rates, the unit of work of the structure solver,
 * at points typical of a solar-like interior, a cool envelope and an M-dwarf centre.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class MicrophysicsBenchmark {

    @Param({"centre_sun", "envelope_sun", "centre_m_dwarf", "photosphere_k_dwarf"})
    public String point;

    private final EquationOfState eos = StandardPhysics.equationOfState();
    private final Opacity opacity = StandardPhysics.opacity(1.0);
    private final NuclearNetwork nuclear = StandardPhysics.nuclearNetwork();
    private double density;
    private double temperature;
    private Composition composition;

    @org.openjdk.jmh.annotations.Setup
    public void setUp() {
        BenchmarkPoint p = BenchmarkPoint.named(point);
        double rho = p.density();
        double t = p.temperature();
        density = rho;
        temperature = t;
        composition = p.composition(nuclear);
    }

    @Benchmark
    public void eosOpacityAndBurning(Blackhole hole) {
        hole.consume(eos.atDensity(density, temperature, composition));
        hole.consume(opacity.rosselandMean(density, temperature, composition));
        hole.consume(nuclear.burn(density, temperature, composition));
    }
}
