package org.convgrid.survey.parallel;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.concurrent.PriorityBlockingQueue;
import java.util.function.Supplier;
import org.convgrid.engine.batch.SharedStep;

/**
 * The schedule of one sweep: tasks that depend on chains of shared steps (a line's zero-age ladder) start only when
 * their last step is done, so no thread ever waits for one that builds what it needs; it takes other work instead.
 * Of the jobs ready, a free thread takes a shared step before any task (the steps of the longest chain first, since
 * a chain is built one step after the other), and tasks in the order they were added. A step wanted by several tasks
 * runs once while it is pending; one that throws counts as done (a task does the steps it finds missing itself).
 * Only when things are computed depends on this schedule, never what.
 */
final class GroundworkFirst {

    private final Executor pool;
    private final PriorityBlockingQueue<Job> ready = new PriorityBlockingQueue<>();
    /** Steps pending or running, by key; guarded by {@code this}. */
    private final Map<Object, Step> pending = new HashMap<>();
    private long added;

    GroundworkFirst(Executor pool) {
        this.pool = pool;
    }

    /**
     * Runs {@code task} on the pool once every step of {@code chain} (in order, each after the one before it) is
     * done.
     *
     * @return the task's result (completed exceptionally with what it threw)
     */
    synchronized <R> CompletableFuture<R> add(List<SharedStep> chain, Supplier<R> task) {
        Step before = null;
        for (int i = 0; i < chain.size(); i++) {
            SharedStep s = chain.get(i);
            int after = chain.size() - 1 - i;
            Step step = pending.get(s.key());
            if (step == null) {
                Step fresh = new Step(s, after);
                pending.put(s.key(), fresh);
                whenDone(before, () -> submit(new Job(true, fresh.after, added++, fresh::run)));
                step = fresh;
            } else {
                step.after = Math.max(step.after, after);
            }
            before = step;
        }
        CompletableFuture<R> result = new CompletableFuture<>();
        whenDone(before, () -> submit(new Job(false, 0, added++, () -> {
            try {
                result.complete(task.get());
            } catch (RuntimeException | Error e) {
                result.completeExceptionally(e);
            }
        })));
        return result;
    }

    /** Does {@code action} now when {@code step} is null (nothing to wait for), else when the step is done. */
    private void whenDone(Step step, Runnable action) {
        if (step == null) {
            action.run();
        } else {
            step.then.add(action);
        }
    }

    /** Queues a ready job and hands the pool one turn to run the most urgent ready job. */
    private void submit(Job job) {
        ready.add(job);
        pool.execute(() -> {
            Job next = ready.poll();
            if (next != null) {
                next.body().run();
            }
        });
    }

    private synchronized void done(Step step) {
        pending.remove(step.shared.key(), step);
        step.then.forEach(Runnable::run);
        step.then.clear();
    }

    /** A shared step while pending: what waits for it, and the most steps of a chain that come after it. */
    private final class Step {
        private final SharedStep shared;
        private final List<Runnable> then = new ArrayList<>();
        private int after;

        Step(SharedStep shared, int after) {
            this.shared = shared;
            this.after = after;
        }

        void run() {
            try {
                shared.work().run();
            } catch (RuntimeException e) {
                // the task that needs this step meets the same failure when it does the step itself, and reports it
            } finally {
                done(this);
            }
        }
    }

    /**
     * A ready job: shared steps before tasks, among steps the one with more steps after it first (ranked when it
     * became ready), then the first added.
     */
    private record Job(boolean step, int after, long order, Runnable body) implements Comparable<Job> {

        @Override
        public int compareTo(Job o) {
            if (step != o.step) {
                return step ? -1 : 1;
            }
            if (after != o.after) {
                return Integer.compare(o.after, after);
            }
            return Long.compare(order, o.order);
        }
    }
}
