package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * A signal during a merge: its handler waits for the write under way, then removes what the merge wrote, and no
 * write follows; a merge whose manifest is written is left whole.
 */
class MergeInterruptionTest {

    @Test
    void aStopWaitsForTheWriteUnderWayThenRemovesWhatWasWrittenAndNoWriteFollows() throws Exception {
        MergeInterruption interruption = new MergeInterruption();
        List<String> events = Collections.synchronizedList(new ArrayList<>());
        interruption.writing(() -> events.add("removed"));
        CountDownLatch inWrite = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        Thread merge = new Thread(() -> {
            try {
                interruption.write(() -> {
                    inWrite.countDown();
                    try {
                        release.await(5, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    events.add("catalogue written");
                });
                interruption.write(() -> events.add("tracks written"));
            } catch (MergeInterruption.Stopped e) {
                events.add("stopped");
            } catch (Exception e) {
                events.add("failed: " + e);
            }
        });
        merge.start();
        assertThat(inWrite.await(5, TimeUnit.SECONDS)).isTrue();
        Thread signal = new Thread(() -> events.add("outcome " + interruption.stop()));
        signal.start();
        // the handler waits for the write under way: blocked on the lock (its stop already asked for)
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
        while (signal.getState() != Thread.State.BLOCKED && System.nanoTime() < deadline) {
            Thread.onSpinWait();
        }
        assertThat(signal.getState()).isEqualTo(Thread.State.BLOCKED);
        assertThat(events).isEmpty();
        release.countDown();
        signal.join(5000);
        merge.join(5000);
        // the write under way ends first; then the removal, and the merge stops where its next write would begin:
        // the tracks are never written (the three come in any order, each after the write under way)
        assertThat(events.get(0)).isEqualTo("catalogue written");
        assertThat(events).containsExactlyInAnyOrder("catalogue written", "removed", "outcome PARTIAL_REMOVED",
                "stopped");
    }

    @Test
    void aMergeWhoseManifestIsWrittenStaysWhole() throws Exception {
        MergeInterruption interruption = new MergeInterruption();
        List<String> removed = new ArrayList<>();
        interruption.writing(() -> removed.add("removed"));
        interruption.write(() -> interruption.complete());
        assertThat(interruption.stop()).isEqualTo(MergeInterruption.Outcome.COMPLETE);
        assertThat(removed).isEmpty();
        assertThatThrownBy(() -> interruption.write(() -> { })).isInstanceOf(MergeInterruption.Stopped.class);
    }

    @Test
    void aStopBeforeAnyWriteHasNothingToRemove() {
        assertThat(new MergeInterruption().stop()).isEqualTo(MergeInterruption.Outcome.NOTHING_WRITTEN);
    }
}
