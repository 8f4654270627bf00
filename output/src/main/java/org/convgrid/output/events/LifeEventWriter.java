package org.convgrid.output.events;

import java.io.IOException;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.OvershootProfileCell;

/**
 * Writes {@code life_events.csv}: a header row of {@link LifeEventColumns#ALL}, then one row per star, ages in Myr
 * since birth, an empty cell for an event that did not happen. Numbers in the {@link CsvNumbers} form;
 * {@code fe_h_dex} measured against the run's Sun ({@link IronAbundance}).
 */
public final class LifeEventWriter {

    private LifeEventWriter() {
    }

    /** The header line, with its line end. */
    public static String header() {
        return String.join(",", LifeEventColumns.ALL) + "\n";
    }

    /** One row, with its line end, [Fe/H] against {@code iron}'s Sun. */
    public static String line(LifeEventRow r, IronAbundance iron) {
        return String.join(",", r.trackId(), CsvNumbers.format(r.massMsun()), CsvNumbers.format(r.zInit()),
                CsvNumbers.format(r.yInit()), iron.cell(r.zInit(), r.yInit()), CsvNumbers.format(r.mixingLength()),
                CsvNumbers.format(r.overshootHp()),
                OvershootProfileCell.format(r.overshootProfile()),
                CsvNumbers.format(r.radiativeCoreMyr()), CsvNumbers.format(r.radiativeCoreEndMyr()),
                CsvNumbers.format(r.zamsMyr()), CsvNumbers.format(r.convCoreOnsetMyr()),
                CsvNumbers.format(r.convCoreEndMyr()), CsvNumbers.format(r.coreEnvelopeMergeMyr()),
                CsvNumbers.format(r.liHalvedMyr()), CsvNumbers.format(r.liOnePercentMyr()),
                CsvNumbers.format(r.centralHExhaustedMyr()), CsvNumbers.format(r.trackEndMyr())) + "\n";
    }

    /**
     * The whole table: one row per track id (of several rows for one star, the last given: a star recomputed after
     * an interruption), sorted by track id, so the same stars always give the same bytes; [Fe/H] against
     * {@code iron}'s Sun.
     */
    public static void write(Collection<LifeEventRow> rows, IronAbundance iron, Appendable out) throws IOException {
        out.append(header());
        for (LifeEventRow r : latestByStar(rows)) {
            out.append(line(r, iron));
        }
    }

    /** One row per track id, the last given, sorted by track id. */
    static List<LifeEventRow> latestByStar(Collection<LifeEventRow> rows) {
        Map<String, LifeEventRow> byId = new LinkedHashMap<>();
        for (LifeEventRow r : rows) {
            byId.put(r.trackId(), r);
        }
        return byId.values().stream().sorted(Comparator.comparing(LifeEventRow::trackId)).toList();
    }
}
