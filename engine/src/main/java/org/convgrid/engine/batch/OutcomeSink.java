package org.convgrid.engine.batch;

import org.convgrid.engine.request.ModelOutcome;
import java.io.IOException;

/** Receives outcomes in grid order, one at a time (for instance a catalogue writer that flushes each row). */
@FunctionalInterface
public interface OutcomeSink {

    void accept(ModelOutcome outcome) throws IOException;
}
