package org.convgrid.engine.overshoot;

import java.util.Optional;
import java.util.function.IntToDoubleFunction;

/**
 * How mixing reaches beyond the formal boundaries of the convective zones of the previous model: either by
 * widening the instantaneously mixed zones ({@link #mixedPoints}) or by a diffusion coefficient beyond them
 * ({@link #diffusion}), or neither. Implementations are immutable and thread-safe.
 */
public interface Overshoot {

    /** The scheme's grid-file name. */
    String label();

    /**
     * The overshoot parameter as the grid gives it: alpha_ov (pressure scale heights) for the step scheme, f for
     * the exponential one (0 for none).
     */
    double parameter();

    /** The parameter a star of {@code massMsun} is mixed with: {@link #parameter()} unless the scheme ramps it. */
    default double parameterAt(double massMsun) {
        return parameter();
    }

    /**
     * The points of the new mesh to be homogenised: the convective flags joined with every point the scheme
     * mixes instantaneously.
     *
     * @param massAt mass of point j of the new mesh, g
     * @param convective the convective flags on the new mesh (not changed)
     * @param previous the converged model the step starts from (its own mesh)
     * @return a new array
     */
    boolean[] mixedPoints(IntToDoubleFunction massAt, boolean[] convective, OvershootProfile previous);

    /**
     * S = (4 pi r^2 rho)^2 D_ov per point of {@code previous}, g^2 s^-1, for a diffusive scheme; empty when the
     * scheme does not diffuse.
     *
     * @param mixingLength alpha of the convective transport, pressure scale heights (sets D_0 = v_c l_m/3)
     */
    Optional<double[]> diffusion(OvershootProfile previous, double mixingLength);

    /**
     * The mass, g, up to which the scheme mixes a central convective zone of {@code profile} instantaneously
     * ({@link #mixedPoints}'s edge above it); NaN when the scheme mixes no further than the zone itself, or when the
     * profile has no central zone or one reaching the surface.
     */
    default double mixedCoreTop(OvershootProfile profile) {
        return Double.NaN;
    }
}
