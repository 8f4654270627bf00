package org.convgrid.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * A catalogue written by an earlier version, brought to this version's layout so that {@code run --resume} and
 * {@code merge} can continue it: its columns must be the first of this version's, in order (columns are only ever
 * added at the end; column descriptions in the header may have been reworded). The rows are read by column name and
 * written again, so their cells keep their text and a column the file lacked is empty, but for the overshoot profile,
 * which is the grid's (one profile per grid; the run or merge has checked the grid is the catalogue's). A catalogue of
 * another table, or one whose columns differ otherwise, is not this version's to upgrade.
 */
final class EarlierCatalogueLayout {

    private EarlierCatalogueLayout() {
    }

    /**
     * @param text complete lines of a catalogue file
     * @param overshootProfile the grid's overshoot profile, for rows written before the column that names it
     * @return the same rows under this version's header; {@code text} itself when it already has that header; null
     *     when its columns are not a leading part of this version's
     */
    static String upgraded(String text, OvershootScheme overshootProfile) {
        String header = RunDirectory.catalogueHeader();
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
        try (CatalogueWriter writer = CatalogueWriter.continuing(out)) {
            for (CatalogueRow row : CatalogueReader.readCompleteLines(text)) {
                writer.write(row.withOvershootProfileIfUnknown(overshootProfile));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }
}
