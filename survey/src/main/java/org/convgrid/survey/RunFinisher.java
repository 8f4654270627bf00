package org.convgrid.survey;

import java.io.IOException;

/**
 * A last step of {@code run} and {@code merge}, after catalogue.csv, transitions.csv and manifest.yaml are in place
 * (for example drawing the maps). Finishers run in list order on the command's thread; one that throws stops the
 * rest and the command exits with code 1, the run directory's tables staying valid.
 */
@FunctionalInterface
public interface RunFinisher {

    void finish(FinishedRun run) throws IOException;
}
