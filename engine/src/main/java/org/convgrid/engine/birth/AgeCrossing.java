package org.convgrid.engine.birth;

/**
 * The age at which a quantity recorded at two consecutive models crosses a level, interpolated linearly between
 * them: how the life events that are not resolved to one step (the radiative core's appearance, the convective
 * core's onset and end, the lithium levels, the zero-age main sequence) are dated. Stateless.
 */
final class AgeCrossing {

    private AgeCrossing() {
    }

    /**
     * @param ageA the earlier model's age
     * @param a the quantity there
     * @param ageB the later model's age
     * @param b the quantity there
     * @param level the level crossed
     * @return the age, clamped to [ageA, ageB]; {@code ageB} when the two values are equal or {@code a} is unknown
     */
    static double of(double ageA, double a, double ageB, double b, double level) {
        if (!(a != b) || Double.isNaN(a)) {
            return ageB;
        }
        double w = (level - a) / (b - a);
        return ageA + Math.max(0.0, Math.min(1.0, w)) * (ageB - ageA);
    }
}
