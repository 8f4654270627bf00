package org.convgrid.survey;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.transitions.RefinedModelIds;

/**
 * What an interrupted run left in its catalogue: the complete lines, checked to be exactly the first rows the
 * shard's plan emits (the scheduler writes in that order, so anything else means the catalogue belongs to another
 * grid or shard). A line cut short by the interruption is dropped from the file.
 *
 * @param ids the model ids of the kept rows
 * @param hasHeader whether the file keeps its header line (false: the file is empty and needs one)
 * @param droppedBytes bytes of a half-written last line that were cut off
 */
public record KeptCatalogue(Set<String> ids, boolean hasHeader, long droppedBytes) {

    /** A catalogue that does not exist yet. */
    static final KeptCatalogue NONE = new KeptCatalogue(Set.of(), false, 0);

    /**
     * Checks the catalogue against the plan, then truncates a half-written last line (and a half-written header).
     *
     * @throws RunSetupException when the header or the rows do not belong to this grid and shard (nothing changed)
     */
    public static KeptCatalogue inspectAndTrim(Path catalogue, ShardPlan plan) throws IOException {
        if (!Files.exists(catalogue)) {
            return NONE;
        }
        byte[] bytes = Files.readAllBytes(catalogue);
        int complete = lastLineEnd(bytes);
        String text = new String(bytes, 0, complete, StandardCharsets.UTF_8);
        Set<String> ids = new HashSet<>();
        boolean rewrite = false;
        if (complete > 0) {
            String current = EarlierCatalogueLayout.inCurrentLayout(catalogue, text,
                    plan.grid().physics().overshootScheme(), GridIronAbundance.of(plan.grid()), "continue it");
            // an earlier version's layout: the same rows, in this version's columns, before anything is appended
            rewrite = !current.equals(text);
            text = current;
            List<CatalogueRow> rows = CatalogueReader.readCompleteLines(text);
            refuseRefined(catalogue, rows);
            Iterator<ModelRequest> expected = plan.iterator();
            for (int i = 0; i < rows.size(); i++) {
                String id = rows.get(i).modelId();
                if (!expected.hasNext()) {
                    throw new RunSetupException(catalogue + " has more rows (" + rows.size()
                            + ") than this grid gives the shard");
                }
                ModelRequest request = expected.next();
                String wanted = request.modelId();
                if (!id.equals(wanted)) {
                    throw notThePlansRows(catalogue, rows, i, wanted, expected);
                }
                refuseOtherStar(catalogue, rows.get(i), i, request);
                ids.add(id);
            }
        }
        if (rewrite) {
            AtomicFiles.writeString(catalogue, text);
        } else if (complete < bytes.length) {
            try (FileChannel channel = FileChannel.open(catalogue, StandardOpenOption.WRITE)) {
                channel.truncate(complete);
            }
        }
        keepZonesOf(catalogue.resolveSibling(RunLayout.ZONES), ids);
        return new KeptCatalogue(Set.copyOf(ids), complete > 0, bytes.length - complete);
    }

    /**
     * The refusal for row {@code i} (0-based) that is not the model the plan expects there. When the row is a later
     * model of the plan, rows are missing in between: the catalogue is this run's with a gap (rows deleted by hand, or
     * damage), which was reported as "belongs to another run". Otherwise it is another grid's or shard's.
     *
     * @param rest the plan after {@code wanted}
     */
    private static RunSetupException notThePlansRows(Path catalogue, List<CatalogueRow> rows, int i, String wanted,
                                                     Iterator<ModelRequest> rest) {
        String id = rows.get(i).modelId();
        long missing = 1;
        String lastMissing = wanted;
        while (rest.hasNext()) {
            String next = rest.next().modelId();
            if (next.equals(id)) {
                String before = i == 0 ? "the header" : rows.get(i - 1).modelId() + " (row " + i + ")";
                return new RunSetupException(catalogue + " misses " + (missing == 1 ? "model " + wanted
                        : missing + " models, " + wanted + " to " + lastMissing) + ", between " + before + " and "
                        + id + " (row " + (i + 1) + "): rows were deleted by hand or the file was damaged, so nothing "
                        + "was changed; restore the file from a copy, or delete its rows from " + id + " on and "
                        + "resume again to compute them anew");
            }
            lastMissing = next;
            missing++;
        }
        return new RunSetupException(catalogue + " row " + (i + 1) + " is model " + id + " where this grid and shard "
                + "expect " + wanted + ", and the grid's later models do not follow it: the catalogue was written by "
                + "another grid or shard, or edited");
    }

    /**
     * Model ids are grid indices, so a grid of the same shape gives the same ids to other stars; a resume that found
     * no manifest to compare the grids by relies on the rows' own mass and Z (written to at least 6 digits).
     */
    private static void refuseOtherStar(Path catalogue, CatalogueRow row, int i, ModelRequest request) {
        double massMsun = request.mass() / Constants.M_SUN;
        if (!close(row.massMsun(), massMsun) || !close(row.zInit(), request.initialMetals())) {
            throw new RunSetupException(catalogue + " row " + (i + 1) + " is model " + row.modelId() + " of "
                    + CsvNumbers.format(row.massMsun()) + " Msun and Z = " + CsvNumbers.format(row.zInit()) + ", where this grid's model of that id has "
                    + CsvNumbers.format(massMsun) + " Msun and Z = " + CsvNumbers.format(request.initialMetals()) + ": the catalogue was written by "
                    + "another grid");
        }
        // the ids are grid positions, so a grid of the same shape with other ages or physics gives the same ids and
        // stars (a run whose manifest was gone was resumed with such a grid): every request value a row
        // carries must match; a cell an earlier layout leaves empty (NaN, null) is not held against it
        String other = otherValue("y_init", row.yInit(), request.initialHelium());
        other = other != null ? other : otherValue("mixing_length", row.mixingLength(),
                request.physics().mixingLength());
        other = other != null ? other : otherValue("overshoot_hp", row.overshootHp(), request.physics().overshoot());
        other = other != null ? other : otherValue("opacity_scale", row.opacityScale(),
                request.physics().opacityScale());
        if (other == null && row.criterion() != null && row.criterion() != request.physics().criterion()) {
            other = "criterion " + row.criterion() + " where this grid has " + request.physics().criterion();
        }
        if (other == null && row.overshootProfile() != null
                && row.overshootProfile() != request.physics().overshootScheme()) {
            other = "overshoot_profile " + row.overshootProfile() + " where this grid has "
                    + request.physics().overshootScheme();
        }
        if (other == null) {
            double ageGyr = OutcomeRows.ageGyr(request.age());
            other = Double.isNaN(ageGyr) ? null : otherValue("age_gyr", row.ageGyr(), ageGyr);
        }
        if (other != null) {
            throw new RunSetupException(catalogue + " row " + (i + 1) + " is model " + row.modelId() + " with " + other
                    + ": the catalogue was written by another grid");
        }
    }

    /** "column x where this grid has y" when the written value differs from the asked one; null when they agree. */
    private static String otherValue(String column, double written, double asked) {
        return Double.isNaN(written) || close(written, asked) ? null : column + " " + CsvNumbers.format(written)
                + " where this grid has " + CsvNumbers.format(asked);
    }

    private static boolean close(double written, double asked) {
        return Math.abs(written - asked) <= 1e-5 * Math.abs(asked) + 1e-12;
    }

    /**
     * Keeps the zone lines of the kept models only (zones are written just before their catalogue row, so an
     * interruption can leave the zones of a row that never made it), and drops a half-written last line.
     */
    private static void keepZonesOf(Path zones, Set<String> ids) throws IOException {
        if (!Files.exists(zones)) {
            return;
        }
        byte[] bytes = Files.readAllBytes(zones);
        String text = new String(bytes, 0, lastLineEnd(bytes), StandardCharsets.UTF_8);
        StringBuilder kept = new StringBuilder(ZoneTable.headerLine());
        for (String line : text.split("\n")) {
            int comma = line.indexOf(',');
            if (comma > 0 && ids.contains(line.substring(0, comma))) {
                kept.append(line).append('\n');
            }
        }
        AtomicFiles.writeString(zones, kept.toString());
    }

    /**
     * A refinement appends models after the grid's rows of a finished run, so such a catalogue is no prefix of the
     * plan and a resume would throw the refined transitions away: refuse it, naming the way out.
     */
    private static void refuseRefined(Path catalogue, List<CatalogueRow> rows) {
        rows.stream().map(CatalogueRow::modelId).filter(RefinedModelIds::isRefined).findFirst().ifPresent(id -> {
            throw new RunSetupException(catalogue + " holds models added by 'convgrid transitions --refine' (" + id
                    + "): a refined run is finished and cannot be resumed; recompute its tables with 'convgrid "
                    + "transitions', or start over with --force or a new --out");
        });
    }

    /** Length of the text up to and including its last line feed (UTF-8 never uses 0x0A inside a character). */
    static int lastLineEnd(byte[] bytes) {
        for (int i = bytes.length - 1; i >= 0; i--) {
            if (bytes[i] == '\n') {
                return i + 1;
            }
        }
        return 0;
    }
}
