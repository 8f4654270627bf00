package org.convgrid.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * A catalogue written by an earlier version, brought to this version's layout so that {@code run --resume},
 * {@code merge} and {@code transitions --refine} can continue it: its columns must be the first of this version's, in order (columns are only ever
 * added at the end; column descriptions in the header may have been reworded). The rows are read by column name and
 * written again, so their cells keep their text and a column the file lacked is empty, but for the overshoot profile,
 * which is the grid's (one profile per grid; the run or merge has checked the grid is the catalogue's), and
 * {@code fe_h_dex}, which the writer computes from each row's z_init and y_init against the grid's Sun. A catalogue
 * of another table, or one whose columns differ otherwise, is not this version's to upgrade.
 */
public final class EarlierCatalogueLayout {

    private EarlierCatalogueLayout() {
    }

    /**
     * The catalogue's complete lines in this version's layout, or a refusal: the one place that decides whether a
     * catalogue is current, upgradable or refused, and the one wording of the refusal, for {@code run --resume},
     * {@code merge} and {@code transitions --refine} alike.
     *
     * @param file the catalogue the text was read from, named in the refusal
     * @param text complete lines of that catalogue
     * @param overshootProfile the grid's overshoot profile, for rows written before the column that names it
     * @param iron the Sun the grid's [Fe/H] is measured against, for the header and the {@code fe_h_dex} cells
     * @param action what the caller would do with the file, ending the refusal "cannot ...": "continue it"
     * @return {@code text} itself when it already has this version's header, else the same rows under that header
     * @throws RunSetupException when its columns are not a leading part of this version's (nothing changed)
     */
    public static String inCurrentLayout(Path file, String text, OvershootScheme overshootProfile, IronAbundance iron,
                                         String action) {
        String header = RunDirectory.catalogueHeader(iron);
        if (text.startsWith(header)) {
            return text;
        }
        if (CatalogueReader.headerCutShort(text) || header.startsWith(text)) {
            // a prefix of the header is damage, not another version's layout (it was read as a version mismatch)
            throw new RunSetupException(file + ": " + CatalogueReader.HEADER_CUT_SHORT + "; cannot " + action
                    + " (remove it and resume again to start the catalogue anew, or restore it from a copy)");
        }
        if (!upgradable(text)) {
            throw new RunSetupException(file + " is not a catalogue this version writes or can bring to its layout "
                    + "(its columns must be the first of this version's, in order); cannot " + action);
        }
        StringBuilder out = new StringBuilder(header);
        try (CatalogueWriter writer = CatalogueWriter.continuing(out, iron)) {
            for (CatalogueRow row : CatalogueReader.readCompleteLines(text)) {
                writer.write(row.withOvershootProfileIfUnknown(overshootProfile));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** Whether an ECSV catalogue's columns, at least the fixed ones, are the first of this version's, in order. */
    private static boolean upgradable(String text) {
        String names = text.lines().filter(line -> !line.startsWith("#")).findFirst().orElse("");
        List<String> columns = List.of(names.split(",", -1));
        List<String> current = CatalogueColumns.HEADER;
        return text.startsWith("# %ECSV") && columns.size() <= current.size()
                && current.subList(0, columns.size()).equals(columns)
                && columns.size() >= CatalogueColumns.FIXED.size();
    }
}
