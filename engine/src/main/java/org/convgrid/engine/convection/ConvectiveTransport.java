package org.convgrid.engine.convection;

/** The actual temperature gradient where matter may convect. Implementations are immutable and thread-safe. */
public interface ConvectiveTransport {

    /**
     * @param state the local conditions, including the gradient that marks the stability limit
     * @return the actual gradient, the element gradient and the convective velocity
     */
    ConvectiveGradient gradient(LocalConvectionState state);

    /**
     * The gradient of {@link #gradient} with its partial derivatives by nabla_rad, nabla_ad and ln U, for the
     * structure solver's Jacobian; null when this model has none (the solver then differences {@link #gradient}).
     */
    default MixingLengthSolution withSlopes(LocalConvectionState state) {
        return null;
    }

    /**
     * The mixing length in pressure scale heights, alpha = l_m / H_P: what sets the turnover time of a zone and the
     * diffusion coefficient D_0 = v_c l_m/3 of diffusive overshoot.
     */
    double alpha();
}
