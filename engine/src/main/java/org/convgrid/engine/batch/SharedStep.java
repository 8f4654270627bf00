package org.convgrid.engine.batch;

import java.util.Objects;

/**
 * A piece of work that several chunks of a grid share and that a scheduler may do ahead of them, on any thread (for
 * a zero-age line: one rung of its ladder). Running it is idempotent and thread-safe, and what it builds is the same
 * whoever runs it and whenever, so doing it ahead changes when a chunk's models are computed, never what they are; a
 * chunk whose steps were not run does them itself.
 *
 * @param key identifies the work: steps with equal keys (value equality) are the same work
 * @param work does it
 */
public record SharedStep(Object key, Runnable work) {

    public SharedStep {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(work, "work");
    }
}
