package org.convgrid.output.catalogue;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;

/**
 * One catalogue row, in the catalogue's units (solar units, Gyr, days); NaN (or null for the class and criterion)
 * means "not applicable" and is written as an empty cell. Column meanings: conventions.md and
 * {@link CatalogueColumns}. Build one from an engine outcome with {@link OutcomeRows#toRow}.
 *
 * @param modelId stable key from the grid indices
 * @param massMsun total mass, solar masses
 * @param zInit initial metal mass fraction
 * @param yInit initial helium mass fraction
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp step overshoot, pressure scale heights
 * @param ageGyr age since the ZAMS, Gyr
 * @param status how the model ended
 * @param statusDetail short reason when not ok, else empty
 * @param luminosityLsun L / L_sun
 * @param radiusRsun R / R_sun
 * @param teffK effective temperature, K
 * @param logGCgs log10 of the surface gravity in cm s^-2
 * @param centerTempK central temperature, K
 * @param centerDensityCgs central density, g cm^-3
 * @param centerHFrac central hydrogen mass fraction
 * @param structureClass the convective layout, null when unknown
 * @param coreCzMassFrac m/M at the top of the convective core, 0 when none
 * @param envCzBaseMassFrac m/M at the base of the convective envelope, 1 when none
 * @param envCzBaseRadiusFrac r/R at the base of the convective envelope, 1 when none
 * @param envCzMassMsun convective envelope mass, solar masses
 * @param turnoverTimeDays envelope turnover time (local definition), days
 * @param convZones every convective zone in m/M, centre outwards
 * @param solverIterations Newton iterations
 * @param criterion stability criterion, null when the catalogue does not say
 * @param opacityFactor opacity multiplier
 * @param turnoverTimeGlobalDays envelope turnover time (integral definition), days
 */
public record CatalogueRow(String modelId, double massMsun, double zInit, double yInit, double mixingLength,
                           double overshootHp, double ageGyr, ModelStatus status, String statusDetail,
                           double luminosityLsun, double radiusRsun, double teffK, double logGCgs,
                           double centerTempK, double centerDensityCgs, double centerHFrac,
                           StructureClass structureClass, double coreCzMassFrac, double envCzBaseMassFrac,
                           double envCzBaseRadiusFrac, double envCzMassMsun, double turnoverTimeDays,
                           List<Span> convZones, int solverIterations, StabilityCriterion criterion,
                           double opacityFactor, double turnoverTimeGlobalDays) {

    public CatalogueRow {
        Objects.requireNonNull(modelId, "modelId");
        Objects.requireNonNull(status, "status");
        statusDetail = statusDetail == null ? "" : statusDetail;
        convZones = List.copyOf(convZones);
    }

    /** Whether the model converged as asked (status ok). */
    public boolean isOk() {
        return status == ModelStatus.OK;
    }
}
