package org.convgrid.output.track;

import java.util.List;
import java.util.OptionalDouble;
import org.convgrid.engine.units.Constants;

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

    /**
     * The star's mass, solar masses, recovered from the surface gravity and radius of its first step that gives both
     * (g = G M / R^2): the file has no mass column, and adding one would change every track's bytes. Both columns
     * carry {@code CsvNumbers.SIGNIFICANT_DIGITS} digits, so the mass comes back to about 2e-6 of itself. Empty when
     * no step gives both.
     */
    public OptionalDouble massMsun() {
        for (TrackStep s : steps) {
            if (Double.isFinite(s.logGCgs()) && s.radiusRsun() > 0 && Double.isFinite(s.radiusRsun())) {
                double radius = s.radiusRsun() * Constants.R_SUN;
                return OptionalDouble.of(Math.pow(10.0, s.logGCgs()) * radius * radius / Constants.GM_SUN);
            }
        }
        return OptionalDouble.empty();
    }

    /** The track id of a catalogue model id: the id without its trailing age part; the id itself when it has none. */
    public static String trackIdOf(String modelId) {
        return modelId.substring(0, modelId.length() - agePartOf(modelId).length());
    }

    /** The trailing age part of a catalogue model id ({@code -a01}: which age of the grid); empty when it has none. */
    public static String agePartOf(String modelId) {
        int cut = modelId.lastIndexOf(AGE_SEPARATOR);
        return cut < 0 ? "" : modelId.substring(cut);
    }
}
