package org.convgrid.output.transitions;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.OvershootProfileCell;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * Writes {@code transitions.csv}: the {@link TransitionColumns#HEADER}, then one row per slice. Masses are reals
 * ({@link CsvNumbers#format}), an empty cell where a transition is not bracketed or there is no transient window.
 * {@code fe_h_dex} is measured against the run's Sun ({@link IronAbundance}), the default one unless given.
 */
public final class TransitionWriter {

    private TransitionWriter() {
    }

    /** Writes the header and the rows in the given order, [Fe/H] against the default Sun. */
    public static void write(List<TransitionRow> rows, Appendable out) throws IOException {
        write(rows, IronAbundance.DEFAULT, out);
    }

    /** Writes the header and the rows in the given order, [Fe/H] against {@code iron}'s Sun. */
    public static void write(List<TransitionRow> rows, IronAbundance iron, Appendable out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, CatalogueWriter.FORMAT);
        printer.printRecord(TransitionColumns.HEADER);
        for (TransitionRow row : rows) {
            printer.printRecord(cells(row, iron));
        }
        printer.flush();
    }

    /** The cells of a row, in {@link TransitionColumns#HEADER} order, [Fe/H] against {@code iron}'s Sun. */
    public static List<String> cells(TransitionRow row, IronAbundance iron) {
        Slice s = row.slice();
        List<String> cells = new ArrayList<>(TransitionColumns.HEADER.size());
        cells.add(CsvNumbers.format(s.zInit()));
        cells.add(CsvNumbers.format(row.yInit()));
        cells.add(iron.cell(s.zInit(), row.yInit()));
        cells.add(CsvNumbers.format(s.ageGyr()));
        cells.add(CsvNumbers.format(s.mixingLength()));
        cells.add(CsvNumbers.format(s.overshootHp()));
        cells.add(OvershootProfileCell.format(s.overshootProfile()));
        cells.add(s.criterion() == null ? "" : s.criterion().name().toLowerCase(Locale.ROOT));
        cells.add(CsvNumbers.format(s.opacityScale()));
        estimate(row.fullyConvective(), cells);
        estimate(row.convCoreOnset(), cells);
        Span window = row.transientCore();
        cells.add(window == null ? "" : CsvNumbers.format(window.lo()));
        cells.add(window == null ? "" : CsvNumbers.format(window.hi()));
        cells.add(row.notes());
        cells.add(row.method().label());
        cells.add(CsvNumbers.format(row.toleranceMsun()));
        estimate(row.turnoff(), cells);
        estimate(row.lithiumDepletion().boundary(), cells);
        cells.add(CsvNumbers.format(row.lithiumDepletion().luminosityLsun()));
        return cells;
    }

    private static void estimate(TransitionEstimate e, List<String> cells) {
        cells.add(CsvNumbers.format(e.massMsun()));
        cells.add(e.found() ? CsvNumbers.format(e.bracket().lo()) : "");
        cells.add(e.found() ? CsvNumbers.format(e.bracket().hi()) : "");
    }
}
