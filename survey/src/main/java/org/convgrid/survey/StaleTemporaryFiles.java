package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.RunLayout;
import org.convgrid.plotting.RunMaps;

/**
 * The temporary files ({@link AtomicFiles}) that writes cut short by a signal or a crash left in a run directory: a
 * hidden {@code .<name>.<random>.convgrid.tmp} beside each file being written. They had survived a
 * finished {@code --resume} and later {@code plot}s (only {@code --force} removed them). A process that holds the
 * directory's lock ({@link RunLock}) is the only writer there, so every such file it finds is stale, and it removes
 * those of the kinds it writes itself. Only files whose name is a temporary name of a file convgrid owns go (a table
 * or report at the top, a track or profile named by a model id, a chart): a user's hidden {@code .notes.1.tmp} stays.
 */
public final class StaleTemporaryFiles {

    /** What a command writes, and so whose leftover temporaries it removes. */
    public enum Scope {
        /** {@code run}: the tables, the manifest, the report, tracks, profiles and charts. */
        RUN,
        /** {@code plot}: the charts and the report. */
        CHARTS
    }

    private StaleTemporaryFiles() {
    }

    /**
     * Removes the stale temporaries of {@code scope}; call only while holding the directory's lock.
     *
     * @return how many were removed
     * @throws IOException when one cannot be removed (the message names it)
     */
    public static int remove(RunLayout layout, Scope scope) throws IOException {
        List<Path> stale = new ArrayList<>(listed(layout.root(), target -> scope == Scope.RUN
                ? EarlierRunFiles.TOP_FILES.contains(target.getFileName().toString())
                : target.getFileName().toString().equals(RunLayout.REPORT)));
        stale.addAll(listed(layout.maps(), RunMaps::isChartFile));
        if (scope == Scope.RUN) {
            stale.addAll(listed(layout.tracks(), RunLayout::isTrackFile));
            stale.addAll(listed(layout.profiles(), RunLayout::isProfileFile));
        }
        for (Path file : stale) {
            try {
                Files.deleteIfExists(file);
            } catch (IOException e) {
                throw new IOException("cannot remove " + file + ", a temporary file an interrupted write left: "
                        + IoMessages.reason(e), e);
            }
        }
        return stale.size();
    }

    /** The regular files of {@code folder} that are temporaries of a file {@code owned} takes; none without it. */
    private static List<Path> listed(Path folder, Predicate<Path> owned) throws IOException {
        if (!Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS)) {
            return List.of();
        }
        try (Stream<Path> entries = Files.list(folder)) {
            return entries.filter(f -> Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS))
                    .filter(f -> AtomicFiles.targetOfTemporary(f).filter(owned).isPresent()).sorted().toList();
        }
    }
}
