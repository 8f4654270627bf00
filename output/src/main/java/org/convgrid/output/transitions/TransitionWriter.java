package org.convgrid.output.transitions;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueWriter;

/** Writes {@code transitions.csv}: the {@link TransitionColumns} header, then one row per slice. */
public final class TransitionWriter {

    private TransitionWriter() {
    }

    /** Writes the header and the rows in the given order. */
    public static void write(List<TransitionRow> rows, Appendable out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, CatalogueWriter.FORMAT);
        printer.printRecord(TransitionColumns.HEADER);
        for (TransitionRow row : rows) {
            printer.printRecord(cells(row));
        }
        printer.flush();
    }

    /** The cells of a row, in {@link TransitionColumns#HEADER} order. */
    public static List<String> cells(TransitionRow row) {
        Slice s = row.slice();
        TransitionEstimate fc = row.fullyConvective();
        TransitionEstimate core = row.convCore();
        List<String> cells = new ArrayList<>(TransitionColumns.HEADER.size());
        cells.add(CsvNumbers.format(s.zInit()));
        cells.add(CsvNumbers.format(s.ageGyr()));
        cells.add(CsvNumbers.format(fc.massMsun()));
        cells.add(Span.format(fc.bracket()));
        cells.add(CsvNumbers.format(core.massMsun()));
        cells.add(Span.format(core.bracket()));
        cells.add(row.method().label());
        cells.add(CsvNumbers.format(s.mixingLength()));
        cells.add(CsvNumbers.format(s.overshootHp()));
        cells.add(s.criterion() == null ? "" : s.criterion().name().toLowerCase(Locale.ROOT));
        cells.add(CsvNumbers.format(s.opacityScale()));
        cells.add(Integer.toString(fc.crossings().size()));
        cells.add(Span.join(fc.crossings()));
        cells.add(Integer.toString(fc.skippedInBracket()));
        cells.add(Integer.toString(core.crossings().size()));
        cells.add(Span.join(core.crossings()));
        cells.add(Integer.toString(core.skippedInBracket()));
        TransitionEstimate lasting = row.lastingCoreOnset();
        cells.add(CsvNumbers.format(lasting.massMsun()));
        cells.add(Span.format(lasting.bracket()));
        cells.add(row.notes());
        return cells;
    }
}
