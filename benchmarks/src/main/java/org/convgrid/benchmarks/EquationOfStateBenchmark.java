package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.state.Composition;
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
 * Cost of the default equation of state alone, forward (rho, T) and inverse (P, T), from the centre of the Sun
 * to a cool atmosphere: the points where the ionisation and degeneracy solve does the most work. The forward call
 * cold, and warm as the structure solver makes it: started from the solved state of the point itself at a
 * differenced neighbour (1e-6 in ln rho) and at a point moved as by one structure iteration (1e-2 in ln rho,
 * 3e-3 in ln T).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class EquationOfStateBenchmark {

    @Param({"centre_sun", "envelope_sun", "centre_m_dwarf", "ionisation_zone", "photosphere_k_dwarf",
            "cool_atmosphere"})
    public String point;

    private final EquationOfState eos = StandardPhysics.equationOfState();
    private double density;
    private double temperature;
    private double pressure;
    private Composition composition;
    private EosState solved;

    @Setup
    public void setUp() {
        switch (point) {
            case "centre_sun" -> set(152.9, 1.567e7, 0.346);
            case "envelope_sun" -> set(0.19, 2.2e6, 0.70);
            case "centre_m_dwarf" -> set(300.0, 6.0e6, 0.70);
            case "ionisation_zone" -> set(1e-7, 1.2e4, 0.70);
            case "photosphere_k_dwarf" -> set(3e-7, 5000.0, 0.70);
            default -> set(1e-9, 5000.0, 0.70);
        }
    }

    private void set(double rho, double t, double x) {
        density = rho;
        temperature = t;
        composition = Composition.scaledSolar(x, 0.0188);
        solved = eos.atDensity(rho, t, composition);
        pressure = solved.pressure();
    }

    @Benchmark
    public Object atDensity() {
        return eos.atDensity(density, temperature, composition);
    }

    @Benchmark
    public Object atDensityNeighbour() {
        return eos.atDensity(density * 1.000001, temperature, composition, solved);
    }

    @Benchmark
    public Object atDensityMoved() {
        return eos.atDensity(density * 1.01, temperature * 1.003, composition, solved);
    }

    @Benchmark
    public Object atPressure() {
        return eos.atPressure(pressure, temperature, composition);
    }
}
