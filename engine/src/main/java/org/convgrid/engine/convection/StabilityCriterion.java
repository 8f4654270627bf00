package org.convgrid.engine.convection;

/** Which gradient the radiative gradient is compared with to decide convective instability. */
public enum StabilityCriterion {
    /** Convective where nabla_rad &gt; nabla_ad. */
    SCHWARZSCHILD,
    /** Convective where nabla_rad &gt; nabla_ad + (phi/delta) nabla_mu. */
    LEDOUX
}
