package org.convgrid.survey;

import java.io.Closeable;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.batch.OutcomeSink;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.catalogue.OutcomeRows;

/**
 * Appends outcomes to the catalogue and their zones to the zones file beside it, one flushed row at a time, so an
 * interrupted run loses at most the row being written (a resume keeps the zones of the kept rows only). Line breaks inside a status detail become spaces: one row is one line, which is what lets a resume cut a
 * half-written row off at the last line feed.
 */
public final class CatalogueAppender implements OutcomeSink, Closeable {

    private final CatalogueWriter writer;
    private final Writer zones;
    private final Path catalogueFile;
    private final Path zonesFile;

    private CatalogueAppender(CatalogueWriter writer, Writer zones, Path catalogueFile, Path zonesFile) {
        this.writer = writer;
        this.zones = zones;
        this.catalogueFile = catalogueFile;
        this.zonesFile = zonesFile;
    }

    /**
     * Opens the catalogue for appending, writing the header first when {@code withHeader}; [Fe/H] against
     * {@code iron}'s Sun (the run's).
     */
    public static CatalogueAppender open(Path catalogue, boolean withHeader, IronAbundance iron) throws IOException {
        Writer out = Files.newBufferedWriter(catalogue, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                StandardOpenOption.WRITE, StandardOpenOption.APPEND);
        CatalogueWriter writer = withHeader ? CatalogueWriter.startingWithHeader(out, iron)
                : CatalogueWriter.continuing(out, iron);
        writer.flush();
        Path zonesFile = catalogue.resolveSibling(RunLayout.ZONES);
        boolean zonesHeader = !Files.exists(zonesFile) || Files.size(zonesFile) == 0;
        Writer zones = Files.newBufferedWriter(zonesFile, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                StandardOpenOption.WRITE, StandardOpenOption.APPEND);
        if (zonesHeader) {
            zones.write(ZoneTable.headerLine());
        }
        zones.flush();
        return new CatalogueAppender(writer, zones, catalogue, zonesFile);
    }

    @Override
    public void accept(ModelOutcome o) throws IOException {
        ModelOutcome oneLine = o instanceof ModelOutcome.Failed f
                ? new ModelOutcome.Failed(f.request(), f.status(), oneLine(f.statusDetail()), f.solverIterations()) : o;
        CatalogueRow row = OutcomeRows.toRow(oneLine);
        // a full disk said only "No space left on device": the message names the file
        try {
            zones.write(ZoneTable.lines(row));
            zones.flush();
        } catch (IOException e) {
            throw IoMessages.appending(zonesFile, e);
        }
        try {
            writer.write(row);
            writer.flush();
        } catch (IOException e) {
            throw IoMessages.appending(catalogueFile, e);
        }
    }

    public static String oneLine(String detail) {
        return detail == null ? "" : detail.replaceAll("\\s*\\R\\s*", " ").strip();
    }

    @Override
    public void close() throws IOException {
        try (Writer z = zones) {
            writer.close();
        }
    }
}
