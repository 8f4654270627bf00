package org.convgrid.engine.physics.opacity;

/**
 * An {@link Opacity} at one fixed composition ({@link Opacity#atComposition}), for many calls with it, e.g. one point
 * of a structure solve over its Newton iterations: what depends on the composition alone is prepared once instead of
 * at every call. Thread-safe, as the opacity it comes from.
 */
@FunctionalInterface
public interface OpacityAtComposition {

    /**
     * {@link Opacity#rosselandMean} at this composition: the same value, bit for bit.
     *
     * @param density g cm^-3
     * @param temperature K
     */
    OpacityValue rosselandMean(double density, double temperature);
}
