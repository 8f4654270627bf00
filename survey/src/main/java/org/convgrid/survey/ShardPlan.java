package org.convgrid.survey;

import java.util.Collections;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import org.convgrid.engine.batch.Chunking;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.batch.Shard;
import org.convgrid.grids.GridSpec;

/**
 * The requests one shard owns, in the order its catalogue lists them: the same chunk cut as
 * {@link ChunkSweep} makes, so a shard's catalogue is always a prefix of this
 * sequence. Produced lazily.
 *
 * @param grid the grid
 * @param shard the share
 * @param massesPerChunk the scheduler's chunk length
 */
public record ShardPlan(GridSpec grid, Shard shard, int massesPerChunk) implements Iterable<ModelRequest> {

    /**
     * How many models the shard owns, from the axes alone (at once, whatever the grid's size). The grid is cut line
     * by line (a line: one metallicity and one physics choice) into {@code ceil(M / k)} chunks of k masses, the last
     * one holding the rest, every mass with all its ages; chunk positions run on across lines, and the shard owns
     * the positions congruent to its index - 1 modulo its count ({@link Shard#owns}). The lines are summed one by
     * one, so the cost grows with their number, never with the masses or ages.
     */
    public long count() {
        if (shard.count() == 1) {
            return grid.count();
        }
        long masses = grid.massesMsun().size();
        long ages = grid.count() / ((long) grid.physics().size() * grid.metallicities().size() * masses);
        long lines = (long) grid.physics().size() * grid.metallicities().size();
        long chunksPerLine = (masses + massesPerChunk - 1) / massesPerChunk;
        long lastChunkMasses = masses - (chunksPerLine - 1) * massesPerChunk;
        long owned = 0;
        for (long line = 0; line < lines; line++) {
            long first = line * chunksPerLine;
            // owned positions in [first, first + chunksPerLine): those congruent to index - 1 modulo count
            long ownedHere = ownedBelow(first + chunksPerLine) - ownedBelow(first);
            boolean ownsLast = shard.owns(first + chunksPerLine - 1);
            owned += ages * ((ownedHere - (ownsLast ? 1 : 0)) * massesPerChunk + (ownsLast ? lastChunkMasses : 0));
        }
        return owned;
    }

    /** How many of the positions 0 .. end - 1 the shard owns. */
    private long ownedBelow(long end) {
        long offset = shard.index() - 1;
        return end <= offset ? 0 : (end - 1 - offset) / shard.count() + 1;
    }

    /** The count by walking the shard's requests: what {@link #count()} must equal (tests). */
    long walkedCount() {
        long n = 0;
        for (Iterator<ModelRequest> it = iterator(); it.hasNext(); it.next()) {
            n++;
        }
        return n;
    }

    @Override
    public Iterator<ModelRequest> iterator() {
        Chunking chunks = new Chunking(grid.requests().iterator(), massesPerChunk);
        return new Iterator<>() {
            private long position;
            private Iterator<ModelRequest> current = Collections.emptyIterator();

            @Override
            public boolean hasNext() {
                while (!current.hasNext() && chunks.hasNext()) {
                    List<ModelRequest> chunk = chunks.next();
                    if (shard.owns(position++)) {
                        current = chunk.iterator();
                    }
                }
                return current.hasNext();
            }

            @Override
            public ModelRequest next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                return current.next();
            }
        };
    }
}
