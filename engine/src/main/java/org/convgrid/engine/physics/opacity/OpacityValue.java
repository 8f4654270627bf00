package org.convgrid.engine.physics.opacity;

/**
 * A Rosseland-mean opacity with its logarithmic derivatives.
 *
 * @param kappa cm^2 g^-1
 * @param dlnKappaDlnRho (dln kappa/dln rho) at fixed T
 * @param dlnKappaDlnT (dln kappa/dln T) at fixed rho
 */
public record OpacityValue(double kappa, double dlnKappaDlnRho, double dlnKappaDlnT) {
}
