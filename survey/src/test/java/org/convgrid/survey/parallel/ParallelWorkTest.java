package org.convgrid.survey.parallel;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ParallelWorkTest {

    /** Later tasks finish first; the results must still come back in task order. */
    private static int slowFirst(int task) {
        try {
            Thread.sleep(Math.max(0, 20 - task));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return task * task;
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 5})
    void resultsComeBackInTaskOrderAtAnyThreadCount(int threads) throws Exception {
        List<Integer> tasks = IntStream.range(0, 40).boxed().toList();
        List<Integer> expected = tasks.stream().map(t -> t * t).toList();
        List<Integer> streamed = new ArrayList<>();
        try (ParallelWork work = new ParallelWork(threads)) {
            work.forEachInOrder(tasks.iterator(), ParallelWorkTest::slowFirst, streamed::add);
            assertThat(work.mapInOrder(tasks, ParallelWorkTest::slowFirst)).isEqualTo(expected);
        }
        assertThat(streamed).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 3})
    void onlyABoundedWindowIsInFlight(int threads) throws Exception {
        AtomicInteger started = new AtomicInteger();
        AtomicInteger handed = new AtomicInteger();
        AtomicInteger mostInFlight = new AtomicInteger();
        try (ParallelWork work = new ParallelWork(threads)) {
            work.forEachInOrder(IntStream.range(0, 200).boxed().iterator(),
                    t -> mostInFlight.accumulateAndGet(started.incrementAndGet() - handed.get(), Math::max),
                    r -> handed.incrementAndGet());
        }
        assertThat(handed.get()).isEqualTo(200);
        assertThat(mostInFlight.get()).isBetween(1, threads * ParallelWork.WINDOW_PER_THREAD);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 4})
    void aFailingTaskReachesTheCaller(int threads) {
        try (ParallelWork work = new ParallelWork(threads)) {
            assertThatThrownBy(() -> work.mapInOrder(List.of(1, 2, 3), t -> {
                if (t == 2) {
                    throw new IllegalArgumentException("task 2");
                }
                return t;
            })).isInstanceOf(IllegalArgumentException.class).hasMessage("task 2");
            assertThatThrownBy(() -> work.forEachInOrder(List.of(1).iterator(), t -> t, r -> {
                throw new IOException("sink");
            })).isInstanceOf(IOException.class).hasMessage("sink");
        }
    }

    @Test
    void atLeastOneThread() {
        assertThatThrownBy(() -> new ParallelWork(0)).isInstanceOf(IllegalArgumentException.class);
    }
}
