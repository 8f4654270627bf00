package org.convgrid.engine.convection;

/** The actual temperature gradient where matter may convect. Implementations are immutable and thread-safe. */
public interface ConvectiveTransport {

    /**
     * @param state the local conditions, including the gradient that marks the stability limit
     * @return the actual gradient, the element gradient and the convective velocity
     */
    ConvectiveGradient gradient(LocalConvectionState state);
}
