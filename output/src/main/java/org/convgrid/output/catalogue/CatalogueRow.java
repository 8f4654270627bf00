package org.convgrid.output.catalogue;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;

/**
 * One catalogue row, in the catalogue's units (solar units, Gyr, days); NaN (or null for the class and criterion,
 * empty text for the phase) means "not applicable" and is written as an empty cell. Column meanings: the README's
 * "Catalogue" section and {@link CatalogueColumns}. Build one from an engine outcome with {@link OutcomeRows#toRow},
 * otherwise with {@link #builder}, which names each value it sets (the canonical constructor takes every column in
 * order, and is there for the builder).
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
 * @param largeSeparationUhz the asymptotic large separation Delta nu = 1 / (2 T) of p modes, microHz, T the acoustic
 *     radius; NaN when not ok, or for rows read from a catalogue written before the column
 * @param surfaceCzBaseAcousticDepthS the acoustic depth of the surface convection zone's base below the photosphere,
 *     s, however thin the zone; NaN when fully convective, with a radiative surface, when not ok,
 *     or for rows read from a catalogue written before the column
 * @param heIiIonisationAcousticDepthS the acoustic depth of helium's second-ionisation dip of Gamma1, s; NaN without
 *     a dip, when not ok, or for rows read from a catalogue written before the column
 * @param momentOfInertiaGCm2 the moment of inertia, g cm^2; NaN when not ok or for rows written before the column
 * @param envCzMomentOfInertiaGCm2 the convective envelope's moment of inertia, g cm^2; NaN without an envelope, when
 *     not ok, or for rows written before the column
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
                           double periodSpacingL1S, double largeSeparationUhz, double surfaceCzBaseAcousticDepthS,
                           double heIiIonisationAcousticDepthS, double momentOfInertiaGCm2,
                           double envCzMomentOfInertiaGCm2) {

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
        return toBuilder().zones(found).build();
    }

    /**
     * The same row with {@code profile} as its overshoot profile when it names none (a row of an earlier layout,
     * continued by a run of the grid it came from: the grid's one profile is the row's).
     */
    public CatalogueRow withOvershootProfileIfUnknown(OvershootScheme profile) {
        return overshootProfile != null ? this : toBuilder().overshootProfile(profile).build();
    }

    /**
     * A builder of a row of model {@code modelId} that ended as {@code status}, every other component "not
     * applicable" until set (see {@link Builder}).
     */
    public static Builder builder(String modelId, ModelStatus status) {
        return new Builder(modelId, status);
    }

    /** A builder holding every component of this row, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Builds a row by naming its components, so that a caller sets only those it knows and a new column is one more
     * setter rather than one more argument in every call. Each setter sets the component of its name (units and
     * meanings: the record's parameters). What is not set is "not applicable": NaN, null, empty text, no zones,
     * {@link ModelOutcome#NO_MODEL_SOLVED} iterations; except the opacity scale, 1 (what a catalogue without the
     * column means).
     */
    public static final class Builder {
        private String modelId;
        private ModelStatus status;
        private double massMsun = Double.NaN;
        private double zInit = Double.NaN;
        private double yInit = Double.NaN;
        private double mixingLength = Double.NaN;
        private double overshootHp = Double.NaN;
        private double ageGyr = Double.NaN;
        private String phase = "";
        private String statusDetail = "";
        private double luminosityLsun = Double.NaN;
        private double radiusRsun = Double.NaN;
        private double teffK = Double.NaN;
        private double logGCgs = Double.NaN;
        private double centralTempK = Double.NaN;
        private double centralDensityCgs = Double.NaN;
        private double centralHFrac = Double.NaN;
        private double surfaceLiRel = Double.NaN;
        private StructureClass structureClass;
        private double coreCzMassFrac = Double.NaN;
        private double coreCzRadiusFrac = Double.NaN;
        private double envCzBaseMassFrac = Double.NaN;
        private double envCzBaseRadiusFrac = Double.NaN;
        private double envCzMassMsun = Double.NaN;
        private double turnoverTimeDays = Double.NaN;
        private List<CatalogueZone> zones = List.of();
        private int solverIterations = ModelOutcome.NO_MODEL_SOLVED;
        private StabilityCriterion criterion;
        private double opacityScale = 1.0;
        private double turnoverTimeGlobalDays = Double.NaN;
        private double coreMixedMassFrac = Double.NaN;
        private OvershootScheme overshootProfile;
        private double buoyancyPeriodPi0S = Double.NaN;
        private double periodSpacingL1S = Double.NaN;
        private double largeSeparationUhz = Double.NaN;
        private double surfaceCzBaseAcousticDepthS = Double.NaN;
        private double heIiIonisationAcousticDepthS = Double.NaN;
        private double momentOfInertiaGCm2 = Double.NaN;
        private double envCzMomentOfInertiaGCm2 = Double.NaN;

        private Builder(String modelId, ModelStatus status) {
            this.modelId = Objects.requireNonNull(modelId, "modelId");
            this.status = Objects.requireNonNull(status, "status");
        }

        private Builder(CatalogueRow row) {
            this(row.modelId, row.status);
            massMsun = row.massMsun;
            zInit = row.zInit;
            yInit = row.yInit;
            mixingLength = row.mixingLength;
            overshootHp = row.overshootHp;
            ageGyr = row.ageGyr;
            phase = row.phase;
            statusDetail = row.statusDetail;
            luminosityLsun = row.luminosityLsun;
            radiusRsun = row.radiusRsun;
            teffK = row.teffK;
            logGCgs = row.logGCgs;
            centralTempK = row.centralTempK;
            centralDensityCgs = row.centralDensityCgs;
            centralHFrac = row.centralHFrac;
            surfaceLiRel = row.surfaceLiRel;
            structureClass = row.structureClass;
            coreCzMassFrac = row.coreCzMassFrac;
            coreCzRadiusFrac = row.coreCzRadiusFrac;
            envCzBaseMassFrac = row.envCzBaseMassFrac;
            envCzBaseRadiusFrac = row.envCzBaseRadiusFrac;
            envCzMassMsun = row.envCzMassMsun;
            turnoverTimeDays = row.turnoverTimeDays;
            zones = row.zones;
            solverIterations = row.solverIterations;
            criterion = row.criterion;
            opacityScale = row.opacityScale;
            turnoverTimeGlobalDays = row.turnoverTimeGlobalDays;
            coreMixedMassFrac = row.coreMixedMassFrac;
            overshootProfile = row.overshootProfile;
            buoyancyPeriodPi0S = row.buoyancyPeriodPi0S;
            periodSpacingL1S = row.periodSpacingL1S;
            largeSeparationUhz = row.largeSeparationUhz;
            surfaceCzBaseAcousticDepthS = row.surfaceCzBaseAcousticDepthS;
            heIiIonisationAcousticDepthS = row.heIiIonisationAcousticDepthS;
            momentOfInertiaGCm2 = row.momentOfInertiaGCm2;
            envCzMomentOfInertiaGCm2 = row.envCzMomentOfInertiaGCm2;
        }

        public Builder modelId(String value) {
            modelId = Objects.requireNonNull(value, "modelId");
            return this;
        }

        public Builder massMsun(double value) {
            massMsun = value;
            return this;
        }

        public Builder zInit(double value) {
            zInit = value;
            return this;
        }

        public Builder yInit(double value) {
            yInit = value;
            return this;
        }

        public Builder mixingLength(double value) {
            mixingLength = value;
            return this;
        }

        public Builder overshootHp(double value) {
            overshootHp = value;
            return this;
        }

        public Builder ageGyr(double value) {
            ageGyr = value;
            return this;
        }

        public Builder phase(String value) {
            phase = value;
            return this;
        }

        public Builder status(ModelStatus value) {
            status = Objects.requireNonNull(value, "status");
            return this;
        }

        public Builder statusDetail(String value) {
            statusDetail = value;
            return this;
        }

        public Builder luminosityLsun(double value) {
            luminosityLsun = value;
            return this;
        }

        public Builder radiusRsun(double value) {
            radiusRsun = value;
            return this;
        }

        public Builder teffK(double value) {
            teffK = value;
            return this;
        }

        public Builder logGCgs(double value) {
            logGCgs = value;
            return this;
        }

        public Builder centralTempK(double value) {
            centralTempK = value;
            return this;
        }

        public Builder centralDensityCgs(double value) {
            centralDensityCgs = value;
            return this;
        }

        public Builder centralHFrac(double value) {
            centralHFrac = value;
            return this;
        }

        public Builder surfaceLiRel(double value) {
            surfaceLiRel = value;
            return this;
        }

        public Builder structureClass(StructureClass value) {
            structureClass = value;
            return this;
        }

        public Builder coreCzMassFrac(double value) {
            coreCzMassFrac = value;
            return this;
        }

        public Builder coreCzRadiusFrac(double value) {
            coreCzRadiusFrac = value;
            return this;
        }

        public Builder envCzBaseMassFrac(double value) {
            envCzBaseMassFrac = value;
            return this;
        }

        public Builder envCzBaseRadiusFrac(double value) {
            envCzBaseRadiusFrac = value;
            return this;
        }

        public Builder envCzMassMsun(double value) {
            envCzMassMsun = value;
            return this;
        }

        public Builder turnoverTimeDays(double value) {
            turnoverTimeDays = value;
            return this;
        }

        public Builder zones(List<CatalogueZone> value) {
            zones = value;
            return this;
        }

        public Builder solverIterations(int value) {
            solverIterations = value;
            return this;
        }

        public Builder criterion(StabilityCriterion value) {
            criterion = value;
            return this;
        }

        public Builder opacityScale(double value) {
            opacityScale = value;
            return this;
        }

        public Builder turnoverTimeGlobalDays(double value) {
            turnoverTimeGlobalDays = value;
            return this;
        }

        public Builder coreMixedMassFrac(double value) {
            coreMixedMassFrac = value;
            return this;
        }

        public Builder overshootProfile(OvershootScheme value) {
            overshootProfile = value;
            return this;
        }

        public Builder buoyancyPeriodPi0S(double value) {
            buoyancyPeriodPi0S = value;
            return this;
        }

        public Builder periodSpacingL1S(double value) {
            periodSpacingL1S = value;
            return this;
        }

        public Builder largeSeparationUhz(double value) {
            largeSeparationUhz = value;
            return this;
        }

        public Builder surfaceCzBaseAcousticDepthS(double value) {
            surfaceCzBaseAcousticDepthS = value;
            return this;
        }

        public Builder heIiIonisationAcousticDepthS(double value) {
            heIiIonisationAcousticDepthS = value;
            return this;
        }

        public Builder momentOfInertiaGCm2(double value) {
            momentOfInertiaGCm2 = value;
            return this;
        }

        public Builder envCzMomentOfInertiaGCm2(double value) {
            envCzMomentOfInertiaGCm2 = value;
            return this;
        }

        public CatalogueRow build() {
            return new CatalogueRow(modelId, massMsun, zInit, yInit, mixingLength, overshootHp, ageGyr, phase,
                    status, statusDetail, luminosityLsun, radiusRsun, teffK, logGCgs, centralTempK,
                    centralDensityCgs, centralHFrac, surfaceLiRel, structureClass, coreCzMassFrac, coreCzRadiusFrac,
                    envCzBaseMassFrac, envCzBaseRadiusFrac, envCzMassMsun, turnoverTimeDays, zones,
                    solverIterations, criterion, opacityScale, turnoverTimeGlobalDays, coreMixedMassFrac,
                    overshootProfile, buoyancyPeriodPi0S, periodSpacingL1S, largeSeparationUhz,
                    surfaceCzBaseAcousticDepthS, heIiIonisationAcousticDepthS, momentOfInertiaGCm2,
                    envCzMomentOfInertiaGCm2);
        }
    }
}
