package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.convgrid.grids.words.Counts;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.RunLayout;
import org.convgrid.plotting.RunMaps;

/**
 * What {@code run --force} removes before it starts over: every file convgrid writes into a run directory (the
 * tables, the manifest, the report, the track and profile files, the charts, and the temporary files of a write that
 * was cut short) and nothing else. The lock file stays (deleting it would let two processes lock two files of one
 * name, see {@link RunLock}), so does any file convgrid does not write (the user's notes, a script), and a folder is
 * removed only when that leaves it empty. Without this, tracks and charts of an earlier, larger grid outlived the new
 * run and were read as part of it. In {@code tracks/} and {@code profiles/} only files named by the ids convgrid makes
 * go ({@code p0-z00-m000.csv}, {@code p0-z00-m000.zones.csv}, refinement stars' {@code p0-z00-r007.csv}, profiles'
 * {@code p0-z00-m000-a00.csv}; {@link RunLayout#isTrackFile}, {@link RunLayout#isProfileFile}): a user's
 * {@code tracks/my-track.csv} is theirs, although it is a table too.
 */
final class EarlierRunFiles {

    /** The files convgrid writes at the top of a run directory. */
    static final List<String> TOP_FILES = List.of(RunLayout.CATALOGUE, RunLayout.CATALOGUE_V1,
            RunLayout.ZONES, RunLayout.TRANSITIONS, RunLayout.LIFE_EVENTS, RunLayout.MANIFEST, RunLayout.REPORT);

    private EarlierRunFiles() {
    }

    /**
     * Removes convgrid's files from the run directory.
     *
     * @return how many files were removed
     * @throws IOException when one cannot be removed (those before it are gone, the directory stays a run directory
     *                     of the old run only in part: the message names the file)
     */
    static int remove(RunLayout layout) throws IOException {
        List<Path> doomed = find(layout);
        for (Path file : doomed) {
            try {
                Files.deleteIfExists(file);
            } catch (IOException e) {
                throw new IOException("cannot remove " + file + " of the earlier run: " + IoMessages.reason(e), e);
            }
        }
        for (Path folder : List.of(layout.tracks(), layout.profiles(), layout.maps())) {
            removeIfEmpty(folder);
        }
        return doomed.size();
    }

    /**
     * The files of the run directory that convgrid writes, which {@link #remove} would remove: the top-level tables,
     * manifest and report, temporary files, and the track, profile and chart files in their folders.
     */
    static List<Path> find(RunLayout layout) throws IOException {
        List<Path> doomed = new ArrayList<>();
        for (String name : TOP_FILES) {
            Path file = layout.root().resolve(name);
            if (Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
                doomed.add(file);
            }
        }
        doomed.addAll(listed(layout.root(), AtomicFiles::isTemporary));
        doomed.addAll(listed(layout.tracks(), f -> RunLayout.isTrackFile(f) || AtomicFiles.isTemporary(f)));
        doomed.addAll(listed(layout.profiles(), f -> RunLayout.isProfileFile(f) || AtomicFiles.isTemporary(f)));
        doomed.addAll(listed(layout.maps(), f -> RunMaps.isChartFile(f) || AtomicFiles.isTemporary(f)));
        return doomed;
    }

    /**
     * The files {@link #find} found, in a few words for a message: the top-level ones by name, those in a folder
     * counted per folder ({@code zones.csv, report.html, 12 files in tracks/}).
     */
    static String describe(RunLayout layout, List<Path> files) {
        Map<String, Integer> perFolder = new LinkedHashMap<>();
        List<String> words = new ArrayList<>();
        for (Path file : files) {
            Path relative = layout.root().relativize(file);
            if (relative.getNameCount() == 1) {
                words.add(relative.toString());
            } else {
                perFolder.merge(relative.getName(0).toString(), 1, Integer::sum);
            }
        }
        perFolder.forEach((folder, n) -> words.add(Counts.of(n, "file") + " in " + folder + "/"));
        return String.join(", ", words);
    }

    /** The regular files of a folder (not followed when it is a link) that the filter takes; none without it. */
    private static List<Path> listed(Path folder, Predicate<Path> convgrids) throws IOException {
        if (!Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS)) {
            return List.of();
        }
        try (Stream<Path> entries = Files.list(folder)) {
            return entries.filter(f -> Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS) && convgrids.test(f))
                    .sorted().toList();
        }
    }

    private static void removeIfEmpty(Path folder) throws IOException {
        if (!Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> entries = Files.list(folder)) {
            if (entries.findAny().isPresent()) {
                return;
            }
        }
        Files.deleteIfExists(folder);
    }
}
