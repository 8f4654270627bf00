package org.convgrid.survey;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.convgrid.engine.batch.Shard;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionRow;

/**
 * The mark a row of transitions.csv carries in its notes when its slice lacks some of the models its run is to
 * compute: an interrupted run (or one that failed part-way) has a catalogue that holds part of some slices' masses,
 * and a limit found among part of them may lie elsewhere once the rest are there. Said until now on stderr alone
 * (a script reading transitions.csv later could not tell). The models a slice is to hold come from the
 * manifest's plan: its grid text and its shard (a shard's slices are complete when its share of them is). A slice
 * that holds all its models, and every slice of a run whose manifest says it finished, carries no mark, so the
 * table of a complete run is what it was. Every command that writes the table or the report's copy of it applies
 * this one rule.
 */
public final class UnfinishedSlices {

    private UnfinishedSlices() {
    }

    /**
     * The rows with the mark first in the notes of each slice that lacks some of its planned models; the rows
     * unchanged when the manifest says the run finished, is absent, or records a grid text this version cannot read
     * (its plan is then unknown, and stderr's warning is all that can be said).
     *
     * @param transitions the table found from {@code catalogue}
     * @param catalogue the catalogue rows the table was found from
     * @param manifest the run's manifest, null when there is none
     */
    public static List<TransitionRow> marked(List<TransitionRow> transitions, List<CatalogueRow> catalogue,
                                             RunManifest manifest) {
        if (manifest == null || !manifest.isUnfinished()) {
            return transitions;
        }
        GridSpec grid;
        try {
            grid = RecordedGrid.of(manifest);
        } catch (GridFileException e) {
            return transitions;
        }
        Shard shard = manifest.shard() == null ? Shard.ALL : ShardChoice.parse(manifest.shard());
        Map<String, Integer> planned = new HashMap<>();
        Set<String> plannedIds = new HashSet<>();
        for (ModelRequest r : new ShardPlan(grid, shard, GridRun.MASSES_PER_CHUNK)) {
            String key = ModelIdFormat.sliceIdOf(r.modelId());
            if (key != null) {
                planned.merge(key, 1, Integer::sum);
                plannedIds.add(r.modelId());
            }
        }
        Map<String, Integer> present = new HashMap<>();
        Map<Slice, String> keyOfSlice = new HashMap<>();
        for (CatalogueRow row : catalogue) {
            String key = ModelIdFormat.sliceIdOf(row.modelId());
            if (key != null && plannedIds.contains(row.modelId())) {
                present.merge(key, 1, Integer::sum);
                keyOfSlice.putIfAbsent(Slice.of(row), key);
            }
        }
        List<TransitionRow> out = new ArrayList<>(transitions.size());
        for (TransitionRow t : transitions) {
            String key = keyOfSlice.get(t.slice());
            int have = key == null ? 0 : present.getOrDefault(key, 0);
            int wanted = key == null ? 0 : planned.getOrDefault(key, 0);
            out.add(key == null || have >= wanted ? t : t.withNotes(note(have, wanted, manifest.shard(), manifest.gridFile())
                    + (t.notes().isEmpty() ? "" : "; " + t.notes())));
        }
        return out;
    }

    /**
     * The mark: how many of the slice's masses are in the catalogue, and the command that completes it
     * ("convgrid run --resume" alone is refused, it needs the grid file and the directory). The directory is the one
     * the table is in, so it is named as such, not by a path that would tie the file to one machine. Its first words
     * are fixed, for scripts to test for: {@code unfinished slice:}.
     *
     * @param shard the shard's label ({@code K/N}), null for the whole grid
     * @param gridFile the grid file as the run was given it (its manifest's {@code grid_file})
     */
    static String note(int computed, int planned, String shard, String gridFile) {
        return "unfinished slice: " + computed + " of " + planned + " masses " + (shard == null ? "" : "of shard "
                + shard + " ") + "computed; complete it with convgrid run " + gridFile + " --out DIR"
                + (shard == null ? "" : " --shard " + shard) + " --resume (DIR: the directory of this table)";
    }
}
