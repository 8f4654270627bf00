package org.convgrid.output;

import java.nio.file.Path;
import java.util.regex.Pattern;

/**
 * The names of the files of a run directory, spelled once for every module that writes or reads one (the run itself,
 * merge, refinement, the maps and the report). It lives with the formats rather than with the module that owns the
 * run directory because the readers below that module (the charts) need the same names.
 *
 * @param root the run directory, absolute and normalized
 */
public record RunLayout(Path root) {

    /** One row per model, in grid order (catalogue v2, ECSV). */
    public static final String CATALOGUE = "catalogue.ecsv";
    /** The catalogue of run directories written before catalogue v2; only recognised, to say so. */
    public static final String CATALOGUE_V1 = "catalogue.csv";
    /** One row per convective zone of every model, in catalogue order. */
    public static final String ZONES = "zones.csv";
    /** Transition masses per slice. */
    public static final String TRANSITIONS = "transitions.csv";
    /** Provenance of the run. */
    public static final String MANIFEST = "manifest.yaml";
    /** One CSV per star evolved beyond age 0, named by its track id, with its zone table beside it. */
    public static final String TRACKS = "tracks";
    /** Ending of a track's zone table ({@code tracks/<track id>.zones.csv}): one row per zone of every step. */
    public static final String TRACK_ZONES_SUFFIX = ".zones.csv";
    /** One row per star evolved from birth: the ages at which its life changes. */
    public static final String LIFE_EVENTS = "life_events.csv";
    /** One CSV per model, named by its model id, when the grid asks for profiles. */
    public static final String PROFILES = "profiles";
    /** The charts. */
    public static final String MAPS = "maps";
    /** The page that shows the maps and the tables. */
    public static final String REPORT = "report.html";
    /** Extension of every table file, tracks and profiles included. */
    public static final String TABLE_EXTENSION = ".csv";

    /**
     * Any track id convgrid makes, whatever the widths: a grid star's {@code p<i>-z<i>-m<i>} (ModelIdFormat, in the
     * grids module, which this one cannot see: survey's RunFileNamesTest ties the two) or a refinement star's
     * {@code p<i>-z<i>-r<i>} ({@link org.convgrid.output.transitions.RefinedModelIds} without the age part). Only
     * files so named in {@code tracks/} and {@code profiles/} are convgrid's: a user's {@code tracks/my-track.csv}
     * is neither read as a track, nor merged, nor removed by {@code run --force}.
     */
    private static final String TRACK_ID = "p\\d+-z\\d+-[mr]\\d+";
    /** The age part a model id adds to its track id. */
    private static final String AGE_PART = "-a\\d+";
    private static final Pattern TRACK_FILE = Pattern.compile(TRACK_ID + "(?:" + Pattern.quote(TRACK_ZONES_SUFFIX)
            + "|" + Pattern.quote(TABLE_EXTENSION) + ")");
    private static final Pattern PROFILE_FILE = Pattern.compile(TRACK_ID + AGE_PART
            + Pattern.quote(TABLE_EXTENSION));

    public RunLayout {
        root = root.toAbsolutePath().normalize();
    }

    public Path catalogue() {
        return root.resolve(CATALOGUE);
    }

    public Path zones() {
        return root.resolve(ZONES);
    }

    /**
     * Refuses a run directory written before catalogue v2 (a {@code catalogue.csv} and no {@code catalogue.ecsv}):
     * this version neither reads nor continues it.
     *
     * @throws OutputFormatException of kind run conflict, naming the way out
     */
    public void refuseEarlierFormat() {
        if (!java.nio.file.Files.exists(catalogue()) && java.nio.file.Files.exists(root.resolve(CATALOGUE_V1))) {
            throw OutputFormatException.earlierRunDirectory(root + " was written by an earlier convgrid ("
                    + CATALOGUE_V1 + ", catalogue v1); this version reads " + CATALOGUE + " (catalogue v2): "
                    + "run the grid again into a new --out (see the README, \"Catalogue\"; its ages now count from "
                    + "birth unless the grid says 'origin: zams', and its track files hold no packed zone lists)");
        }
    }

    public Path transitions() {
        return root.resolve(TRANSITIONS);
    }

    public Path manifest() {
        return root.resolve(MANIFEST);
    }

    public Path tracks() {
        return root.resolve(TRACKS);
    }

    public Path profiles() {
        return root.resolve(PROFILES);
    }

    public Path maps() {
        return root.resolve(MAPS);
    }

    public Path report() {
        return root.resolve(REPORT);
    }

    /** The track file of a star, by its track id (a model id without the age index). */
    public Path trackFile(String trackId) {
        return tracks().resolve(trackId + TABLE_EXTENSION);
    }

    /** The zone table of a star's track, by its track id. */
    public Path trackZonesFile(String trackId) {
        return tracks().resolve(trackId + TRACK_ZONES_SUFFIX);
    }

    /** Whether a file in {@code tracks} is a zone table (not a track file). */
    public static boolean isTrackZones(Path file) {
        return file.getFileName().toString().endsWith(TRACK_ZONES_SUFFIX);
    }

    public Path lifeEvents() {
        return root.resolve(LIFE_EVENTS);
    }

    /** The profile file of a model. */
    public Path profileFile(String modelId) {
        return profiles().resolve(modelId + TABLE_EXTENSION);
    }

    /**
     * Whether a file of {@code tracks/} is one convgrid writes there, a track file or its zone table: named by a
     * track id ({@link #trackFile}, {@link #trackZonesFile}).
     */
    public static boolean isTrackFile(Path file) {
        return TRACK_FILE.matcher(file.getFileName().toString()).matches();
    }

    /** Whether a file of {@code profiles/} is one convgrid writes there: named by a model id ({@link #profileFile}). */
    public static boolean isProfileFile(Path file) {
        return PROFILE_FILE.matcher(file.getFileName().toString()).matches();
    }

    /** The id a track or profile file is named by: its file name without the extension. */
    public static String idOf(Path file) {
        String name = file.getFileName().toString();
        return name.endsWith(TABLE_EXTENSION) ? name.substring(0, name.length() - TABLE_EXTENSION.length()) : name;
    }
}
