package org.convgrid.grids;

import java.util.List;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.units.Constants;

/**
 * The age axis of a grid: ages in Gyr since the ZAMS ({@code age: {gyr: [...]}}) or fractions of each star's own
 * main-sequence lifetime ({@code age: {ms_fraction: [...]}}, 0 = ZAMS, 1 = core-hydrogen exhaustion).
 *
 * @param fractions whether the values are main-sequence fractions (else Gyr since the ZAMS)
 * @param values Gyr, or fractions in [0, 1]
 */
public record AgeAxis(boolean fractions, List<Double> values) {

    public AgeAxis {
        values = List.copyOf(values);
        if (fractions && values.stream().anyMatch(f -> !(f >= 0.0 && f <= 1.0))) {
            throw new IllegalArgumentException("main-sequence fractions must lie in [0, 1]: " + values);
        }
    }

    /** Ages in Gyr. */
    public static AgeAxis gyr(List<Double> ages) {
        return new AgeAxis(false, ages);
    }

    /** Fractions of each star's main-sequence lifetime. */
    public static AgeAxis msFractions(List<Double> fractions) {
        return new AgeAxis(true, fractions);
    }

    /** Whether any model is older than the ZAMS (so stars must be evolved). */
    public boolean evolves() {
        return values.stream().anyMatch(v -> v > 0.0);
    }

    /** The age a request of entry {@code index} asks for. */
    Age requestAge(int index) {
        return fractions ? new Age.MainSequenceFraction(values.get(index))
                : new Age.SinceZeroAge(values.get(index) * Constants.GYR);
    }
}
