package org.convgrid.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * A catalogue written by an earlier version, brought to this version's layout so that {@code run --resume} and
 * {@code merge} can continue it: its columns must be the first of this version's, in order (columns are only ever
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
     * @param text complete lines of a catalogue file
     * @param overshootProfile the grid's overshoot profile, for rows written before the column that names it
     * @param iron the Sun the grid's [Fe/H] is measured against, for the header and the {@code fe_h_dex} cells
     * @return the same rows under this version's header; {@code text} itself when it already has that header; null
     *     when its columns are not a leading part of this version's
     */
    public static String upgraded(String text, OvershootScheme overshootProfile, IronAbundance iron) {
        String header = RunDirectory.catalogueHeader(iron);
        if (text.startsWith(header)) {
            return text;
        }
        String names = text.lines().filter(line -> !line.startsWith("#")).findFirst().orElse("");
        List<String> columns = List.of(names.split(",", -1));
        List<String> current = CatalogueColumns.HEADER;
        if (!text.startsWith("# %ECSV") || columns.size() > current.size()
                || !current.subList(0, columns.size()).equals(columns)
                || columns.size() < CatalogueColumns.FIXED.size()) {
            return null;
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
}
