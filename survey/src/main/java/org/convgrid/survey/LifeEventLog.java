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
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.events.LifeEventColumns;
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
     * Appends one star's row. The header is decided by the file's content, not by its existence: a full disk can
     * leave the file created but empty, or a row cut short, and every later append must still produce a readable
     * table (24 rows had been left without a header, which no command could read). So before the first
     * append, and again after an append failed, the table is {@link #repair}ed; a table an earlier version began (a
     * run resumed after an upgrade: fewer columns) is rewritten with today's header, so that the rows appended to it
     * stay readable (a column it lacked stays empty until {@link #tidy} fills what it can).
     */
    public synchronized void append(LifeEventRow row) throws IOException {
        if (!headerChecked) {
            repair(file, iron);
            headerChecked = true;
        }
        boolean needsHeader = !Files.exists(file) || Files.size(file) == 0;
        String text = (needsHeader ? LifeEventWriter.header() : "") + LifeEventWriter.line(row, iron);
        try {
            Files.writeString(file, text, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.APPEND);
        } catch (IOException e) {
            // part of the text may have reached the disk: the next append looks at the file again first
            headerChecked = false;
            throw IoMessages.appending(file, e);
        }
    }

    /**
     * Makes the table readable again after a write was cut short (a full disk, a crash): drops a last row without
     * its line end, writes the header of a table that has none (its rows, of today's columns, are kept; an empty table
     * gets the header alone), and
     * rewrites a table of an earlier version's columns with today's header. Does nothing to a table that needs none
     * of that, or to a missing one.
     *
     * @throws org.convgrid.output.OutputFormatException when the rows cannot be told apart (no header, and lines of
     *                                                   another column count): the message names the file and line
     */
    public static void repair(Path file, IronAbundance iron) throws IOException {
        if (!Files.isRegularFile(file)) {
            return;
        }
        byte[] bytes = Files.readAllBytes(file);
        int complete = KeptCatalogue.lastLineEnd(bytes);
        String text = new String(bytes, 0, complete, StandardCharsets.UTF_8);
        String header = LifeEventWriter.header();
        if (text.isEmpty()) {
            // empty, or a header cut short with no row after it (a full disk): the header alone, which readers take
            // as a table of no rows (a resume of an emptied table had stopped on it as "damaged")
            AtomicFiles.writeString(file, header);
            return;
        }
        if (text.equals(header)) {
            if (complete < bytes.length) {
                AtomicFiles.writeString(file, text);
            }
            return;
        }
        String first = text.substring(0, text.indexOf('\n')).strip();
        if (first.equals(header.strip())) {
            if (complete < bytes.length) {
                AtomicFiles.writeString(file, text);
            }
        } else if (first.startsWith(LifeEventColumns.TRACK_ID + ",")) {
            write(file, LifeEventReader.read(new java.io.StringReader(text)), iron);
        } else {
            requireTodaysColumns(file, text);
            AtomicFiles.writeString(file, header + text);
        }
    }

    /** Refuses a table without header whose lines are not rows of today's columns: nothing tells what they hold. */
    private static void requireTodaysColumns(Path file, String text) {
        String[] lines = text.split("\n");
        for (int i = 0; i < lines.length; i++) {
            long cells = lines[i].chars().filter(c -> c == ',').count() + 1;
            if (cells != LifeEventColumns.ALL.size()) {
                throw new OutputFormatException(file.toAbsolutePath().normalize() + " is damaged: it has no header "
                        + "line, and its line " + (i + 1) + " has " + cells + " cells where a row has "
                        + LifeEventColumns.ALL.size() + "; move it aside and resume the run: the stars it lacks are "
                        + "computed again");
            }
        }
    }

    /**
     * Rewrites a table in its final order, rows of an earlier version taking {@code overshootProfile}, the grid's
     * (the run has checked the table is this grid's; its stars may all be done, so no row appended says it), and
     * every row its [Fe/H] against {@code iron}'s Sun; does nothing when there is none (no star evolved from birth).
     */
    public static void tidy(Path file, OvershootScheme overshootProfile, IronAbundance iron) throws IOException {
        if (Files.exists(file)) {
            repair(file, iron);
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

    private static void write(Path file, List<LifeEventRow> rows, IronAbundance iron) throws IOException {
        StringWriter text = new StringWriter();
        LifeEventWriter.write(rows, iron, text);
        AtomicFiles.writeString(file, text.toString());
    }
}
