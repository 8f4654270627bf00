package org.convgrid.survey;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.events.LifeEventWriter;

/**
 * The run's {@code life_events.csv} while it grows: one row appended per star as soon as its track is computed (so
 * an interrupted run keeps the stars it finished), then put in order once the sweep ends ({@link #tidy}: one row per
 * star, the last computed, sorted by track id), which makes the table independent of thread count, shards and
 * resumes. Thread-safe: appends are serialised.
 */
public final class LifeEventLog {

    private final Path file;
    private final IronAbundance iron;
    private boolean headerChecked;

    /**
     * @param file the table ({@code life_events.csv} of the run directory)
     * @param iron the Sun the grid's [Fe/H] is measured against ({@code fe_h_dex})
     */
    public LifeEventLog(Path file, IronAbundance iron) {
        this.file = file;
        this.iron = iron;
    }

    /**
     * Appends one star's row, writing the header first when the table is new. A table an earlier version began
     * (a run resumed after an upgrade: fewer columns) is first rewritten with today's header, so that the rows
     * appended to it stay readable (a column it lacked stays empty until {@link #tidy} fills what it can).
     */
    public synchronized void append(LifeEventRow row) throws IOException {
        if (!headerChecked) {
            headerChecked = true;
            if (Files.exists(file) && !firstLine(file).equals(LifeEventWriter.header().strip())) {
                write(file, LifeEventReader.read(file), iron);
            }
        }
        String text = (Files.exists(file) ? "" : LifeEventWriter.header()) + LifeEventWriter.line(row, iron);
        try {
            Files.writeString(file, text, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.APPEND);
        } catch (IOException e) {
            throw IoMessages.appending(file, e);
        }
    }

    /**
     * Rewrites a table in its final order, rows of an earlier version taking {@code overshootProfile}, the grid's
     * (the run has checked the table is this grid's; its stars may all be done, so no row appended says it), and
     * every row its [Fe/H] against {@code iron}'s Sun; does nothing when there is none (no star evolved from birth).
     */
    public static void tidy(Path file, OvershootScheme overshootProfile, IronAbundance iron) throws IOException {
        if (Files.exists(file)) {
            write(file, LifeEventReader.read(file).stream()
                    .map(r -> r.withOvershootProfileIfUnknown(overshootProfile)).toList(), iron);
        }
    }

    /**
     * Joins the tables of several run directories (shards) into {@code target}; none written when none exists. Rows
     * of a table an earlier version wrote take {@code overshootProfile}, the grid's; [Fe/H] against {@code iron}'s
     * Sun, the grid's.
     */
    public static void merge(Collection<Path> tables, Path target, OvershootScheme overshootProfile,
                             IronAbundance iron) throws IOException {
        List<LifeEventRow> rows = new ArrayList<>();
        boolean any = false;
        for (Path t : tables) {
            any |= Files.exists(t);
            LifeEventReader.read(t).forEach(r -> rows.add(r.withOvershootProfileIfUnknown(overshootProfile)));
        }
        if (any) {
            write(target, rows, iron);
        }
    }

    private static String firstLine(Path file) throws IOException {
        try (var lines = Files.lines(file, StandardCharsets.UTF_8)) {
            return lines.findFirst().orElse("").strip();
        }
    }

    private static void write(Path file, List<LifeEventRow> rows, IronAbundance iron) throws IOException {
        StringWriter text = new StringWriter();
        LifeEventWriter.write(rows, iron, text);
        AtomicFiles.writeString(file, text.toString());
    }
}
