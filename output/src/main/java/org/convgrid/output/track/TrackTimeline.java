package org.convgrid.output.track;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Where a track's life stages lie, read from its {@code phase} column: whether it starts at birth (its first steps
 * are {@code pre_main_sequence}) and the age at which it reaches the zero-age main sequence (its first
 * {@code main_sequence} step after them). Tracks without the column, written from the zero-age main sequence, are
 * {@link #UNKNOWN}.
 *
 * @param startsAtBirth whether the track has pre-main-sequence steps
 * @param zeroAgeMainSequenceGyr age of the first main-sequence step after them, Gyr; NaN when the track starts on the
 *                               main sequence, never reaches it, or does not say
 */
public record TrackTimeline(boolean startsAtBirth, double zeroAgeMainSequenceGyr) {

    /** A track that does not record its phases. */
    public static final TrackTimeline UNKNOWN = new TrackTimeline(false, Double.NaN);

    /** The catalogue's and the track files' spelling of the two phases. */
    static final String PRE_MAIN_SEQUENCE = "pre_main_sequence";
    static final String MAIN_SEQUENCE = "main_sequence";

    /** The timeline of one track file. */
    public static TrackTimeline read(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in);
        }
    }

    /** The timeline of a track file's text; a file without a {@code phase} column gives {@link #UNKNOWN}. */
    public static TrackTimeline read(Reader in) throws IOException {
        return of(TrackReader.read(in));
    }

    /** The timeline of a track's steps, in file order; steps without a phase give {@link #UNKNOWN}. */
    public static TrackTimeline of(List<TrackStep> steps) {
        boolean preMainSequence = false;
        for (TrackStep step : steps) {
            if (PRE_MAIN_SEQUENCE.equals(step.phase())) {
                preMainSequence = true;
            } else if (MAIN_SEQUENCE.equals(step.phase()) && preMainSequence) {
                return new TrackTimeline(true, step.ageGyr());
            }
        }
        return preMainSequence ? new TrackTimeline(true, Double.NaN) : UNKNOWN;
    }
}
