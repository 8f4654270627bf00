package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.Chunking;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.batch.Shard;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.survey.parallel.ParallelWork;
import org.junit.jupiter.api.Test;

/** The grid sweep: grid order, thread-count independence, shards, resume and failing chunks. */
class ChunkSweepTest {

    /** Two lines (two Z) of 20 masses with 2 ages each, in grid order. */
    private static List<ModelRequest> grid() {
        List<ModelRequest> requests = new ArrayList<>();
        for (int iz = 0; iz < 2; iz++) {
            for (int im = 0; im < 20; im++) {
                for (int ia = 0; ia < 2; ia++) {
                    requests.add(new ModelRequest("z" + iz + "m" + im + "a" + ia, 1.0 + im, 0.01 * (iz + 1), 0.27,
                            ia, PhysicsOptions.DEFAULT));
                }
            }
        }
        return requests;
    }

    /**
     * A solver whose answer depends on the chunk's first mass (its "seed"), like homology seeding does; it answers
     * without models, the seed in the detail.
     */
    private static final ChunkSolver SEED_DEPENDENT = chunk -> chunk.stream()
            .<ModelOutcome>map(r -> new ModelOutcome.Failed(r,
                    r.mass() == 7.0 ? ModelStatus.FAILED : ModelStatus.NOT_CONVERGED,
                    "seed " + chunk.get(0).mass(), (int) r.mass()))
            .collect(Collectors.toList());

    private static List<String> run(int threads, Shard shard, Set<String> done) throws Exception {
        List<String> rows = new ArrayList<>();
        try (ParallelWork work = new ParallelWork(threads)) {
            ChunkSweep.run(work, grid().iterator(), 4, shard, r -> done.contains(r.modelId()), SEED_DEPENDENT,
                    o -> rows.add(o.request().modelId() + " " + o.statusDetail()), ProgressListener.NONE, -1);
        }
        return rows;
    }

    @Test
    void sameRowsInGridOrderWhateverTheThreadCount() throws Exception {
        List<String> one = run(1, Shard.ALL, Set.of());
        assertThat(one).hasSize(80);
        assertThat(one.get(0)).startsWith("z0m0a0");
        assertThat(run(2, Shard.ALL, Set.of())).isEqualTo(one);
        assertThat(run(4, Shard.ALL, Set.of())).isEqualTo(one);
    }

    @Test
    void progressIsToldOncePerChunkWithTheRunningCount() throws Exception {
        // 2 lines x 20 masses in chunks of 4 masses (8 models); the 3 models of the first chunk already done
        List<Long> told = new ArrayList<>();
        try (ParallelWork work = new ParallelWork(2)) {
            ChunkSweep.run(work, grid().iterator(), 4, Shard.ALL, r -> Set.of("z0m0a0", "z0m0a1", "z0m1a0")
                    .contains(r.modelId()), SEED_DEPENDENT, o -> { }, (done, total) -> told.add(done), 77);
        }
        assertThat(told).hasSize(10).startsWith(5L, 13L, 21L).endsWith(77L);
    }

    @Test
    void chunksNeverCrossALineAndKeepAllAgesOfAMass() {
        Chunking chunking = new Chunking(grid().iterator(), 4);
        List<List<ModelRequest>> chunks = new ArrayList<>();
        chunking.forEachRemaining(chunks::add);
        assertThat(chunks).hasSize(10);
        assertThat(chunks).allSatisfy(c -> {
            assertThat(c).hasSize(8);
            assertThat(c.stream().map(ModelRequest::initialMetals).distinct()).hasSize(1);
        });
    }

    @Test
    void shardsTogetherGiveTheSingleRunRows() throws Exception {
        List<String> all = run(2, Shard.ALL, Set.of());
        List<String> merged = new ArrayList<>(run(1, new Shard(1, 3), Set.of()));
        merged.addAll(run(1, new Shard(2, 3), Set.of()));
        merged.addAll(run(1, new Shard(3, 3), Set.of()));
        assertThat(merged).containsExactlyInAnyOrderElementsOf(all);
    }

    @Test
    void resumedRunEmitsOnlyMissingRowsWithTheSameContent() throws Exception {
        List<String> all = run(2, Shard.ALL, Set.of());
        Set<String> done = grid().subList(0, 13).stream().map(ModelRequest::modelId).collect(Collectors.toSet());
        List<String> rest = run(2, Shard.ALL, done);
        assertThat(rest).isEqualTo(all.subList(13, all.size()));
    }

    @Test
    void aThrowingSolverGivesFailedRowsAndTheRunGoesOn() throws Exception {
        ChunkSolver flaky = chunk -> {
            if (chunk.get(0).initialMetals() == 0.01) {
                throw new IllegalStateException("boom");
            }
            return SEED_DEPENDENT.solve(chunk);
        };
        List<ModelOutcome> outcomes = new ArrayList<>();
        Map<ModelStatus, Long> counts;
        try (ParallelWork work = new ParallelWork(2)) {
            counts = ChunkSweep.run(work, grid().iterator(), 4, Shard.ALL, r -> false, flaky, outcomes::add,
                    ProgressListener.NONE, -1);
        }
        assertThat(outcomes).hasSize(80);
        assertThat(counts.get(ModelStatus.FAILED)).isEqualTo(40L + 2L);
        // a fault of the solver is said so in the catalogue, without a Java class name or its raw message
        assertThat(outcomes.get(0).statusDetail()).startsWith("internal error in the solver")
                .doesNotContain("IllegalStateException").doesNotContain("boom");
    }
}
