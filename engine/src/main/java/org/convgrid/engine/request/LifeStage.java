package org.convgrid.engine.request;

/**
 * Where a solved model stands in its star's life, as far as the evolution that made it followed it.
 *
 * @param preMainSequence whether the star was still contracting towards the main sequence (nuclear burning
 *                        short of the zero-age fraction of its luminosity)
 * @param surfaceLithium surface (convective-envelope) 7Li over its birth value; NaN when lithium was not
 *                       followed (models from the zero-age main sequence)
 */
public record LifeStage(boolean preMainSequence, double surfaceLithium) {

    /** A model on the main sequence whose lithium was not followed: every model built from the zero-age one. */
    public static final LifeStage MAIN_SEQUENCE_UNTRACED = new LifeStage(false, Double.NaN);
}
