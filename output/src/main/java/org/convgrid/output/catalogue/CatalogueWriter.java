package org.convgrid.output.catalogue;

import java.io.Closeable;
import java.io.Flushable;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OvershootProfileCell;
import org.convgrid.output.EcsvHeader;
import org.convgrid.output.IronAbundance;

/**
 * Writes catalogue rows as ECSV 1.0 (astropy's Enhanced Character Separated Values: {@code #}-prefixed YAML giving
 * each column's name, unit, datatype and description, then CSV with comma, {@code \n} line ends and RFC 4180 quoting
 * when a cell needs it) with the numbers of {@link CsvNumbers}. {@link #startingWithHeader} writes the header first;
 * {@link #continuing} writes none, to grow an existing catalogue on resume. Each takes the run's {@link IronAbundance}
 * (the Sun its {@code fe_h_dex} column is measured against), or the default one for a grid given in Z. Not
 * thread-safe: one writer per file, rows in grid order.
 */
public final class CatalogueWriter implements Flushable, Closeable {

    /** The CSV dialect of every convgrid table. */
    public static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    private final CSVPrinter printer;
    private final IronAbundance iron;

    private CatalogueWriter(Appendable out, IronAbundance iron) throws IOException {
        this.printer = new CSVPrinter(out, FORMAT);
        this.iron = iron;
    }

    /** A writer that first writes the header row, [Fe/H] against the default Sun. */
    public static CatalogueWriter startingWithHeader(Appendable out) throws IOException {
        return startingWithHeader(out, IronAbundance.DEFAULT);
    }

    /** A writer that first writes the header row, [Fe/H] against {@code iron}'s Sun. */
    public static CatalogueWriter startingWithHeader(Appendable out, IronAbundance iron) throws IOException {
        out.append(ecsvHeader(iron));
        CatalogueWriter writer = new CatalogueWriter(out, iron);
        writer.printer.printRecord(CatalogueColumns.HEADER);
        return writer;
    }

    /** {@link #ecsvHeader(IronAbundance)} of a run whose [Fe/H] is measured against the default Sun. */
    public static String ecsvHeader() {
        return ecsvHeader(IronAbundance.DEFAULT);
    }

    /**
     * The {@code #} lines before the column-name row: the ECSV version line, then YAML with the delimiter and one
     * flow mapping per column. Fixed text for one Sun, so a resumed catalogue can be checked against it.
     */
    public static String ecsvHeader(IronAbundance iron) {
        return EcsvHeader.of(CatalogueColumns.described(iron));
    }

    /** A writer for rows after an existing header, [Fe/H] against {@code iron}'s Sun. */
    public static CatalogueWriter continuing(Appendable out, IronAbundance iron) throws IOException {
        return new CatalogueWriter(out, iron);
    }

    /** Writes one row. */
    public void write(CatalogueRow row) throws IOException {
        printer.printRecord(cells(row, iron));
    }

    /** Writes rows in the given order. */
    public void writeAll(Iterable<CatalogueRow> rows) throws IOException {
        for (CatalogueRow row : rows) {
            write(row);
        }
    }

    /** The cells of a row, in {@link CatalogueColumns#HEADER} order, [Fe/H] against the default Sun. */
    public static List<String> cells(CatalogueRow r) {
        return cells(r, IronAbundance.DEFAULT);
    }

    /** The cells of a row, in {@link CatalogueColumns#HEADER} order, [Fe/H] against {@code iron}'s Sun. */
    public static List<String> cells(CatalogueRow r, IronAbundance iron) {
        List<String> cells = new ArrayList<>(CatalogueColumns.HEADER.size());
        cells.add(r.modelId());
        for (double v : new double[] {r.massMsun(), r.zInit(), r.yInit(), r.mixingLength(), r.overshootHp(),
                r.ageGyr()}) {
            cells.add(CsvNumbers.format(v));
        }
        cells.add(r.phase());
        cells.add(r.status().label());
        cells.add(r.statusDetail());
        for (double v : new double[] {r.luminosityLsun(), r.radiusRsun(), r.teffK(), r.logGCgs(), r.centralTempK(),
                r.centralDensityCgs(), r.centralHFrac(), r.surfaceLiRel()}) {
            cells.add(CsvNumbers.format(v));
        }
        cells.add(r.structureClass() == null ? "" : r.structureClass().label());
        for (double v : new double[] {r.coreCzMassFrac(), r.coreCzRadiusFrac(), r.envCzBaseMassFrac(),
                r.envCzBaseRadiusFrac(),
                r.envCzMassMsun(), r.turnoverTimeDays()}) {
            cells.add(CsvNumbers.format(v));
        }
        cells.add(r.solverIterations() == ModelOutcome.NO_MODEL_SOLVED ? "" : Integer.toString(r.solverIterations()));
        cells.add(r.criterion() == null ? "" : r.criterion().name().toLowerCase(Locale.ROOT));
        cells.add(CsvNumbers.format(r.opacityScale()));
        cells.add(CsvNumbers.format(r.turnoverTimeGlobalDays()));
        cells.add(CsvNumbers.format(r.coreMixedMassFrac()));
        cells.add(OvershootProfileCell.format(r.overshootProfile()));
        // derived from the row's own z_init and y_init, so a row written again (resume, merge) keeps its cell
        cells.add(iron.cell(r.zInit(), r.yInit()));
        cells.add(CsvNumbers.format(r.buoyancyPeriodPi0S()));
        cells.add(CsvNumbers.format(r.periodSpacingL1S()));
        cells.add(CsvNumbers.format(r.largeSeparationUhz()));
        cells.add(CsvNumbers.format(r.surfaceCzBaseAcousticDepthS()));
        cells.add(CsvNumbers.format(r.heIiIonisationAcousticDepthS()));
        cells.add(CsvNumbers.format(r.momentOfInertiaGCm2()));
        cells.add(CsvNumbers.format(r.envCzMomentOfInertiaGCm2()));
        return cells;
    }

    @Override
    public void flush() throws IOException {
        printer.flush();
    }

    /** Flushes, and closes the target when it is closeable. */
    @Override
    public void close() throws IOException {
        printer.close(true);
    }
}
