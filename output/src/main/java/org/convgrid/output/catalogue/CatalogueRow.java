package org.convgrid.output.catalogue;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;

/**
 * One catalogue row, in the catalogue's units (solar units, Gyr, days); NaN (or null for the class and criterion,
 * empty text for the phase) means "not applicable" and is written as an empty cell. Column meanings: the README's
 * "Catalogue" section and {@link CatalogueColumns}. Build one from an engine outcome with {@link OutcomeRows#toRow}.
 *
 * @param modelId stable key from the grid indices
 * @param massMsun total mass, solar masses
 * @param zInit initial metal mass fraction
 * @param yInit initial helium mass fraction
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp overshoot length, pressure scale heights
 * @param ageGyr age from the run's age origin, Gyr
 * @param phase {@code main_sequence} or {@code pre_main_sequence}; empty when status is not ok
 * @param status how the model ended
 * @param statusDetail short reason when not ok, else empty
 * @param luminosityLsun L / L_sun
 * @param radiusRsun R / R_sun
 * @param teffK effective temperature, K
 * @param logGCgs log10 of the surface gravity in cm s^-2
 * @param centralTempK central temperature, K
 * @param centralDensityCgs central density, g cm^-3
 * @param centralHFrac central hydrogen mass fraction
 * @param surfaceLiRel surface 7Li over its initial value; NaN until the engine follows lithium
 * @param structureClass the convective layout, null when unknown
 * @param coreCzMassFrac m/M at the top of the convective core, NaN when there is none
 * @param coreCzRadiusFrac r/R at the top of the convective core, NaN when there is none
 * @param envCzBaseMassFrac m/M at the base of the convective envelope, NaN when none, 0 when fully convective
 * @param envCzBaseRadiusFrac r/R at the base of the convective envelope, NaN when none, 0 when fully convective
 * @param envCzMassMsun convective envelope mass, solar masses, NaN when none
 * @param turnoverTimeDays envelope turnover time (local definition), days
 * @param zones every convective zone, centre outwards (empty when read from a catalogue without its zones file)
 * @param solverIterations Newton iterations; {@link org.convgrid.engine.request.ModelOutcome#NO_MODEL_SOLVED} (an empty
 *     cell) when no model was solved for the row
 * @param criterion stability criterion, null when the catalogue does not say
 * @param opacityScale opacity multiplier
 * @param turnoverTimeGlobalDays envelope turnover time (integral definition), days
 * @param coreMixedMassFrac m/M up to which the central convective zone is mixed (overshoot included); NaN when
 *     there is no core, or for rows read from a catalogue written before the column
 * @param overshootProfile which profile {@code overshootHp} is the length of; null for rows read from a catalogue
 *     written before the column
 * @param buoyancyPeriodPi0S the g-mode period scale Pi_0, s; NaN without a g-mode cavity, when not ok, or for rows read
 *     from a catalogue written before the column
 * @param periodSpacingL1S the dipole period spacing Delta Pi_1 = Pi_0 / sqrt(2), s, NaN when Pi_0 is; kept beside
 *     Pi_0 rather than derived from it, so that a row read and written again keeps both cells' digits
 */
public record CatalogueRow(String modelId, double massMsun, double zInit, double yInit, double mixingLength,
                           double overshootHp, double ageGyr, String phase, ModelStatus status, String statusDetail,
                           double luminosityLsun, double radiusRsun, double teffK, double logGCgs,
                           double centralTempK, double centralDensityCgs, double centralHFrac, double surfaceLiRel,
                           StructureClass structureClass, double coreCzMassFrac, double coreCzRadiusFrac,
                           double envCzBaseMassFrac, double envCzBaseRadiusFrac, double envCzMassMsun,
                           double turnoverTimeDays, List<CatalogueZone> zones, int solverIterations,
                           StabilityCriterion criterion, double opacityScale, double turnoverTimeGlobalDays,
                           double coreMixedMassFrac, OvershootScheme overshootProfile, double buoyancyPeriodPi0S,
                           double periodSpacingL1S) {

    /** The {@code phase} of a model on the main sequence. */
    public static final String MAIN_SEQUENCE = "main_sequence";
    /** The {@code phase} of a model still contracting towards the main sequence. */
    public static final String PRE_MAIN_SEQUENCE = "pre_main_sequence";

    public CatalogueRow {
        Objects.requireNonNull(modelId, "modelId");
        Objects.requireNonNull(status, "status");
        statusDetail = statusDetail == null ? "" : statusDetail;
        phase = phase == null ? "" : phase;
        zones = List.copyOf(zones);
    }

    /** A row without the g-mode period scale (as a catalogue written before its columns gives it). */
    public CatalogueRow(String modelId, double massMsun, double zInit, double yInit, double mixingLength,
                        double overshootHp, double ageGyr, String phase, ModelStatus status, String statusDetail,
                        double luminosityLsun, double radiusRsun, double teffK, double logGCgs,
                        double centralTempK, double centralDensityCgs, double centralHFrac, double surfaceLiRel,
                        StructureClass structureClass, double coreCzMassFrac, double coreCzRadiusFrac,
                        double envCzBaseMassFrac, double envCzBaseRadiusFrac, double envCzMassMsun,
                        double turnoverTimeDays, List<CatalogueZone> zones, int solverIterations,
                        StabilityCriterion criterion, double opacityScale, double turnoverTimeGlobalDays,
                        double coreMixedMassFrac, OvershootScheme overshootProfile) {
        this(modelId, massMsun, zInit, yInit, mixingLength, overshootHp, ageGyr, phase, status, statusDetail,
                luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK, centralDensityCgs, centralHFrac,
                surfaceLiRel, structureClass, coreCzMassFrac, coreCzRadiusFrac, envCzBaseMassFrac,
                envCzBaseRadiusFrac, envCzMassMsun, turnoverTimeDays, zones, solverIterations, criterion,
                opacityScale, turnoverTimeGlobalDays, coreMixedMassFrac, overshootProfile, Double.NaN, Double.NaN);
    }

    /**
     * A row without overshoot: its core is mixed no further than its top ({@code coreMixedMassFrac} = core top), its
     * profile the uniform one.
     */
    public CatalogueRow(String modelId, double massMsun, double zInit, double yInit, double mixingLength,
                        double overshootHp, double ageGyr, String phase, ModelStatus status, String statusDetail,
                        double luminosityLsun, double radiusRsun, double teffK, double logGCgs,
                        double centralTempK, double centralDensityCgs, double centralHFrac, double surfaceLiRel,
                        StructureClass structureClass, double coreCzMassFrac, double coreCzRadiusFrac,
                        double envCzBaseMassFrac, double envCzBaseRadiusFrac, double envCzMassMsun,
                        double turnoverTimeDays, List<CatalogueZone> zones, int solverIterations,
                        StabilityCriterion criterion, double opacityScale, double turnoverTimeGlobalDays) {
        this(modelId, massMsun, zInit, yInit, mixingLength, overshootHp, ageGyr, phase, status, statusDetail,
                luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK, centralDensityCgs, centralHFrac,
                surfaceLiRel, structureClass, coreCzMassFrac, coreCzRadiusFrac, envCzBaseMassFrac,
                envCzBaseRadiusFrac, envCzMassMsun, turnoverTimeDays, zones, solverIterations, criterion,
                opacityScale, turnoverTimeGlobalDays, coreCzMassFrac, OvershootScheme.STEP);
    }

    /** Whether the model converged as asked (status ok). */
    public boolean isOk() {
        return status == ModelStatus.OK;
    }

    /** The mass extent of every zone, centre outwards. */
    public List<Span> convZones() {
        return zones.stream().map(z -> new Span(z.massFracInner(), z.massFracOuter())).toList();
    }

    /** The same row with its zones (read from {@code zones.csv}). */
    public CatalogueRow withZones(List<CatalogueZone> found) {
        return new CatalogueRow(modelId, massMsun, zInit, yInit, mixingLength, overshootHp, ageGyr, phase, status,
                statusDetail, luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK, centralDensityCgs,
                centralHFrac, surfaceLiRel, structureClass, coreCzMassFrac, coreCzRadiusFrac, envCzBaseMassFrac,
                envCzBaseRadiusFrac, envCzMassMsun, turnoverTimeDays, found, solverIterations, criterion,
                opacityScale, turnoverTimeGlobalDays, coreMixedMassFrac, overshootProfile, buoyancyPeriodPi0S,
                periodSpacingL1S);
    }

    /**
     * The same row with {@code profile} as its overshoot profile when it names none (a row of an earlier layout,
     * continued by a run of the grid it came from: the grid's one profile is the row's).
     */
    public CatalogueRow withOvershootProfileIfUnknown(OvershootScheme profile) {
        return overshootProfile != null ? this : new CatalogueRow(modelId, massMsun, zInit, yInit, mixingLength,
                overshootHp, ageGyr, phase, status, statusDetail, luminosityLsun, radiusRsun, teffK, logGCgs,
                centralTempK, centralDensityCgs, centralHFrac, surfaceLiRel, structureClass, coreCzMassFrac,
                coreCzRadiusFrac, envCzBaseMassFrac, envCzBaseRadiusFrac, envCzMassMsun, turnoverTimeDays, zones,
                solverIterations, criterion, opacityScale, turnoverTimeGlobalDays, coreMixedMassFrac, profile,
                buoyancyPeriodPi0S, periodSpacingL1S);
    }
}
