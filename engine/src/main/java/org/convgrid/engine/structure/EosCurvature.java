package org.convgrid.engine.structure;

/**
 * The equation of state's second derivatives at one point as the convective Jacobian needs them: the changes of
 * nabla_ad, ln c_P and ln delta per ln rho and per ln T (one-sided differences), with the ln rho and ln T where they
 * were taken. They only shape the Jacobian (the Newton iteration's rate), never the solution, so a point that moved
 * a little since may use them again ({@link #servesAt}) instead of two more equation-of-state calls.
 *
 * @param dNablaAdDLnRho   d nabla_ad / d ln rho at fixed T
 * @param dLnCpDLnRho      d ln c_P / d ln rho at fixed T
 * @param dLnDeltaDLnRho   d ln delta / d ln rho at fixed T
 * @param dNablaAdDLnT     d nabla_ad / d ln T at fixed rho
 * @param dLnCpDLnT        d ln c_P / d ln T at fixed rho
 * @param dLnDeltaDLnT     d ln delta / d ln T at fixed rho
 * @param lnDensity        ln rho where they were taken
 * @param lnTemperature    ln T where they were taken
 */
public record EosCurvature(double dNablaAdDLnRho, double dLnCpDLnRho, double dLnDeltaDLnRho, double dNablaAdDLnT,
                           double dLnCpDLnT, double dLnDeltaDLnT, double lnDensity, double lnTemperature) {

    /**
     * How far (in ln rho or ln T) a point may move before its curvature is differenced again, and, where the gas
     * is nearly ideal and fully ionised (all six terms below {@link #SMOOTH_LIMIT} in size: they vanish for such a
     * gas), the wider distance. Measured on the 1 Msun, Z = 0.02 track from birth (2026-12-03, equation-of-state
     * calls counted, Newton iterations of the start model + track): never reused 458 086 calls, 14 + 631
     * iterations; these values, the previous model's curvature carried into each step: 398 794, 14 + 636.
     * Zero-age track (ZAMS + track): 274 422 calls, 19 + 344 -> 247 400, 19 + 346. Other values (a scratch
     * version carrying from the last solve on the same mesh): one distance 1e-2 everywhere 396 290, 14 + 674
     * (stale curvature in the ionisation zones slows the iteration, and an iteration's other work - opacity,
     * burning, convection, the block solve - eats the gain); 1e-3 everywhere 436 090, 14 + 633; 1e-3 and 1e-1
     * where smooth 396 576, 14 + 658; 1e-3 and 3e-2 where |terms| < 0.5: 388 318, 14 + 649. Within one solve
     * only (no carry) 1e-3 everywhere gave 438 412, 14 + 633: most points are differenced once per solve, at
     * its first derivative evaluation.
     */
    static final double REUSE_DISTANCE = 1.0e-3;
    static final double SMOOTH_REUSE_DISTANCE = 3.0e-2;
    static final double SMOOTH_LIMIT = 0.2;

    /** Whether these derivatives may stand in for fresh ones at the given ln rho, ln T of the same point. */
    public boolean servesAt(double lnRho, double lnT) {
        // the six-term smoothness test only where it decides: between the two distances
        double moved = Math.max(Math.abs(lnRho - lnDensity), Math.abs(lnT - lnTemperature));
        return moved <= REUSE_DISTANCE || moved <= SMOOTH_REUSE_DISTANCE && smooth();
    }

    private boolean smooth() {
        return Math.abs(dNablaAdDLnRho) < SMOOTH_LIMIT && Math.abs(dLnCpDLnRho) < SMOOTH_LIMIT
                && Math.abs(dLnDeltaDLnRho) < SMOOTH_LIMIT && Math.abs(dNablaAdDLnT) < SMOOTH_LIMIT
                && Math.abs(dLnCpDLnT) < SMOOTH_LIMIT && Math.abs(dLnDeltaDLnT) < SMOOTH_LIMIT;
    }
}
