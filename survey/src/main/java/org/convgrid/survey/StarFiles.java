package org.convgrid.survey;

import java.io.IOException;
import org.convgrid.engine.request.ModelRequest;

/**
 * The files a star's catalogue rows must never be kept without (its track files, its life-events row). The sweep
 * asks before it appends each row: a catalogue row whose track failed to reach the disk would be kept by a resume
 * while the track stayed missing, so the row is not written at all and the sweep stops there (a full disk
 * had left 38 catalogue rows beside the track of one star).
 */
@FunctionalInterface
public interface StarFiles {

    /** A run that writes no files per star. */
    StarFiles NONE = request -> { };

    /**
     * Returns when the files of {@code request}'s star were written (or the star has none).
     *
     * @throws IOException the failure that kept them from the disk, naming the file and the reason
     */
    void requireWritten(ModelRequest request) throws IOException;
}
