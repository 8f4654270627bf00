package org.convgrid.survey;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.grids.GridSpec;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.grids.words.Counts;

/**
 * The catalogue lines of several shards, keyed by model id and kept byte for byte, then put back in grid order.
 * Not thread-safe.
 */
final class ShardRows {

    /** Model ids listed per kind of problem in a refusal message. */
    static final int IDS_SHOWN = 10;

    private final Map<String, String> lines = new HashMap<>();
    private final Map<String, Path> origin = new HashMap<>();
    private final Set<String> duplicates = new LinkedHashSet<>();
    private final OvershootScheme overshootProfile;
    private final IronAbundance iron;

    /**
     * @param overshootProfile the grid's overshoot profile, for rows of shards written before the column named it
     * @param iron the Sun the grid's [Fe/H] is measured against, for rows of shards written before fe_h_dex
     */
    ShardRows(OvershootScheme overshootProfile, IronAbundance iron) {
        this.overshootProfile = overshootProfile;
        this.iron = iron;
    }

    /**
     * Adds the complete lines of one shard's catalogue (each row checked by the catalogue reader).
     *
     * @return the shard's rows, read in this version's layout
     */
    List<CatalogueRow> add(Path catalogue, Path shard) throws IOException {
        byte[] bytes = Files.readAllBytes(catalogue);
        String header = RunDirectory.catalogueHeader(iron);
        // a shard written by an earlier version is read in this version's layout
        String text = EarlierCatalogueLayout.inCurrentLayout(catalogue,
                new String(bytes, 0, KeptCatalogue.lastLineEnd(bytes), StandardCharsets.UTF_8), overshootProfile, iron,
                "merge it");
        List<CatalogueRow> rows = CatalogueReader.readCompleteLines(text);
        String[] raw = text.substring(header.length()).split("\n");
        int count = text.length() == header.length() ? 0 : raw.length;
        if (count != rows.size()) {
            throw new RunSetupException(catalogue + " has rows that span several lines; cannot merge it");
        }
        for (int i = 0; i < count; i++) {
            String id = rows.get(i).modelId();
            if (lines.putIfAbsent(id, raw[i]) != null) {
                duplicates.add(id + " (" + origin.get(id) + " and " + shard + ")");
            } else {
                origin.put(id, shard);
            }
        }
        return rows;
    }

    /**
     * Every line in grid order.
     *
     * @param missingCause appended to the list of models missing from every shard (what may explain them), or empty
     * @throws RunSetupException listing models missing from every shard, present twice, or not in the grid
     */
    List<String> inGridOrder(GridSpec grid, String missingCause) {
        Map<String, String> left = new HashMap<>(lines);
        List<String> missing = new ArrayList<>();
        List<String> ordered = new ArrayList<>(lines.size());
        for (ModelRequest request : grid.requests()) {
            String line = left.remove(request.modelId());
            if (line == null) {
                missing.add(request.modelId());
            } else {
                ordered.add(line);
            }
        }
        List<String> problems = new ArrayList<>();
        if (!missing.isEmpty()) {
            problems.add(Counts.of(missing.size(), "model") + " missing from every shard: " + firstIds(missing)
                    + missingCause);
        }
        if (!duplicates.isEmpty()) {
            problems.add(Counts.of(duplicates.size(), "model") + " in more than one shard: " + firstIds(duplicates));
        }
        List<String> refined = left.keySet().stream().filter(RefinedModelIds::isRefined).sorted()
                .map(id -> id + " (" + origin.get(id) + ")").toList();
        if (!refined.isEmpty()) {
            problems.add(Counts.of(refined.size(), "model") + " added by 'convgrid transitions --refine': " + firstIds(refined)
                    + "; merge unrefined shards, then refine the merged directory");
            left.keySet().removeIf(RefinedModelIds::isRefined);
        }
        if (!left.isEmpty()) {
            List<String> strays = left.keySet().stream().sorted().map(id -> id + " (" + origin.get(id) + ")").toList();
            problems.add(Counts.of(strays.size(), "row") + " not in the grid: " + firstIds(strays));
        }
        if (!problems.isEmpty()) {
            throw new RunSetupException("cannot merge: " + String.join("; ", problems));
        }
        return ordered;
    }

    private static String firstIds(Collection<String> ids) {
        return String.join(", ", ids.stream().limit(IDS_SHOWN).toList()) + (ids.size() > IDS_SHOWN ? ", ..." : "");
    }
}
