package org.convgrid.plotting.label;

import java.util.List;
import java.util.stream.Collectors;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;

/**
 * How the charts group a run's models by age. A grid gives its ages either in Gyr or Myr, the same for every star,
 * or as fractions of each star's own main-sequence lifetime ({@code age: {ms_fraction: [...]}}). In the second case
 * one grid age is another age in Gyr for every star, and grouping by Gyr gave groups of one star each (a
 * grid of 6 masses, 2 Z and 5 fractions drew 60 one-star zone maps per coordinate and an HR legend of one-star
 * "isochrones"); such a run is grouped by fraction instead. A model's fraction is the grid's list at the age index
 * its id ends with ({@code -aNN}, {@link Track#agePartOf}), the same for the refinement's models.
 *
 * @param msFractions the grid's {@code ms_fraction} list in grid order; empty when its ages are in Gyr or Myr (or
 *     the run's grid text is not at hand): then the models are grouped by age in Gyr
 */
public record AgeGroups(List<Double> msFractions) {

    /** Grouping by age in Gyr: every grid with ages in Gyr or Myr. */
    public static final AgeGroups BY_AGE = new AgeGroups(List.of());

    /** The prefix of the age index in a model id's age part ({@code -a03}). */
    private static final String AGE_INDEX_PREFIX = "-a";

    public AgeGroups {
        msFractions = List.copyOf(msFractions);
    }

    /** Whether the models are grouped by main-sequence fraction, not by age in Gyr. */
    public boolean byFraction() {
        return !msFractions.isEmpty();
    }

    /** The group of a catalogue row ({@link #keyOf(String, double)}). */
    public double keyOf(CatalogueRow row) {
        return keyOf(row.modelId(), row.ageGyr());
    }

    /**
     * The group of a model: its age in Gyr when grouping by age; else its main-sequence fraction, NaN when its id
     * names no age index of the grid's list (a model of another grid: it then joins no group).
     */
    public double keyOf(String modelId, double ageGyr) {
        if (!byFraction()) {
            return ageGyr;
        }
        String agePart = Track.agePartOf(modelId);
        if (!agePart.startsWith(AGE_INDEX_PREFIX)) {
            return Double.NaN;
        }
        try {
            int index = Integer.parseInt(agePart.substring(AGE_INDEX_PREFIX.length()));
            return index >= 0 && index < msFractions.size() ? msFractions.get(index) : Double.NaN;
        } catch (NumberFormatException e) {
            // an id that is not one of convgrid's: no group, as for an index off the list
            return Double.NaN;
        }
    }

    /** A group's name for a legend or a chart label: {@code 150 Myr} ({@link SliceLabels#age}), {@code MS fraction 0.5}. */
    public String name(double key) {
        return byFraction() ? "MS fraction " + SliceLabels.number(key) : SliceLabels.age(key);
    }

    /** A group's name in a title, spelled out: {@code 150 Myr}, {@code main-sequence fraction 0.25}. */
    public String longName(double key) {
        return byFraction() ? SliceLabels.msFraction(key) : SliceLabels.age(key);
    }

    /**
     * The groups of a chart for its title when grouping by fraction, short and every one listed (a grid has a
     * handful): {@code MS fractions 0, 0.25, 0.5}, {@code MS fraction 0.5} for one.
     */
    public String fractionsTitle(List<Double> fractions) {
        return (fractions.size() == 1 ? "MS fraction " : "MS fractions ")
                + fractions.stream().map(SliceLabels::number).collect(Collectors.joining(", "));
    }
}
