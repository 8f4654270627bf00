package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import org.convgrid.engine.batch.ModelSink;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.output.RunLayout;
import org.convgrid.output.profile.ProfileWriter;

/**
 * Writes the profile of every OK grid model to {@code profiles/<model_id>.csv} of a run directory (the grid's
 * {@code output: profiles: true}), atomically: a reader never sees half a file, and a recomputed model replaces its
 * old profile. The same columns and header as {@code star --profile}; grids evolve without settling. The directory
 * is created with the first profile.
 * Thread-safe: each model has its own file. An I/O failure does not stop the models (their rows are still worth
 * having): the first one is kept for {@link #failure()}.
 */
public final class ProfileFiles implements ModelSink {

    private final RunLayout layout;
    private final String toolVersion;
    private final String toolCommit;
    private final AtomicReference<IOException> failure = new AtomicReference<>();

    /**
     * @param layout the run directory whose {@code profiles} folder receives the files
     * @param toolVersion the convgrid version, recorded in every profile's header
     * @param toolCommit the commit it was built from, recorded alike
     */
    public ProfileFiles(RunLayout layout, String toolVersion, String toolCommit) {
        this.layout = layout;
        this.toolVersion = toolVersion;
        this.toolCommit = toolCommit;
    }

    @Override
    public void accept(ModelRequest request, StellarModel model) {
        Path target = layout.profileFile(request.modelId());
        try {
            ProfileWriter.writeFile(target, request, model, false, toolVersion, toolCommit);
        } catch (IOException e) {
            failure.compareAndSet(null, new IOException("cannot write " + target + ": " + IoMessages.reason(e), e));
        }
    }

    /** The first write failure, null when every profile was written. */
    public IOException failure() {
        return failure.get();
    }
}
