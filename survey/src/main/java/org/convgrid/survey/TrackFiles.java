package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.RunLayout;
import org.convgrid.output.track.TrackWriter;

/**
 * Writes every track it receives to {@code tracks/<model_id without age>.csv} of a run directory, atomically (a
 * reader never sees half a file; a recomputed track replaces the old one). The directory is created with the first
 * track, so a zero-age grid leaves none. Thread-safe: each track has its own file. An I/O failure does not stop the
 * models (their rows are still worth having): the first one is kept for {@link #failure()}.
 */
public final class TrackFiles implements TrackSink {

    private final RunLayout layout;
    private final AtomicReference<IOException> failure = new AtomicReference<>();

    /** @param layout the run directory whose {@code tracks} receive the files */
    public TrackFiles(RunLayout layout) {
        this.layout = layout;
    }

    @Override
    public void accept(ModelRequest first, List<EvolutionStep> steps) {
        Path target = layout.trackFile(ModelIdFormat.trackIdOf(first.modelId()));
        try {
            AtomicFiles.write(target, out -> TrackWriter.write(first.mass(), steps, out));
        } catch (IOException e) {
            failure.compareAndSet(null, new IOException("cannot write track " + target + ": "
                    + IoMessages.reason(e), e));
        }
    }

    /** The first write failure, null when every track was written. */
    public IOException failure() {
        return failure.get();
    }
}
