package org.convgrid.plotting.hr;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.convgrid.plotting.style.ChartStyle;

/**
 * The dash pattern of each isochrone age: the legend's key to the ages, since colour stands for Z. Ages take the
 * patterns in age order, so up to {@link ChartStyle#DASH_PATTERNS} ages get one each; past that the patterns repeat
 * and the chart says which ages share one, instead of a legend that shows two ages the same way unannounced.
 */
final class IsochroneDashes {

    /** Isochrone line width, pixels: under the 3 px data lines, so the models' markers read first. */
    static final float WIDTH = 2.0f;

    private IsochroneDashes() {
    }

    /** The ages that have an isochrone, increasing: the ones that take a pattern. */
    static List<Double> ages(HrDiagramData data) {
        return data.isochrones().stream().map(HrDiagramData.ZeroAgeLine::age).distinct().sorted().toList();
    }

    /** The stroke of the isochrones of {@code ageGyr}. */
    static BasicStroke stroke(HrDiagramData data, double ageGyr) {
        return ChartStyle.dashed(ages(data).indexOf(ageGyr), WIDTH);
    }

    /** The ages that share a pattern with another, one group per shared pattern (empty when none repeats). */
    static List<List<Double>> sharing(HrDiagramData data) {
        List<Double> ages = ages(data);
        List<List<Double>> groups = new ArrayList<>();
        for (int pattern = 0; pattern < ChartStyle.DASH_PATTERNS && pattern + ChartStyle.DASH_PATTERNS < ages.size();
             pattern++) {
            List<Double> group = new ArrayList<>();
            for (int i = pattern; i < ages.size(); i += ChartStyle.DASH_PATTERNS) {
                group.add(ages.get(i));
            }
            groups.add(group);
        }
        return groups;
    }

    /**
     * The note naming the ages that share a dash pattern ("... 1 Myr and 900 Myr share one; 5 Myr and 1 Gyr share
     * another."), when some do.
     */
    static Optional<String> sharingNote(HrDiagramData data) {
        List<List<Double>> groups = sharing(data);
        if (groups.isEmpty()) {
            return Optional.empty();
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < groups.size(); i++) {
            List<String> names = groups.get(i).stream().map(data::ageName).toList();
            String joined = names.size() == 2 ? names.get(0) + " and " + names.get(1)
                    : String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
            parts.add(joined + " share " + (i == 0 ? "one" : "another"));
        }
        return Optional.of("More ages than dash patterns (" + ChartStyle.DASH_PATTERNS + "), so the isochrones' "
                + "patterns repeat: " + String.join("; ", parts) + ".");
    }
}
