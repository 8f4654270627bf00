package org.convgrid.benchmarks;

import java.util.concurrent.TimeUnit;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;
import org.convgrid.engine.physics.opacity.TabulatedOpacity;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Set-up cost of the default opacity: one read of the shipped OPAL tables in a fresh JVM (cold: what a run pays
 * once, at the first opacity call), five forks.
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 0)
@Measurement(iterations = 1)
@Fork(5)
public class OpacityTableLoadBenchmark {

    @Benchmark
    public TabulatedOpacity readShippedTable() {
        return OpalGn93Opacity.readShippedTable();
    }
}
