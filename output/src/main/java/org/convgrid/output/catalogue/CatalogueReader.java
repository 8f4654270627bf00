package org.convgrid.output.catalogue;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.OvershootProfileCell;

/**
 * Reads catalogues by column name, so it accepts columns in any order, ignores columns it does not know (later
 * extensions, trailing extras) and fills missing {@link CatalogueColumns#EXTENSIONS} with "not applicable" (an
 * opacity scale of 1). Every {@link CatalogueColumns#FIXED} column must be present. The ECSV header ({@code #}
 * lines) is skipped: the column names and the fixed formats say all the reader needs. Rows come without their
 * zones unless read with {@link #readWithZones}.
 */
public final class CatalogueReader {

    private static final CSVFormat FORMAT = CatalogueWriter.FORMAT.builder().setHeader().setSkipHeaderRecord(true)
            .setAllowMissingColumnNames(true).setCommentMarker('#').get();

    private CatalogueReader() {
    }

    /** Every row of a catalogue file, each with its zones from the zones file beside it (when there is one). */
    public static List<CatalogueRow> readWithZones(Path file, Path zonesFile) throws IOException {
        List<CatalogueRow> rows = read(file);
        if (!Files.isRegularFile(zonesFile)) {
            return rows;
        }
        Map<String, List<CatalogueZone>> zones = ZoneTable.read(zonesFile);
        return rows.stream().map(r -> r.withZones(zones.getOrDefault(r.modelId(), List.of()))).toList();
    }

    /**
     * Every row of a catalogue file.
     *
     * @throws OutputFormatException when a cell cannot be read, or when the last row is cut short without its line
     *     break (a run killed while writing it; the message says how to repair it)
     */
    public static List<CatalogueRow> read(Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        if (!text.isEmpty() && headerCutShort(text)) {
            // a catalogue cut inside its header (`truncate -s 500`) was reported as a row cut short
            throw new OutputFormatException(file.getFileName() + ": " + HEADER_CUT_SHORT);
        }
        if (!text.isEmpty() && !text.endsWith("\n")) {
            // every row the writer writes ends with a line break: without one the last row was cut short, even when
            // what is left still parses (a number cut to fewer digits, an empty last cell). The message named a
            // column of a row it could not know was cut, or the CSV parser's unfinished quoted cell
            throw new OutputFormatException(file.getFileName() + ": its last row is cut short, as a run stopped "
                    + "while writing it leaves it; 'convgrid run GRID --out DIR --resume' drops that row and computes "
                    + "it again");
        }
        try {
            return read(new StringReader(text));
        } catch (java.io.UncheckedIOException e) {
            throw new OutputFormatException(file.getFileName() + ": " + e.getMessage(), e);
        }
    }

    /** What a catalogue cut inside its header is, and what that means for its rows. */
    public static final String HEADER_CUT_SHORT = "its header is cut short before the column names (the file was "
            + "damaged, e.g. by a full disk or an interrupted copy), so it holds no rows";

    /**
     * Whether the text ends inside the header: no line but {@code #} comment lines, and not even the column names
     * (every catalogue the writer starts has them before its first row).
     */
    public static boolean headerCutShort(String text) {
        return text.lines().allMatch(line -> line.startsWith("#"));
    }

    /**
     * The rows of a catalogue whose last line may have been cut short by an interrupted run: text after the last
     * line break is ignored. The caller can truncate the file to {@code text.lastIndexOf('\n') + 1} chars.
     */
    public static List<CatalogueRow> readCompleteLines(String text) throws IOException {
        return read(new StringReader(text.substring(0, text.lastIndexOf('\n') + 1)));
    }

    /**
     * Every row of a catalogue.
     *
     * @throws OutputFormatException when a fixed column is missing or a cell cannot be read
     */
    public static List<CatalogueRow> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            List<String> header = parser.getHeaderNames();
            if (header.isEmpty()) {
                // only comment lines: the file ends inside its header (plot said "misses the column 'model_id'")
                throw new OutputFormatException("catalogue: " + HEADER_CUT_SHORT);
            }
            for (String column : CatalogueColumns.FIXED) {
                if (!header.contains(column)) {
                    throw new OutputFormatException("catalogue misses the column '" + column + "'");
                }
            }
            List<CatalogueRow> rows = new ArrayList<>();
            for (CSVRecord record : parser) {
                rows.add(row(record));
            }
            return rows;
        }
    }

    private static CatalogueRow row(CSVRecord r) {
        Cells c = new Cells(r);
        try {
            String criterion = c.text(CatalogueColumns.CRITERION);
            String structure = c.text(CatalogueColumns.STRUCTURE_CLASS);
            double opacity = c.number(CatalogueColumns.OPACITY_SCALE);
            return CatalogueRow.builder(c.text(CatalogueColumns.MODEL_ID),
                            ModelStatus.fromLabel(c.text(CatalogueColumns.STATUS)))
                    .massMsun(c.number(CatalogueColumns.MASS_MSUN))
                    .zInit(c.number(CatalogueColumns.Z_INIT))
                    .yInit(c.number(CatalogueColumns.Y_INIT))
                    .mixingLength(c.number(CatalogueColumns.MIXING_LENGTH))
                    .overshootHp(c.number(CatalogueColumns.OVERSHOOT_HP))
                    .ageGyr(c.number(CatalogueColumns.AGE_GYR))
                    .phase(c.text(CatalogueColumns.PHASE))
                    .statusDetail(c.text(CatalogueColumns.STATUS_DETAIL))
                    .luminosityLsun(c.number(CatalogueColumns.LUMINOSITY_LSUN))
                    .radiusRsun(c.number(CatalogueColumns.RADIUS_RSUN))
                    .teffK(c.number(CatalogueColumns.TEFF_K))
                    .logGCgs(c.number(CatalogueColumns.LOG_G_CGS))
                    .centralTempK(c.number(CatalogueColumns.CENTRAL_TEMP_K))
                    .centralDensityCgs(c.number(CatalogueColumns.CENTRAL_DENSITY_CGS))
                    .centralHFrac(c.number(CatalogueColumns.CENTRAL_H_FRAC))
                    .surfaceLiRel(c.number(CatalogueColumns.SURFACE_LI_REL))
                    .structureClass(structure.isEmpty() ? null : StructureClass.fromLabel(structure))
                    .coreCzMassFrac(c.number(CatalogueColumns.CORE_CZ_MASS_FRAC))
                    .coreCzRadiusFrac(c.number(CatalogueColumns.CORE_CZ_RADIUS_FRAC))
                    .envCzBaseMassFrac(c.number(CatalogueColumns.ENV_CZ_BASE_MASS_FRAC))
                    .envCzBaseRadiusFrac(c.number(CatalogueColumns.ENV_CZ_BASE_RADIUS_FRAC))
                    .envCzMassMsun(c.number(CatalogueColumns.ENV_CZ_MASS_MSUN))
                    .turnoverTimeDays(c.number(CatalogueColumns.TURNOVER_TIME_DAYS))
                    .solverIterations(solverIterations(c.text(CatalogueColumns.SOLVER_ITERATIONS),
                            c.text(CatalogueColumns.STATUS)))
                    .criterion(criterion.isEmpty() ? null
                            : StabilityCriterion.valueOf(criterion.toUpperCase(Locale.ROOT)))
                    .opacityScale(Double.isNaN(opacity) ? 1.0 : opacity)
                    .turnoverTimeGlobalDays(c.number(CatalogueColumns.TURNOVER_TIME_GLOBAL_DAYS))
                    .coreMixedMassFrac(c.number(CatalogueColumns.CORE_MIXED_MASS_FRAC))
                    .overshootProfile(OvershootProfileCell.parse(c.text(CatalogueColumns.OVERSHOOT_PROFILE)))
                    .buoyancyPeriodPi0S(c.number(CatalogueColumns.BUOYANCY_PERIOD_PI0_S))
                    .periodSpacingL1S(c.number(CatalogueColumns.PERIOD_SPACING_L1_S))
                    .largeSeparationUhz(c.number(CatalogueColumns.LARGE_SEPARATION_UHZ))
                    .surfaceCzBaseAcousticDepthS(c.number(CatalogueColumns.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S))
                    .heIiIonisationAcousticDepthS(c.number(CatalogueColumns.HE_II_IONISATION_ACOUSTIC_DEPTH_S))
                    .momentOfInertiaGCm2(c.number(CatalogueColumns.MOMENT_OF_INERTIA_G_CM2))
                    .envCzMomentOfInertiaGCm2(c.number(CatalogueColumns.ENV_CZ_MOMENT_OF_INERTIA_G_CM2))
                    .build();
        } catch (IllegalArgumentException e) {
            throw new OutputFormatException("catalogue row " + r.getRecordNumber() + " (line "
                    + (r.getRecordNumber() + 1) + "), column '" + c.current + "': " + e.getMessage(), e);
        }
    }

    /**
     * The {@code solver_iterations} cell: empty when no model was solved for the row. Catalogues written before
     * that rule gave {@code past_main_sequence} rows 0, for a model that was never solved (the engine stops at
     * core-hydrogen exhaustion); read so, they are written again (resume, merge) with the empty cell. A 0 in any
     * other row is kept as the count it may be.
     */
    private static int solverIterations(String cell, String status) {
        if (cell.isBlank()) {
            return ModelOutcome.NO_MODEL_SOLVED;
        }
        int count = Integer.parseInt(cell.strip());
        return count == 0 && ModelStatus.PAST_MAIN_SEQUENCE.label().equals(status) ? ModelOutcome.NO_MODEL_SOLVED
                : count;
    }

    /** Cell access by name that remembers the column being read, for error messages. */
    private static final class Cells {
        private final CSVRecord record;
        private String current = "";

        Cells(CSVRecord record) {
            this.record = record;
        }

        String text(String column) {
            current = column;
            return record.isSet(column) ? record.get(column) : "";
        }

        double number(String column) {
            return CsvNumbers.parse(text(column));
        }
    }
}
