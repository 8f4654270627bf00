package org.convgrid.engine.batch;

/** Told how far a run has come; called from the scheduling thread only. */
@FunctionalInterface
public interface ProgressListener {

    /** No reporting. */
    ProgressListener NONE = (done, total) -> { };

    /**
     * @param done models written so far in this run
     * @param total models this run will write (or -1 when unknown)
     */
    void progress(long done, long total);

    /**
     * As {@link #progress(long, long)}, telling apart the models computed and those whose rows are written: rows
     * are written in grid order, so models computed after the first unfinished one wait, and are lost on an
     * interrupt. By default only the written ones are told.
     *
     * @param computed models computed so far in this run, written or waiting
     * @param saved models whose rows are written so far in this run
     * @param total models this run will write (or -1 when unknown)
     */
    default void progress(long computed, long saved, long total) {
        progress(saved, total);
    }
}
