package org.convgrid.survey;

import java.io.IOException;

/**
 * Stops a merge between two of its writes when the process is signalled (Ctrl-C, a batch system's SIGTERM), so that
 * the signal's handler removes what the merge wrote without racing it. Every write of the merged directory runs
 * under one lock; {@link #stop} takes it, so it waits for the write under way, and no write starts after it. Until
 * the merged manifest is written, {@link #stop} also removes what the merge wrote (the directory it created, else
 * convgrid's files in it): a merge cut short had left a catalogue without a manifest, which the next merge had to
 * refuse. After the manifest the merged run is whole and stays; only its charts and report may be missing.
 * Thread-safe.
 */
public final class MergeInterruption {

    /** One write of the merge. */
    @FunctionalInterface
    interface Write {
        void run() throws IOException;
    }

    /** What {@link #stop} found. */
    public enum Outcome {
        /** The merge had not begun to write: nothing to remove. */
        NOTHING_WRITTEN,
        /** The merge was writing: what it wrote is removed. */
        PARTIAL_REMOVED,
        /** Removing what the merge wrote failed: the directory is left as it is. */
        PARTIAL_LEFT,
        /** The merged run was whole (its manifest written): it stays. */
        COMPLETE
    }

    private final Object lock = new Object();
    /**
     * Set before {@link #stop} waits for the lock, so that the merge starts no further write while the handler waits:
     * the lock is not fair, and a merge copying thousands of track files could take it again and again first.
     */
    private volatile boolean stopped;
    private boolean complete;
    private Write removal;

    /** Thrown by a write asked for after {@link #stop}: the merge ends there (the signal's handler ends the process). */
    public static final class Stopped extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Stopped() {
            super("merge stopped by a signal", null, false, false);
        }
    }

    /** Runs one write unless the merge was stopped; a stopped merge throws {@link Stopped} instead. */
    void write(Write write) throws IOException {
        synchronized (lock) {
            if (stopped) {
                throw new Stopped();
            }
            write.run();
        }
    }

    /** The merge begins to write; {@code removal} undoes what it writes until {@link #complete()}. */
    void writing(Write removal) {
        synchronized (lock) {
            this.removal = removal;
        }
    }

    /** The merged manifest is written: the run is whole. */
    void complete() {
        synchronized (lock) {
            complete = true;
        }
    }

    /**
     * Removes what the merge wrote, once: for a merge that failed (a disk full), under the lock, so that a signal
     * arriving meanwhile does not remove it a second time beside it.
     */
    void undo() throws IOException {
        synchronized (lock) {
            Write armed = removal;
            removal = null;
            if (armed != null) {
                armed.run();
            }
        }
    }

    /** Stops the merge after the write under way and, when it was unfinished, removes what it wrote. */
    public Outcome stop() {
        stopped = true;
        synchronized (lock) {
            if (complete) {
                return Outcome.COMPLETE;
            }
            if (removal == null) {
                return Outcome.NOTHING_WRITTEN;
            }
            try {
                undo();
                return Outcome.PARTIAL_REMOVED;
            } catch (IOException | RuntimeException e) {
                return Outcome.PARTIAL_LEFT;
            }
        }
    }
}
