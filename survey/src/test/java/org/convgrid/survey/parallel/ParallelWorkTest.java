package org.convgrid.survey.parallel;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.convgrid.engine.batch.SharedStep;
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

    /** Task t uses the chain "line L" then rungs 1..(t % 4) of line L = t / 8, each step needing the one before. */
    private static List<SharedStep> chainOf(int task, Set<String> built, List<String> log) {
        List<SharedStep> chain = new ArrayList<>();
        String line = "line " + task / 8;
        List<String> keys = new ArrayList<>(List.of(line));
        for (int rung = 1; rung <= task % 4; rung++) {
            keys.add(line + " rung " + rung);
        }
        for (int i = 0; i < keys.size(); i++) {
            String key = keys.get(i);
            String before = i == 0 ? null : keys.get(i - 1);
            chain.add(new SharedStep(key, () -> {
                if (before != null && !built.contains(before)) {
                    log.add("step " + key + " ran before " + before);
                }
                built.add(key);
            }));
        }
        return chain;
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 5})
    void aTaskStartsAfterItsSharedStepsAndResultsStayInOrder(int threads) throws Exception {
        Set<String> built = ConcurrentHashMap.newKeySet();
        List<String> faults = Collections.synchronizedList(new ArrayList<>());
        List<Integer> streamed = new ArrayList<>();
        try (ParallelWork work = new ParallelWork(threads)) {
            work.forEachInOrder(IntStream.range(0, 40).boxed().iterator(), t -> chainOf(t, built, faults), t -> {
                for (SharedStep s : chainOf(t, Set.of(), List.of())) {
                    if (!built.contains((String) s.key())) {
                        faults.add("task " + t + " started before " + s.key());
                    }
                }
                return slowFirst(t);
            }, streamed::add);
        }
        assertThat(faults).isEmpty();
        assertThat(streamed).isEqualTo(IntStream.range(0, 40).map(t -> t * t).boxed().toList());
        assertThat(built).hasSize(5 * 4);
    }

    @Test
    void aFreeThreadTakesSharedStepsBeforeTasksAndTheLongerChainFirst() throws Exception {
        List<String> order = Collections.synchronizedList(new ArrayList<>());
        Map<Integer, List<SharedStep>> chains = Map.of(
                0, List.of(new SharedStep("a1", () -> order.add("a1"))),
                1, List.of(),
                2, List.of(new SharedStep("b1", () -> order.add("b1")), new SharedStep("b2", () -> order.add("b2"))));
        CountDownLatch allAdded = new CountDownLatch(1);
        CountDownLatch holding = new CountDownLatch(1);
        Iterator<Integer> tasks = List.of(-1, 0, 1, 2).iterator();
        // the scheduler asks for the next task only after it has added the last one: the moment every task is queued
        Iterator<Integer> signalling = new Iterator<>() {
            @Override
            public boolean hasNext() {
                boolean more = tasks.hasNext();
                if (!more) {
                    allAdded.countDown();
                }
                return more;
            }

            @Override
            public Integer next() {
                int next = tasks.next();
                if (next == 0) {
                    // the rest only once task -1 holds the thread: a worker that started late (under load) found a1
                    // already queued beside task -1 and, a step going before any task, ran it before b1 was added
                    await(holding);
                }
                return next;
            }
        };
        try (ParallelWork work = new ParallelWork(1)) {
            // task -1 holds the only thread until every task has been added, so the ready queue alone decides what
            // runs next (a pause after the last chain was named raced the adding thread under load)
            work.forEachInOrder(signalling, t -> t < 0 ? List.of() : chains.get(t), t -> {
                if (t < 0) {
                    holding.countDown();
                    await(allAdded);
                } else {
                    order.add("task " + t);
                }
                return t;
            }, t -> { });
        }
        assertThat(order).containsExactly("b1", "a1", "b2", "task 1", "task 0", "task 2");
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Test
    void atLeastOneThread() {
        assertThatThrownBy(() -> new ParallelWork(0)).isInstanceOf(IllegalArgumentException.class);
    }
}
