package org.convgrid.output.manifest;

import java.util.Optional;

/**
 * A run directory whose run did not finish (its manifest has no finish time: interrupted, killed, or still running
 * elsewhere): how many of its models are there. Its transitions, charts and report cover those only, so the commands
 * that read it and the report say so.
 *
 * @param present rows in the catalogue
 * @param expected models the directory is to hold, {@link RunManifest#EXPECTED_UNKNOWN} when the manifest does not
 *                 say (written by an earlier version)
 */
public record UnfinishedRun(long present, long expected) {

    /** The unfinished state of a run, empty when its manifest says it finished. */
    public static Optional<UnfinishedRun> of(RunManifest manifest, long catalogueRows) {
        return manifest.isUnfinished() ? Optional.of(new UnfinishedRun(catalogueRows, manifest.expectedModels()))
                : Optional.empty();
    }

    /** {@code 30 of 90 models}, or {@code 30 models} when the expected number is not known. */
    public String describe() {
        // "1 of 3 models" reads right; only a lone count needs the singular
        return expected == RunManifest.EXPECTED_UNKNOWN ? present + (present == 1 ? " model" : " models")
                : present + " of " + expected + (expected == 1 ? " model" : " models");
    }
}
