package org.convgrid.engine.physics.nuclear;

/**
 * The destruction rates per unit abundance of deuterium by d(p,g)3He and of 7Li by 7Li(p,a)4He at one point,
 * lambda_i = -(dX_i/dt)/X_i = rho Y_p N_A&lt;sigma v&gt;_i (screened). Each capture is linear in the fragile
 * species' own abundance (Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 5), so lambda does
 * not depend on it.
 *
 * @param deuterium lambda_D, s^-1 (0 where the composition holds no deuterium)
 * @param lithium lambda_Li, s^-1 (0 where the composition holds no 7Li)
 */
public record LightElementCaptures(double deuterium, double lithium) {

    /** No capture: a composition that holds neither species. */
    public static final LightElementCaptures NONE = new LightElementCaptures(0.0, 0.0);
}
