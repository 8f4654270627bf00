package org.convgrid.plotting.turnover;

/**
 * One model on a turnover-time chart.
 *
 * @param modelId the catalogue's model id
 * @param massMsun total mass, solar masses
 * @param localDays {@code turnover_time_days}: l_m / v_c at one point of the envelope, days (positive)
 * @param globalDays {@code turnover_time_global_days}: the integral of dr / v_c across the envelope, days; NaN when
 *     the catalogue leaves it empty
 * @param fullyConvective whether the model is fully convective (its time is taken at r = R/2, not above a base)
 */
public record TurnoverPoint(String modelId, double massMsun, double localDays, double globalDays,
                            boolean fullyConvective) {

    /** Whether the model has a global turnover time to draw. */
    public boolean hasGlobal() {
        return Double.isFinite(globalDays) && globalDays > 0;
    }
}
