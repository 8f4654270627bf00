package org.convgrid.survey;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;

/**
 * On resume: the kept catalogue rows whose star lacks its track files (a grid whose stars evolve), its life-events
 * row (a grid from birth) or a model's profile file (a grid with {@code output: profiles: true}). An earlier version kept such rows when a full disk stopped the track writes but not the
 * catalogue (52 rows "ok" beside 14 of 26 tracks, and charts quietly missing), and a user may
 * delete a track. The catalogue is cut back to just before the first such row, so the sweep recomputes the blocks
 * from there in grid order (the catalogue stays a prefix of the plan, byte-identical to an uninterrupted run) and
 * writes their tracks again.
 *
 * <p>Only a star with a model of status {@code ok} older than age 0 is known to have a track (and only a model of
 * status {@code ok} a profile): one whose evolution
 * failed has none and needs none, and asking for it would recompute it on every resume.
 */
final class MissingStarFiles {

    /**
     * What was cut.
     *
     * @param droppedRows catalogue rows dropped, to be computed again
     * @param starsLacking stars among the kept rows that lacked files
     * @param example the first lacking star and what it lacked, for people
     */
    record Recomputed(int droppedRows, int starsLacking, String example) {

        /** One line for the user. */
        String describe(Path catalogue) {
            return starsLacking + (starsLacking == 1 ? " star" : " stars") + " kept in " + catalogue.getFileName()
                    + " lacked files (first: " + example + "); the " + droppedRows + " rows from that star on are "
                    + "computed again";
        }
    }

    private MissingStarFiles() {
    }

    /**
     * Cuts the catalogue back to before the first kept row whose star lacks its files (first repairing a life-events
     * table a full disk left without header or with a row cut short).
     *
     * @return what was dropped, or null when every kept star has its files (the catalogue is unchanged)
     */
    static Recomputed cutBackToFirstLacking(RunDirectory dir, GridSpec grid, IronAbundance iron) throws IOException {
        if (!checked(grid) || !Files.exists(dir.catalogue())) {
            return null;
        }
        if (grid.ages().evolves() && grid.ages().origin() == AgeOrigin.BIRTH) {
            LifeEventLog.repair(dir.layout().lifeEvents(), iron);
        }
        List<CatalogueRow> rows = CatalogueReader.read(dir.catalogue());
        Lacking lacking = find(dir, grid, rows);
        if (lacking == null) {
            return null;
        }
        int first = 0;
        while (!lacking.stars().contains(ModelIdFormat.trackIdOf(rows.get(first).modelId()))) {
            first++;
        }
        keepFirstRows(dir.catalogue(), first);
        return new Recomputed(rows.size() - first, lacking.stars().size(), lacking.example());
    }

    /**
     * The stars of {@code rows} that lack files, in catalogue order, and the first one with what it lacks.
     *
     * @param stars the track ids
     * @param example the first star and its missing file, for people
     */
    record Lacking(Set<String> stars, String example) {

        /** One line for the user. */
        String describe() {
            return stars.size() + (stars.size() == 1 ? " star lacks" : " stars lack") + " files (first: " + example
                    + ")";
        }
    }

    /** Whether a grid's stars have files to check: tracks (its stars evolve) or profiles. */
    private static boolean checked(GridSpec grid) {
        return grid.ages().evolves() || grid.profiles();
    }

    /**
     * The stars among {@code rows} of the run in {@code dir} (of grid {@code grid}) that lack their files; reads
     * only. Null when none lacks any.
     */
    static Lacking find(RunDirectory dir, GridSpec grid, List<CatalogueRow> rows) throws IOException {
        boolean tracks = grid.ages().evolves();
        boolean profiles = grid.profiles();
        if (!checked(grid)) {
            return null;
        }
        RunLayout layout = dir.layout();
        boolean lifeEvents = tracks && grid.ages().origin() == AgeOrigin.BIRTH;
        Set<String> withEvents = !lifeEvents || !Files.exists(layout.lifeEvents()) ? Set.of()
                : LifeEventReader.read(layout.lifeEvents()).stream().map(LifeEventRow::trackId)
                        .collect(Collectors.toSet());
        Set<String> lacking = new LinkedHashSet<>();
        String example = null;
        for (CatalogueRow row : rows) {
            String star = ModelIdFormat.trackIdOf(row.modelId());
            if (row.status() != ModelStatus.OK || lacking.contains(star)) {
                continue;
            }
            String missing = null;
            if (tracks && row.ageGyr() > 0.0) {
                missing = !Files.isRegularFile(layout.trackFile(star)) ? RunLayout.TRACKS + "/"
                        + layout.trackFile(star).getFileName()
                        : !Files.isRegularFile(layout.trackZonesFile(star)) ? RunLayout.TRACKS + "/"
                        + layout.trackZonesFile(star).getFileName()
                        : lifeEvents && !withEvents.contains(star) ? "its row in " + RunLayout.LIFE_EVENTS : null;
            }
            if (missing == null && profiles && !Files.isRegularFile(layout.profileFile(row.modelId()))) {
                // every ok model of such a grid has one; a full disk lets the run go on without it and fail at its
                // end (the disk-full fix left this for resume to see)
                missing = RunLayout.PROFILES + "/" + layout.profileFile(row.modelId()).getFileName();
            }
            if (missing != null) {
                lacking.add(star);
                if (example == null) {
                    example = star + ", " + missing;
                }
            }
        }
        return lacking.isEmpty() ? null : new Lacking(lacking, example);
    }

    /** Truncates the catalogue after its header and first {@code rows} rows (shortening only: nothing rewritten). */
    private static void keepFirstRows(Path catalogue, int rows) throws IOException {
        byte[] bytes = Files.readAllBytes(catalogue);
        // ECSV: '#' header lines, the column-name line, then one row per line; cut where row rows + 1 begins
        int tableLines = 0;
        int position = 0;
        while (position < bytes.length) {
            if (bytes[position] != '#' && ++tableLines == rows + 2) {
                break;
            }
            while (position < bytes.length && bytes[position] != '\n') {
                position++;
            }
            position++;
        }
        try (FileChannel channel = FileChannel.open(catalogue, StandardOpenOption.WRITE)) {
            channel.truncate(Math.min(position, bytes.length));
        }
    }
}
