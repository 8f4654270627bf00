package org.convgrid.engine.evolution;

/**
 * How {@link GridRequests} reads {@link org.convgrid.engine.batch.ModelRequest#age()} of the requests it is given.
 * The grid decides (its age axis); the solver is built with the grid's meaning, so the request record keeps one shape.
 */
public enum AgeMeaning {

    /** The age is the time since the zero-age main sequence, s (the record's documented meaning). */
    SECONDS,

    /**
     * The age field holds a dimensionless fraction f in [0, 1] of the star's own main-sequence lifetime t_MS (the
     * age at which central hydrogen falls below {@link MainSequenceEvolver.Settings#endCentralHydrogen()}, 1e-4 by
     * default). The model is computed at t = f t_MS; f = 0 is the zero-age model and f = 1 the exhaustion point
     * itself. The outcomes carry a copy of the request with the resolved age t in s (NaN when t_MS is unknown).
     */
    MS_FRACTION
}
