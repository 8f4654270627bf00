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
     * How many models the shard owns: from the axes for the whole grid (at once, whatever its size), by walking the
     * grid once for a share of it.
     */
    public long count() {
        if (shard.count() == 1) {
            return grid.count();
        }
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
