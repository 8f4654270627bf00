package org.convgrid.plotting.hr;

import java.util.List;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.PhysicsKey;

/**
 * Everything an HR diagram shows.
 *
 * @param physics the physics of every model shown
 * @param metallicities the Z values shown, increasing
 * @param ages the ages shown, increasing: Gyr, or main-sequence fractions when {@code ageGroups} groups by fraction
 * @param points every usable model of the grid (status ok, with L, Teff and a structure class)
 * @param zeroAgeLines one line per Z through its youngest models (age 0 when the run has it), by mass
 * @param massLabels the points that get a mass label (on one zero-age line)
 * @param tracks one evolution track per (mass, Z) of this physics, by Z then mass; empty when the run has none
 * @param isochrones per Z and age, the models of that age in mass order, ending at the slice's turn-off model when
 *                   the transition refinement found it ({@link IsochroneEnd}); only when there are tracks, or when
 *                   the diagram groups by main-sequence fraction (then each joins the models of one fraction)
 * @param refinementPoints the usable models the transition refinement added at masses of its own choosing: drawn
 *                         apart (small and pale), never on a line or labelled, since they crowd near the transition
 *                         masses and an isochrone through them would not be one through the grid's masses; but for
 *                         the turn-off models a drawn line ends at ({@link #turnoffModels}), which are not in it
 * @param ageGroups how the lines' ages are keyed and named: by age in Gyr, or by main-sequence fraction
 * @param withoutResult the masses (Msun, increasing, each once) of this physics' models that failed or did not
 *                      converge: not drawn, and named in a note so that a gap in a line is not read as the grid's
 */
public record HrDiagramData(PhysicsKey physics, List<Double> metallicities, List<Double> ages, List<HrPoint> points,
                            List<ZeroAgeLine> zeroAgeLines, List<HrPoint> massLabels, List<TrackLine> tracks,
                            List<ZeroAgeLine> isochrones, List<HrPoint> refinementPoints, AgeGroups ageGroups,
                            List<Double> withoutResult) {

    /** A diagram all of whose models have a result. */
    public HrDiagramData(PhysicsKey physics, List<Double> metallicities, List<Double> ages, List<HrPoint> points,
                         List<ZeroAgeLine> zeroAgeLines, List<HrPoint> massLabels, List<TrackLine> tracks,
                         List<ZeroAgeLine> isochrones, List<HrPoint> refinementPoints, AgeGroups ageGroups) {
        this(physics, metallicities, ages, points, zeroAgeLines, massLabels, tracks, isochrones, refinementPoints,
                ageGroups, List.of());
    }

    /** A diagram without tracks or isochrones. */
    public HrDiagramData(PhysicsKey physics, List<Double> metallicities, List<Double> ages, List<HrPoint> points,
                         List<ZeroAgeLine> zeroAgeLines, List<HrPoint> massLabels) {
        this(physics, metallicities, ages, points, zeroAgeLines, massLabels, List.of(), List.of(), List.of());
    }

    /** A diagram whose lines join models of equal age in Gyr. */
    public HrDiagramData(PhysicsKey physics, List<Double> metallicities, List<Double> ages, List<HrPoint> points,
                         List<ZeroAgeLine> zeroAgeLines, List<HrPoint> massLabels, List<TrackLine> tracks,
                         List<ZeroAgeLine> isochrones, List<HrPoint> refinementPoints) {
        this(physics, metallicities, ages, points, zeroAgeLines, massLabels, tracks, isochrones, refinementPoints,
                AgeGroups.BY_AGE);
    }

    public HrDiagramData {
        metallicities = List.copyOf(metallicities);
        ages = List.copyOf(ages);
        points = List.copyOf(points);
        zeroAgeLines = List.copyOf(zeroAgeLines);
        massLabels = List.copyOf(massLabels);
        tracks = List.copyOf(tracks);
        isochrones = List.copyOf(isochrones);
        refinementPoints = List.copyOf(refinementPoints);
        java.util.Objects.requireNonNull(ageGroups, "ageGroups");
        withoutResult = List.copyOf(withoutResult);
    }

    /**
     * The lines the chart draws: the isochrones, of which the youngest is the zero-age line, when there are any, else
     * the zero-age lines.
     */
    public List<ZeroAgeLine> drawnLines() {
        return isochrones.isEmpty() ? zeroAgeLines : isochrones;
    }

    /** The turn-off models the drawn lines end at ({@link IsochroneEnd#AT_TURNOFF_MODEL}), in line order. */
    public List<HrPoint> turnoffModels() {
        return drawnLines().stream().filter(l -> l.end() == IsochroneEnd.AT_TURNOFF_MODEL)
                .map(l -> l.points().get(l.points().size() - 1)).toList();
    }

    /** The name of a line's age for its label and legend: {@code 150 Myr}, {@code MS fraction 0.5}. */
    public String ageName(double age) {
        return ageGroups.name(age);
    }

    /**
     * One evolution track in the diagram.
     *
     * @param massMsun total mass, solar masses
     * @param zInit initial metal mass fraction
     * @param logTeff log10 of Teff in K, one per step with a surface, in age order
     * @param logL log10 of L / L_sun, same steps
     * @param preMainSequencePoints how many of the first points lie before the zero-age main sequence (0 for a
     *                              track from it)
     */
    public record TrackLine(double massMsun, double zInit, List<Double> logTeff, List<Double> logL,
                            int preMainSequencePoints) {
        public TrackLine {
            logTeff = List.copyOf(logTeff);
            logL = List.copyOf(logL);
            if (preMainSequencePoints < 0 || preMainSequencePoints > logL.size()) {
                throw new IllegalArgumentException("pre-main-sequence points " + preMainSequencePoints + " of "
                        + logL.size());
            }
        }

        /** A track from the zero-age main sequence. */
        public TrackLine(double massMsun, double zInit, List<Double> logTeff, List<Double> logL) {
            this(massMsun, zInit, logTeff, logL, 0);
        }
    }

    /**
     * The models of one metallicity and one age, joined in mass order: the zero-age line (the youngest models) and
     * the isochrones.
     *
     * @param zInit initial metal mass fraction
     * @param age the age of the line: Gyr (0 = ZAMS), or its main-sequence fraction (0 = ZAMS) when the diagram
     *     groups by fraction
     * @param points the models on the line, increasing mass
     * @param end how its high-mass end lies against the turn-off: with {@link IsochroneEnd#AT_TURNOFF_MODEL} its last
     *     point is the turn-off model
     */
    public record ZeroAgeLine(double zInit, double age, List<HrPoint> points, IsochroneEnd end) {
        public ZeroAgeLine {
            points = List.copyOf(points);
            java.util.Objects.requireNonNull(end, "end");
        }

        /** A line of a slice whose models are all on the main sequence. */
        public ZeroAgeLine(double zInit, double age, List<HrPoint> points) {
            this(zInit, age, points, IsochroneEnd.ALL_ON_MAIN_SEQUENCE);
        }
    }
}
