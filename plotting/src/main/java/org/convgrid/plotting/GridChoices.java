package org.convgrid.plotting;

import java.util.List;
import java.util.Map;
import org.convgrid.output.manifest.RunManifest;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

/**
 * What the grid file says about the charts and the report, read from the grid text the manifest keeps (the grid
 * reader has validated it already): the {@code title}, the masses of {@code output: age_charts_for_masses_msun} and
 * whether {@code transitions: {refine}} asks for refined transition masses, and its {@code ms_fraction} ages.
 *
 * @param title the report's title: the grid's title, else the grid file's name, else {@code convgrid run}
 * @param ageChartMasses the masses, solar masses, whose zones-against-age charts the grid asks for; empty when it
 *     names none
 * @param refinesTransitions whether the grid asks for its transition masses refined (the default)
 * @param refineToleranceMsun the bracket width the refinement aims at ({@code transitions: tolerance_msun}), Msun
 * @param msFractions the grid's ages as fractions of each star's main-sequence lifetime
 *     ({@code age: {ms_fraction: [...]}}), in grid order; empty when it gives them in Gyr or Myr
 */
public record GridChoices(String title, List<Double> ageChartMasses, boolean refinesTransitions,
                          double refineToleranceMsun, List<Double> msFractions) {

    /**
     * The grid file's default {@code tolerance_msun}, Msun: the grid reader's (TransitionSettings.DEFAULT, in a module
     * this one does not see; a survey test holds the two equal).
     */
    public static final double DEFAULT_REFINE_TOLERANCE_MSUN = 0.002;

    /** The key under {@code output:} that names the masses of the zones-against-age charts. */
    public static final String AGE_CHART_MASSES_KEY = "age_charts_for_masses_msun";
    static final String FALLBACK_TITLE = "convgrid run";

    public GridChoices {
        ageChartMasses = List.copyOf(ageChartMasses);
        msFractions = List.copyOf(msFractions);
    }

    /** The key under {@code age:} whose values are fractions of each star's main-sequence lifetime. */
    static final String MS_FRACTION_KEY = "ms_fraction";

    /** The choices of a run; a missing manifest or an unreadable grid text gives the defaults. */
    public static GridChoices of(RunManifest manifest) {
        if (manifest == null) {
            return new GridChoices(FALLBACK_TITLE, List.of(), true, DEFAULT_REFINE_TOLERANCE_MSUN, List.of());
        }
        String title = FALLBACK_TITLE + ": " + manifest.gridFile();
        List<Double> masses = List.of();
        boolean refines = true;
        double tolerance = DEFAULT_REFINE_TOLERANCE_MSUN;
        Object doc;
        try {
            doc = new Load(LoadSettings.builder().build()).loadFromString(manifest.gridText());
        } catch (RuntimeException e) {
            // the run read this text already; one this reader cannot parse just gives the defaults
            doc = null;
        }
        if (doc instanceof Map<?, ?> map) {
            if (map.get("title") instanceof String t && !t.isBlank()) {
                title = t.strip();
            }
            if (map.get("output") instanceof Map<?, ?> output
                    && output.get(AGE_CHART_MASSES_KEY) instanceof List<?> list) {
                masses = list.stream().filter(Number.class::isInstance).map(v -> ((Number) v).doubleValue())
                        .filter(v -> v > 0 && Double.isFinite(v)).toList();
            } else if (map.get("output") instanceof Map<?, ?> output
                    && output.get(AGE_CHART_MASSES_KEY) instanceof Number one && one.doubleValue() > 0) {
                masses = List.of(one.doubleValue());
            }
        }
        if (doc instanceof Map<?, ?> map && map.get("transitions") instanceof Map<?, ?> transitions) {
            if (transitions.get("refine") instanceof Boolean refine) {
                refines = refine;
            }
            if (transitions.get("tolerance_msun") instanceof Number width && width.doubleValue() > 0) {
                tolerance = width.doubleValue();
            }
        }
        List<Double> fractions = List.of();
        if (doc instanceof Map<?, ?> map && map.get("age") instanceof Map<?, ?> age
                && age.get(MS_FRACTION_KEY) instanceof List<?> list) {
            // every value, in grid order: a model id's age index counts along this list
            fractions = list.stream().map(v -> v instanceof Number n ? n.doubleValue() : Double.NaN).toList();
        }
        return new GridChoices(title, masses, refines, tolerance, fractions);
    }
}
