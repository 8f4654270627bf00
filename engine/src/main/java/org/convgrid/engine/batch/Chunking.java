package org.convgrid.engine.batch;

import org.convgrid.engine.request.ModelRequest;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Objects;

/**
 * Cuts a grid-ordered stream of requests into chunks: a chunk never crosses a line of constant (Z, Y, physics)
 * and holds at most a fixed number of masses. The cut depends on the grid alone (never on the thread count),
 * which is what makes catalogues identical across thread counts, shards and resumed runs.
 */
public final class Chunking implements Iterator<List<ModelRequest>> {

    /** Masses per chunk by default: long enough for homology seeding to pay, short enough to share work. */
    public static final int DEFAULT_MASSES_PER_CHUNK = 8;

    private final Iterator<ModelRequest> requests;
    private final int massesPerChunk;
    private ModelRequest pending;

    public Chunking(Iterator<ModelRequest> requests, int massesPerChunk) {
        if (massesPerChunk < 1) {
            throw new IllegalArgumentException("massesPerChunk must be >= 1, got " + massesPerChunk);
        }
        this.requests = requests;
        this.massesPerChunk = massesPerChunk;
        this.pending = requests.hasNext() ? requests.next() : null;
    }

    @Override
    public boolean hasNext() {
        return pending != null;
    }

    @Override
    public List<ModelRequest> next() {
        if (pending == null) {
            throw new NoSuchElementException();
        }
        List<ModelRequest> chunk = new ArrayList<>();
        int masses = 0;
        double lastMass = Double.NaN;
        ModelRequest first = pending;
        while (pending != null && sameLine(first, pending)) {
            if (pending.mass() != lastMass) {
                if (masses == massesPerChunk) {
                    break;
                }
                masses++;
                lastMass = pending.mass();
            }
            chunk.add(pending);
            pending = requests.hasNext() ? requests.next() : null;
        }
        return chunk;
    }

    /** Same initial composition and physics: models that may seed one another. */
    static boolean sameLine(ModelRequest a, ModelRequest b) {
        return a.initialMetals() == b.initialMetals() && a.initialHelium() == b.initialHelium()
                && Objects.equals(a.physics(), b.physics());
    }
}
