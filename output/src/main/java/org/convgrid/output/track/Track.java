package org.convgrid.output.track;

import java.util.List;

/**
 * One evolution track: the steps of one (mass, metallicity, physics) model, in file order (increasing age).
 *
 * @param trackId the model id without its age part (the file name without {@code .csv}), e.g. {@code p0-z01-m009}
 * @param steps the evolution steps
 */
public record Track(String trackId, List<TrackStep> steps) {

    /** The part of a model id that names its age ({@code -a<index>}, README "A run directory" and the grid's id format). */
    private static final String AGE_SEPARATOR = "-a";

    public Track {
        steps = List.copyOf(steps);
    }

    /** The track id of a catalogue model id: the id without its trailing age part; the id itself when it has none. */
    public static String trackIdOf(String modelId) {
        int cut = modelId.lastIndexOf(AGE_SEPARATOR);
        return cut < 0 ? modelId : modelId.substring(0, cut);
    }
}
