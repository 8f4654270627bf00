package org.convgrid.grids;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.evolution.AgeMeaning;
import org.convgrid.engine.units.Constants;

/**
 * The age axis of a grid: ages in Gyr since the ZAMS ({@code age: {gyr: [...]}}) or fractions of each star's own
 * main-sequence lifetime ({@code age: {ms_fraction: [...]}}, 0 = ZAMS, 1 = core-hydrogen exhaustion).
 *
 * @param meaning how the values are read, and how the solver reads the requests' age field
 * @param values Gyr for {@link AgeMeaning#SECONDS}, fractions in [0, 1] for {@link AgeMeaning#MS_FRACTION}
 */
public record AgeAxis(AgeMeaning meaning, List<Double> values) {

    public AgeAxis {
        Objects.requireNonNull(meaning, "meaning");
        values = List.copyOf(values);
        if (meaning == AgeMeaning.MS_FRACTION && values.stream().anyMatch(f -> !(f >= 0.0 && f <= 1.0))) {
            throw new IllegalArgumentException("main-sequence fractions must lie in [0, 1]: " + values);
        }
    }

    /** Ages in Gyr. */
    public static AgeAxis gyr(List<Double> ages) {
        return new AgeAxis(AgeMeaning.SECONDS, ages);
    }

    /** Fractions of each star's main-sequence lifetime. */
    public static AgeAxis msFractions(List<Double> fractions) {
        return new AgeAxis(AgeMeaning.MS_FRACTION, fractions);
    }

    /** Whether the values are main-sequence fractions. */
    public boolean fractions() {
        return meaning == AgeMeaning.MS_FRACTION;
    }

    /** Whether any model is older than the ZAMS (so stars must be evolved). */
    public boolean evolves() {
        return values.stream().anyMatch(v -> v > 0.0);
    }

    /**
     * The value of a request's age field for entry {@code index}: seconds for Gyr ages, the bare fraction for
     * fractions (the solver is built with {@link #meaning()} and resolves it per star).
     */
    double requestAge(int index) {
        return fractions() ? values.get(index) : values.get(index) * Constants.GYR;
    }
}
