package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.batch.Shard;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.survey.parallel.ParallelWork;
import org.junit.jupiter.api.Test;

/**
 * The production solver, not a stand-in, swept at 1, 2 and 4 threads: the catalogue text must be byte-identical.
 * Each thread count gets a fresh solver, so each builds its own physics bundles and atmosphere nodes, in whatever
 * order its threads happen to reach them.
 */
class RealModelsThreadCountTest {

    /** Two metallicities x 4 zero-age masses 0.5-1.1 Msun, chunks of 2 masses: 4 chunks for the threads to share. */
    private static List<ModelRequest> grid() {
        List<ModelRequest> requests = new ArrayList<>();
        double[] z = {0.01, 0.02};
        for (int iz = 0; iz < z.length; iz++) {
            for (int im = 0; im < 4; im++) {
                requests.add(new ModelRequest("z" + iz + "m" + im, (0.5 + 0.2 * im) * Constants.M_SUN, z[iz],
                        0.2471 + 1.5 * z[iz], 0.0, PhysicsOptions.DEFAULT));
            }
        }
        return requests;
    }

    private static String catalogue(int threads) throws Exception {
        StringBuilder text = new StringBuilder();
        List<ModelStatus> statuses = new ArrayList<>();
        try (ParallelWork work = new ParallelWork(threads);
             CatalogueWriter writer = CatalogueWriter.startingWithHeader(text)) {
            ChunkSweep.run(work, grid().iterator(), 2, Shard.ALL, r -> false,
                    new GridRequests(TrackSink.NONE), o -> {
                        statuses.add(o.status());
                        writer.write(OutcomeRows.toRow(o));
                    }, ProgressListener.NONE, -1);
        }
        assertThat(statuses).hasSize(8).containsOnly(ModelStatus.OK);
        return text.toString();
    }

    @Test
    void catalogueIsByteIdenticalAtOneTwoAndFourThreads() throws Exception {
        String one = catalogue(1);
        assertThat(catalogue(2)).isEqualTo(one);
        assertThat(catalogue(4)).isEqualTo(one);
    }
}
