package org.convgrid.survey.refine;

import org.convgrid.engine.batch.ProgressListener;

/**
 * Counts a refinement's new models as the worker threads finish them and tells a {@link ProgressListener}, one call at
 * a time (a listener expects a single caller). The total stays unknown (-1): each round's searches stop early when a
 * model fails, and a round's new models can call for another round. One per command: the count runs on across rounds.
 */
public final class RefinementProgress {

    private final ProgressListener listener;
    private long done;

    /** @param listener told the count of new models so far after each one, with total -1 */
    public RefinementProgress(ProgressListener listener) {
        this.listener = listener;
    }

    /** A new model was computed, on any thread. */
    synchronized void modelDone() {
        listener.progress(++done, -1);
    }
}
