package org.convgrid.engine.batch;

import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;

/**
 * The zero-age ladders of the lines a solver works on: every ladder that a chunk's groundwork has named and that
 * chunk has not used yet, plus the {@code kept} most recently used others. A scheduler builds the rungs of every chunk
 * it has in flight ahead (threads times its window per thread), so the lines in flight can be many more than a
 * fixed count; a ladder built ahead and evicted before its chunk starts would be built again (time and heap, never a
 * result). Sizing the cache from what is built ahead keeps each such ladder until its chunk has taken it, whatever
 * the thread count. Thread-safe.
 *
 * @param <K> the line
 * @param <V> its ladder
 */
final class LadderCache<K, V> {

    private final int kept;
    /** Access order, eldest first. */
    private final Map<K, V> ladders = new LinkedHashMap<>(16, 0.75f, true);
    /** Chunks named ahead per line that have not taken the line's ladder yet. */
    private final Map<K, Integer> awaited = new HashMap<>();

    /** @param kept ladders kept beyond the awaited ones, &gt;= 0 */
    LadderCache(int kept) {
        if (kept < 0) {
            throw new IllegalArgumentException("ladders kept must be >= 0, got " + kept);
        }
        this.kept = kept;
    }

    /** A chunk's groundwork has named the line: its ladder stays until {@link #taken} is called for that chunk. */
    synchronized void awaiting(K line) {
        awaited.merge(line, 1, Integer::sum);
    }

    /** A chunk named by {@link #awaiting} has taken the line's ladder (or will not): one wait fewer. */
    synchronized void taken(K line) {
        awaited.computeIfPresent(line, (k, n) -> n > 1 ? n - 1 : null);
        evictBeyondKept();
    }

    /** The line's ladder, made on first use. */
    synchronized V ladder(K line, Supplier<V> make) {
        V ladder = ladders.get(line);
        if (ladder == null) {
            ladder = make.get();
            ladders.put(line, ladder);
            evictBeyondKept();
        }
        return ladder;
    }

    /** Ladders held now, awaited ones included. */
    synchronized int size() {
        return ladders.size();
    }

    /** Drops the least recently used ladders that no chunk awaits until at most {@link #kept} such remain. */
    private void evictBeyondKept() {
        int free = 0;
        for (K line : ladders.keySet()) {
            free += awaited.containsKey(line) ? 0 : 1;
        }
        for (Iterator<K> it = ladders.keySet().iterator(); free > kept && it.hasNext(); ) {
            if (!awaited.containsKey(it.next())) {
                it.remove();
                free--;
            }
        }
    }
}
