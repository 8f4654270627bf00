package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The ladder cache keeps every ladder built ahead for a chunk until that chunk has taken it, however many lines are in
 * flight, and otherwise only the most recently used few.
 */
class LadderCacheTest {

    private static final int KEPT = 2;

    /** Makes a new "ladder" per call and remembers which lines it made, so a rebuild shows. */
    private final List<String> made = new ArrayList<>();
    private final LadderCache<String, Object> cache = new LadderCache<>(KEPT);

    private Object ladder(String line) {
        return cache.ladder(line, () -> {
            made.add(line);
            return new Object();
        });
    }

    @Test
    void withoutChunksNamedAheadKeepsTheMostRecentlyUsed() {
        ladder("a");
        ladder("b");
        ladder("a");
        ladder("c");
        assertThat(cache.size()).isEqualTo(KEPT);
        Object a = ladder("a");
        assertThat(made).containsExactly("a", "b", "c");
        assertThat(ladder("a")).isSameAs(a);
        ladder("b");
        // b, the least recently used after a and c, was evicted by c and is made again
        assertThat(made).containsExactly("a", "b", "c", "b");
    }

    @Test
    void ladderBuiltAheadStaysUntilItsChunkTakesIt() {
        // a window of many more chunks than the cache keeps, each of its own line, all built ahead (groundwork)
        int inFlight = 8 * KEPT;
        List<Object> built = new ArrayList<>();
        for (int i = 0; i < inFlight; i++) {
            cache.awaiting("line" + i);
            built.add(ladder("line" + i));
        }
        // lines asked for without groundwork in between do not push the awaited ones out
        ladder("other1");
        ladder("other2");
        ladder("other3");
        assertThat(cache.size()).isEqualTo(inFlight + KEPT);
        for (int i = 0; i < inFlight; i++) {
            assertThat(ladder("line" + i)).as("line %d", i).isSameAs(built.get(i));
            cache.taken("line" + i);
        }
        assertThat(made).hasSize(inFlight + 3);
        // once taken they are ordinary ladders again: only the most recently used few stay
        assertThat(cache.size()).isEqualTo(KEPT);
    }

    @Test
    void eachChunkOfALineWaitsForItsLadder() {
        cache.awaiting("a");
        cache.awaiting("a");
        Object a = ladder("a");
        cache.taken("a");
        ladder("b");
        ladder("c");
        ladder("d");
        // one chunk of line a still waits: its ladder is kept
        assertThat(ladder("a")).isSameAs(a);
        cache.taken("a");
        ladder("b");
        ladder("c");
        ladder("d");
        assertThat(ladder("a")).isNotSameAs(a);
    }

    @Test
    void takingALadderNoChunkAwaitsChangesNothing() {
        // a chunk solved without groundwork (a refinement's) reports its ladder taken too
        cache.taken("a");
        Object a = ladder("a");
        assertThat(ladder("a")).isSameAs(a);
        assertThat(cache.size()).isEqualTo(1);
    }
}
