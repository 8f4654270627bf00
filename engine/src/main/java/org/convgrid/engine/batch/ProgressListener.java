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
}
