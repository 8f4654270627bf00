package org.convgrid.engine.physics.atmosphere;

/**
 * The interior's outer boundary values and their sensitivities.
 *
 * @param lnPressure ln P at the fitting point (P in dyn cm^-2)
 * @param lnTemperature ln T at the fitting point (T in K)
 * @param dlnPDlnTeff (dln P/dln Teff) at fixed g
 * @param dlnPDlnG (dln P/dln g) at fixed Teff
 * @param dlnTDlnTeff (dln T/dln Teff) at fixed g
 * @param dlnTDlnG (dln T/dln g) at fixed Teff
 */
public record SurfaceCondition(double lnPressure, double lnTemperature, double dlnPDlnTeff, double dlnPDlnG,
                               double dlnTDlnTeff, double dlnTDlnG) {
}
