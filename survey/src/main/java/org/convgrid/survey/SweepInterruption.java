package org.convgrid.survey;

import java.io.IOException;
import java.util.function.DoubleSupplier;

/**
 * Lets a signal stop a sweep cleanly between two writes. Every write that must not be cut in half (a catalogue row
 * with its zones, a life-events row, the tables and manifest at the sweep's end) runs through {@link #write}; the
 * interrupting thread calls {@link #stop}, which waits for the write in progress and then shuts the gate: a later
 * write never starts, its thread waits until the process ends (the caller halts it). So after {@link #stop} the
 * catalogue holds only complete rows and nothing else of the sweep changes on disk. Thread-safe; one per run.
 */
public final class SweepInterruption {

    /** One write of the sweep. */
    @FunctionalInterface
    public interface Write {
        void run() throws IOException;
    }

    /**
     * Where the sweep stood when it was stopped.
     *
     * @param swept whether the sweep had already written its final tables and manifest (only refinement, charts and
     *              report were left)
     * @param medianSecondsPerModel median seconds per model measured so far this session, NaN when none
     */
    public record Stopped(boolean swept, double medianSecondsPerModel) {
    }

    private final Object gate = new Object();
    private boolean stopped;
    private boolean swept;
    private DoubleSupplier timing = () -> Double.NaN;

    /**
     * Runs one write unless the sweep was stopped; once stopped the calling thread waits for the process to end
     * instead (neither writing nor returning, so nothing after it is written either).
     */
    public void write(Write write) throws IOException {
        synchronized (gate) {
            waitForTheEndIfStopped();
            write.run();
        }
    }

    /** As {@link #write}, and marks the sweep as swept once the write (its final tables and manifest) is done. */
    void finalWrite(Write write) throws IOException {
        synchronized (gate) {
            waitForTheEndIfStopped();
            write.run();
            swept = true;
        }
    }

    /** Where the median seconds per model of this session come from. */
    void timedBy(DoubleSupplier medianSecondsPerModel) {
        synchronized (gate) {
            timing = medianSecondsPerModel;
        }
    }

    /** Waits for the write in progress, then shuts the gate for good. */
    public Stopped stop() {
        synchronized (gate) {
            stopped = true;
            return new Stopped(swept, timing.getAsDouble());
        }
    }

    private void waitForTheEndIfStopped() {
        while (stopped) {
            try {
                gate.wait();
            } catch (InterruptedException e) {
                // keep waiting: the process is ending, and this thread must not write
            }
        }
    }
}
