package org.convgrid.engine.batch;

/**
 * A deterministic share of a grid: shard {@code index} of {@code count} (1-based) takes every chunk whose
 * position in grid order is congruent to index - 1 modulo count.
 *
 * @param index 1..count
 * @param count number of shards, &gt;= 1
 */
public record Shard(int index, int count) {

    /** The whole grid. */
    public static final Shard ALL = new Shard(1, 1);

    public Shard {
        if (count < 1 || index < 1 || index > count) {
            throw new IllegalArgumentException("shard must be K/N with 1 <= K <= N, got " + index + "/" + count);
        }
    }

    /** Whether the chunk at this 0-based position in grid order belongs to this shard. */
    public boolean owns(long chunkPosition) {
        return chunkPosition % count == index - 1;
    }
}
