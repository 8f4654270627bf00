package org.convgrid.grids;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.units.Constants;

/**
 * The age axis of a grid: ages in Gyr counted from the axis's origin ({@code age: {gyr: [...]}} or
 * {@code myr: [...]}, converted to Gyr; origin birth or the ZAMS), or fractions of each star's own main-sequence
 * lifetime ({@code age: {ms_fraction: [...]}}, 0 = ZAMS, 1 = core-hydrogen exhaustion, whatever the origin: the
 * origin then says whether the star is evolved from birth and where its reported age counts from).
 *
 * @param fractions whether the values are main-sequence fractions (else Gyr since the origin)
 * @param values Gyr, or fractions in [0, 1]
 * @param origin where age 0 lies
 */
public record AgeAxis(boolean fractions, List<Double> values, AgeOrigin origin) {

    public AgeAxis {
        values = List.copyOf(values);
        Objects.requireNonNull(origin, "origin");
        if (fractions && values.stream().anyMatch(f -> !(f >= 0.0 && f <= 1.0))) {
            throw new IllegalArgumentException("main-sequence fractions must lie in [0, 1]: " + values);
        }
        if (!fractions && origin == AgeOrigin.BIRTH && values.stream().anyMatch(a -> !(a > 0.0))) {
            throw new IllegalArgumentException("ages from birth must be above 0 (age 0 is the start model): "
                    + values);
        }
    }

    /** An axis counted from the zero-age main sequence. */
    public AgeAxis(boolean fractions, List<Double> values) {
        this(fractions, values, AgeOrigin.ZAMS);
    }

    /** Ages in Gyr since the zero-age main sequence. */
    public static AgeAxis gyr(List<Double> ages) {
        return new AgeAxis(false, ages);
    }

    /** Ages in Gyr since {@code origin}. */
    public static AgeAxis gyr(List<Double> ages, AgeOrigin origin) {
        return new AgeAxis(false, ages, origin);
    }

    /** Fractions of each star's main-sequence lifetime, of stars evolved from their zero-age models. */
    public static AgeAxis msFractions(List<Double> fractions) {
        return new AgeAxis(true, fractions);
    }

    /** Fractions of each star's main-sequence lifetime, reported from {@code origin}. */
    public static AgeAxis msFractions(List<Double> fractions, AgeOrigin origin) {
        return new AgeAxis(true, fractions, origin);
    }

    /** The same values in another order or subset, with this axis's kind and origin. */
    public AgeAxis withValues(List<Double> other) {
        return new AgeAxis(fractions, other, origin);
    }

    /** Whether stars must be evolved (any model older than the ZAMS, or any model counted from birth). */
    public boolean evolves() {
        return origin == AgeOrigin.BIRTH || values.stream().anyMatch(v -> v > 0.0);
    }

    /** The age a request of entry {@code index} asks for. */
    Age requestAge(int index) {
        return fractions ? new Age.MainSequenceFraction(values.get(index), origin)
                : Age.since(origin, values.get(index) * Constants.GYR);
    }
}
