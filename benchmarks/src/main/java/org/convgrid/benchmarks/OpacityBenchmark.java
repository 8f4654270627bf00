package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.StandardPhysics;
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
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Cost of one call of the default opacity (the OPAL GN93 tables, interpolated in log T, log R, X and Z) at points
 * typical of a solar interior, a solar envelope, an M-dwarf centre, a K-dwarf photosphere (the cool join) and a
 * composition between table nodes; beside it the analytic composite at the same points (the old default
 * was that composite times a tabulated correction, so at least as costly), a ratio that survives a busy machine; and
 * the composition-bound call ({@link Opacity#atComposition}) repeated at one point and made afresh.
 * {@link OpacityTableLoadBenchmark} times reading the tables.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class OpacityBenchmark {

    @Param({"centre_sun", "envelope_sun", "centre_m_dwarf", "photosphere_k_dwarf", "between_nodes"})
    public String point;

    /** {@code tables}: the default (OPAL tables); {@code analytic}: the analytic composite, for a load-free ratio. */
    @Param({"tables", "analytic"})
    public String model;

    private Opacity opacity;
    private OpacityAtComposition atComposition;
    private double density;
    private double temperature;
    private Composition composition;

    @Setup
    public void setUp() {
        opacity = model.equals("analytic") ? StandardPhysics.analyticOpacity(1.0) : StandardPhysics.opacity(1.0);
        switch (point) {
            case "centre_sun" -> set(152.9, 1.567e7, 0.346, 0.0188);
            case "envelope_sun" -> set(0.19, 2.2e6, 0.70, 0.0188);
            case "centre_m_dwarf" -> set(300.0, 6.0e6, 0.70, 0.0188);
            case "photosphere_k_dwarf" -> set(3e-7, 5000.0, 0.70, 0.0188);
            default -> set(1e-3, 2.0e5, 0.55, 0.0065);
        }
    }

    private void set(double rho, double t, double x, double z) {
        density = rho;
        temperature = t;
        composition = Composition.scaledSolar(x, z);
        atComposition = opacity.atComposition(composition);
    }

    @Benchmark
    public Object rosselandMean() {
        return opacity.rosselandMean(density, temperature, composition);
    }

    /**
     * The composition-bound call the structure solver makes (one bound opacity per point, kept through a solve),
     * repeated at one point: the cost of a call whose (log T, log R) cell is the last one's, as over most Newton
     * iterations.
     */
    @Benchmark
    public Object rosselandMeanAtComposition() {
        return atComposition.rosselandMean(density, temperature);
    }

    /** Binding the composition and one call: the cost of a point's first call after its composition changed. */
    @Benchmark
    public Object atCompositionFirstCall() {
        return opacity.atComposition(composition).rosselandMean(density, temperature);
    }
}
